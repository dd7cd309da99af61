import type { AppContext } from '../config/context';
import { isDatabaseUnavailable } from '../lib/db-unavailable';
import { claimEmail, recordFailure, recordSent } from './email-claims';
import { keepLease } from './email-lease';

export type DeliveryOutcome = 'sent' | 'skipped' | 'failed' | 'dead' | 'lost-lease';

export interface DeliverySettings {
  leaseMs: number;
  firstDelayMs: number;
  maxDelayMs: number;
  /** How long after the first failure a message keeps being retried before it is marked dead. */
  horizonMs: number;
}

export function deliverySettings(env: AppContext['env']): DeliverySettings {
  return {
    leaseMs: env.EMAIL_LEASE_SECONDS * 1000,
    firstDelayMs: env.EMAIL_RETRY_FIRST_DELAY_SECONDS * 1000,
    maxDelayMs: env.EMAIL_RETRY_MAX_DELAY_SECONDS * 1000,
    horizonMs: env.EMAIL_RETRY_HORIZON_SECONDS * 1000,
  };
}

/** The sender's domain names our Message-IDs, so they read as ours in any mail client. */
export function messageIdFor(emailId: string, mailFrom: string) {
  const domain = /@([^>\s]+)/.exec(mailFrom)?.[1] ?? 'gradepass.invalid';
  return `<${emailId}@${domain}>`;
}

/** Doubling from the first delay up to the cap, each spread by ±20% so many failed rows do not retry in step. */
export function retryDelayMs(attempts: number, s: DeliverySettings, random = Math.random) {
  const base = Math.min(s.maxDelayMs, s.firstDelayMs * 2 ** Math.min(30, Math.max(0, attempts - 1)));
  return Math.round(base * (0.8 + 0.4 * random()));
}

/**
 * Sends one outbox row: claim it (one statement), send with no database connection held, record the outcome
 * (one statement, only under our own claim). The Message-ID is the row's id, so a resend after a crash between
 * the server's acceptance and the "sent" record carries the same id and the receiving side can recognise it.
 */
export async function deliverEmail(ctx: AppContext, emailId: string, s: DeliverySettings): Promise<DeliveryOutcome> {
  const claimedAt = Date.now();
  const claim = await claimEmail(ctx.db, emailId, s.leaseMs);
  if (!claim) return 'skipped';
  const messageId = messageIdFor(claim.id, ctx.env.MAIL_FROM);
  const abort = new AbortController();
  const lease = keepLease(ctx.db, claim, s.leaseMs, claimedAt, (reason) =>
    abort.abort(new Error(`sending stopped: ${reason}`)),
  );
  let failure: unknown = null;
  try {
    await ctx.mailer.sendMail({
      from: ctx.env.MAIL_FROM,
      replyTo: ctx.env.MAIL_REPLY_TO,
      to: claim.toAddress,
      subject: claim.subject,
      text: claim.textBody,
      html: claim.htmlBody,
      attachments: claim.attachments.map((a) => ({
        filename: a.filename,
        contentType: a.contentType,
        content: a.content,
        ...(a.encoding ? { encoding: a.encoding } : {}),
      })),
      messageId,
      headers: { 'X-Gradepass-Email-Id': claim.id },
      signal: abort.signal,
    });
  } catch (error) {
    failure = error;
  } finally {
    lease.stop();
  }
  if (abort.signal.aborted) return 'lost-lease';
  if (failure === null) {
    return (await persist(ctx, () => recordSent(ctx.db, claim, messageId))) ? 'sent' : 'lost-lease';
  }
  const status = await persist(ctx, () =>
    recordFailure(ctx.db, claim, describe(failure), retryDelayMs(claim.attempts, s), s.horizonMs),
  );
  return status ?? 'lost-lease';
}

/**
 * The message has gone (or failed) and the database may be restarting: keep trying to write that down for a while,
 * since the lease still protects the row, rather than leave it to a resend.
 */
async function persist<T>(ctx: AppContext, write: () => Promise<T>, forMs = 60_000): Promise<T> {
  const end = Date.now() + forMs;
  for (let wait = 100; ; wait = Math.min(1_000, wait * 2)) {
    try {
      return await write();
    } catch (error) {
      if (!isDatabaseUnavailable(error) || Date.now() > end) throw error;
      ctx.logger.warn({ err: error }, 'could not record an e-mail outcome yet; trying again');
      await new Promise((resolve) => setTimeout(resolve, wait));
    }
  }
}

function describe(error: unknown): string {
  if (!(error instanceof Error)) return String(error).slice(0, 2000);
  const code = (error as { code?: string; responseCode?: number }).code;
  const response = (error as { response?: string }).response;
  return [code, error.message, response].filter(Boolean).join(': ').slice(0, 2000);
}
