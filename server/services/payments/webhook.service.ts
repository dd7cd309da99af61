import type Stripe from 'stripe';
import { eq } from 'drizzle-orm';
import { paymentProviderEvents } from '../../db/schema';
import { AppError } from '../../lib/errors';
import { recordPaidSession } from './checkout.service';
import type { PaymentContext } from './record-payment';

/** The provider's notices that record a payment; every other type is taken in and ignored. */
const paidTypes = new Set(['checkout.session.completed', 'checkout.session.async_payment_succeeded']);

/**
 * One notice from the provider: its signature is checked against the raw body with the SDK (anything unsigned,
 * forged or stale is refused with 400 and writes nothing), then it is acted on once per event id.
 */
export async function takeWebhook(ctx: PaymentContext, rawBody: Buffer, signature: string | undefined) {
  if (!signature) throw new AppError(400, 'unsigned_webhook', 'The notice carries no signature.');
  let event: Stripe.Event;
  try {
    event = ctx.payments.webhooks.constructEvent(rawBody, signature, ctx.env.STRIPE_WEBHOOK_SECRET);
  } catch {
    throw new AppError(400, 'bad_webhook_signature', 'The notice’s signature does not match.');
  }
  const object = event.data.object as { id?: string };
  const [seen] = await ctx.db
    .select({ eventId: paymentProviderEvents.eventId })
    .from(paymentProviderEvents)
    .where(eq(paymentProviderEvents.eventId, event.id));
  if (seen) return { received: true, duplicate: true };
  // The payment is keyed by the page's id, so this is safe to repeat; the event is written once it is done, and a
  // failure before that leaves it unwritten for the provider's next try.
  if (paidTypes.has(event.type)) await recordPaidSession(ctx, event.data.object as Stripe.Checkout.Session);
  const [fresh] = await ctx.db
    .insert(paymentProviderEvents)
    .values({ eventId: event.id, type: event.type, objectId: object.id ?? null })
    .onConflictDoNothing()
    .returning();
  return { received: true, duplicate: fresh === undefined };
}
