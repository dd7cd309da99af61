import { RequireRole } from '@/app/layout/require-role';
import { PageHeader, Panel } from '@/components/ui/panel';
import { InviteUserForm } from '@/features/people/components/invite-user-form';
import { UsersTable } from '@/features/people/components/users-table';

export function Component() {
  return (
    <RequireRole roles={['admin']}>
      <PageHeader
        title="Users and roles"
        lead="Everyone who signs in starts as a homeowner. Give office staff, crew leads and administrators their access here."
      />
      <div className="space-y-6">
        <Panel title="Add a person">
          <InviteUserForm />
        </Panel>
        <Panel title="People">
          <UsersTable />
        </Panel>
      </div>
    </RequireRole>
  );
}
