import { officeRoles } from '@shared/workflow/roles';
import { useParams } from 'react-router';
import { RequireRole } from '@/app/layout/require-role';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { Panel } from '@/components/ui/panel';
import { useMe } from '@/features/auth/api/get-me';
import { useAsBuilt } from '@/features/jobs/api/get-as-built';
import { AsBuiltReview } from '@/features/jobs/components/as-built-review';
import { EventList } from '@/features/events/components/event-list';
import { MessageThread } from '@/features/messages/components/message-thread';
import type { Cautions } from '@/features/office/components/action-panel';
import { RequestWorkspace } from '@/features/office/components/request-workspace';
import { OfficePayments } from '@/features/payments/components/office-payments';
import { useRequestPayments } from '@/features/payments/api/get-request-payments';
import { InspectionPanel } from '@/features/inspections/components/inspection-panel';
import { CrewPhotos } from '@/features/photos/components/crew-photos';
import { PermitPanel } from '@/features/permits/components/permit-panel';
import { PhotoGallery } from '@/features/photos/components/photo-gallery';
import { QuoteBuilder } from '@/features/quotes/components/quote-builder';
import { useOfficeRequest } from '@/features/requests/api/get-request';
import { ApplicationSummary } from '@/features/requests/components/application-summary';

// The crew's as-built set is what the office reviews before closing or sending the job back.
function OfficeRequestPage({ id }: { id: string }) {
  const me = useMe().data;
  const query = useOfficeRequest(id);
  const built = ['under_construction', 'built', 'closed'].includes(query.data?.request.status ?? '');
  const latest = useAsBuilt(id, built).data?.sets[0];
  const waits = useRequestPayments(id).data?.waits ?? [];
  // Closing over failing readings is allowed, but the office sees them first and writes down why. A step that waits
  // for money under the company's setting says so before the office tries it.
  const cautions: Cautions = Object.fromEntries(waits.map((w) => [w.action, w.text]));
  if (latest && !latest.passed) {
    const readings = `The crew’s last as-built readings fail the rule profile${latest.note ? ` (crew’s note: “${latest.note}”)` : ''}. Closing anyway needs a note saying why.`;
    cautions.close = cautions.close ? `${cautions.close} ${readings}` : readings;
  }
  if (query.isPending) return <Loading label="Loading the request…" />;
  if (query.error) return <ErrorNotice error={query.error} />;
  const { request } = query.data;
  return (
    <>
      {me && (
        <RequestWorkspace
          key={id}
          request={request}
          me={me}
          cautions={cautions}
          sections={{
            application: () => <ApplicationSummary application={request.application} />,
            quote: () => <QuoteBuilder requestId={id} ownerName={request.applicantName} />,
            photos: () => <PhotoGallery requestId={id} emptyText="The homeowner has not added photos." />,
            messages: () => <MessageThread requestId={id} office />,
            history: () => <EventList requestId={id} office label="History" />,
            money: () => (
              <OfficePayments
                requestId={id}
                canRefund={me.role === 'admin' && ['withdrawn', 'declined', 'permit_refused'].includes(request.status)}
              />
            ),
            permit: () => (
              <PermitPanel requestId={id} status={request.status} filed={Boolean(request.permitReference)} />
            ),
          }}
        />
      )}
      {built && (
        <div className="mt-6 space-y-6">
          <AsBuiltReview requestId={id} />
          <Panel title="Crew photos">
            <CrewPhotos requestId={id} />
          </Panel>
          <Panel title="Road authority inspection">
            <InspectionPanel requestId={id} status={request.status} office />
          </Panel>
        </div>
      )}
    </>
  );
}

export function Component() {
  const { id = '' } = useParams();
  return (
    <RequireRole roles={officeRoles}>
      <OfficeRequestPage id={id} />
    </RequireRole>
  );
}
