import { createHash } from 'node:crypto';
import { asc, eq } from 'drizzle-orm';
import PgBoss from 'pg-boss';
import type { AppContext } from '../context';
import { emails } from '../db/schema';
import { deliverEmail } from './email-delivery';

export const emailQueue = 'email-delivery';

export interface EmailWorkerOptions {
  /** Attempts after the first before a message is marked dead. */
  retryLimit?: number;
  /** The first retry waits about this long; each later one about twice as long (pg-boss backoff with jitter). */
  retryDelaySeconds?: number;
  /** How often queued rows are handed to the job queue. */
  sweepIntervalMs?: number;
  pollingIntervalSeconds?: number;
}

/**
 * One job id per outbox row and delivery round: inserting it again is a no-op, so the sweeper can run on every
 * instance as often as it likes; a staff "retry" starts a new round because it changes the attempt count.
 */
export function jobIdFor(emailId: string, attempts: number) {
  const hex = createHash('sha256').update(`${emailId}:${attempts}`).digest('hex');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-5${hex.slice(13, 16)}-a${hex.slice(17, 20)}-${hex.slice(20, 32)}`;
}

interface EmailJob { emailId: string }

export async function startEmailWorker(ctx: AppContext, opts: EmailWorkerOptions = {}) {
  const retryLimit = opts.retryLimit ?? 6;
  const retryDelay = opts.retryDelaySeconds ?? 5;
  const boss = new PgBoss({ connectionString: ctx.env.DATABASE_URL, schema: 'pgboss', max: 3, schedule: false, application_name: 'gradepass-worker' });
  boss.on('error', (error) => ctx.logger.error({ err: error }, 'job queue error'));
  await boss.start();
  await ensureQueue(boss, { retryLimit, retryDelay });

  await boss.work<EmailJob>(emailQueue, { batchSize: 10, includeMetadata: true, pollingIntervalSeconds: opts.pollingIntervalSeconds ?? 1 }, async (jobs) => {
    for (const job of jobs) {
      const outcome = await deliverEmail(ctx, job.data.emailId, { finalAttempt: job.retryCount >= job.retryLimit });
      if (outcome === 'failed' || outcome === 'dead') {
        // Fail only this job (pg-boss schedules its retry with backoff); the others in the batch complete.
        await boss.fail(emailQueue, job.id, { outcome });
        ctx.logger.warn({ emailId: job.data.emailId, attempt: job.retryCount + 1, outcome }, 'e-mail not delivered');
      }
    }
  });

  const sweep = async () => {
    const queued = await ctx.db.select({ id: emails.id, attempts: emails.attempts }).from(emails)
      .where(eq(emails.status, 'queued')).orderBy(asc(emails.createdAt)).limit(500);
    if (queued.length === 0) return;
    await boss.insert(queued.map((row) => ({
      id: jobIdFor(row.id, row.attempts), name: emailQueue, data: { emailId: row.id },
      retryLimit, retryDelay, retryBackoff: true, expireInSeconds: 120,
    })));
  };
  let sweeping: Promise<void> | null = null;
  const timer = setInterval(() => {
    sweeping ??= sweep()
      .catch((error: unknown) => ctx.logger.error({ err: error }, 'e-mail sweep failed'))
      .finally(() => { sweeping = null; });
  }, opts.sweepIntervalMs ?? 1000);

  return {
    stop: async () => {
      clearInterval(timer);
      await sweeping;
      await boss.stop({ graceful: true, wait: true, timeout: 10_000 });
    },
  };
}

/** Every instance calls this at start; two doing it at once must not stop either from starting. */
async function ensureQueue(boss: PgBoss, settings: { retryLimit: number; retryDelay: number }) {
  const options = { name: emailQueue, policy: 'standard' as const, retryBackoff: true, expireInSeconds: 120, ...settings };
  if (await boss.getQueue(emailQueue)) return boss.updateQueue(emailQueue, options);
  try {
    await boss.createQueue(emailQueue, options);
  } catch (error) {
    if (!(await boss.getQueue(emailQueue))) throw error;
  }
}
