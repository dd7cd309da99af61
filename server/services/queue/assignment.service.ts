import type { QueueOptions } from '@shared/contracts/queue';
import { and, asc, eq, inArray } from 'drizzle-orm';
import { officeRoles } from '@shared/workflow/roles';
import type { SessionUser } from '../../lib/session-user';
import type { Db, DbOrTx } from '../../db/client';
import { jurisdictions, requestEvents, requests, users } from '../../db/schema';
import { badRequest } from '../../lib/errors';
import { loadVisibleRequest } from '../requests/request-access';

/** People a request can be given to: the office and the owner, while their accounts are on. */
export async function officePeople(db: DbOrTx) {
  return db
    .select({ id: users.id, name: users.name, role: users.role })
    .from(users)
    .where(and(inArray(users.role, [...officeRoles]), eq(users.disabled, false)))
    .orderBy(asc(users.name));
}

export async function queueOptions(db: DbOrTx) {
  const places = await db
    .select({ id: jurisdictions.id, name: jurisdictions.name })
    .from(jurisdictions)
    .orderBy(asc(jurisdictions.name));
  return { jurisdictions: places, people: await officePeople(db) } satisfies QueueOptions;
}

/**
 * Gives a request to someone in the office (or to nobody). Not a status change, so the version stays: a
 * colleague halfway through a transition is not sent back to reload. The change is an internal event.
 */
export async function assignRequest(db: Db, actor: SessionUser, requestId: string, assigneeId: string | null) {
  return db.transaction(async (tx) => {
    const row = await loadVisibleRequest(tx, actor, requestId, { forUpdate: true });
    let name = '';
    if (assigneeId) {
      const [person] = await tx
        .select({ name: users.name })
        .from(users)
        .where(and(eq(users.id, assigneeId), inArray(users.role, [...officeRoles]), eq(users.disabled, false)));
      if (!person)
        throw badRequest('That person is not in the office.', { assigneeId: 'choose someone from the office' });
      name = person.name;
    }
    if (row.assigneeId === assigneeId) return row;
    const [updated] = await tx
      .update(requests)
      .set({ assigneeId, updatedAt: new Date() })
      .where(eq(requests.id, row.id))
      .returning();
    const note = !assigneeId
      ? 'Unassigned'
      : assigneeId === actor.id
        ? `${name} took this request`
        : `Assigned to ${name}`;
    await tx
      .insert(requestEvents)
      .values({ requestId: row.id, actorId: actor.id, kind: 'assignment', internal: true, note });
    return updated;
  });
}
