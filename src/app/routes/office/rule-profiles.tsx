import { officeRoles } from '@shared/workflow/roles';
import { RequireRole } from '@/app/layout/require-role';
import { PageHeader, Panel } from '@/components/ui/panel';
import { useMe } from '@/features/auth/api/get-me';
import { JurisdictionsList } from '@/features/rule-profiles/components/jurisdictions-list';
import { NewJurisdictionForm } from '@/features/rule-profiles/components/new-jurisdiction-form';

export function Component() {
  const me = useMe().data;
  return (
    <RequireRole roles={officeRoles}>
      <PageHeader
        title="Rule profiles"
        lead="Each road authority's limits, with where every value comes from. Checks always name the version they used."
      />
      <div className="space-y-6">
        <Panel title="Road authorities">
          <JurisdictionsList />
        </Panel>
        {me?.role === 'admin' && (
          <Panel title="Add a road authority">
            <NewJurisdictionForm />
          </Panel>
        )}
      </div>
    </RequireRole>
  );
}
