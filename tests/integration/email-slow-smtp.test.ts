import { eq, inArray, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { StandIns } from '../../fakes';
import { closeContext, createContext } from '../../server/context-factory';
import { emails } from '../../server/db/schema';
import { parseEnv } from '../../server/config/env';
import { startWorkers, type Workers } from '../../server/workers';
import { claimEmail, recordFailure, recordSent } from '../../server/workers/email-claims';
import { emailQueue, jobIdFor } from '../../server/workers/email-queue';
import { sleep, until } from '../setup/fault-rig';
import { settle, writeEmails } from '../setup/mail-ledger';
import { startOwnStandIns, type OwnStandIns } from '../setup/own-stand-ins';
import { createTestApp, type TestApp } from '../setup/test-app';

// Its own mail catcher, so holding every reply does not slow other test files.
let own: OwnStandIns;
let standIns: StandIns;
let t: TestApp;
beforeAll(async () => {
  own = await startOwnStandIns('slow-smtp');
  standIns = own.standIns;
  t = await createTestApp(own.smtpEnv);
});
afterAll(async () => {
  await t?.close();
  await own?.stop();
});

describe('the outbox lease', () => {
  it('lets nobody but the current holder record an outcome, once a lease has run out and the row was claimed again', async () => {
    const [id] = await writeEmails(t.ctx.db, 1, 'lease');
    const first = await claimEmail(t.ctx.db, id, 200);
    expect(first).not.toBeNull();
    expect(await claimEmail(t.ctx.db, id, 200)).toBeNull(); // still held
    await sleep(400);
    const second = await claimEmail(t.ctx.db, id, 60_000);
    expect(second).not.toBeNull();
    expect(await recordSent(t.ctx.db, first!, '<late@gradepass.test>')).toBe(false);
    expect(await recordFailure(t.ctx.db, first!, 'late failure', 1_000, 60_000)).toBeUndefined();
    const [row] = await t.ctx.db.select().from(emails).where(eq(emails.id, id));
    expect(row).toMatchObject({ status: 'sending', leaseToken: second!.leaseToken, attempts: 2 });
    expect(await recordSent(t.ctx.db, second!, '<ok@gradepass.test>')).toBe(true);
  });

  it('sends rows left failed past their next try or sending under a lapsed lease', async () => {
    const ids = await writeEmails(t.ctx.db, 4, 'left behind');
    await t.ctx.db
      .update(emails)
      .set({
        status: 'failed',
        attempts: 3,
        nextAttemptAt: new Date(Date.now() - 1_000),
        retryUntil: new Date(Date.now() + 60_000),
      })
      .where(inArray(emails.id, ids.slice(0, 2)));
    await t.ctx.db
      .update(emails)
      .set({
        status: 'sending',
        attempts: 1,
        nextAttemptAt: new Date(Date.now() - 1_000),
        leaseToken: crypto.randomUUID(),
      })
      .where(inArray(emails.id, ids.slice(2)));
    const workers = await startWorkers(t.ctx, { email: { sweepIntervalMs: 200, pollingIntervalSeconds: 0.5 } });
    try {
      expect(await settle(standIns.mail.webUrl, ids, 20_000, 500)).toMatchObject({ lost: 0, doubled: 0 });
    } finally {
      await workers.stop();
    }
  });

  it('sends a row whose job already ran without claiming it (the database was away at that moment)', async () => {
    await (await startWorkers(t.ctx)).stop(); // the job queue's tables exist once a worker has started
    const [id] = await writeEmails(t.ctx.db, 1, 'job used up');
    const [row] = await t.ctx.db
      .select({ dueAt: sql<string>`${emails.nextAttemptAt}::text` })
      .from(emails)
      .where(eq(emails.id, id));
    // The job the sweeper makes for this row now, already finished, as a job whose claim failed leaves it.
    await t.ctx.pool.query(
      `insert into pgboss.job (id, name, data, state, completed_on) values ($1, $2, $3, 'completed', now())`,
      [jobIdFor(id, row.dueAt), emailQueue, { emailId: id }],
    );
    const workers = await startWorkers(t.ctx, { email: { sweepIntervalMs: 200, pollingIntervalSeconds: 0.5 } });
    try {
      expect(await settle(standIns.mail.webUrl, [id], 25_000, 500)).toMatchObject({ lost: 0, doubled: 0 });
    } finally {
      await workers.stop();
    }
  });
});

describe('a slow mail server', () => {
  // Each reply is held longer than the lease and longer than a connection used to be given (5 s) to say hello.
  it(
    'gets every message exactly once from two instances when each reply is held longer than the lease',
    { timeout: 120_000 },
    async () => {
      const second = createContext(parseEnv(t.env));
      const fast = { delivery: { leaseMs: 1_000 }, sweepIntervalMs: 200, pollingIntervalSeconds: 0.5 };
      const workers: Workers[] = await Promise.all([
        startWorkers(t.ctx, { email: fast }),
        startWorkers(second, { email: fast }),
      ]);
      standIns.mail.setReplyDelay(5_500);
      try {
        const ids = await writeEmails(t.ctx.db, 6, 'slow');
        await until('the first message to be with the server', async () =>
          (await t.ctx.db.select().from(emails).where(inArray(emails.id, ids))).some((r) => r.status === 'sending'),
        );
        // The catcher keeps a message before it gives its (held) final reply, so wait for the rows to say "sent".
        await until(
          'every row to be sent',
          async () =>
            (await t.ctx.db.select().from(emails).where(inArray(emails.id, ids))).every((r) => r.status === 'sent'),
          90_000,
        );
        expect(await settle(standIns.mail.webUrl, ids, 1_000, 3_000)).toEqual({
          tried: 6,
          delivered: 6,
          lost: 0,
          doubled: 0,
        });
      } finally {
        standIns.mail.setReplyDelay(0);
        await Promise.all(workers.map((w) => w.stop()));
        await closeContext(second);
      }
    },
  );
});
