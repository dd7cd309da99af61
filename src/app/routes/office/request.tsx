import { useParams } from 'react-router';
import { RequireRole } from '@/app/layout/require-role';
import { useMe } from '@/features/auth/api/get-me';
import { useAsBuilt } from '@/features/crew/api/get-as-built';
import { AsBuiltReview } from '@/features/crew/components/as-built-review';
import { useOfficeRequest } from '@/features/office/api/get-office-request';
import { RequestWorkspace } from '@/features/office/components/request-workspace';
import { ApplicationSummary } from '@/features/requests/components/application-summary';

function CautionedWorkspace({ id, me, built }: { id: string; me: NonNullable<ReturnType<typeof useMe>['data']>; built: boolean }) {
  const latest = useAsBuilt(id, built).data?.sets[0];
  // Closing over failing readings is allowed, but the office sees them first and writes down why.
  const cautions = latest && !latest.passed
    ? { close: `The crew’s last as-built readings fail the rule profile${latest.note ? ` (crew’s note: “${latest.note}”)` : ''}. Closing anyway needs a note saying why.` }
    : undefined;
  return <RequestWorkspace key={id} requestId={id} me={me} cautions={cautions} renderApplication={(request) => <ApplicationSummary application={request.application} />} />;
}

export function Component() {
  const { id = '' } = useParams();
  const me = useMe().data;
  // The crew's as-built set is what the office reviews before closing or sending the job back.
  const built = ['under_construction', 'built', 'closed'].includes(useOfficeRequest(id).data?.request.status ?? '');
  return (
    <RequireRole roles={['staff', 'admin']}>
      {me && <CautionedWorkspace id={id} me={me} built={built} />}
      {built && <div className="mt-6"><AsBuiltReview requestId={id} /></div>}
    </RequireRole>
  );
}
