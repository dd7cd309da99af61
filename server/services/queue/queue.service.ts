import { requestStatuses, statusText, waitingOnOffice, type RequestStatus } from '@shared/workflow/statuses';
import { allowedTransitions } from '@shared/workflow/transitions';
import type { SessionUser } from '../../lib/session-user';
import type { DbOrTx } from '../../db/client';
import { badRequest } from '../../lib/errors';
import type { QueuePage, QueueQuery, QueueRow } from '@shared/contracts/queue';
import { decodeQueueCursor, encodeQueueCursor, searchQuery } from './queue-query';
import {
  queueCountCap,
  queueStatement,
  sortsByTime,
  sortsEndedLast,
  type QueueShape,
  type QueueValues,
} from './queue-statement';

const waitingElsewhere: Partial<Record<RequestStatus, string>> = {
  draft: 'The homeowner is still filling it in',
  needs_details: 'Waiting on the homeowner’s answer',
  permit_filed: 'Waiting on the road authority',
  released: 'Waiting for a crew to take it',
  crew_assigned: 'With the crew',
  under_construction: 'With the crew',
};

/** What the office does next, from the same table the server enforces. */
export function nextOfficeAction(status: RequestStatus): string {
  const moves = allowedTransitions(status, 'staff')
    .filter((t) => t.action !== 'decline')
    .map((t) => t.label);
  if (moves.length > 0) return moves.join(' or ');
  return waitingElsewhere[status] ?? 'Nothing: finished';
}

const rowWords = Object.fromEntries(
  requestStatuses.map((status) => [
    status,
    {
      statusLabel: statusText[status].label,
      waitingOnUs: waitingOnOffice.includes(status),
      nextAction: nextOfficeAction(status),
    },
  ]),
) as Record<RequestStatus, { statusLabel: string; waitingOnUs: boolean; nextAction: string }>;

/**
 * One page of the office queue in a single query (assignee and jurisdiction joined, not fetched per row), with
 * keyset paging so page 200 costs what page 1 does. The total is counted only up to a cap, for the same reason.
 */
export async function listQueue(db: DbOrTx, user: SessionUser, query: QueueQuery) {
  const search = query.q ? searchQuery(query.q) : null;
  const cursor = query.cursor
    ? decodeQueueCursor(query.cursor, sortsByTime(query.sort) ? 'time' : 'text', sortsEndedLast(query.sort))
    : null;
  if (query.cursor && !cursor)
    throw badRequest('The page position is not one this list gave out.', { cursor: 'start again from the first page' });
  const one = (value: string | undefined) => (value === 'none' ? 'none' : value ? 'one' : null);
  const shape: QueueShape = {
    statuses: !query.status ? null : query.status.length === 1 ? 'one' : 'many',
    waiting: query.waiting,
    jurisdiction: one(query.jurisdiction),
    assignee: one(query.assignee),
    search: Boolean(search),
    cursor: Boolean(cursor),
    sort: query.sort,
    dir: query.dir,
    rows: query.limit + 1,
  };
  const values: QueueValues = {
    status: query.status?.[0],
    statuses: query.status,
    jurisdiction: query.jurisdiction,
    search: search ?? undefined,
    assignee: query.assignee === 'me' ? user.id : query.assignee,
    cursorValue: cursor?.value,
    cursorId: cursor?.id,
    cursorEnded: cursor?.ended,
  };
  const rows = await queueStatement(db, shape).execute({ ...values });
  // No row on a first page means nothing matched at all.
  const n = cursor ? null : (rows[0]?.total ?? 0);
  const more = rows.length > query.limit;
  const items = more ? rows.slice(0, query.limit) : rows;
  const last = items.at(-1);
  // Each row built field by field: copying a row minus some keys (object rest) cost more than the query's mapping.
  const requests = items.map((row): QueueRow => {
    const words = rowWords[row.status];
    return {
      id: row.id,
      reference: row.reference,
      status: row.status,
      statusLabel: words.statusLabel,
      applicantName: row.applicantName,
      roadName: row.roadName,
      statusChangedAt: row.statusChangedAt,
      waitingOnUs: words.waitingOnUs,
      nextAction: words.nextAction,
      jurisdiction: row.jurisdictionId ? { id: row.jurisdictionId, name: row.jurisdictionName ?? '' } : null,
      assignee: row.assigneeId ? { id: row.assigneeId, name: row.assigneeName ?? '' } : null,
    };
  });
  return {
    requests,
    nextCursor:
      more && last
        ? encodeQueueCursor(last.sortKey, last.id, sortsEndedLast(query.sort) ? last.ended : undefined)
        : null,
    total: n === null ? null : Math.min(n, queueCountCap),
    totalIsCapped: n !== null && n > queueCountCap,
  } satisfies QueuePage;
}
