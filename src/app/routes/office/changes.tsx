import { RequireRole } from '@/app/layout/require-role';
import { PageHeader, Panel } from '@/components/ui/panel';
import { AuditLog } from '@/features/audit/components/audit-log';

export function Component() {
  return (
    <RequireRole roles={['admin']}>
      <PageHeader
        title="Changes log"
        lead="Every change an administrator made: roles, names, sign-ins turned off or on, people added, rule profile versions published and the crew yard."
      />
      <Panel title="Changes, newest first">
        <AuditLog />
      </Panel>
    </RequireRole>
  );
}
