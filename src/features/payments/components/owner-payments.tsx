import { useEffect, useRef } from 'react';
import { useSearchParams } from 'react-router';
import { paymentKindLabels } from '@shared/contracts/payments';
import { formatCents } from '@shared/money/money';
import { Button } from '@/components/ui/button';
import { ErrorNotice, Loading, Notice } from '@/components/ui/notice';
import { useConfirmReturn } from '../api/confirm-return';
import { useRequestPayments } from '../api/get-request-payments';
import { useStartCheckout } from '../api/start-checkout';
import { MoneySteps } from './money-steps';

/**
 * The owner's money panel: what is agreed, paid and due, and the button to the payment page. Back from that page
 * (its id in the address), the server is asked to confirm the payment with the provider before anything is shown.
 */
export function OwnerPayments({ requestId }: { requestId: string }) {
  const { data, error, isPending } = useRequestPayments(requestId);
  const checkout = useStartCheckout(requestId);
  const back = useConfirmReturn(requestId);
  const [params, setParams] = useSearchParams();
  const returned = params.get('payment');
  const sessionId = params.get('session_id');
  const asked = useRef(false);

  useEffect(() => {
    if (returned !== 'done' || !sessionId || asked.current) return;
    asked.current = true;
    back.mutate({ sessionId });
  }, [returned, sessionId, back]);

  if (isPending) return <Loading />;
  if (error) return <ErrorNotice error={error} />;
  const due = data.due;
  const done = () => setParams({}, { replace: true });
  return (
    <div className="space-y-4">
      {returned === 'done' && back.isPending && <Loading label="Checking your payment with the card company…" />}
      {returned === 'done' && back.isSuccess && (
        <Notice title="Thank you: your payment is recorded.">
          A receipt is on its way by e-mail.{' '}
          <Button variant="quiet" onClick={done}>
            Hide this
          </Button>
        </Notice>
      )}
      {returned === 'done' && back.error && <ErrorNotice error={back.error} />}
      {returned === 'cancelled' && (
        <Notice tone="warn" title="Nothing was paid.">
          You came back from the payment page without paying. You can pay whenever you are ready.{' '}
          <Button variant="quiet" onClick={done}>
            Hide this
          </Button>
        </Notice>
      )}
      <MoneySteps view={data} />
      {due && (
        <div className="space-y-2">
          <Button onClick={() => checkout.mutate({ kind: due.kind })} disabled={checkout.isPending}>
            {checkout.isPending
              ? 'Opening the payment page…'
              : due.kind === 'deposit'
                ? `Pay the deposit (${formatCents(due.amountCents)})`
                : `Pay the final invoice (${formatCents(due.amountCents)})`}
          </Button>
          <p className="text-xs text-stone-600">
            The {paymentKindLabels[due.kind].toLowerCase()} is paid by card on the payment company’s page; you come back
            here afterwards. Gradepass never sees your card number.
          </p>
          {checkout.error && <ErrorNotice error={checkout.error} />}
        </div>
      )}
    </div>
  );
}
