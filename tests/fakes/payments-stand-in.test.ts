import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startPaymentsStandIn, testCards, type PaymentsStandIn } from '../../fakes';

// The stand-in driven by the real SDK, configured by host, port and protocol alone, as the app configures it; its
// notices go to a small receiver that answers 500 to the first delivery, so the retry shows.
let provider: PaymentsStandIn;
let stripe: Stripe;
let receiver: Server;
const received: { signature: string; body: string }[] = [];

beforeAll(async () => {
  receiver = createServer((req, res) => {
    let body = '';
    req.on('data', (chunk: Buffer) => (body += chunk.toString('utf8')));
    req.on('end', () => {
      received.push({ signature: String(req.headers['stripe-signature'] ?? ''), body });
      res.statusCode = received.length === 1 ? 500 : 200;
      res.end();
    });
  });
  await new Promise<void>((resolve) => receiver.listen(0, '127.0.0.1', resolve));
  provider = await startPaymentsStandIn({
    secretKey: 'sk_test_alone',
    webhookSecret: 'whsec_alone',
    webhookUrl: `http://127.0.0.1:${(receiver.address() as AddressInfo).port}/hook`,
    firstRetryMs: 20,
    maxAttempts: 3,
  });
  stripe = new Stripe(provider.secretKey, { host: provider.host, port: provider.port, protocol: provider.protocol });
});
afterAll(async () => {
  await provider?.stop();
  await new Promise((resolve) => receiver?.close(resolve));
});

const page = (amount = 2500) =>
  stripe.checkout.sessions.create({
    mode: 'payment',
    line_items: [
      { quantity: 1, price_data: { currency: 'usd', unit_amount: amount, product_data: { name: 'Deposit' } } },
    ],
    metadata: { requestId: 'r1' },
    success_url: 'http://127.0.0.1:1/back?session_id={CHECKOUT_SESSION_ID}',
    cancel_url: 'http://127.0.0.1:1/back?payment=cancelled',
  });

async function pay(url: string, card: string = testCards.pays) {
  return fetch(url, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams({ card, expiry: '11/31', code: '123' }),
  });
}

describe('the payments stand-in through the SDK', () => {
  it('makes, pays, retrieves and refunds, and signs its notices so the SDK verifies them', async () => {
    const session = await page();
    expect(session).toMatchObject({ status: 'open', payment_status: 'unpaid', amount_total: 2500, currency: 'usd' });
    expect((await stripe.checkout.sessions.retrieve(session.id)).url).toBe(session.url);
    const done = await pay(session.url!);
    expect(done.status).toBe(303);
    expect(done.headers.get('location')).toBe(`http://127.0.0.1:1/back?session_id=${session.id}`);
    const paid = await stripe.checkout.sessions.retrieve(session.id, { expand: ['payment_intent'] });
    expect(paid).toMatchObject({ status: 'complete', payment_status: 'paid', url: null });
    const intent = paid.payment_intent as Stripe.PaymentIntent;
    expect(intent).toMatchObject({ status: 'succeeded', amount_received: 2500 });
    expect((await stripe.paymentIntents.retrieve(intent.id)).id).toBe(intent.id);

    await expect.poll(() => received.length).toBe(2);
    const event = stripe.webhooks.constructEvent(received[1].body, received[1].signature, provider.webhookSecret);
    expect(event.type).toBe('checkout.session.completed');
    expect((event.data.object as Stripe.Checkout.Session).id).toBe(session.id);
    expect(received[0].body).toBe(received[1].body);
    expect(() => stripe.webhooks.constructEvent(received[1].body, received[1].signature, 'whsec_other')).toThrow();

    const refund = await stripe.refunds.create({ payment_intent: intent.id, amount: 1000 });
    expect(refund).toMatchObject({ status: 'succeeded', amount: 1000 });
    await expect(stripe.refunds.create({ payment_intent: intent.id, amount: 1501 })).rejects.toMatchObject({
      type: 'StripeInvalidRequestError',
      param: 'amount',
    });
    await expect(stripe.checkout.sessions.expire(session.id)).rejects.toMatchObject({ statusCode: 400 });
  });

  it('repeats an answer for the same idempotency key, and refuses the key with other parameters', async () => {
    const key = `key-${Date.now()}`;
    const params = {
      mode: 'payment' as const,
      line_items: [
        { quantity: 1, price_data: { currency: 'usd', unit_amount: 900, product_data: { name: 'Deposit' } } },
      ],
      success_url: 'http://127.0.0.1:1/back',
    };
    const first = await stripe.checkout.sessions.create(params, { idempotencyKey: key });
    const again = await stripe.checkout.sessions.create(params, { idempotencyKey: key });
    expect(again.id).toBe(first.id);
    await expect(
      stripe.checkout.sessions.create({ ...params, success_url: 'http://127.0.0.1:1/other' }, { idempotencyKey: key }),
    ).rejects.toMatchObject({ type: 'StripeIdempotencyError' });
  });

  it('refuses a wrong key, fractions of a cent, a refused card, and an expired page', async () => {
    const wrong = new Stripe('sk_test_wrong', {
      host: provider.host,
      port: provider.port,
      protocol: provider.protocol,
    });
    await expect(wrong.checkout.sessions.retrieve('cs_test_anything')).rejects.toMatchObject({ statusCode: 401 });
    await expect(page(12.5)).rejects.toMatchObject({ type: 'StripeInvalidRequestError' });
    const session = await page();
    const refused = await pay(session.url!, testCards.refused);
    expect(refused.status).toBe(402);
    expect((await stripe.checkout.sessions.retrieve(session.id)).status).toBe('open');
    const expired = await stripe.checkout.sessions.expire(session.id);
    expect(expired.status).toBe('expired');
    expect((await fetch(session.url!)).status).toBe(410);
  });
});
