import { useParams } from 'react-router';
import { RequireRole } from '@/app/layout/require-role';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { PageHeader, Panel } from '@/components/ui/panel';
import { paths } from '@/config/paths';
import { photosEditable } from '@shared/contracts/photos';
import { crewStages } from '@shared/workflow/statuses';
import { useLatestQuestion } from '@/features/events/api/get-events';
import { EventList } from '@/features/events/components/event-list';
import { CheckSummary } from '@/features/grade-check/components/check-summary';
import { MessageThread } from '@/features/messages/components/message-thread';
import { OwnerPayments } from '@/features/payments/components/owner-payments';
import { InspectionPanel } from '@/features/inspections/components/inspection-panel';
import { CrewPhotos } from '@/features/photos/components/crew-photos';
import { PhotoGallery } from '@/features/photos/components/photo-gallery';
import { PhotoStep } from '@/features/photos/components/photo-step';
import { OwnerQuote } from '@/features/quotes/components/owner-quote';
import { useRequest } from '@/features/requests/api/get-request';
import { ApplicationSummary } from '@/features/requests/components/application-summary';
import { RequestDocuments } from '@/features/requests/components/request-documents';
import { RequestStatus } from '@/features/requests/components/request-status';

function RequestPage({ id }: { id: string }) {
  const { data, error, isPending } = useRequest(id);
  const question = useLatestQuestion(id, data?.request.status === 'needs_details');
  if (isPending) return <Loading />;
  if (error) return <ErrorNotice error={error} />;
  const { request, documents } = data;
  return (
    <>
      <PageHeader
        title={request.siteAddress || 'Driveway entrance request'}
        lead={`Reference ${request.reference}${request.roadName ? ` · on ${request.roadName}` : ''}`}
      />
      <div className="grid grid-cols-[minmax(0,1fr)] gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <div className="space-y-6">
          <Panel title="Where it stands">
            <RequestStatus request={request} editHref={paths.applicant.editRequest.getHref(id)} question={question} />
          </Panel>
          {request.status !== 'draft' && (
            <Panel title="Quote">
              <OwnerQuote requestId={id} nameOnRequest={request.applicantName} questionHref="#messages" />
            </Panel>
          )}
          {request.status !== 'draft' && (
            <Panel title="Payments">
              <OwnerPayments requestId={id} />
            </Panel>
          )}
          <div id="messages">
            <Panel title="Messages with the office">
              <MessageThread requestId={id} canWrite={request.status !== 'draft'} />
            </Panel>
          </div>
          <Panel title="Photos">
            {photosEditable(request.status) ? <PhotoStep requestId={id} /> : <PhotoGallery requestId={id} />}
          </Panel>
          {crewStages.includes(request.status) && request.status !== 'released' && (
            <>
              <Panel title="The crew’s photos">
                <CrewPhotos requestId={id} />
              </Panel>
              <Panel title="Road authority inspection">
                <InspectionPanel requestId={id} status={request.status} />
              </Panel>
            </>
          )}
          <Panel title="Your answers">
            <ApplicationSummary application={request.application} />
          </Panel>
        </div>
        <div className="space-y-6">
          <Panel title="Timeline">
            <EventList requestId={id} />
          </Panel>
          <Panel title="Grade check">
            <CheckSummary requestId={id} />
          </Panel>
          <Panel title="Documents">
            <RequestDocuments requestId={id} documents={documents} />
          </Panel>
        </div>
      </div>
    </>
  );
}

export function Component() {
  const { id = '' } = useParams();
  return (
    <RequireRole roles={['applicant']}>
      <RequestPage id={id} />
    </RequireRole>
  );
}
