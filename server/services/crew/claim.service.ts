import { eq } from 'drizzle-orm';
import type { SessionUser } from '../../auth/session-user';
import type { DbOrTx } from '../../db/client';
import { jobs, requests, users } from '../../db/schema';
import { AppError } from '../../lib/errors';
import { applyTransition, type TransitionContext } from '../requests/transition.service';

const takenStatuses = new Set(['crew_assigned', 'under_construction', 'built', 'closed']);

/** After a lost race the job is someone else's: say whose, so the crew lead can call them rather than guess. */
async function whoHasIt(db: DbOrTx, requestId: string, me: SessionUser): Promise<AppError | null> {
  const [row] = await db.select({ status: requests.status, crewId: requests.crewId, name: users.name })
    .from(requests).leftJoin(users, eq(users.id, requests.crewId)).where(eq(requests.id, requestId));
  if (!row || !row.crewId || row.crewId === me.id || !takenStatuses.has(row.status)) return null;
  return new AppError(409, 'job_taken', `${row.name ?? 'Another crew lead'} has already taken this job.`);
}

/**
 * Taking a job. applyTransition locks the request row, so of two crew leads pressing at once (on any server
 * instance: the lock is in PostgreSQL) the second waits, then finds the job no longer on the board.
 */
export async function acceptJob(ctx: TransitionContext, crew: SessionUser, requestId: string, expectedVersion: number) {
  try {
    return await applyTransition(ctx, crew, {
      requestId,
      action: 'accept-job',
      expectedVersion,
      patch: { crewId: crew.id },
      emailDetail: `Crew lead: ${crew.name}.`,
      within: async (tx, row) => {
        await tx.update(jobs).set({ crewId: crew.id, acceptedAt: new Date(), scheduledFor: null, startedAt: null, builtAt: null })
          .where(eq(jobs.requestId, row.id));
      },
    });
  } catch (error) {
    if (error instanceof AppError && (error.status === 404 || error.status === 409)) {
      throw (await whoHasIt(ctx.db, requestId, crew)) ?? error;
    }
    throw error;
  }
}

/** Before work starts the crew may give the job back; it returns to the board for any crew. */
export async function handBackJob(ctx: TransitionContext, crew: SessionUser, requestId: string, expectedVersion: number, note: string) {
  return applyTransition(ctx, crew, {
    requestId,
    action: 'hand-back',
    expectedVersion,
    note,
    patch: { crewId: null },
    within: async (tx, row) => {
      await tx.update(jobs).set({ crewId: null, acceptedAt: null, scheduledFor: null }).where(eq(jobs.requestId, row.id));
    },
  });
}

export async function startWork(ctx: TransitionContext, crew: SessionUser, requestId: string, expectedVersion: number) {
  return applyTransition(ctx, crew, {
    requestId,
    action: 'start-work',
    expectedVersion,
    within: async (tx, row) => {
      await tx.update(jobs).set({ startedAt: new Date() }).where(eq(jobs.requestId, row.id));
    },
  });
}
