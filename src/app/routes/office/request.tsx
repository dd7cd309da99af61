import { officeRoles } from '@shared/workflow/roles';
import { useParams } from 'react-router';
import { RequireRole } from '@/app/layout/require-role';
import { useMe } from '@/features/auth/api/get-me';
import { AsBuiltReview } from '@/features/crew/components/as-built-review';
import { useOfficeRequest } from '@/features/office/api/get-office-request';
import { RequestWorkspace } from '@/features/office/components/request-workspace';
import { ApplicationSummary } from '@/features/requests/components/application-summary';

export function Component() {
  const { id = '' } = useParams();
  const me = useMe().data;
  // The crew's as-built set is what the office reviews before closing or sending the job back.
  const built = ['under_construction', 'built', 'closed'].includes(useOfficeRequest(id).data?.request.status ?? '');
  return (
    <RequireRole roles={officeRoles}>
      {me && <RequestWorkspace key={id} requestId={id} me={me} renderApplication={(request) => <ApplicationSummary application={request.application} />} />}
      {built && <div className="mt-6"><AsBuiltReview requestId={id} /></div>}
    </RequireRole>
  );
}
