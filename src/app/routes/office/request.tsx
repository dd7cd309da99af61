import { useParams } from 'react-router';
import { RequireRole } from '@/app/layout/require-role';
import { useMe } from '@/features/auth/api/get-me';
import { RequestWorkspace } from '@/features/office/components/request-workspace';
import { ApplicationSummary } from '@/features/requests/components/application-summary';

export function Component() {
  const { id = '' } = useParams();
  const me = useMe().data;
  return (
    <RequireRole roles={['staff', 'admin']}>
      {me && <RequestWorkspace key={id} requestId={id} me={me} renderApplication={(request) => <ApplicationSummary application={request.application} />} />}
    </RequireRole>
  );
}
