import { RequireRole } from '@/app/layout/require-role';
import { PageHeader } from '@/components/ui/panel';
import { MyJobsList } from '@/features/jobs/components/my-jobs-list';

export function Component() {
  return (
    <RequireRole roles={['crew']}>
      <PageHeader
        title="My jobs"
        lead="From taken to built. Plan the day (the homeowner is e-mailed), print the field sheet, then enter the finished grades."
      />
      <MyJobsList />
    </RequireRole>
  );
}
