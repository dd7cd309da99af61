import { and, asc, desc, eq, fillPlaceholders, inArray, isNull, ne, sql, type AnyColumn, type SQL } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import { waitingOnOffice } from '../../../shared/workflow/statuses';
import type { DbOrTx } from '../../db/client';
import { jurisdictions, requests, users } from '../../db/schema';
import type { QueueSort } from './queue-query';

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

/** Which filters a page uses and how it is ordered: everything that changes the SQL text, and nothing else. */
export interface QueueShape {
  statuses: boolean;
  waiting: boolean;
  jurisdiction: 'none' | 'one' | null;
  assignee: 'none' | 'one' | null;
  search: boolean;
  cursor: boolean;
  sort: QueueSort;
  dir: 'asc' | 'desc';
}

/** The values a page fills into its shape's statement. */
export interface QueueValues {
  statuses?: string[];
  jurisdiction?: string;
  assignee?: string;
  search?: string;
  cursorValue?: string;
  cursorId?: string;
  limit: number;
}

const p = (name: keyof QueueValues) => sql.placeholder(name);

function filters(shape: QueueShape): SQL[] {
  const where: SQL[] = [ne(requests.status, 'draft')];
  if (shape.statuses) where.push(sql`${requests.status} = any(${p('statuses')})`);
  if (shape.waiting) where.push(inArray(requests.status, [...waitingOnOffice]));
  if (shape.jurisdiction === 'none') where.push(isNull(requests.jurisdictionId));
  else if (shape.jurisdiction) where.push(eq(requests.jurisdictionId, p('jurisdiction')));
  if (shape.assignee === 'none') where.push(isNull(requests.assigneeId));
  else if (shape.assignee) where.push(eq(requests.assigneeId, p('assignee')));
  if (shape.search) where.push(sql`${requests.searchVector} @@ to_tsquery('simple', ${p('search')})`);
  return where;
}

// Times come back as ISO text straight from PostgreSQL: no Date objects to build and serialise again per row.
const iso = (column: AnyColumn) => sql<string>`to_char(${column} at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"')`;

/** The columns of a page row, in the order the statement returns them. */
export const queueColumns = [
  'id', 'reference', 'status', 'applicantName', 'roadName', 'statusChangedAt', 'jurisdictionId', 'jurisdictionName',
  'assigneeId', 'assigneeName', 'sortKey', 'total',
] as const;

function build(db: DbOrTx, shape: QueueShape) {
  const where = filters(shape);
  const { column, cast } = sortColumns[shape.sort];
  const order = shape.dir === 'asc' ? asc : desc;
  const page = [...where];
  if (shape.cursor) {
    const cmp = sql.raw(shape.dir === 'asc' ? '>' : '<');
    page.push(sql`(${column}, ${requests.id}) ${cmp} (${p('cursorValue')}::${sql.raw(cast)}, ${p('cursorId')}::uuid)`);
  }
  // The total belongs to the view, not the page: counted up to a cap on the first page only, inside the same
  // statement (an uncorrelated subquery runs once), so a page costs one round trip. Past a few hundred the exact
  // number changes nothing for the office, and counting further is the costly part.
  const capped = db.select({ one: sql`1` }).from(requests).where(and(...where)).limit(queueCountCap + 1);
  const total = shape.cursor ? sql<null>`null::int` : sql<number>`(select count(*)::int from (${capped}) as capped)`;
  const fields = {
    id: requests.id, reference: requests.reference, status: requests.status,
    applicantName: requests.applicantName, roadName: requests.roadName, statusChangedAt: iso(requests.statusChangedAt),
    jurisdictionId: jurisdictions.id, jurisdictionName: jurisdictions.name,
    assigneeId: assignee.id, assigneeName: assignee.name,
    sortKey: sql<string>`${column}::text`,
    total,
  } satisfies Record<(typeof queueColumns)[number], unknown>;
  // The rows are read by position, so the field order must be the column order above.
  if (Object.keys(fields).join() !== queueColumns.join()) throw new Error('queue columns out of order');
  return db.select(fields).from(requests)
    .leftJoin(jurisdictions, eq(jurisdictions.id, requests.jurisdictionId))
    .leftJoin(assignee, eq(assignee.id, requests.assigneeId))
    .where(and(...page))
    .orderBy(order(column), order(requests.id))
    .limit(p('limit'))
    .toSQL();
}

const statements = new Map<string, { name: string; text: string; params: unknown[] }>();

/**
 * The hottest office query, written by Drizzle once per shape and kept: later pages of the same shape only fill
 * in their values, and the statement's name lets PostgreSQL parse and plan it once per connection.
 */
export function queueStatement(db: DbOrTx, shape: QueueShape, values: QueueValues) {
  const key = JSON.stringify(shape);
  let statement = statements.get(key);
  if (!statement) {
    const built = build(db, shape);
    statement = { name: `queue_${statements.size + 1}`, text: built.sql, params: built.params };
    statements.set(key, statement);
  }
  return { name: statement.name, text: statement.text, values: fillPlaceholders(statement.params, { ...values }) };
}
