import { eq } from 'drizzle-orm';
import type { SessionUser } from '../../lib/session-user';
import type { DbOrTx } from '../../db/client';
import { jobs, requests, users } from '../../db/schema';
import { AppError } from '../../lib/errors';
import type { ActionDef } from './action-def';
import { assertBuildable } from './as-built-state';

const takenStatuses = new Set(['crew_assigned', 'under_construction', 'built', 'closed']);

/** After a lost race the job is someone else's: say whose, so the crew lead can call them rather than guess. */
async function whoHasIt(db: DbOrTx, requestId: string, me: SessionUser): Promise<AppError | null> {
  const [row] = await db
    .select({ status: requests.status, crewId: requests.crewId, name: users.name })
    .from(requests)
    .leftJoin(users, eq(users.id, requests.crewId))
    .where(eq(requests.id, requestId));
  if (!row || !row.crewId || row.crewId === me.id || !takenStatuses.has(row.status)) return null;
  return new AppError(409, 'job_taken', `${row.name ?? 'Another crew lead'} has already taken this job.`);
}

/**
 * Taking a job. The door locks the request row, so of two crew leads pressing at once (on any server instance:
 * the lock is in PostgreSQL) the second waits, then finds the job no longer on the board.
 */
export const acceptJob: ActionDef<'accept-job'> = {
  emails: { to: ['applicant', 'office'] },
  run: async ({ tx, row, actor, now }) => {
    await tx
      .update(jobs)
      .set({ crewId: actor.id, acceptedAt: now, scheduledFor: null, startedAt: null, builtAt: null })
      .where(eq(jobs.requestId, row.id));
    return { patch: { crewId: actor.id }, emailDetail: `Crew lead: ${actor.name}.` };
  },
  explainRefusal: async (db, requestId, actor) => (actor.role === 'crew' ? whoHasIt(db, requestId, actor) : null),
};

/** Before work starts the crew may give the job back; it returns to the board for any crew. */
export const handBack: ActionDef<'hand-back'> = {
  emails: { to: ['office'] },
  run: async ({ tx, row }) => {
    await tx.update(jobs).set({ crewId: null, acceptedAt: null, scheduledFor: null }).where(eq(jobs.requestId, row.id));
    return { patch: { crewId: null } };
  },
};

export const startWork: ActionDef<'start-work'> = {
  emails: { to: ['applicant'] },
  run: async ({ tx, row, now }) => {
    await tx.update(jobs).set({ startedAt: now }).where(eq(jobs.requestId, row.id));
  },
};

export const markBuilt: ActionDef<'mark-built'> = {
  emails: { to: ['applicant', 'office'] },
  run: async ({ tx, row, body, now }) => {
    const emailDetail = await assertBuildable(tx, row.id, body.note ?? '');
    await tx.update(jobs).set({ builtAt: now }).where(eq(jobs.requestId, row.id));
    return { emailDetail };
  },
};
