import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { asc, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { paymentWebhookPath } from '@shared/contracts/payments';
import { signatureHeader, startPaymentsStandIn, testCards, type PaymentsStandIn } from '../../fakes';
import {
  emails,
  paymentCheckouts,
  paymentProviderEvents,
  payments,
  requestEvents,
  requests,
} from '../../server/db/schema';
import type { RequestStatus } from '@shared/workflow/statuses';
import { signInCast, type Cast } from '../factories/office-cast';
import { createSentQuote } from '../factories/quotes';
import { createRequestRow, type RequestRow } from '../factories/request-rows';
import { createTestApp, type TestApp } from '../setup/test-app';

// Every payment here goes through the real SDK to the payments stand-in, which notifies this file's own app (it
// listens on a port of its own so the stand-in's signed notices can reach it).
let t: TestApp;
let cast: Cast;
let provider: PaymentsStandIn;
let server: Server;

beforeAll(async () => {
  provider = await startPaymentsStandIn({
    secretKey: 'sk_test_payments_file',
    webhookSecret: 'whsec_payments_file',
    firstRetryMs: 50,
    maxAttempts: 3,
  });
  t = await createTestApp({
    STRIPE_SECRET_KEY: provider.secretKey,
    STRIPE_WEBHOOK_SECRET: provider.webhookSecret,
    STRIPE_API_HOST: provider.host,
    STRIPE_API_PORT: String(provider.port),
    STRIPE_API_PROTOCOL: provider.protocol,
  });
  server = createServer(t.app);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  provider.setWebhookUrl(`http://127.0.0.1:${(server.address() as AddressInfo).port}${paymentWebhookPath}`);
  cast = await signInCast(t);
});

afterAll(async () => {
  await provider?.stop();
  await new Promise((resolve) => server?.close(resolve));
  await t?.close();
});

/** A request of the cast's owner with a quote accepted by typing their name, as the owner's page does. */
async function acceptedRequest(opts: { status?: RequestStatus; totalCents?: number; depositCents?: number } = {}) {
  const request = await createRequestRow(t.ctx.db, {
    applicantId: cast.applicant.id,
    status: opts.status ?? 'checked',
  });
  const quote = await createSentQuote(t.ctx.db, {
    requestId: request.id,
    createdById: cast.staff.id,
    totalCents: opts.totalCents ?? 1_234_567,
    depositCents: opts.depositCents ?? 370_370,
  });
  await cast.applicant.agent.post(`/api/quotes/${quote.id}/accept`).send({ name: 'Ellen Marsh' }).expect(200);
  return request;
}

/** The owner fills the stand-in's card page; answers where the page sends the browser next. */
async function payOnPage(url: string, card: string = testCards.pays) {
  const page = await fetch(url);
  expect(page.status).toBe(200);
  const done = await fetch(url, {
    method: 'POST',
    redirect: 'manual',
    headers: { 'content-type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams({ card, expiry: '12/34', code: '123' }),
  });
  return { status: done.status, location: done.headers.get('location'), html: await done.text() };
}

async function startCheckout(request: RequestRow, kind: 'deposit' | 'balance' = 'deposit') {
  const answer = await cast.applicant.agent
    .post(`/api/requests/${request.id}/payments/checkout`)
    .send({ kind })
    .expect(200);
  return answer.body.url as string;
}

const paymentsOf = (requestId: string) => t.ctx.db.select().from(payments).where(eq(payments.requestId, requestId));
const receiptsOf = (requestId: string) =>
  t.ctx.db
    .select()
    .from(emails)
    .where(eq(emails.requestId, requestId))
    .orderBy(asc(emails.createdAt))
    .then((rows) => rows.filter((r) => r.template.startsWith('payment.')));

describe('paying the deposit through the provider', () => {
  it('records the payment from the signed notice, once, with a receipt and a history entry', async () => {
    const request = await acceptedRequest();
    const before = await cast.applicant.agent.get(`/api/requests/${request.id}/payments`).expect(200);
    expect(before.body.due).toEqual({ kind: 'deposit', amountCents: 370_370 });
    expect(before.body.dueText).toBe('The deposit of $3,703.70 is due now.');

    const url = await startCheckout(request);
    expect(url.startsWith(provider.url)).toBe(true);
    const paid = await payOnPage(url);
    expect(paid.status).toBe(303);
    const back = new URL(paid.location!);
    expect(back.pathname).toBe(`/my/requests/${request.id}`);
    await provider.settle();

    const rows = await paymentsOf(request.id);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ kind: 'deposit', method: 'card', amountCents: 370_370, currency: 'usd' });
    // The owner's return after the notice writes nothing more.
    const sessionId = back.searchParams.get('session_id')!;
    const after = await cast.applicant.agent
      .post(`/api/requests/${request.id}/payments/return`)
      .send({ sessionId })
      .expect(200);
    expect(after.body.payments).toHaveLength(1);
    expect(after.body.due).toBeNull();
    expect(await paymentsOf(request.id)).toHaveLength(1);

    const receipts = await receiptsOf(request.id);
    expect(receipts.map((r) => r.template)).toEqual(['payment.receipt.deposit']);
    expect(receipts[0].toAddress).toBe(cast.applicant.email);
    expect(receipts[0].subject).toContain('$3,703.70');
    expect(receipts[0].textBody).toContain(`Receipt number: ${rows[0].id}`);
    const history = await t.ctx.db.select().from(requestEvents).where(eq(requestEvents.requestId, request.id));
    expect(history.filter((e) => e.kind === 'deposit-paid')).toHaveLength(1);
    const events = await cast.applicant.agent.get(`/api/requests/${request.id}/events`).expect(200);
    expect(events.body.events.some((e: { kind: string }) => e.kind === 'deposit-paid')).toBe(true);
  });

  it('records one payment when the same notice is delivered twice', async () => {
    const request = await acceptedRequest();
    await payOnPage(await startCheckout(request));
    await provider.settle();
    const completed = provider
      .deliveries()
      .filter((d) => d.type === 'checkout.session.completed')
      .at(-1)!;
    expect(completed.delivered).toBe(true);
    await provider.resendEvent(completed.eventId);
    await provider.resendEvent(completed.eventId);
    expect(await paymentsOf(request.id)).toHaveLength(1);
    expect(await receiptsOf(request.id)).toHaveLength(1);
    const taken = await t.ctx.db
      .select()
      .from(paymentProviderEvents)
      .where(eq(paymentProviderEvents.eventId, completed.eventId));
    expect(taken).toHaveLength(1);
  });

  it('catches a payment whose notice was lost when the owner comes back', async () => {
    const request = await acceptedRequest();
    provider.setWebhooksEnabled(false);
    try {
      const paid = await payOnPage(await startCheckout(request));
      await provider.settle();
      expect(await paymentsOf(request.id)).toHaveLength(0);
      const sessionId = new URL(paid.location!).searchParams.get('session_id')!;
      const view = await cast.applicant.agent
        .post(`/api/requests/${request.id}/payments/return`)
        .send({ sessionId })
        .expect(200);
      expect(view.body.payments).toMatchObject([{ kind: 'deposit', amountCents: 370_370 }]);
      expect(await receiptsOf(request.id)).toHaveLength(1);
    } finally {
      provider.setWebhooksEnabled(true);
    }
  });

  it('catches a lost notice when the owner asks to pay again instead of coming back', async () => {
    const request = await acceptedRequest();
    provider.setWebhooksEnabled(false);
    try {
      const url = await startCheckout(request);
      await payOnPage(url);
      const again = await cast.applicant.agent
        .post(`/api/requests/${request.id}/payments/checkout`)
        .send({ kind: 'deposit' })
        .expect(409);
      expect(again.body.error.message).toBe('The deposit is already paid.');
      expect(await paymentsOf(request.id)).toHaveLength(1);
    } finally {
      provider.setWebhooksEnabled(true);
    }
  });

  it('gives two tabs the same payment page, so the deposit is paid once', async () => {
    const request = await acceptedRequest();
    const [one, two] = await Promise.all([startCheckout(request), startCheckout(request)]);
    expect(two).toBe(one);
    expect(await startCheckout(request)).toBe(one);
    const pages = await t.ctx.db.select().from(paymentCheckouts).where(eq(paymentCheckouts.requestId, request.id));
    expect(pages).toHaveLength(1);
    await payOnPage(one);
    await provider.settle();
    // The second tab's page is the same, now paid: it cannot take the money again.
    const second = await fetch(two);
    expect(await second.text()).toContain('Already paid');
    expect(await paymentsOf(request.id)).toHaveLength(1);
  });

  it('a refused card and a confirmation turned down charge nothing; a confirmed one pays', async () => {
    const request = await acceptedRequest();
    const url = await startCheckout(request);
    const refused = await payOnPage(url, testCards.refused);
    expect(refused.status).toBe(402);
    expect(refused.html).toContain('The card was refused by its bank');
    const asks = await payOnPage(url, testCards.confirms);
    expect(asks.status).toBe(200);
    const token = /name="token" value="([0-9a-f]+)"/.exec(asks.html)![1];
    const no = await fetch(`${url}/confirm`, {
      method: 'POST',
      redirect: 'manual',
      headers: { 'content-type': 'application/x-www-form-urlencoded' },
      body: new URLSearchParams({ token, decision: 'refuse' }),
    });
    expect(no.status).toBe(402);
    await provider.settle();
    expect(await paymentsOf(request.id)).toHaveLength(0);
    const asksAgain = await payOnPage(url, testCards.confirms);
    const token2 = /name="token" value="([0-9a-f]+)"/.exec(asksAgain.html)![1];
    const yes = await fetch(`${url}/confirm`, {
      method: 'POST',
      redirect: 'manual',
      headers: { 'content-type': 'application/x-www-form-urlencoded' },
      body: new URLSearchParams({ token: token2, decision: 'approve' }),
    });
    expect(yes.status).toBe(303);
    await provider.settle();
    expect(await paymentsOf(request.id)).toHaveLength(1);
  });
});

describe('notices the app refuses', () => {
  const completedEvent = (sessionId: string, amount: number) =>
    JSON.stringify({
      id: `evt_forged_${sessionId}_${amount}`,
      object: 'event',
      type: 'checkout.session.completed',
      created: Math.floor(Date.now() / 1000),
      data: {
        object: {
          id: sessionId,
          object: 'checkout.session',
          amount_total: amount,
          currency: 'usd',
          payment_status: 'paid',
          status: 'complete',
          payment_intent: 'pi_test_forged',
        },
      },
    });
  const post = (body: string, signature?: string) => {
    const req = cast.applicant.agent.post(paymentWebhookPath).set('content-type', 'application/json');
    return (signature ? req.set('stripe-signature', signature) : req).send(body);
  };

  it('refuses a forged or unsigned notice with 400 and writes nothing', async () => {
    const request = await acceptedRequest();
    await startCheckout(request);
    const [page] = await t.ctx.db.select().from(paymentCheckouts).where(eq(paymentCheckouts.requestId, request.id));
    const body = completedEvent(page.providerSessionId!, 370_370);
    const forged = await post(body, signatureHeader(body, 'whsec_someone_else'));
    expect(forged.status).toBe(400);
    const unsigned = await post(body);
    expect(unsigned.status).toBe(400);
    // A real signature over other bytes does not cover this body.
    const other = await post(body, signatureHeader(`${body} `, provider.webhookSecret));
    expect(other.status).toBe(400);
    const stale = await post(body, signatureHeader(body, provider.webhookSecret, Math.floor(Date.now() / 1000) - 3600));
    expect(stale.status).toBe(400);
    expect(await paymentsOf(request.id)).toHaveLength(0);
    const taken = await t.ctx.db.select().from(paymentProviderEvents);
    expect(taken.some((e) => e.eventId.startsWith('evt_forged_'))).toBe(false);
  });

  it('never records an amount other than the one on our own records', async () => {
    const request = await acceptedRequest();
    await startCheckout(request);
    const [page] = await t.ctx.db.select().from(paymentCheckouts).where(eq(paymentCheckouts.requestId, request.id));
    // Even signed with the right secret, a page reporting another amount is not taken as this deposit.
    const body = completedEvent(page.providerSessionId!, 100);
    await post(body, signatureHeader(body, provider.webhookSecret)).expect(200);
    expect(await paymentsOf(request.id)).toHaveLength(0);
    // The browser cannot name an amount: the field is refused outright.
    const tampered = await cast.applicant.agent
      .post(`/api/requests/${request.id}/payments/checkout`)
      .send({ kind: 'deposit', amountCents: 100 })
      .expect(400);
    expect(tampered.body.error.fields).toHaveProperty('(body)');
    // And the page the provider shows asks for the deposit of the accepted quote.
    const html = await (await fetch(page.url!)).text();
    expect(html).toContain('$3,703.70');
  });
});

describe('who may do what', () => {
  it('only the owner pays, only the office records a cheque, only the admin refunds', async () => {
    const request = await acceptedRequest();
    const path = `/api/requests/${request.id}/payments`;
    await cast.otherApplicant.agent.post(`${path}/checkout`).send({ kind: 'deposit' }).expect(404);
    await cast.otherApplicant.agent.get(path).expect(404);
    await cast.staff.agent.post(`${path}/checkout`).send({ kind: 'deposit' }).expect(403);
    await cast.crew.agent.get(path).expect(403);
    await cast.applicant.agent.post(`${path}/offline`).send({ kind: 'deposit', note: 'Cheque 88' }).expect(403);
    await cast.crew.agent.post(`${path}/offline`).send({ kind: 'deposit', note: 'Cheque 88' }).expect(403);
    const missingNote = await cast.staff.agent.post(`${path}/offline`).send({ kind: 'deposit', note: ' ' }).expect(400);
    expect(missingNote.body.error.fields.note).toBe('Note: say how it was paid, such as the cheque number.');
    const recorded = await cast.staff.agent
      .post(`${path}/offline`)
      .send({ kind: 'deposit', note: 'Cheque 1042, Fenwick Savings' })
      .expect(201);
    expect(recorded.body.payments).toMatchObject([
      { kind: 'deposit', method: 'offline', amountCents: 370_370, note: 'Cheque 1042, Fenwick Savings' },
    ]);
    await cast.staff.agent.post(`${path}/offline`).send({ kind: 'deposit', note: 'again' }).expect(409);
    expect((await receiptsOf(request.id)).map((r) => r.template)).toEqual(['payment.receipt.deposit']);

    const paymentId = recorded.body.payments[0].id;
    await t.ctx.db.update(requests).set({ status: 'withdrawn' }).where(eq(requests.id, request.id));
    await cast.applicant.agent.post(`/api/payments/${paymentId}/refund`).send({ note: 'Withdrawn' }).expect(403);
    await cast.staff.agent.post(`/api/payments/${paymentId}/refund`).send({ note: 'Withdrawn' }).expect(403);
    const refunded = await cast.admin.agent
      .post(`/api/payments/${paymentId}/refund`)
      .send({ note: 'Owner withdrew before the permit' })
      .expect(200);
    expect(refunded.body.payments[0]).toMatchObject({
      refundedCents: 370_370,
      refundNote: 'Owner withdrew before the permit',
    });
  });
});

describe('refunds', () => {
  it('refunds a card payment through the provider once, when the request is withdrawn', async () => {
    const request = await acceptedRequest();
    await payOnPage(await startCheckout(request));
    await provider.settle();
    const [payment] = await paymentsOf(request.id);
    const early = await cast.admin.agent
      .post(`/api/payments/${payment.id}/refund`)
      .send({ note: 'Too soon' })
      .expect(409);
    expect(early.body.error.message).toContain('still going ahead');

    await t.ctx.db.update(requests).set({ status: 'withdrawn' }).where(eq(requests.id, request.id));
    const [first, second] = await Promise.all([
      cast.admin.agent.post(`/api/payments/${payment.id}/refund`).send({ note: 'Withdrawn by the owner' }),
      cast.admin.agent.post(`/api/payments/${payment.id}/refund`).send({ note: 'Withdrawn by the owner' }),
    ]);
    expect([first.status, second.status].sort()).toEqual([200, 409]);
    await provider.settle();
    const refunds = provider.deliveries().filter((d) => d.type === 'refund.created');
    const [after] = await paymentsOf(request.id);
    expect(after.refundedCents).toBe(370_370);
    expect(after.providerRefundId).toMatch(/^re_/);
    // The idempotency key makes the second click's call the same refund at the provider.
    expect(refunds.length).toBeGreaterThanOrEqual(1);
    const receipts = await receiptsOf(request.id);
    expect(receipts.map((r) => r.template)).toEqual(['payment.receipt.deposit', 'payment.refund']);
    const history = await t.ctx.db.select().from(requestEvents).where(eq(requestEvents.requestId, request.id));
    expect(history.filter((e) => e.kind === 'payment-refunded')).toHaveLength(1);
  });
});

describe('the balance and where the workflow waits', () => {
  it('filing waits for the deposit and closing for the balance when the admin says so', async () => {
    await cast.staff.agent
      .put('/api/settings/payment-waits')
      .send({ depositBeforePermit: true, balanceBeforeClose: true })
      .expect(403);
    await cast.admin.agent
      .put('/api/settings/payment-waits')
      .send({ depositBeforePermit: true, balanceBeforeClose: true })
      .expect(200);
    try {
      const request = await acceptedRequest({ status: 'checked' });
      const refused = await cast.staff.agent
        .post(`/api/requests/${request.id}/transitions`)
        .send({ action: 'file-permit', expectedVersion: request.version, permitReference: 'FC-2026-118' })
        .expect(409);
      expect(refused.body.error.message).toBe(
        'Filing the permit waits for the deposit of $3,703.70, which is not paid yet (the company files permits once the deposit is in).',
      );
      const office = await cast.staff.agent.get(`/api/requests/${request.id}/payments`).expect(200);
      expect(office.body.waits.map((w: { action: string }) => w.action)).toEqual(['file-permit', 'close']);
      await payOnPage(await startCheckout(request));
      await provider.settle();
      await cast.staff.agent
        .post(`/api/requests/${request.id}/transitions`)
        .send({ action: 'file-permit', expectedVersion: request.version, permitReference: 'FC-2026-118' })
        .expect(200);

      // Built: an agreed change moves the balance, which is then paid on the same kind of page.
      await t.ctx.db.update(requests).set({ status: 'built' }).where(eq(requests.id, request.id));
      const [{ version }] = await t.ctx.db.select().from(requests).where(eq(requests.id, request.id));
      await cast.staff.agent
        .post(`/api/requests/${request.id}/payments/changes`)
        .send({ description: 'Four more feet of 18 in pipe', amountCents: 48_000 })
        .expect(201);
      const owner = await cast.applicant.agent.get(`/api/requests/${request.id}/payments`).expect(200);
      expect(owner.body.due).toEqual({ kind: 'balance', amountCents: 1_234_567 + 48_000 - 370_370 });
      const closeRefused = await cast.staff.agent
        .post(`/api/requests/${request.id}/transitions`)
        .send({ action: 'close', expectedVersion: version })
        .expect(409);
      expect(closeRefused.body.error.message).toContain('Closing waits for the balance of $9,121.97');
      await payOnPage(await startCheckout(request, 'balance'));
      await provider.settle();
      const rows = await paymentsOf(request.id);
      expect(rows.map((p) => [p.kind, p.amountCents])).toEqual([
        ['deposit', 370_370],
        ['balance', 912_197],
      ]);
      await cast.staff.agent
        .post(`/api/requests/${request.id}/transitions`)
        .send({ action: 'close', expectedVersion: version })
        .expect(200);
      expect((await receiptsOf(request.id)).map((r) => r.template)).toEqual([
        'payment.receipt.deposit',
        'payment.receipt.balance',
      ]);
    } finally {
      await cast.admin.agent
        .put('/api/settings/payment-waits')
        .send({ depositBeforePermit: false, balanceBeforeClose: false })
        .expect(200);
    }
  });

  it('the balance cannot be paid before the entrance is built', async () => {
    const request = await acceptedRequest({ status: 'permit_granted' });
    await cast.applicant.agent
      .post(`/api/requests/${request.id}/payments/checkout`)
      .send({ kind: 'balance' })
      .expect(409);
  });
});

describe('the office payments view', () => {
  it('lists paid, outstanding and refunded, and exports them as CSV for the bookkeeper', async () => {
    const request = await acceptedRequest();
    await t.ctx.db.update(requests).set({ applicantName: 'Marsh, Ellen "Nell"' }).where(eq(requests.id, request.id));
    const list = await cast.staff.agent.get('/api/payments?state=outstanding').expect(200);
    expect(list.body.rows.find((r: { requestId: string }) => r.requestId === request.id)).toMatchObject({
      state: 'outstanding',
      kind: 'deposit',
      amountCents: 370_370,
    });
    await cast.applicant.agent.get('/api/payments').expect(403);
    await cast.staff.agent.get('/api/payments?state=sideways').expect(400);
    const csv = await cast.staff.agent.get('/api/payments/export.csv?state=outstanding').expect(200);
    expect(csv.headers['content-type']).toContain('text/csv');
    const lines = csv.text.split('\r\n');
    expect(lines[0]).toBe(
      'Request,Owner,Site address,Payment,State,Paid how,Amount (USD),Date,Refunded (USD),Refunded on,Note,Receipt number',
    );
    expect(lines).toContain(
      `${request.reference},"Marsh, Ellen ""Nell""","118 Larkspur Hollow Lane, Fenwick Falls",Deposit,Outstanding,,3703.70,,,,,`,
    );
  });
});
