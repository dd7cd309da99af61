import { RequireRole } from '@/app/layout/require-role';
import { PageHeader, Panel } from '@/components/ui/panel';
import { YardForm } from '@/features/jobs/components/yard-form';

export function Component() {
  return (
    <RequireRole roles={['admin']}>
      <PageHeader
        title="Crew yard"
        lead="Where the crews start from: the released jobs board measures each job's distance from here."
      />
      <Panel title="Where the crews start from">
        <YardForm />
      </Panel>
    </RequireRole>
  );
}
