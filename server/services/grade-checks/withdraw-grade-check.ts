import { and, eq, isNotNull } from 'drizzle-orm';
import { crewStages, gradeCheckOpenStatuses, statusText } from '@shared/workflow/statuses';
import type { SessionUser } from '../../lib/session-user';
import type { Db } from '../../db/client';
import { documents, gradeChecks, requestEvents } from '../../db/schema';
import { conflict } from '../../lib/errors';
import { loadVisibleRequest } from '../requests/request-access';
import { loadVisibleGradeCheck, readGradeCheckRow } from './grade-checks.service';

/**
 * Takes an attached check back: the owner no longer sees it or its report, the record keeps it, and the history
 * says so (to the owner too when they had the report).
 */
export async function withdrawGradeCheck(db: Db, user: SessionUser, checkId: string) {
  const check = await loadVisibleGradeCheck(db, user, checkId);
  return db.transaction(async (tx) => {
    const request = await loadVisibleRequest(tx, user, check.requestId, { forUpdate: true });
    if (crewStages.includes(request.status)) {
      throw conflict('This check went to the crew with the job; it can no longer be withdrawn.');
    }
    // A declined or withdrawn request keeps its record as it ended.
    if (!gradeCheckOpenStatuses.includes(request.status)) {
      throw conflict(
        `This request is "${statusText[request.status].label}": a check can be withdrawn only from the site visit until the crew has the job.`,
      );
    }
    // Whether it is attached is read under the request's lock, not from before it: an attach that committed in
    // between must be undone with its report unshared and its history entry, like any other.
    const [withdrawn] = await tx
      .update(gradeChecks)
      .set({ attachedAt: null })
      .where(and(eq(gradeChecks.id, check.id), isNotNull(gradeChecks.attachedAt)))
      .returning();
    if (!withdrawn) {
      const [unattached] = await tx.select().from(gradeChecks).where(eq(gradeChecks.id, check.id));
      return readGradeCheckRow(unattached);
    }
    const unshared = await tx
      .update(documents)
      .set({ sharedWithApplicant: false })
      .where(and(eq(documents.gradeCheckId, check.id), eq(documents.sharedWithApplicant, true)))
      .returning({ id: documents.id });
    await tx.insert(requestEvents).values({
      requestId: request.id,
      actorId: user.id,
      kind: 'grade-check-withdrawn',
      internal: unshared.length === 0,
      note: `Grade check ${check.number} withdrawn by the office${unshared.length > 0 ? '; its report is no longer shared' : ''}.`,
    });
    return readGradeCheckRow(withdrawn);
  });
}
