import { officeRoles } from '@shared/workflow/roles';
import { RequireRole } from '@/app/layout/require-role';
import { PageHeader } from '@/components/ui/panel';
import { useMe } from '@/features/auth/api/get-me';
import { OfficeQueue } from '@/features/office/components/office-queue';

export function Component() {
  const me = useMe().data;
  return (
    <RequireRole roles={officeRoles}>
      <PageHeader
        title="Queue"
        lead="Every request sent to the office, oldest wait first. Filter, search, take one and move it on."
      />
      {me && <OfficeQueue meId={me.id} />}
    </RequireRole>
  );
}
