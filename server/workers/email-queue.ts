import { createHash } from 'node:crypto';
import type { AppContext } from '../config/context';
import { ensureQueue, startJobQueue } from '../infra/job-queue';
import { dueEmails } from './email-claims';
import { deliverEmail, deliverySettings, type DeliverySettings } from './email-delivery';

export const emailQueue = 'email-delivery';

export interface EmailWorkerOptions {
  /** Overrides the lease and retry clock from the environment (tests use a short one). */
  delivery?: Partial<DeliverySettings>;
  /** How often due rows are handed to the job queue. */
  sweepIntervalMs?: number;
  pollingIntervalSeconds?: number;
}

/**
 * One job id per outbox row, due moment and ten-second window: inserting it again is a no-op, so the sweeper can
 * run on every instance as often as it likes. Every claim, renewal, failure and "send again" moves the due moment,
 * so each round of a row gets a job of its own; the window gives a row that is still due (its job ran while the
 * database was away and could not claim it) a new job soon after, instead of a job id already used up.
 */
export function jobIdFor(emailId: string, dueAt: string, now = Date.now()) {
  const hex = createHash('sha256')
    .update(`${emailId}:${dueAt}:${Math.floor(now / 10_000)}`)
    .digest('hex');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-5${hex.slice(13, 16)}-a${hex.slice(17, 20)}-${hex.slice(20, 32)}`;
}

interface EmailJob {
  emailId: string;
}

/**
 * The job queue only wakes senders; the outbox row decides. Retries, backoff and giving up live on the row, so a
 * job may expire, run twice or be lost without losing or doubling a message: a job for a row that is not due
 * (or is claimed by someone else) does nothing, and the sweeper makes a new job for any row that comes due.
 */
export async function startEmailWorker(ctx: AppContext, opts: EmailWorkerOptions = {}) {
  const settings = { ...deliverySettings(ctx.env), ...opts.delivery };
  const boss = await startJobQueue(ctx);
  await ensureQueue(boss, { name: emailQueue, policy: 'standard', retryLimit: 0, expireInSeconds: 900 });

  await boss.work<EmailJob>(
    emailQueue,
    { batchSize: 10, pollingIntervalSeconds: opts.pollingIntervalSeconds ?? 1 },
    async (jobs) => {
      await Promise.all(
        jobs.map(async (job) => {
          try {
            const outcome = await deliverEmail(ctx, job.data.emailId, settings);
            if (outcome === 'failed' || outcome === 'dead' || outcome === 'lost-lease') {
              ctx.logger.warn({ emailId: job.data.emailId, outcome }, 'e-mail not delivered on this try');
            }
          } catch (error) {
            // The row keeps its state (a lease runs out by itself), so the sweeper brings it back.
            ctx.logger.warn({ err: error, emailId: job.data.emailId }, 'e-mail delivery interrupted');
          }
        }),
      );
    },
  );

  const sweep = async () => {
    const due = await dueEmails(ctx.db, 500);
    if (due.length === 0) return;
    await boss.insert(
      due.map((row) => ({
        id: jobIdFor(row.id, row.dueAt),
        name: emailQueue,
        data: { emailId: row.id },
        retryLimit: 0,
        expireInSeconds: 900,
      })),
    );
  };
  let sweeping: Promise<void> | null = null;
  const timer = setInterval(() => {
    sweeping ??= sweep()
      .catch((error: unknown) => ctx.logger.warn({ err: error }, 'e-mail sweep failed'))
      .finally(() => {
        sweeping = null;
      });
  }, opts.sweepIntervalMs ?? 1000);

  return {
    stop: async () => {
      clearInterval(timer);
      await sweeping;
      await boss.stop({ graceful: true, wait: true, timeout: 10_000 });
    },
  };
}
