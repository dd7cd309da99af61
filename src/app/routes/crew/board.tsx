import { crewScreenRoles } from '@shared/workflow/roles';
import { RequireRole } from '@/app/layout/require-role';
import { PageHeader, Panel } from '@/components/ui/panel';
import { useMe } from '@/features/auth/api/get-me';
import { BoardList } from '@/features/jobs/components/board-list';
import { YardForm } from '@/features/jobs/components/yard-form';

export function Component() {
  const me = useMe().data;
  return (
    <RequireRole roles={crewScreenRoles}>
      <PageHeader
        title="Released jobs"
        lead="Permit granted, grade check attached, waiting for a crew. The first crew lead to take a job gets it."
      />
      <div className="space-y-6">
        {me?.role === 'admin' && (
          <Panel title="Where the crews start from">
            <YardForm />
          </Panel>
        )}
        <BoardList canTake={me?.role === 'crew'} />
      </div>
    </RequireRole>
  );
}
