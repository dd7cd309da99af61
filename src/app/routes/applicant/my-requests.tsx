import { RequireRole } from '@/app/layout/require-role';
import { PageHeader } from '@/components/ui/panel';

export function Component() {
  return (
    <RequireRole roles={['applicant']}>
      <PageHeader title="My requests" />
    </RequireRole>
  );
}
