import { and, desc, eq } from 'drizzle-orm';
import type { DbOrTx, Tx } from '../../db/client';
import { asBuiltSets, requestEvents } from '../../db/schema';
import { badRequest, conflict } from '../../lib/errors';

export async function lastAsBuiltSet(db: DbOrTx, requestId: string) {
  const [set] = await db
    .select()
    .from(asBuiltSets)
    .where(eq(asBuiltSets.requestId, requestId))
    .orderBy(desc(asBuiltSets.createdAt))
    .limit(1);
  return set ?? null;
}

async function lastSendBack(tx: Tx, requestId: string) {
  const [event] = await tx
    .select({ at: requestEvents.createdAt })
    .from(requestEvents)
    .where(
      and(
        eq(requestEvents.requestId, requestId),
        eq(requestEvents.fromStatus, 'built'),
        eq(requestEvents.toStatus, 'under_construction'),
      ),
    )
    .orderBy(desc(requestEvents.createdAt))
    .limit(1);
  return event?.at ?? null;
}

/**
 * What "built" needs: the latest as-built set, taken after any send-back by the office, either passing or
 * failing with the crew's explanation (typed now, or saved with the set). Returns the words the e-mails carry.
 */
export async function assertBuildable(tx: Tx, requestId: string, note: string): Promise<string> {
  const set = await lastAsBuiltSet(tx, requestId);
  if (!set) throw conflict('Record the as-built grades before marking the job built.');
  const sentBack = await lastSendBack(tx, requestId);
  if (sentBack && set.createdAt <= sentBack) {
    throw conflict(
      'The office sent this job back after the last as-built readings; record the grades again before marking it built.',
    );
  }
  const count = Array.isArray(set.readings) ? set.readings.length : 0;
  if (set.passed) return `As-built check: the ${count} finished-grade readings are inside the road authority's limits.`;
  const explanation = note || set.note.trim();
  if (!explanation) {
    throw badRequest(
      'The last as-built readings fail the rule profile: fill in "Why the readings fail" before marking the job built.',
      {
        note: 'Why the readings fail: say what you found and why, for the office',
      },
    );
  }
  if (note && note !== set.note) await tx.update(asBuiltSets).set({ note }).where(eq(asBuiltSets.id, set.id));
  return `As-built check: some of the ${count} finished-grade readings are beyond the road authority's limits. Crew note: ${explanation}`;
}
