import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startPaymentsStandIn, type PaymentsStandIn } from '../../fakes';
import { payments, requests } from '../../server/db/schema';
import { seedDemo } from '../../server/dev/seed';
import { seedDemoPayments } from '../../server/dev/seed/demo-payments';
import { createTestApp, signIn, type TestApp } from '../setup/test-app';

let t: TestApp;
let provider: PaymentsStandIn;
beforeAll(async () => {
  // Notices have nowhere to go here (the app does not listen): the seed records each payment on the owner's return.
  provider = await startPaymentsStandIn({ secretKey: 'sk_test_demo', webhookSecret: 'whsec_demo', maxAttempts: 1 });
  t = await createTestApp({
    STRIPE_SECRET_KEY: provider.secretKey,
    STRIPE_WEBHOOK_SECRET: provider.webhookSecret,
    STRIPE_API_HOST: provider.host,
    STRIPE_API_PORT: String(provider.port),
    STRIPE_API_PROTOCOL: provider.protocol,
  });
  await seedDemo(t.ctx.db);
  await seedDemoPayments(t.ctx);
});
afterAll(async () => {
  await t?.close();
  await provider?.stop();
});

const moneyOf = async (address: string) => {
  const [request] = await t.ctx.db.select().from(requests).where(eq(requests.siteAddress, address));
  const rows = await t.ctx.db.select().from(payments).where(eq(payments.requestId, request.id));
  return { request, rows: rows.map((p) => `${p.kind} ${p.method}${p.refundedAt ? ' refunded' : ''}`).sort() };
};

describe('the demo money stages', () => {
  it('has a request at each stage, paid the way an owner and the office pay', async () => {
    expect((await moneyOf('904 Old Mill Road, Marrow Crossing')).rows).toEqual([]);
    expect((await moneyOf('12 Heronsgate Road, Marrow Crossing')).rows).toEqual(['deposit card']);
    expect((await moneyOf('51 Bramblewood Drive, Elderbrook')).rows).toEqual(['deposit offline']);
    expect((await moneyOf('400 Larkspur Ridge Road, Elderbrook')).rows).toEqual(['deposit card']);
    expect((await moneyOf('18 Fernhill Road, Marrow Crossing')).rows).toEqual(['balance card', 'deposit card']);
    expect((await moneyOf('27 Kestrel Bend Road, Marrow Crossing')).rows).toEqual(['deposit offline refunded']);

    const office = await signIn(t.app, 'priya.lindqvist@gradepass.test');
    const due = await office.get('/api/payments?state=outstanding').expect(200);
    const outstanding = due.body.rows.map((r: { siteAddress: string; kind: string }) => `${r.siteAddress}: ${r.kind}`);
    expect(outstanding.sort()).toEqual([
      '400 Larkspur Ridge Road, Elderbrook: balance',
      '904 Old Mill Road, Marrow Crossing: deposit',
    ]);
  });

  it('adds nothing when seeded again', async () => {
    const count = async () => (await t.ctx.db.select().from(payments)).length;
    const before = await count();
    await seedDemoPayments(t.ctx);
    expect(await count()).toBe(before);
  });
});
