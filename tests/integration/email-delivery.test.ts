import { eq, inArray } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { StandIns, StoredMessage } from '../../fakes';
import { emails } from '../../server/db/schema';
import { closeContext, createContext } from '../../server/context-factory';
import { parseEnv } from '../../server/config/env';
import { startWorkers, type Workers } from '../../server/workers';
import { messageIdFor } from '../../server/workers/email-delivery';
import { signInCast, type Cast } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import { startOwnStandIns, type OwnStandIns } from '../setup/own-stand-ins';
import { createTestApp, type TestApp } from '../setup/test-app';

// This file brings its own mail catcher so it can take the SMTP side down and up without touching other tests.
let own: OwnStandIns;
let standIns: StandIns;
let t: TestApp;
let cast: Cast;
let workers: Workers | null = null;
const fast = {
  delivery: { leaseMs: 2_000, firstDelayMs: 300, maxDelayMs: 1_000, horizonMs: 60_000 },
  sweepIntervalMs: 200,
  pollingIntervalSeconds: 0.5,
};

beforeAll(async () => {
  own = await startOwnStandIns('email');
  standIns = own.standIns;
  t = await createTestApp(own.smtpEnv);
  cast = await signInCast(t);
});
afterAll(async () => {
  await workers?.stop();
  await t?.close();
  await own?.stop();
});

async function caught(): Promise<StoredMessage[]> {
  return (await fetch(`${standIns.mail.webUrl}/api/messages`)).json() as Promise<StoredMessage[]>;
}

async function until<T>(what: string, probe: () => Promise<T | undefined | false>, timeoutMs = 20_000): Promise<T> {
  const end = Date.now() + timeoutMs;
  for (;;) {
    const value = await probe();
    if (value) return value;
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 150));
  }
}

/** Three status changes on one request: ask for details, the owner answers, the office books the visit. */
async function threeTransitions() {
  const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id });
  const go = async (who: Cast[keyof Cast], body: Record<string, unknown>, version: number) =>
    (
      await who.agent
        .post(`/api/requests/${row.id}/transitions`)
        .send({ ...body, expectedVersion: version })
        .expect(200)
    ).body.request.version as number;
  let v = await go(cast.staff, { action: 'ask-details', note: 'How deep is the ditch at the mailbox?' }, row.version);
  v = await go(cast.applicant, { action: 'answer', answer: 'About two feet.' }, v);
  await go(cast.staff, { action: 'book-visit', visitAt: new Date(Date.now() + 86_400_000).toISOString() }, v);
  const rows = await t.ctx.db.select().from(emails).where(eq(emails.requestId, row.id));
  expect(rows).toHaveLength(3);
  return rows.map((r) => r.id);
}

describe('e-mail delivery', () => {
  it('keeps mail written while SMTP is down and sends each message exactly once when it is back', async () => {
    workers = await startWorkers(t.ctx, { email: fast });
    await standIns.mail.stopSmtp();
    const ids = await threeTransitions();
    await until('a failed attempt on each', async () => {
      const rows = await t.ctx.db.select().from(emails).where(inArray(emails.id, ids));
      return rows.every((r) => r.status === 'failed' && r.attempts >= 1 && r.lastError) && rows;
    });
    await standIns.mail.startSmtp();
    const expected = ids.map((id) => messageIdFor(id, t.ctx.env.MAIL_FROM));
    await until('three messages in the catcher', async () => {
      const mine = (await caught()).filter((m) => expected.includes(m.messageId));
      return mine.length >= 3 && mine;
    });
    // Give any duplicate time to show up before counting.
    await new Promise((r) => setTimeout(r, 3000));
    const mine = (await caught()).filter((m) => expected.includes(m.messageId));
    expect(mine.map((m) => m.messageId).sort()).toEqual([...expected].sort());
    expect(mine.every((m) => m.from.includes('no-reply@gradepass.test'))).toBe(true);
    expect(mine.every((m) => m.headers['reply-to']?.includes('office@gradepass.test'))).toBe(true);
    const rows = await t.ctx.db.select().from(emails).where(inArray(emails.id, ids));
    expect(rows.every((r) => r.status === 'sent' && r.sentAt && r.messageId)).toBe(true);
  });

  it('sends what was written while no worker was running, once one starts', async () => {
    await workers?.stop();
    workers = null;
    const ids = await threeTransitions();
    const expected = ids.map((id) => messageIdFor(id, t.ctx.env.MAIL_FROM));
    workers = await startWorkers(t.ctx, { email: fast });
    await until('the backlog to go out', async () => {
      const mine = (await caught()).filter((m) => expected.includes(m.messageId));
      return mine.length >= 3 && mine;
    });
    await new Promise((r) => setTimeout(r, 1500));
    expect((await caught()).filter((m) => expected.includes(m.messageId))).toHaveLength(3);
  });

  it('marks a message dead once the retry period is over, keeps the error, and sends it when staff retry it', async () => {
    await workers?.stop();
    workers = await startWorkers(t.ctx, { email: { ...fast, delivery: { ...fast.delivery, horizonMs: 1_000 } } });
    await standIns.mail.stopSmtp();
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id });
    await cast.staff.agent
      .post(`/api/requests/${row.id}/transitions`)
      .send({ action: 'decline', note: 'The sight line to the east is far too short.', expectedVersion: row.version })
      .expect(200);
    const [email] = await t.ctx.db.select().from(emails).where(eq(emails.requestId, row.id));
    const dead = await until('the message to give up', async () => {
      const [r] = await t.ctx.db.select().from(emails).where(eq(emails.id, email.id));
      return r.status === 'dead' && r;
    });
    expect(dead.attempts).toBeGreaterThanOrEqual(2);
    expect(dead.lastError).toMatch(/ECONNREFUSED|connect/i);

    const log = await cast.staff.agent.get('/api/emails?status=dead').expect(200);
    expect(log.body.emails).toEqual(
      expect.arrayContaining([expect.objectContaining({ id: email.id, lastError: dead.lastError })]),
    );
    await cast.applicant.agent.post(`/api/emails/${email.id}/retry`).expect(403);

    await standIns.mail.startSmtp();
    const retried = await cast.staff.agent.post(`/api/emails/${email.id}/retry`).expect(200);
    expect(retried.body.email.status).toBe('queued');
    await cast.staff.agent.post(`/api/emails/${email.id}/retry`).expect(409);
    await until('the retried message to arrive', async () =>
      (await caught()).some((m) => m.messageId === messageIdFor(email.id, t.ctx.env.MAIL_FROM)),
    );
    const [sent] = await t.ctx.db.select().from(emails).where(eq(emails.id, email.id));
    expect(sent).toMatchObject({ status: 'sent', attempts: dead.attempts + 1 });
  });

  it('sends each message once when two instances run workers on the same database', async () => {
    await workers?.stop();
    const second = createContext(parseEnv(t.env));
    const [one, two] = await Promise.all([startWorkers(t.ctx, { email: fast }), startWorkers(second, { email: fast })]);
    workers = {
      stop: async () => {
        await Promise.all([one.stop(), two.stop()]);
        await closeContext(second);
      },
    };
    const ids = [...(await threeTransitions()), ...(await threeTransitions()), ...(await threeTransitions())];
    const expected = ids.map((id) => messageIdFor(id, t.ctx.env.MAIL_FROM));
    await until(
      'all nine to arrive',
      async () => (await caught()).filter((m) => expected.includes(m.messageId)).length >= 9,
    );
    await new Promise((r) => setTimeout(r, 2000));
    const mine = (await caught()).filter((m) => expected.includes(m.messageId));
    expect(mine.map((m) => m.messageId).sort()).toEqual([...expected].sort());
  });
});
