import { createHash } from 'node:crypto';
import { and, asc, desc, eq, inArray, isNull, ne, sql, type AnyColumn, type SQL } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import { requestStatuses, statusText, waitingOnOffice, type RequestStatus } from '../../../shared/workflow/statuses';
import { allowedTransitions } from '../../../shared/workflow/transitions';
import type { SessionUser } from '../../auth/session-user';
import type { DbOrTx } from '../../db/client';
import { jurisdictions, requests, users } from '../../db/schema';
import { badRequest } from '../../lib/errors';
import { decodeQueueCursor, encodeQueueCursor, searchQuery, type QueueQuery, type QueueSort } from './queue-query';

const assignee = alias(users, 'assignee');

interface Queryable { query<R extends unknown[]>(config: { name: string; text: string; values: unknown[]; rowMode: 'array' }): Promise<{ rows: R[] }> }
interface QueueRow {
  id: string; reference: string; status: RequestStatus; applicantName: string; roadName: string; statusChangedAt: string;
  jurisdictionId: string | null; jurisdictionName: string | null; assigneeId: string | null; assigneeName: string | null;
  sortKey: string; total: number | null;
}
export const queueCountCap = 200;

/** Each sort is a column with an index behind it; `cast` reads a cursor value back in the column's own type. */
const sortColumns: Record<QueueSort, { column: AnyColumn; cast: string }> = {
  waiting: { column: requests.statusChangedAt, cast: 'timestamptz' },
  reference: { column: requests.reference, cast: 'text' },
  applicant: { column: requests.applicantName, cast: 'text' },
  road: { column: requests.roadName, cast: 'text' },
  created: { column: requests.createdAt, cast: 'timestamptz' },
};

const waitingElsewhere: Partial<Record<RequestStatus, string>> = {
  draft: 'The property owner is still filling it in',
  needs_details: 'Waiting on the property owner’s answer',
  permit_filed: 'Waiting on the road authority',
  released: 'Waiting for a crew to take it',
  crew_assigned: 'With the crew',
  under_construction: 'With the crew',
};

/** What the office does next, from the same table the server enforces. */
export function nextOfficeAction(status: RequestStatus): string {
  const moves = allowedTransitions(status, 'staff').filter((t) => t.action !== 'decline').map((t) => t.label);
  if (moves.length > 0) return moves.join(' or ');
  return waitingElsewhere[status] ?? 'Nothing: finished';
}

const rowWords = Object.fromEntries(requestStatuses.map((status) => [status, {
  statusLabel: statusText[status].label, waitingOnUs: waitingOnOffice.includes(status), nextAction: nextOfficeAction(status),
}])) as Record<RequestStatus, { statusLabel: string; waitingOnUs: boolean; nextAction: string }>;

function filtersFor(user: SessionUser, query: QueueQuery): SQL[] {
  const where: SQL[] = [ne(requests.status, 'draft')];
  if (query.status) where.push(inArray(requests.status, query.status));
  if (query.waiting) where.push(inArray(requests.status, [...waitingOnOffice]));
  if (query.jurisdiction === 'none') where.push(isNull(requests.jurisdictionId));
  else if (query.jurisdiction) where.push(eq(requests.jurisdictionId, query.jurisdiction));
  if (query.assignee === 'none') where.push(isNull(requests.assigneeId));
  else if (query.assignee) where.push(eq(requests.assigneeId, query.assignee === 'me' ? user.id : query.assignee));
  const text = query.q ? searchQuery(query.q) : null;
  if (text) where.push(sql`${requests.searchVector} @@ to_tsquery('simple', ${text})`);
  return where;
}

/**
 * One page of the office queue in a single query (assignee and jurisdiction joined, not fetched per row), with
 * keyset paging so page 200 costs what page 1 does. The total is counted only up to a cap, for the same reason.
 */
export async function listQueue(db: DbOrTx, pool: Queryable, user: SessionUser, query: QueueQuery) {
  const where = filtersFor(user, query);
  const { column, cast } = sortColumns[query.sort];
  const order = query.dir === 'asc' ? asc : desc;
  const page = [...where];
  if (query.cursor) {
    const cursor = decodeQueueCursor(query.cursor);
    if (!cursor) throw badRequest('The page position is not one this list gave out.', { cursor: 'start again from the first page' });
    const cmp = query.dir === 'asc' ? sql.raw('>') : sql.raw('<');
    page.push(sql`(${column}, ${requests.id}) ${cmp} (${cursor.value}::${sql.raw(cast)}, ${cursor.id}::uuid)`);
  }
  // Times come back as ISO text straight from PostgreSQL: no Date objects to build and serialise again per row.
  const iso = (column: AnyColumn) => sql<string>`to_char(${column} at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"')`;
  // The total belongs to the view, not the page: counted up to a cap on the first page only, inside the same
  // statement (an uncorrelated subquery runs once), so a page costs one round trip.
  // Past a few hundred the exact number changes nothing for the office, and counting further is the costly part.
  const cap = queueCountCap;
  const capped = db.select({ one: sql`1` }).from(requests).where(and(...where)).limit(cap + 1);
  const total = query.cursor ? sql<null>`null::int` : sql<number>`(select count(*)::int from (${capped}) as capped)`;
  const fields = {
    id: requests.id, reference: requests.reference, status: requests.status,
    applicantName: requests.applicantName, roadName: requests.roadName, statusChangedAt: iso(requests.statusChangedAt),
    jurisdictionId: jurisdictions.id, jurisdictionName: jurisdictions.name,
    assigneeId: assignee.id, assigneeName: assignee.name,
    sortKey: sql<string>`${column}::text`,
    total,
  };
  const built = db.select(fields).from(requests)
    .leftJoin(jurisdictions, eq(jurisdictions.id, requests.jurisdictionId))
    .leftJoin(assignee, eq(assignee.id, requests.assigneeId))
    .where(and(...page))
    .orderBy(order(column), order(requests.id))
    .limit(query.limit + 1)
    .toSQL();
  // The hottest office query: Drizzle writes the SQL, and the rows come back as arrays in the order of `fields`
  // (every column is already text, uuid or int, so there is nothing to decode), which spares a per-cell mapping.
  const keys = Object.keys(fields) as (keyof typeof fields)[];
  // Named by its text, the statement is parsed and planned once per connection instead of on every page.
  const name = `queue_${createHash('sha1').update(built.sql).digest('hex').slice(0, 16)}`;
  const result = await pool.query<unknown[]>({ name, text: built.sql, values: built.params, rowMode: 'array' });
  const rows = result.rows.map((cells) => Object.fromEntries(keys.map((key, i) => [key, cells[i]])) as unknown as QueueRow);
  // No row on a first page means nothing matched at all.
  const n = query.cursor ? null : (rows[0]?.total ?? 0);
  const more = rows.length > query.limit;
  const items = more ? rows.slice(0, query.limit) : rows;
  const last = items.at(-1);
  return {
    requests: items.map(({ sortKey: _key, total: _total, jurisdictionId, jurisdictionName, assigneeId, assigneeName, ...row }) => ({
      ...row,
      ...rowWords[row.status],
      jurisdiction: jurisdictionId ? { id: jurisdictionId, name: jurisdictionName ?? '' } : null,
      assignee: assigneeId ? { id: assigneeId, name: assigneeName ?? '' } : null,
    })),
    nextCursor: more && last ? encodeQueueCursor(last.sortKey, last.id) : null,
    total: n === null ? null : Math.min(n, cap),
    totalIsCapped: n !== null && n > cap,
  };
}
