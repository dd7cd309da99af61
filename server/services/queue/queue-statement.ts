import { and, asc, desc, eq, inArray, isNull, ne, not, sql, type AnyColumn, type SQL } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import { waitingOnOffice } from '@shared/workflow/statuses';
import type { DbOrTx } from '../../db/client';
import { jurisdictions, requests, users } from '../../db/schema';
import type { QueueSort } from '@shared/contracts/queue';

const assignee = alias(users, 'assignee');
export const queueCountCap = 200;

/** Each sort is a column with an index behind it; `cast` reads a cursor value back in the column's own type. */
export const sortsByTime = (sort: QueueSort) => sortColumns[sort].cast === 'timestamptz';

const sortColumns: Record<QueueSort, { column: AnyColumn; cast: string }> = {
  waiting: { column: requests.statusChangedAt, cast: 'timestamptz' },
  reference: { column: requests.reference, cast: 'text' },
  applicant: { column: requests.applicantName, cast: 'text' },
  road: { column: requests.roadName, cast: 'text' },
  created: { column: requests.createdAt, cast: 'timestamptz' },
};

/**
 * Time in status says how long a request has waited only while it is open: a finished request is not waiting on
 * anyone, so the wait sort puts every open request before every ended one, in either direction.
 */
export const sortsEndedLast = (sort: QueueSort) => sort === 'waiting';

/** Which filters a page uses, how it is ordered and how many rows it reads: everything that changes the SQL text. */
export interface QueueShape {
  /** One status is an equality, so an index on (authority, status, sort column) can hand rows over in order. */
  statuses: 'one' | 'many' | null;
  waiting: boolean;
  jurisdiction: 'none' | 'one' | null;
  assignee: 'none' | 'one' | null;
  search: boolean;
  cursor: boolean;
  sort: QueueSort;
  dir: 'asc' | 'desc';
  /** Rows to read (a page and one more), written into the SQL: see `rowsToRead`. */
  rows: number;
}

/** The values a page fills into its shape's statement. */
export interface QueueValues {
  status?: string;
  statuses?: string[];
  jurisdiction?: string;
  assignee?: string;
  search?: string;
  cursorValue?: string;
  cursorId?: string;
  cursorEnded?: boolean;
}

const p = (name: keyof QueueValues) => sql.placeholder(name);

/**
 * A row count written into the statement rather than bound. PostgreSQL keeps a named statement's generic plan (no
 * planning per run) only when it costs about what the custom plans did, and it costs a bound LIMIT as a tenth of the
 * table: every page of the queue was planned afresh, which took longer than running it. Drizzle writes an SQL value
 * given to `limit()` into the text as it is.
 */
const rowsToRead = (n: number) => sql.raw(String(Math.trunc(n))) as unknown as number;

function filters(shape: QueueShape): SQL[] {
  const where: SQL[] = [ne(requests.status, 'draft')];
  if (shape.statuses === 'one') where.push(sql`${requests.status} = ${p('status')}`);
  else if (shape.statuses) where.push(sql`${requests.status} = any(${p('statuses')})`);
  if (shape.waiting) where.push(inArray(requests.status, [...waitingOnOffice]));
  if (shape.jurisdiction === 'none') where.push(isNull(requests.jurisdictionId));
  else if (shape.jurisdiction) where.push(eq(requests.jurisdictionId, p('jurisdiction')));
  if (shape.assignee === 'none') where.push(isNull(requests.assigneeId));
  else if (shape.assignee) where.push(eq(requests.assigneeId, p('assignee')));
  if (shape.search) where.push(sql`${requests.searchVector} @@ to_tsquery('simple', ${p('search')})`);
  return where;
}

/**
 * The order and the keyset condition after a cursor. Ended-last in both directions is a mixed order, which one
 * index cannot serve; so newest-first runs on "not ended", whose own index read backwards gives that order.
 */
function ordering(shape: QueueShape) {
  const { column, cast } = sortColumns[shape.sort];
  const order = shape.dir === 'asc' ? asc : desc;
  const cmp = sql.raw(shape.dir === 'asc' ? '>' : '<');
  const after = sql`${p('cursorValue')}::${sql.raw(cast)}, ${p('cursorId')}::uuid`;
  if (!sortsEndedLast(shape.sort)) {
    return { orderBy: [order(column), order(requests.id)], after: sql`(${column}, ${requests.id}) ${cmp} (${after})` };
  }
  const ended = shape.dir === 'asc' ? sql`${requests.ended}` : sql`(${not(requests.ended)})`;
  const endedAt = shape.dir === 'asc' ? sql`${p('cursorEnded')}::boolean` : sql`not ${p('cursorEnded')}::boolean`;
  return {
    orderBy: [order(ended), order(column), order(requests.id)],
    after: sql`(${ended}, ${column}, ${requests.id}) ${cmp} (${endedAt}, ${after})`,
  };
}

// Times come back as ISO text straight from PostgreSQL: no Date objects to build and serialise again per row.
const iso = (column: AnyColumn) => sql<string>`to_char(${column} at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"')`;

function build(db: DbOrTx, shape: QueueShape, name: string) {
  const where = filters(shape);
  const { orderBy, after } = ordering(shape);
  // The total belongs to the view, not the page: counted up to a cap on the first page only, inside the same
  // statement (an uncorrelated subquery runs once), so a page costs one round trip. Past a few hundred the exact
  // number changes nothing for the office, and counting further is the costly part.
  const capped = db
    .select({ one: sql`1` })
    .from(requests)
    .where(and(...where))
    .limit(rowsToRead(queueCountCap + 1));
  const total = shape.cursor ? sql<null>`null::int` : sql<number>`(select count(*)::int from (${capped}) as capped)`;
  return db
    .select({
      id: requests.id,
      reference: requests.reference,
      status: requests.status,
      applicantName: requests.applicantName,
      roadName: requests.roadName,
      statusChangedAt: iso(requests.statusChangedAt),
      jurisdictionId: jurisdictions.id,
      jurisdictionName: jurisdictions.name,
      assigneeId: assignee.id,
      assigneeName: assignee.name,
      sortKey: sql<string>`${sortColumns[shape.sort].column}::text`,
      ended: requests.ended,
      total,
    })
    .from(requests)
    .leftJoin(jurisdictions, eq(jurisdictions.id, requests.jurisdictionId))
    .leftJoin(assignee, eq(assignee.id, requests.assigneeId))
    .where(and(...where, ...(shape.cursor ? [after] : [])))
    .orderBy(...orderBy)
    .limit(rowsToRead(shape.rows))
    .prepare(name);
}

type QueueStatement = ReturnType<typeof build>;
const maxNamedStatements = 300;
const prepared = new WeakMap<DbOrTx, Map<string, QueueStatement>>();

/**
 * The hottest office query, one Drizzle prepared statement per shape: later pages of a shape only fill in their
 * values, and the statement's name (made from the shape, so the same on every connection) lets PostgreSQL parse
 * and plan it once per connection.
 */
export function queueStatement(db: DbOrTx, shape: QueueShape): QueueStatement {
  let byShape = prepared.get(db);
  if (!byShape) prepared.set(db, (byShape = new Map()));
  const name = `queue_${Object.values(shape)
    .map((v) => (v === true ? 1 : v === false || v === null ? 0 : v))
    .join('_')}`;
  let statement = byShape.get(name);
  if (statement) return statement;
  // Shapes times page sizes could grow without end; past a few hundred, a page runs as an unnamed statement.
  if (byShape.size >= maxNamedStatements) return build(db, shape, '');
  byShape.set(name, (statement = build(db, shape, name)));
  return statement;
}
