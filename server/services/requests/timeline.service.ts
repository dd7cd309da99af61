import { and, asc, eq } from 'drizzle-orm';
import type { EventView } from '@shared/contracts/events';
import type { SessionUser } from '../../lib/session-user';
import type { DbOrTx } from '../../db/client';
import { requestEvents, users } from '../../db/schema';
import { isOffice } from './request-view';

/** Internal events (assignments, the office's notes) exist for the office only. */
export async function listEvents(db: DbOrTx, user: SessionUser, requestId: string) {
  const office = isOffice(user);
  const where = office
    ? eq(requestEvents.requestId, requestId)
    : and(eq(requestEvents.requestId, requestId), eq(requestEvents.internal, false));
  const rows = await db
    .select({
      id: requestEvents.id,
      kind: requestEvents.kind,
      fromStatus: requestEvents.fromStatus,
      toStatus: requestEvents.toStatus,
      note: requestEvents.note,
      internal: requestEvents.internal,
      documentId: requestEvents.documentId,
      createdAt: requestEvents.createdAt,
      actorName: users.name,
      actorRole: users.role,
    })
    .from(requestEvents)
    .leftJoin(users, eq(users.id, requestEvents.actorId))
    .where(where)
    .orderBy(asc(requestEvents.createdAt), asc(requestEvents.id));
  // The document an event names is the office's to open (the owner sees only what the office shares).
  return rows.map(({ internal, documentId, ...event }): EventView<Date> =>
    office ? { ...event, internal, documentId } : event,
  );
}
