import { Link } from 'react-router';
import { RequireRole } from '@/app/layout/require-role';
import { PageHeader, Panel } from '@/components/ui/panel';
import { paths } from '@/config/paths';
import { MyRequestsTable } from '@/features/requests/components/my-requests-table';

const hrefFor = (id: string, status: string) =>
  status === 'draft' ? paths.applicant.editRequest.getHref(id) : paths.applicant.request.getHref(id);

export function Component() {
  return (
    <RequireRole roles={['applicant']}>
      <PageHeader
        title="My requests"
        lead="Every driveway entrance you have asked for, where it stands, and whether anything is waiting on you."
        actions={
          <Link
            to={paths.applicant.newRequest.getHref()}
            className="rounded-md bg-pine-700 px-4 py-2 text-sm font-semibold text-white hover:bg-pine-800"
          >
            Start a new request
          </Link>
        }
      />
      <Panel>
        <MyRequestsTable hrefFor={hrefFor} />
      </Panel>
    </RequireRole>
  );
}
