import { randomUUID } from 'node:crypto';
import { and, asc, eq, inArray, lte, sql } from 'drizzle-orm';
import type { Db } from '../db/client';
import { emails } from '../db/schema';

/**
 * The outbox row is its own lock: each step below is one short statement, and no connection is held while the
 * message is with the mail server. A sender claims a due row with a lease (a deadline and a token), renews the
 * lease while it sends, and records the outcome only if the token is still its own, so a second sender can never
 * mark sent (or failed) a row it did not send.
 */
const dueStatuses = ['queued', 'failed', 'sending'] as const;
const after = (ms: number) => sql`now() + ${ms} * interval '1 millisecond'`;

export type Claim = typeof emails.$inferSelect & { leaseToken: string };

/** Rows that are due: queued, failed past their next try, or sending under a lease that ran out. */
export async function dueEmails(db: Db, limit: number) {
  return db
    .select({ id: emails.id, dueAt: sql<string>`${emails.nextAttemptAt}::text` })
    .from(emails)
    .where(and(inArray(emails.status, [...dueStatuses]), lte(emails.nextAttemptAt, sql`now()`)))
    .orderBy(asc(emails.nextAttemptAt))
    .limit(limit);
}

export async function claimEmail(db: Db, id: string, leaseMs: number): Promise<Claim | null> {
  const [row] = await db
    .update(emails)
    .set({
      status: 'sending',
      attempts: sql`${emails.attempts} + 1`,
      leaseToken: randomUUID(),
      nextAttemptAt: after(leaseMs),
    })
    .where(and(eq(emails.id, id), inArray(emails.status, [...dueStatuses]), lte(emails.nextAttemptAt, sql`now()`)))
    .returning();
  return row ? (row as Claim) : null;
}

/** False once the lease is no longer ours (it ran out and another sender claimed the row). */
export async function renewLease(db: Db, claim: Claim, leaseMs: number): Promise<boolean> {
  const rows = await db
    .update(emails)
    .set({ nextAttemptAt: after(leaseMs) })
    .where(and(eq(emails.id, claim.id), eq(emails.leaseToken, claim.leaseToken), eq(emails.status, 'sending')))
    .returning({ id: emails.id });
  return rows.length > 0;
}

export async function recordSent(db: Db, claim: Claim, messageId: string): Promise<boolean> {
  const rows = await db
    .update(emails)
    .set({ status: 'sent', sentAt: sql`now()`, messageId, lastError: null, leaseToken: null })
    .where(and(eq(emails.id, claim.id), eq(emails.leaseToken, claim.leaseToken)))
    .returning({ id: emails.id });
  return rows.length > 0;
}

/**
 * A failure schedules the next try (never later than the give-up time, so the last try falls on it); a failure at
 * or after the give-up time makes the row dead. Either way the row always says what happens next.
 */
export async function recordFailure(db: Db, claim: Claim, error: string, delayMs: number, horizonMs: number) {
  const giveUpAt = sql`coalesce(${emails.retryUntil}, ${after(horizonMs)})`;
  const [row] = await db
    .update(emails)
    .set({
      status: sql`case when ${giveUpAt} <= now() then 'dead'::email_status else 'failed'::email_status end`,
      retryUntil: giveUpAt,
      nextAttemptAt: sql`least(${after(delayMs)}, ${giveUpAt})`,
      lastError: error,
      leaseToken: null,
    })
    .where(and(eq(emails.id, claim.id), eq(emails.leaseToken, claim.leaseToken)))
    .returning({ status: emails.status });
  return row?.status as 'failed' | 'dead' | undefined;
}
