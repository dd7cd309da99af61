import { asc, eq } from 'drizzle-orm';
import type { AmountDue, PaymentKind, PaymentWaits } from '@shared/contracts/payments';
import { formatCents } from '@shared/money/money';
import type { RequestStatus } from '@shared/workflow/statuses';
import type { DbOrTx } from '../../db/client';
import { balanceChanges, payments } from '../../db/schema';
import { getAcceptedQuote, type AcceptedQuote } from '../quotes/accepted-quote';

export type PaymentRow = typeof payments.$inferSelect;
export type BalanceChangeRow = typeof balanceChanges.$inferSelect;

/** The balance (the final invoice) can be paid once the crew has built the entrance. */
export const balanceStatuses: readonly RequestStatus[] = ['built', 'closed'];

/** Everything the money of one request is worked out from, read from our own records only. */
export interface MoneyState {
  quote: AcceptedQuote | null;
  changes: BalanceChangeRow[];
  payments: PaymentRow[];
}

export async function loadMoneyState(db: DbOrTx, requestId: string): Promise<MoneyState> {
  // One after another: inside a transaction the three share one connection.
  const quote = await getAcceptedQuote(db, requestId);
  const changes = await db
    .select()
    .from(balanceChanges)
    .where(eq(balanceChanges.requestId, requestId))
    .orderBy(asc(balanceChanges.createdAt));
  const paid = await db.select().from(payments).where(eq(payments.requestId, requestId)).orderBy(asc(payments.paidAt));
  return { quote, changes, payments: paid };
}

export const paymentOf = (state: MoneyState, kind: PaymentKind) => state.payments.find((p) => p.kind === kind);

/** Quote total plus every agreed change; null without an accepted quote. */
export function agreedTotalCents(state: MoneyState): number | null {
  if (!state.quote) return null;
  return state.quote.totalCents + state.changes.reduce((sum, c) => sum + c.amountCents, 0);
}

/** Requests that ended without the work being done: nothing more is owed on them. */
export const endedWithoutWork: readonly RequestStatus[] = ['declined', 'withdrawn', 'permit_refused'];

/** The deposit, once the quote is accepted, unless the request ended without the work. */
function depositDue(state: MoneyState, status: RequestStatus): AmountDue | string {
  if (!state.quote) return 'Nothing to pay yet: the deposit is due once the quote is accepted.';
  if (paymentOf(state, 'deposit')) return '';
  if (endedWithoutWork.includes(status)) return 'This request has ended, so nothing is due.';
  if (state.quote.depositCents <= 0) return '';
  return { kind: 'deposit', amountCents: state.quote.depositCents };
}

/** The balance: the agreed total less the deposit, due once the entrance is built. */
export function balanceCents(state: MoneyState): number | null {
  const total = agreedTotalCents(state);
  if (total === null || !state.quote) return null;
  return total - state.quote.depositCents;
}

function balanceDue(state: MoneyState, status: RequestStatus): AmountDue | string {
  const balance = balanceCents(state);
  if (balance === null || paymentOf(state, 'balance')) return '';
  if (!balanceStatuses.includes(status)) {
    return `The balance of ${formatCents(balance)} is due once the entrance is built.`;
  }
  if (balance <= 0) return 'Nothing more to pay: the deposit covers the agreed total.';
  return { kind: 'balance', amountCents: balance };
}

/** What the owner can pay now (at most one amount), or why nothing. */
export function amountDue(state: MoneyState, status: RequestStatus): { due: AmountDue | null; text: string } {
  const deposit = depositDue(state, status);
  if (typeof deposit !== 'string') {
    return { due: deposit, text: `The deposit of ${formatCents(deposit.amountCents)} is due now.` };
  }
  if (deposit) return { due: null, text: deposit };
  const balance = balanceDue(state, status);
  if (typeof balance !== 'string') {
    return { due: balance, text: `The final invoice of ${formatCents(balance.amountCents)} is due now.` };
  }
  if (balance) return { due: null, text: balance };
  const refunded = state.payments.some((p) => p.refundedAt);
  if (refunded) return { due: null, text: 'The money paid has been refunded.' };
  return { due: null, text: 'Everything is paid. Thank you.' };
}

/** The amount due of one kind, or null when that kind cannot be paid now. */
export function dueOfKind(state: MoneyState, status: RequestStatus, kind: PaymentKind): AmountDue | null {
  const due = kind === 'deposit' ? depositDue(state, status) : balanceDue(state, status);
  return typeof due === 'string' ? null : due;
}

/** The steps that wait for money under the company's setting, with what they wait for, in plain words. */
export function waitsFor(state: MoneyState, waits: PaymentWaits): { action: 'file-permit' | 'close'; text: string }[] {
  const out: { action: 'file-permit' | 'close'; text: string }[] = [];
  const paid = (kind: PaymentKind) => {
    const payment = paymentOf(state, kind);
    return payment !== undefined && !payment.refundedAt;
  };
  if (waits.depositBeforePermit && !paid('deposit') && !(state.quote && state.quote.depositCents === 0)) {
    out.push({
      action: 'file-permit',
      text: state.quote
        ? `Filing the permit waits for the deposit of ${formatCents(state.quote.depositCents)}, which is not paid yet (the company files permits once the deposit is in).`
        : 'Filing the permit waits for the deposit, and there is no accepted quote yet (the company files permits once the deposit is in).',
    });
  }
  const balance = balanceCents(state);
  if (waits.balanceBeforeClose && !paid('balance') && !(balance !== null && balance <= 0 && paid('deposit'))) {
    out.push({
      action: 'close',
      text:
        balance === null
          ? 'Closing waits for the balance, and there is no accepted quote yet (the company closes requests once they are paid in full).'
          : `Closing waits for the balance of ${formatCents(balance)}, which is not paid yet (the company closes requests once they are paid in full).`,
    });
  }
  return out;
}
