import { paymentWaitLabels, type PaymentWaits } from '@shared/contracts/payments';
import { ErrorNotice, Loading } from '@/components/ui/notice';
import { usePaymentWaits } from '../api/get-payment-waits';
import { useSavePaymentWaits } from '../api/save-payment-waits';

/** The company's setting of which steps wait for money; the admin changes it, the office reads it. */
export function PaymentWaitsForm({ canEdit }: { canEdit: boolean }) {
  const { data, error, isPending } = usePaymentWaits();
  const save = useSavePaymentWaits();
  if (isPending) return <Loading />;
  if (error) return <ErrorNotice error={error} />;
  const keys = Object.keys(paymentWaitLabels) as (keyof PaymentWaits)[];
  return (
    <fieldset className="space-y-2" disabled={!canEdit || save.isPending}>
      <legend className="sr-only">Steps that wait for money</legend>
      {keys.map((key) => (
        <label key={key} className="flex items-center gap-2 text-sm">
          <input
            type="checkbox"
            checked={data[key]}
            onChange={(e) => save.mutate({ ...data, [key]: e.target.checked })}
          />
          {paymentWaitLabels[key]}
        </label>
      ))}
      {!canEdit && <p className="text-xs text-stone-600">Only the owner (admin) changes these.</p>}
      {save.error && <ErrorNotice error={save.error} />}
    </fieldset>
  );
}
