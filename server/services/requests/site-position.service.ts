import { eq } from 'drizzle-orm';
import type { SessionUser } from '../../lib/session-user';
import type { Db, DbOrTx } from '../../db/client';
import { jobs, requestEvents, requests, users } from '../../db/schema';
import { loadVisibleRequest } from './request-access';

/**
 * The office sets the entrance's position (from the visit, or a map), for a request whose owner gave a landmark or
 * nothing usable: the crews' board measures its distance from this. The history keeps the change, for the office.
 */
export async function setSitePosition(db: Db, user: SessionUser, requestId: string, at: { lat: number; lng: number }) {
  return db.transaction(async (tx) => {
    const row = await loadVisibleRequest(tx, user, requestId, { forUpdate: true });
    const [updated] = await tx
      .update(requests)
      .set({ siteLat: at.lat, siteLng: at.lng, version: row.version + 1, updatedAt: new Date() })
      .where(eq(requests.id, row.id))
      .returning();
    await tx.insert(requestEvents).values({
      requestId: row.id,
      actorId: user.id,
      kind: 'site-position',
      internal: true,
      note: `Site position set to ${at.lat.toFixed(5)}, ${at.lng.toFixed(5)}.`,
    });
    return updated;
  });
}

/** What the office's "At a glance" and the owner's page add to a request: the crew lead and the work day. */
export async function crewFacts(db: DbOrTx, requestId: string) {
  const [row] = await db
    .select({ workDay: jobs.scheduledFor, crewLeadName: users.name })
    .from(jobs)
    .leftJoin(users, eq(users.id, jobs.crewId))
    .where(eq(jobs.requestId, requestId));
  return { workDay: row?.workDay ?? null, crewLeadName: row?.crewLeadName ?? null };
}
