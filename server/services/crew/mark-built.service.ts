import { and, desc, eq } from 'drizzle-orm';
import type { SessionUser } from '../../auth/session-user';
import type { Tx } from '../../db/client';
import { asBuiltSets, jobs, requestEvents } from '../../db/schema';
import { badRequest, conflict } from '../../lib/errors';
import type { RequestRow } from '../requests/request-access';
import { applyTransition, type TransitionContext } from '../requests/transition.service';

async function lastSendBack(tx: Tx, requestId: string) {
  const [event] = await tx.select({ at: requestEvents.createdAt }).from(requestEvents)
    .where(and(eq(requestEvents.requestId, requestId), eq(requestEvents.fromStatus, 'built'), eq(requestEvents.toStatus, 'under_construction')))
    .orderBy(desc(requestEvents.createdAt)).limit(1);
  return event?.at ?? null;
}

/**
 * What "built" needs: the latest as-built set, taken after any send-back by the office, either passing or
 * failing with the crew's explanation. Returns the words the e-mails carry about the set.
 */
export async function assertBuildable(tx: Tx, row: RequestRow, note: string): Promise<string> {
  const [set] = await tx.select().from(asBuiltSets).where(eq(asBuiltSets.requestId, row.id)).orderBy(desc(asBuiltSets.createdAt)).limit(1);
  if (!set) throw conflict('Record the as-built grades before marking the job built.');
  const sentBack = await lastSendBack(tx, row.id);
  if (sentBack && set.createdAt <= sentBack) {
    throw conflict('The office sent this job back after the last as-built readings; record the grades again before marking it built.');
  }
  const count = Array.isArray(set.readings) ? set.readings.length : 0;
  if (set.passed) return `As-built check: the ${count} finished-grade readings are inside the road authority's limits.`;
  const explanation = note || set.note;
  if (!explanation) {
    throw badRequest('The last as-built readings fail the rule profile: say what you found and why before marking the job built.', {
      note: 'explain the failing readings for the office',
    });
  }
  if (note && note !== set.note) await tx.update(asBuiltSets).set({ note }).where(eq(asBuiltSets.id, set.id));
  return `As-built check: some of the ${count} finished-grade readings are beyond the road authority's limits. Crew note: ${explanation}`;
}

export async function markBuilt(ctx: TransitionContext, crew: SessionUser, requestId: string, expectedVersion: number, note = '') {
  const input: Parameters<typeof applyTransition>[2] = {
    requestId,
    action: 'mark-built',
    expectedVersion,
    note,
    within: async (tx, row) => {
      input.emailDetail = await assertBuildable(tx, row, note.trim());
      await tx.update(jobs).set({ builtAt: new Date() }).where(eq(jobs.requestId, row.id));
    },
  };
  return applyTransition(ctx, crew, input);
}
