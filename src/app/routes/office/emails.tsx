import { officeRoles } from '@shared/workflow/roles';
import { RequireRole } from '@/app/layout/require-role';
import { PageHeader } from '@/components/ui/panel';
import { EmailLog } from '@/features/emails/components/email-log';

export function Component() {
  return (
    <RequireRole roles={officeRoles}>
      <PageHeader
        title="E-mail log"
        lead="Every status e-mail: waiting, sent, failed and retried, with the error when delivery went wrong."
      />
      <EmailLog />
    </RequireRole>
  );
}
