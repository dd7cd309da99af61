import { crewStages, isOfficeRole } from '@shared/workflow/statuses';
import { eq } from 'drizzle-orm';
import type { SessionUser } from '../../lib/session-user';
import type { DbOrTx } from '../../db/client';
import { requests } from '../../db/schema';
import { notFound } from '../../lib/errors';

export type RequestRow = typeof requests.$inferSelect;

/**
 * Who may see a request: its applicant, the office, and crew once it is released (any crew while it waits on
 * the board, then only the crew that took it). Everyone else gets 404, so ids are never confirmed.
 */
export function canSee(user: SessionUser, row: RequestRow): boolean {
  if (isOfficeRole(user.role)) return true;
  if (user.role === 'applicant') return row.applicantId === user.id;
  if (!crewStages.includes(row.status)) return false;
  return row.status === 'released' ? row.crewId === null : row.crewId === user.id;
}

export async function loadVisibleRequest(
  db: DbOrTx,
  user: SessionUser,
  id: string,
  opts: { forUpdate?: boolean } = {},
) {
  const query = db.select().from(requests).where(eq(requests.id, id));
  const [row] = opts.forUpdate ? await query.for('update') : await query;
  if (!row || !canSee(user, row)) throw notFound('Request');
  return row;
}
