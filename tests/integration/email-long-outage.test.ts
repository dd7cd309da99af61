import { inArray } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { StandIns } from '../../fakes';
import { emails } from '../../server/db/schema';
import { startWorkers } from '../../server/workers';
import { signInCast, type Cast } from '../factories/office-cast';
import { until } from '../setup/fault-rig';
import { settle, writeEmails } from '../setup/mail-ledger';
import { startOwnStandIns, type OwnStandIns } from '../setup/own-stand-ins';
import { createTestApp, type TestApp } from '../setup/test-app';

// Its own mail catcher, taken down for longer than the retries used to last; the clock is short (tenths of a
// second instead of minutes) so the test runs in seconds.
let own: OwnStandIns;
let standIns: StandIns;
let t: TestApp;
let cast: Cast;
beforeAll(async () => {
  own = await startOwnStandIns('outage');
  standIns = own.standIns;
  t = await createTestApp(own.smtpEnv);
  cast = await signInCast(t);
});
afterAll(async () => {
  await t?.close();
  await own?.stop();
});

const rowsOf = (ids: string[]) => t.ctx.db.select().from(emails).where(inArray(emails.id, ids));
const clock = { leaseMs: 2_000, firstDelayMs: 100, maxDelayMs: 300 };
const polling = { sweepIntervalMs: 100, pollingIntervalSeconds: 0.5 };

describe('a mail server that is down for a long time', () => {
  it('keeps retrying past the old seven tries and sends each message once when the server answers again', async () => {
    const workers = await startWorkers(t.ctx, { email: { delivery: { ...clock, horizonMs: 120_000 }, ...polling } });
    try {
      await standIns.mail.stopSmtp();
      const ids = await writeEmails(t.ctx.db, 5, 'long outage');
      const failing = await until('eight failed tries on each', async () => {
        const rows = await rowsOf(ids);
        return rows.every((r) => r.attempts >= 8 && r.status !== 'sending') && rows;
      });
      // Every row waiting out the outage says when it is tried next and until when.
      expect(failing.every((r) => r.status === 'failed' && r.retryUntil && r.nextAttemptAt <= r.retryUntil)).toBe(true);
      await standIns.mail.startSmtp();
      expect(await settle(standIns.mail.webUrl, ids, 30_000)).toEqual({ tried: 5, delivered: 5, lost: 0, doubled: 0 });
      expect((await rowsOf(ids)).map((r) => r.status)).toEqual(Array(5).fill('sent'));
    } finally {
      await workers.stop();
    }
  });

  it('gives up after the retry period, and the office sends every message that gave up again in one step', async () => {
    const workers = await startWorkers(t.ctx, { email: { delivery: { ...clock, horizonMs: 1_000 }, ...polling } });
    try {
      await standIns.mail.stopSmtp();
      const ids = await writeEmails(t.ctx.db, 4, 'past the horizon');
      await until('all four to give up', async () => (await rowsOf(ids)).every((r) => r.status === 'dead'));
      await standIns.mail.startSmtp();
      await cast.applicant.agent.post('/api/emails/retry-dead').expect(403);
      await cast.crew.agent.post('/api/emails/retry-dead').expect(403);
      const resent = await cast.staff.agent.post('/api/emails/retry-dead').expect(200);
      expect(resent.body).toEqual({ queued: 4 });
      expect(await settle(standIns.mail.webUrl, ids, 30_000)).toEqual({ tried: 4, delivered: 4, lost: 0, doubled: 0 });
    } finally {
      await workers.stop();
    }
  });

  it('sends a failed message again at once when the office asks', async () => {
    const workers = await startWorkers(t.ctx, {
      email: { delivery: { ...clock, firstDelayMs: 60_000, maxDelayMs: 60_000, horizonMs: 600_000 }, ...polling },
    });
    try {
      await standIns.mail.stopSmtp();
      const [id] = await writeEmails(t.ctx.db, 1, 'send again');
      await until('the first failure', async () => (await rowsOf([id]))[0].status === 'failed');
      await standIns.mail.startSmtp();
      await cast.staff.agent.post(`/api/emails/${id}/retry`).expect(200);
      expect(await settle(standIns.mail.webUrl, [id], 20_000, 500)).toEqual({
        tried: 1,
        delivered: 1,
        lost: 0,
        doubled: 0,
      });
    } finally {
      await workers.stop();
    }
  });
});
