import { and, eq } from 'drizzle-orm';
import type Stripe from 'stripe';
import { paymentKindLabels, type CheckoutAnswer, type PaymentKind } from '@shared/contracts/payments';
import { sharedPaths } from '@shared/paths';
import type { SessionUser } from '../../lib/session-user';
import { paymentCheckouts, payments } from '../../db/schema';
import { AppError, conflict, notFound } from '../../lib/errors';
import { loadVisibleRequest } from '../requests/request-access';
import { dueOfKind, loadMoneyState } from './money-state';
import { insertPayment, type PaymentContext } from './record-payment';

type CheckoutRow = typeof paymentCheckouts.$inferSelect;

/** A page is made to last 23 hours from when its row was written, so a retried create asks for the same thing. */
const pageLifetimeMs = 23 * 3600 * 1000;
/** An open page this close to its end is replaced rather than handed out. */
const reuseMarginMs = 30 * 60 * 1000;

/** The provider is unreachable or refused: the owner can try again, and nothing was charged. */
function providerUnavailable(ctx: PaymentContext, error: unknown): AppError {
  ctx.logger.warn({ err: error }, 'the payment provider did not answer');
  return new AppError(
    503,
    'payments_unavailable',
    'The payment service did not answer. Nothing was charged; try again in a minute.',
  );
}

/**
 * The owner asks to pay what is due of one kind: the amount comes from the accepted quote and our own records.
 * An open page for the same amount is handed out again (a second tab, a second click), so one amount has one page.
 */
export async function startCheckout(
  ctx: PaymentContext,
  actor: SessionUser,
  requestId: string,
  kind: PaymentKind,
): Promise<CheckoutAnswer> {
  const request = await loadVisibleRequest(ctx.db, actor, requestId);
  if (request.applicantId !== actor.id) throw notFound('Request');
  const due = dueOfKind(await loadMoneyState(ctx.db, request.id), request.status, kind);
  if (!due) throw conflict(`There is no ${paymentKindLabels[kind].toLowerCase()} to pay on this request now.`);

  for (let tries = 0; tries < 3; tries += 1) {
    const open = await openCheckout(ctx, request.id, kind);
    if (open) {
      const usable = await settleOpenCheckout(ctx, open, due.amountCents, request.reference);
      if (usable === 'paid') throw conflict(`The ${paymentKindLabels[kind].toLowerCase()} is already paid.`);
      if (usable) return { url: usable };
      continue;
    }
    const now = new Date();
    const [created] = await ctx.db
      .insert(paymentCheckouts)
      .values({
        requestId: request.id,
        kind,
        amountCents: due.amountCents,
        currency: ctx.env.PAYMENT_CURRENCY,
        createdById: actor.id,
        createdAt: now,
        expiresAt: new Date(now.getTime() + pageLifetimeMs),
      })
      .onConflictDoNothing()
      .returning();
    // Another tab wrote its row first: go round and use that one.
    if (!created) continue;
    return { url: await ensureSession(ctx, created, request.reference) };
  }
  throw conflict('The payment page is being prepared in another window. Try again in a moment.');
}

async function openCheckout(ctx: PaymentContext, requestId: string, kind: PaymentKind) {
  const [row] = await ctx.db
    .select()
    .from(paymentCheckouts)
    .where(
      and(
        eq(paymentCheckouts.requestId, requestId),
        eq(paymentCheckouts.kind, kind),
        eq(paymentCheckouts.status, 'open'),
      ),
    );
  return row;
}

/**
 * Looks at the provider's side of an open page: paid (recorded now, in case its notice was lost), expired, for
 * another amount (the price changed: it is closed), or still good (its URL is handed out again).
 */
async function settleOpenCheckout(ctx: PaymentContext, row: CheckoutRow, amountCents: number, reference: string) {
  if (!row.providerSessionId) {
    // Its maker is still asking the provider; the same idempotency key gives the same page.
    return ensureSession(ctx, row, reference);
  }
  let session: Stripe.Checkout.Session;
  try {
    session = await ctx.payments.checkout.sessions.retrieve(row.providerSessionId);
  } catch (error) {
    throw providerUnavailable(ctx, error);
  }
  if (session.payment_status === 'paid') {
    await recordPaidSession(ctx, session);
    return 'paid' as const;
  }
  const stale = row.amountCents !== amountCents || row.expiresAt.getTime() - Date.now() < reuseMarginMs;
  if (session.status === 'open' && !stale && session.url) return session.url;
  if (session.status === 'open') {
    try {
      await ctx.payments.checkout.sessions.expire(session.id);
    } catch (error) {
      throw providerUnavailable(ctx, error);
    }
  }
  await ctx.db
    .update(paymentCheckouts)
    .set({ status: 'expired' })
    .where(and(eq(paymentCheckouts.id, row.id), eq(paymentCheckouts.status, 'open')));
  return null;
}

/** Asks the provider for the row's page, keyed by the row's id, and keeps its id and URL on the row. */
async function ensureSession(ctx: PaymentContext, row: CheckoutRow, reference: string): Promise<string> {
  const back = `${ctx.env.APP_ORIGIN}${sharedPaths.applicantRequest.getHref(row.requestId)}`;
  const metadata = { requestId: row.requestId, kind: row.kind, checkoutId: row.id };
  let session: Stripe.Checkout.Session;
  try {
    session = await ctx.payments.checkout.sessions.create(
      {
        mode: 'payment',
        client_reference_id: row.id,
        line_items: [
          {
            quantity: 1,
            price_data: {
              currency: row.currency,
              unit_amount: row.amountCents,
              product_data: {
                name: `${paymentKindLabels[row.kind]} for driveway entrance request${reference ? ` ${reference}` : ''}`,
              },
            },
          },
        ],
        metadata,
        payment_intent_data: { metadata },
        success_url: `${back}?payment=done&session_id={CHECKOUT_SESSION_ID}`,
        cancel_url: `${back}?payment=cancelled`,
        expires_at: Math.floor(row.expiresAt.getTime() / 1000),
      },
      { idempotencyKey: `checkout-${row.id}` },
    );
  } catch (error) {
    throw providerUnavailable(ctx, error);
  }
  await ctx.db
    .update(paymentCheckouts)
    .set({ providerSessionId: session.id, url: session.url })
    .where(eq(paymentCheckouts.id, row.id));
  if (!session.url) throw providerUnavailable(ctx, new Error(`session ${session.id} came back without a URL`));
  return session.url;
}

/**
 * Records a paid provider page as a payment, taking the amount from our own checkout row: a session we did not
 * make, or whose amount or currency is not what we asked, records nothing. Safe to call any number of times.
 */
export async function recordPaidSession(ctx: PaymentContext, session: Stripe.Checkout.Session) {
  if (session.payment_status !== 'paid') return null;
  const [row] = await ctx.db.select().from(paymentCheckouts).where(eq(paymentCheckouts.providerSessionId, session.id));
  if (!row) {
    ctx.logger.warn({ sessionId: session.id }, 'a paid payment page that is not ours was reported; nothing recorded');
    return null;
  }
  if (session.amount_total !== row.amountCents || session.currency !== row.currency) {
    ctx.logger.warn(
      { sessionId: session.id, expected: row.amountCents, reported: session.amount_total },
      'a payment page reported another amount than we asked for; nothing recorded',
    );
    return null;
  }
  const state = await loadMoneyState(ctx.db, row.requestId);
  const intent = typeof session.payment_intent === 'string' ? session.payment_intent : session.payment_intent?.id;
  const recorded = await ctx.db.transaction((tx) =>
    insertPayment(tx, ctx, {
      requestId: row.requestId,
      kind: row.kind,
      method: 'card',
      amountCents: row.amountCents,
      currency: row.currency,
      quoteId: state.quote?.quoteId ?? null,
      checkoutId: row.id,
      providerSessionId: session.id,
      providerPaymentIntentId: intent ?? null,
      recordedById: row.createdById,
      paidAt: new Date(),
    }),
  );
  if (!recorded && intent) await refundIfDuplicate(ctx, session.id, intent);
  return recorded;
}

/**
 * A second page of the same kind was paid (two pages made around a price change, both paid): the request keeps one
 * payment of each kind, so the second goes straight back to the card, once (the key is the page's id).
 */
async function refundIfDuplicate(ctx: PaymentContext, sessionId: string, intent: string) {
  const [same] = await ctx.db
    .select({ id: payments.id })
    .from(payments)
    .where(eq(payments.providerSessionId, sessionId));
  if (same) return;
  ctx.logger.warn({ sessionId }, 'a second payment of the same kind was made; it is refunded');
  try {
    await ctx.payments.refunds.create(
      { payment_intent: intent, metadata: { reason: 'paid twice' } },
      { idempotencyKey: `duplicate-${sessionId}` },
    );
  } catch (error) {
    ctx.logger.error({ err: error, sessionId }, 'the refund of a payment made twice failed; refund it by hand');
  }
}

/**
 * The owner is back from the payment page: the page is looked up among this request's own, and the provider asked
 * whether it was paid, so the payment is recorded even when the provider's notice never arrives.
 */
export async function confirmReturn(ctx: PaymentContext, actor: SessionUser, requestId: string, sessionId: string) {
  const request = await loadVisibleRequest(ctx.db, actor, requestId);
  if (request.applicantId !== actor.id) throw notFound('Request');
  const [row] = await ctx.db
    .select()
    .from(paymentCheckouts)
    .where(and(eq(paymentCheckouts.providerSessionId, sessionId), eq(paymentCheckouts.requestId, request.id)));
  if (!row) throw notFound('That payment page');
  let session: Stripe.Checkout.Session;
  try {
    session = await ctx.payments.checkout.sessions.retrieve(sessionId);
  } catch (error) {
    throw providerUnavailable(ctx, error);
  }
  await recordPaidSession(ctx, session);
  return session.payment_status === 'paid';
}
