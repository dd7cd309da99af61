import type { PaymentView, RequestPaymentsView } from '@shared/contracts/payments';
import { paymentKindLabels, paymentMethodLabels } from '@shared/contracts/payments';
import { formatDay } from '@shared/format/dates';
import { formatCents } from '@shared/money/money';

function paymentWords(p: PaymentView) {
  const paid = `${formatCents(p.amountCents)} paid ${formatDay(p.paidAt)} · ${paymentMethodLabels[p.method]}`;
  return p.refundedAt ? `${paid} · refunded ${formatDay(p.refundedAt)}` : paid;
}

/** The money side of a request as steps in plain words: the agreed price, then the deposit, then the balance. */
export function MoneySteps({ view }: { view: RequestPaymentsView }) {
  if (!view.quote) return <p className="text-sm text-stone-600">{view.dueText}</p>;
  const deposit = view.payments.find((p) => p.kind === 'deposit');
  const balance = view.payments.find((p) => p.kind === 'balance');
  const balanceCents = (view.agreedTotalCents ?? 0) - view.quote.depositCents;
  const step = (label: string, amount: string, state: string, done: boolean, testId: string) => (
    <li className="flex flex-wrap items-baseline justify-between gap-2 py-2" data-testid={testId}>
      <span className="font-semibold text-pine-900">
        <span
          aria-hidden
          className={`mr-2 inline-block h-2.5 w-2.5 rounded-full ${done ? 'bg-pine-600' : 'bg-stone-300'}`}
        />
        {label} <span className="font-mono">{amount}</span>
      </span>
      <span className="text-sm text-stone-600">{state}</span>
    </li>
  );
  return (
    <div className="space-y-3">
      <ol className="divide-y divide-stone-100" aria-label="Money steps">
        {step(
          `Quote version ${view.quote.version} accepted:`,
          formatCents(view.quote.totalCents),
          'the agreed price',
          true,
          'money-quote',
        )}
        {view.changes.map((c) => (
          <li key={c.id} className="flex flex-wrap items-baseline justify-between gap-2 py-2 pl-5 text-sm">
            <span>
              Change agreed: {c.description} ({c.amountCents > 0 ? '+' : '−'}
              {formatCents(Math.abs(c.amountCents))})
            </span>
            <span className="text-stone-600">{formatDay(c.createdAt)}</span>
          </li>
        ))}
        {step(
          `${paymentKindLabels.deposit}:`,
          formatCents(view.quote.depositCents),
          deposit ? paymentWords(deposit) : view.due?.kind === 'deposit' ? 'due now' : 'not paid',
          Boolean(deposit && !deposit.refundedAt),
          'money-deposit',
        )}
        {step(
          `${paymentKindLabels.balance} (final invoice):`,
          formatCents(balance?.amountCents ?? balanceCents),
          balance ? paymentWords(balance) : view.due?.kind === 'balance' ? 'due now' : 'due once the entrance is built',
          Boolean(balance && !balance.refundedAt),
          'money-balance',
        )}
      </ol>
      <p className="text-sm text-stone-700">{view.dueText}</p>
    </div>
  );
}
