import { and, eq, sql } from 'drizzle-orm';
import type { PaymentKind, PaymentMethod } from '@shared/contracts/payments';
import { formatDay } from '@shared/format/dates';
import { formatCents } from '@shared/money/money';
import type { AppContext } from '../../config/context';
import type { Tx } from '../../db/client';
import { paymentCheckouts, payments, requestEvents, requests, users } from '../../db/schema';
import { paymentReceiptEmail, refundReceiptEmail } from '../email/payment-emails';
import { enqueueEmails } from '../email/outbox';
import { amountDue, loadMoneyState } from './money-state';

export type PaymentContext = Pick<AppContext, 'db' | 'env' | 'logger' | 'payments'>;

/** What the history calls each money step (shared/workflow/event-kinds.ts holds the words). */
export const paymentEventKinds = {
  deposit: 'deposit-paid',
  balance: 'balance-paid',
  refund: 'payment-refunded',
  change: 'balance-change',
} as const;

export interface NewPayment {
  requestId: string;
  kind: PaymentKind;
  method: PaymentMethod;
  amountCents: number;
  currency: string;
  quoteId: string | null;
  checkoutId?: string;
  providerSessionId?: string;
  providerPaymentIntentId?: string | null;
  note?: string;
  recordedById: string | null;
  paidAt: Date;
}

/**
 * Writes one payment with its history entry and the owner's receipt, in the caller's transaction, after locking the
 * request. Returns null when this payment (same provider page) or one of its kind is already recorded: the second
 * of two deliveries, or the return racing the webhook, writes nothing.
 */
export async function insertPayment(tx: Tx, ctx: Pick<AppContext, 'env'>, payment: NewPayment) {
  const [request] = await tx.select().from(requests).where(eq(requests.id, payment.requestId)).for('update');
  if (!request) return null;
  const [row] = await tx
    .insert(payments)
    .values({ ...payment, note: payment.note ?? '' })
    .onConflictDoNothing()
    .returning();
  if (!row) return null;
  if (payment.checkoutId) {
    await tx.update(paymentCheckouts).set({ status: 'complete' }).where(eq(paymentCheckouts.id, payment.checkoutId));
  }
  const [event] = await tx
    .insert(requestEvents)
    .values({
      requestId: request.id,
      actorId: payment.recordedById,
      kind: paymentEventKinds[payment.kind],
      note: paymentNote(row),
    })
    .returning({ id: requestEvents.id });
  const state = await loadMoneyState(tx, request.id);
  const [owner] = await tx
    .select({ email: users.email, name: users.name })
    .from(users)
    .where(eq(users.id, request.applicantId));
  await enqueueEmails(tx, [
    {
      ...paymentReceiptEmail({
        request,
        owner,
        kind: row.kind,
        method: row.method,
        amountCents: row.amountCents,
        day: formatDay(row.paidAt),
        receiptNumber: row.id,
        note: row.method === 'offline' ? row.note : '',
        appOrigin: ctx.env.APP_ORIGIN,
        whatNext: amountDue(state, request.status).text,
      }),
      eventId: event.id,
    },
  ]);
  return row;
}

function paymentNote(row: typeof payments.$inferSelect) {
  const amount = formatCents(row.amountCents);
  return row.method === 'card' ? `${amount} by card, online.` : `${amount} recorded by the office: ${row.note}`;
}

/** Marks a payment refunded (once), with its history entry and the owner's notice. */
export async function markRefunded(
  tx: Tx,
  ctx: Pick<AppContext, 'env'>,
  paymentId: string,
  refund: { providerRefundId: string | null; note: string; byId: string; at: Date },
) {
  const [row] = await tx
    .update(payments)
    .set({
      refundedAt: refund.at,
      refundedCents: sql`${payments.amountCents}`,
      providerRefundId: refund.providerRefundId,
      refundNote: refund.note,
      refundedById: refund.byId,
    })
    .where(and(eq(payments.id, paymentId), sql`${payments.refundedAt} is null`))
    .returning();
  if (!row) return null;
  const [request] = await tx.select().from(requests).where(eq(requests.id, row.requestId));
  const [event] = await tx
    .insert(requestEvents)
    .values({
      requestId: row.requestId,
      actorId: refund.byId,
      kind: paymentEventKinds.refund,
      note: `${row.kind === 'deposit' ? 'Deposit' : 'Balance'} of ${formatCents(row.amountCents)} refunded: ${refund.note}`,
    })
    .returning({ id: requestEvents.id });
  const [owner] = await tx
    .select({ email: users.email, name: users.name })
    .from(users)
    .where(eq(users.id, request.applicantId));
  await enqueueEmails(tx, [
    {
      ...refundReceiptEmail({
        request,
        owner,
        kind: row.kind,
        method: row.method,
        amountCents: row.amountCents,
        day: formatDay(refund.at),
        receiptNumber: row.id,
        note: refund.note,
        appOrigin: ctx.env.APP_ORIGIN,
        whatNext: '',
      }),
      eventId: event.id,
    },
  ]);
  return row;
}
