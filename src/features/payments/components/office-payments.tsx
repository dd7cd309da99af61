import { useState, type FormEvent } from 'react';
import { paymentKindLabels, type PaymentKind, type PaymentView } from '@shared/contracts/payments';
import { formatCents, parseDollarsToCents } from '@shared/money/money';
import { Button } from '@/components/ui/button';
import { Field, TextInput } from '@/components/ui/field';
import { ErrorNotice, Loading, Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/api-client';
import { useAddBalanceChange } from '../api/add-balance-change';
import { useRequestPayments } from '../api/get-request-payments';
import { useRecordOfflinePayment } from '../api/record-offline-payment';
import { useRefundPayment } from '../api/refund-payment';
import { MoneySteps } from './money-steps';

interface OfficePaymentsProps {
  requestId: string;
  /** The admin may hand money back once the request will not go ahead. */
  canRefund: boolean;
}

const fieldError = (error: unknown, field: string) => (error instanceof ApiError ? error.fields[field] : undefined);

/** The office's money panel: the steps, what waits for money, a cheque received, an agreed change, refunds. */
export function OfficePayments({ requestId, canRefund }: OfficePaymentsProps) {
  const { data, error, isPending } = useRequestPayments(requestId);
  if (isPending) return <Loading />;
  if (error) return <ErrorNotice error={error} />;
  return (
    <div className="space-y-4">
      <MoneySteps view={data} />
      {data.waits.map((w) => (
        <Notice key={w.action} tone="warn">
          {w.text}
        </Notice>
      ))}
      {data.due && <OfflineForm requestId={requestId} kind={data.due.kind} amountCents={data.due.amountCents} />}
      {data.quote && !data.payments.some((p) => p.kind === 'balance') && <ChangeForm requestId={requestId} />}
      {canRefund &&
        data.payments
          .filter((p) => !p.refundedAt)
          .map((p) => <RefundForm key={p.id} requestId={requestId} payment={p} />)}
    </div>
  );
}

function OfflineForm({ requestId, kind, amountCents }: { requestId: string; kind: PaymentKind; amountCents: number }) {
  const record = useRecordOfflinePayment(requestId);
  const [note, setNote] = useState('');
  const submit = (event: FormEvent) => {
    event.preventDefault();
    record.mutate({ kind, note }, { onSuccess: () => setNote('') });
  };
  return (
    <form onSubmit={submit} className="space-y-2 rounded-md border border-stone-200 p-3">
      <p className="text-sm font-semibold text-pine-900">
        Record the {paymentKindLabels[kind].toLowerCase()} received another way ({formatCents(amountCents)})
      </p>
      <Field label="Note" hint="How it was paid, such as “Cheque 1042”." error={fieldError(record.error, 'note')}>
        {(ids) => (
          <TextInput
            id={ids.id}
            aria-describedby={ids.describedBy}
            aria-invalid={ids.invalid}
            value={note}
            onChange={(e) => setNote(e.target.value)}
          />
        )}
      </Field>
      <Button type="submit" variant="secondary" disabled={record.isPending}>
        Record the payment
      </Button>
      {record.error && !fieldError(record.error, 'note') && <ErrorNotice error={record.error} />}
    </form>
  );
}

/** "−12.50" or "12.50" typed as dollars, to signed cents; null when it is not an amount. */
function signedCents(text: string): number | null {
  const trimmed = text.trim();
  const negative = /^[-−]/.test(trimmed);
  const cents = parseDollarsToCents(trimmed.replace(/^[-−+]\s*/, ''));
  return cents === null ? null : negative ? -cents : cents;
}

function ChangeForm({ requestId }: { requestId: string }) {
  const add = useAddBalanceChange(requestId);
  const [description, setDescription] = useState('');
  const [amount, setAmount] = useState('');
  const [typed, setTyped] = useState<string>();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const cents = signedCents(amount);
    if (cents === null) {
      setTyped('Amount: enter dollars and cents, such as 480.00, or −120.00 for money off.');
      return;
    }
    setTyped(undefined);
    add.mutate(
      { description, amountCents: cents },
      {
        onSuccess: () => {
          setDescription('');
          setAmount('');
        },
      },
    );
  };
  return (
    <details className="rounded-md border border-stone-200 p-3">
      <summary className="cursor-pointer text-sm font-semibold text-pine-900">
        Add a change agreed with the owner
      </summary>
      <form onSubmit={submit} className="mt-2 space-y-2">
        <Field label="What changed" error={fieldError(add.error, 'description')}>
          {(ids) => (
            <TextInput
              id={ids.id}
              aria-describedby={ids.describedBy}
              aria-invalid={ids.invalid}
              value={description}
              onChange={(e) => setDescription(e.target.value)}
            />
          )}
        </Field>
        <Field
          label="Amount"
          hint="In dollars; put a minus sign before money taken off."
          error={typed ?? fieldError(add.error, 'amountCents')}
        >
          {(ids) => (
            <TextInput
              id={ids.id}
              inputMode="decimal"
              aria-describedby={ids.describedBy}
              aria-invalid={ids.invalid}
              value={amount}
              onChange={(e) => setAmount(e.target.value)}
            />
          )}
        </Field>
        <Button type="submit" variant="secondary" disabled={add.isPending}>
          Add the change
        </Button>
        {add.error && !fieldError(add.error, 'description') && !fieldError(add.error, 'amountCents') && (
          <ErrorNotice error={add.error} />
        )}
      </form>
    </details>
  );
}

function RefundForm({ requestId, payment }: { requestId: string; payment: PaymentView }) {
  const refund = useRefundPayment(requestId);
  const [note, setNote] = useState('');
  const submit = (event: FormEvent) => {
    event.preventDefault();
    refund.mutate({ paymentId: payment.id, note });
  };
  return (
    <form onSubmit={submit} className="space-y-2 rounded-md border border-clay/40 p-3">
      <p className="text-sm font-semibold text-pine-900">
        Refund the {paymentKindLabels[payment.kind].toLowerCase()} ({formatCents(payment.amountCents)})
      </p>
      <Field label="Reason for the refund" error={fieldError(refund.error, 'note')}>
        {(ids) => (
          <TextInput
            id={ids.id}
            aria-describedby={ids.describedBy}
            aria-invalid={ids.invalid}
            value={note}
            onChange={(e) => setNote(e.target.value)}
          />
        )}
      </Field>
      <Button type="submit" variant="danger" disabled={refund.isPending}>
        Refund {formatCents(payment.amountCents)}
      </Button>
      {refund.error && !fieldError(refund.error, 'note') && <ErrorNotice error={refund.error} />}
    </form>
  );
}
