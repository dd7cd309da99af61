import { z } from 'zod';
import { and, count, desc, eq, ilike, inArray, or, sql, type SQL } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import { emails, requests } from '../../db/schema';
import { conflict, notFound } from '../../lib/errors';

import { emailStatuses, type EmailStatus } from '@shared/contracts/emails';

export { emailStatuses, type EmailStatus };

export interface EmailLogQuery {
  status?: EmailStatus;
  requestId?: string;
  search?: string;
  /** Opaque position from the previous page: newest first, so new mail never shifts the pages already read. */
  cursor?: { createdAt: Date; id: string };
  limit: number;
}

const listColumns = {
  id: emails.id,
  requestId: emails.requestId,
  reference: requests.reference,
  template: emails.template,
  toAddress: emails.toAddress,
  subject: emails.subject,
  status: emails.status,
  attempts: emails.attempts,
  lastError: emails.lastError,
  messageId: emails.messageId,
  createdAt: emails.createdAt,
  sentAt: emails.sentAt,
  nextAttemptAt: emails.nextAttemptAt,
};

export async function listEmails(db: DbOrTx, query: EmailLogQuery) {
  const filters: SQL[] = [];
  if (query.status) filters.push(eq(emails.status, query.status));
  if (query.requestId) filters.push(eq(emails.requestId, query.requestId));
  if (query.search) {
    const like = `%${query.search.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    filters.push(or(ilike(emails.toAddress, like), ilike(emails.subject, like), ilike(requests.reference, like))!);
  }
  const where = filters.length ? and(...filters) : undefined;
  const page = query.cursor
    ? and(
        where,
        sql`(${emails.createdAt}, ${emails.id}) < (${query.cursor.createdAt.toISOString()}::timestamptz, ${query.cursor.id}::uuid)`,
      )
    : where;
  const rows = await db
    .select(listColumns)
    .from(emails)
    .leftJoin(requests, eq(requests.id, emails.requestId))
    .where(page)
    .orderBy(desc(emails.createdAt), desc(emails.id))
    .limit(query.limit + 1);
  const more = rows.length > query.limit;
  const items = more ? rows.slice(0, query.limit) : rows;
  const last = items.at(-1);
  const totals = await db.select({ status: emails.status, n: count() }).from(emails).groupBy(emails.status);
  return {
    emails: items,
    nextCursor: more && last ? encodeCursor(last.createdAt, last.id) : null,
    totals: Object.fromEntries(emailStatuses.map((s) => [s, totals.find((t) => t.status === s)?.n ?? 0])) as Record<
      EmailStatus,
      number
    >,
  };
}

export async function getEmail(db: DbOrTx, id: string) {
  const [row] = await db
    .select({ ...listColumns, textBody: emails.textBody, htmlBody: emails.htmlBody })
    .from(emails)
    .leftJoin(requests, eq(requests.id, emails.requestId))
    .where(eq(emails.id, id));
  if (!row) throw notFound('E-mail');
  return row;
}

/** Back to the queue at once, with a fresh retry period: the sweeper picks it up within a second or so. */
const sendAgain = { status: 'queued' as const, nextAttemptAt: sql`now()`, retryUntil: null, leaseToken: null };

/** Staff can send a failed or dead message again (once the cause is fixed) without waiting for the next try. */
export async function retryEmail(db: DbOrTx, id: string) {
  const [row] = await db
    .update(emails)
    .set(sendAgain)
    .where(and(eq(emails.id, id), inArray(emails.status, ['failed', 'dead'])))
    .returning({ id: emails.id });
  if (row) return getEmail(db, id);
  const current = await getEmail(db, id);
  throw conflict(`Only a message that failed or gave up can be sent again; this one is "${current.status}".`);
}

/** After an outage longer than the retry period: every message that gave up goes back to the queue in one step. */
export async function retryAllDead(db: DbOrTx) {
  const rows = await db.update(emails).set(sendAgain).where(eq(emails.status, 'dead')).returning({ id: emails.id });
  return { queued: rows.length };
}

export function encodeCursor(createdAt: Date, id: string) {
  return Buffer.from(`${createdAt.toISOString()}|${id}`).toString('base64url');
}

export function decodeCursor(value: string): { createdAt: Date; id: string } | null {
  const [at, id] = Buffer.from(value, 'base64url').toString().split('|');
  const createdAt = new Date(at ?? '');
  // Only times this log can hold: PostgreSQL refuses years before 1 and Date accepts far more than it stores.
  const year = createdAt.getUTCFullYear();
  if (Number.isNaN(createdAt.getTime()) || year < 2000 || year > 9999 || !z.uuid().safeParse(id).success) return null;
  return { createdAt, id };
}
