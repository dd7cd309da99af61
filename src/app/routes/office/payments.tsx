import { officeRoles } from '@shared/workflow/roles';
import { RequireRole } from '@/app/layout/require-role';
import { PageHeader, Panel } from '@/components/ui/panel';
import { useMe } from '@/features/auth/api/get-me';
import { PaymentWaitsForm } from '@/features/payments/components/payment-waits-form';
import { PaymentsTable } from '@/features/payments/components/payments-table';

function PaymentsPage() {
  const me = useMe().data;
  return (
    <>
      <PageHeader
        title="Payments"
        lead="Deposits and final invoices: what came in, what is still owed, and what went back to the owner."
      />
      <div className="grid grid-cols-[minmax(0,1fr)] gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]">
        <Panel title="Money in and out">
          <PaymentsTable />
        </Panel>
        <Panel title="Steps that wait for money">
          <PaymentWaitsForm canEdit={me?.role === 'admin'} />
        </Panel>
      </div>
    </>
  );
}

export function Component() {
  return (
    <RequireRole roles={officeRoles}>
      <PaymentsPage />
    </RequireRole>
  );
}
