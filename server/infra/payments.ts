import Stripe from 'stripe';
import type { Env } from '../config/env';

/**
 * The payment provider's SDK. With STRIPE_API_HOST/PORT/PROTOCOL unset it talks to the provider itself; set, to
 * any server speaking the same API (the local stand-in in `fakes/payments`). Nothing else differs.
 */
export function createPaymentsClient(env: Env): Stripe {
  return new Stripe(env.STRIPE_SECRET_KEY, {
    ...(env.STRIPE_API_HOST ? { host: env.STRIPE_API_HOST } : {}),
    ...(env.STRIPE_API_PORT !== undefined ? { port: env.STRIPE_API_PORT } : {}),
    ...(env.STRIPE_API_PROTOCOL ? { protocol: env.STRIPE_API_PROTOCOL } : {}),
    // A retried create carries the same idempotency key, so a lost answer never makes a second payment page.
    maxNetworkRetries: 2,
    timeout: 15_000,
    appInfo: { name: 'Gradepass' },
  });
}
