import { and, eq } from 'drizzle-orm';
import {
  paymentKindLabels,
  type BalanceChangeInput,
  type OfflinePaymentInput,
  type RequestPaymentsView,
} from '@shared/contracts/payments';
import { formatCents } from '@shared/money/money';
import type { SessionUser } from '../../lib/session-user';
import { balanceChanges, paymentCheckouts, payments, requestEvents } from '../../db/schema';
import { AppError, conflict, notFound } from '../../lib/errors';
import { loadVisibleRequest } from '../requests/request-access';
import { agreedTotalCents, amountDue, dueOfKind, endedWithoutWork, loadMoneyState, waitsFor } from './money-state';
import { loadPaymentWaits } from './payment-waits.service';
import { insertPayment, markRefunded, paymentEventKinds, type PaymentContext } from './record-payment';

/** GET /api/requests/:id/payments, for whoever may see the request (the owner and the office). */
export async function requestPayments(
  ctx: Pick<PaymentContext, 'db' | 'env'>,
  actor: SessionUser,
  requestId: string,
): Promise<RequestPaymentsView<Date>> {
  const request = await loadVisibleRequest(ctx.db, actor, requestId);
  if (actor.role === 'crew') throw notFound('Request');
  const [state, waits] = await Promise.all([loadMoneyState(ctx.db, request.id), loadPaymentWaits(ctx.db)]);
  const { due, text } = amountDue(state, request.status);
  return {
    currency: ctx.env.PAYMENT_CURRENCY,
    quote: state.quote
      ? {
          quoteId: state.quote.quoteId,
          version: state.quote.version,
          totalCents: state.quote.totalCents,
          depositCents: state.quote.depositCents,
        }
      : null,
    changes: state.changes.map((c) => ({
      id: c.id,
      description: c.description,
      amountCents: c.amountCents,
      createdAt: c.createdAt,
    })),
    agreedTotalCents: agreedTotalCents(state),
    payments: state.payments.map((p) => ({
      id: p.id,
      kind: p.kind,
      method: p.method,
      amountCents: p.amountCents,
      currency: p.currency,
      paidAt: p.paidAt,
      note: p.method === 'offline' || actor.role !== 'applicant' ? p.note : '',
      refundedAt: p.refundedAt,
      refundedCents: p.refundedCents,
      refundNote: p.refundNote,
    })),
    due,
    dueText: text,
    waits: actor.role === 'applicant' ? [] : waitsFor(state, waits),
  };
}

/**
 * The office records money it received itself (a cheque, cash, a transfer): the amount is what is due of that kind
 * by our own records, and the note says how it came. An open payment page for it is closed afterwards.
 */
export async function recordOfflinePayment(
  ctx: PaymentContext,
  actor: SessionUser,
  requestId: string,
  input: OfflinePaymentInput,
) {
  const request = await loadVisibleRequest(ctx.db, actor, requestId);
  const state = await loadMoneyState(ctx.db, request.id);
  const due = dueOfKind(state, request.status, input.kind);
  const what = paymentKindLabels[input.kind].toLowerCase();
  if (!due) throw conflict(`There is no ${what} due on this request now, so there is nothing to record.`);
  const row = await ctx.db.transaction((tx) =>
    insertPayment(tx, ctx, {
      requestId: request.id,
      kind: input.kind,
      method: 'offline',
      amountCents: due.amountCents,
      currency: ctx.env.PAYMENT_CURRENCY,
      quoteId: state.quote?.quoteId ?? null,
      note: input.note,
      recordedById: actor.id,
      paidAt: new Date(),
    }),
  );
  if (!row) throw conflict(`The ${what} was paid a moment ago; reload to see it.`);
  await closeOpenPages(ctx, request.id, input.kind);
  return row;
}

/** Open payment pages for an amount now paid another way are closed, so nobody can pay it twice. */
async function closeOpenPages(ctx: PaymentContext, requestId: string, kind: 'deposit' | 'balance') {
  const open = await ctx.db
    .select()
    .from(paymentCheckouts)
    .where(
      and(
        eq(paymentCheckouts.requestId, requestId),
        eq(paymentCheckouts.kind, kind),
        eq(paymentCheckouts.status, 'open'),
      ),
    );
  for (const row of open) {
    try {
      if (row.providerSessionId) {
        const session = await ctx.payments.checkout.sessions.retrieve(row.providerSessionId);
        if (session.status === 'open') await ctx.payments.checkout.sessions.expire(row.providerSessionId);
      }
      await ctx.db.update(paymentCheckouts).set({ status: 'expired' }).where(eq(paymentCheckouts.id, row.id));
    } catch (error) {
      // The page stays open at the provider; if it is paid after all, the payment of a kind already paid is refunded.
      ctx.logger.warn({ err: error, checkoutId: row.id }, 'an open payment page could not be closed');
    }
  }
}

/**
 * The admin returns a payment on a request that will not go ahead: by card through the provider (keyed by the
 * payment, so a repeated click refunds once), or, for money the office took in, recorded as handed back.
 */
export async function refundPayment(ctx: PaymentContext, actor: SessionUser, paymentId: string, note: string) {
  const [payment] = await ctx.db.select().from(payments).where(eq(payments.id, paymentId));
  if (!payment) throw notFound('Payment');
  const request = await loadVisibleRequest(ctx.db, actor, payment.requestId);
  if (payment.refundedAt) throw conflict('This payment was already refunded.');
  if (!endedWithoutWork.includes(request.status)) {
    throw conflict(
      'Refunds are made when a paid request is withdrawn, declined or its permit refused; this request is still going ahead.',
    );
  }
  let providerRefundId: string | null = null;
  if (payment.method === 'card') {
    if (!payment.providerPaymentIntentId) throw conflict('This card payment has no provider record to refund against.');
    try {
      const refund = await ctx.payments.refunds.create(
        { payment_intent: payment.providerPaymentIntentId, amount: payment.amountCents, metadata: { paymentId } },
        { idempotencyKey: `refund-${payment.id}` },
      );
      providerRefundId = refund.id;
    } catch (error) {
      ctx.logger.warn({ err: error, paymentId }, 'the payment provider refused or did not answer a refund');
      throw new AppError(
        503,
        'payments_unavailable',
        'The payment service did not make the refund. Nothing changed; try again in a minute.',
      );
    }
  }
  const row = await ctx.db.transaction((tx) =>
    markRefunded(tx, ctx, payment.id, { providerRefundId, note, byId: actor.id, at: new Date() }),
  );
  if (!row) throw conflict('This payment was already refunded.');
  return row;
}

/** The office writes down a change to the price agreed with the owner; it moves the balance. */
export async function addBalanceChange(
  ctx: Pick<PaymentContext, 'db'>,
  actor: SessionUser,
  requestId: string,
  input: BalanceChangeInput,
) {
  const request = await loadVisibleRequest(ctx.db, actor, requestId);
  return ctx.db.transaction(async (tx) => {
    const state = await loadMoneyState(tx, request.id);
    if (!state.quote) throw conflict('Changes to the price follow an accepted quote; this request has none yet.');
    if (state.payments.some((p) => p.kind === 'balance')) {
      throw conflict('The balance is already paid, so the price can no longer change.');
    }
    const total = agreedTotalCents(state)! + input.amountCents;
    if (total < state.quote.depositCents) {
      throw new AppError(400, 'invalid_input', 'The change would bring the price below the deposit.', {
        amountCents: `Amount: the agreed total cannot fall below the deposit of ${formatCents(state.quote.depositCents)}.`,
      });
    }
    const [row] = await tx
      .insert(balanceChanges)
      .values({
        requestId: request.id,
        description: input.description,
        amountCents: input.amountCents,
        createdById: actor.id,
      })
      .returning();
    await tx.insert(requestEvents).values({
      requestId: request.id,
      actorId: actor.id,
      kind: paymentEventKinds.change,
      note: `${input.amountCents > 0 ? 'Adds' : 'Takes off'} ${formatCents(Math.abs(input.amountCents))}: ${input.description}`,
    });
    return row;
  });
}
