import { and, eq } from 'drizzle-orm';
import { gradeCheckOpenStatuses } from '@shared/workflow/statuses';
import type { GradeCheckDraftView } from '@shared/contracts/grade-checks';
import type { SessionUser } from '../../lib/session-user';
import type { Db, DbOrTx } from '../../db/client';
import { gradeCheckDrafts } from '../../db/schema';
import { conflict } from '../../lib/errors';
import { loadVisibleRequest } from '../requests/request-access';
import { loadPublishedProfile } from './grade-checks.service';

type DraftRow = typeof gradeCheckDrafts.$inferSelect;

const draftView = (row: DraftRow): GradeCheckDraftView<Date> => ({
  survey: row.survey as Record<string, unknown>,
  ruleProfileVersionId: row.ruleProfileVersionId,
  updatedAt: row.updatedAt,
});

/** The caller's own survey draft for the request, or null. Each person's draft is theirs alone. */
export async function loadGradeCheckDraft(db: DbOrTx, user: SessionUser, requestId: string) {
  const request = await loadVisibleRequest(db, user, requestId);
  const [row] = await db
    .select()
    .from(gradeCheckDrafts)
    .where(and(eq(gradeCheckDrafts.requestId, request.id), eq(gradeCheckDrafts.userId, user.id)));
  return row ? draftView(row) : null;
}

/** Keeps the survey as typed; one row per request and person, replaced on every save. */
export async function saveGradeCheckDraft(
  db: Db,
  user: SessionUser,
  requestId: string,
  body: { survey: Record<string, unknown>; ruleProfileVersionId: string | null },
) {
  const request = await loadVisibleRequest(db, user, requestId);
  if (!gradeCheckOpenStatuses.includes(request.status)) {
    throw conflict(
      'Grade checks are made from the site visit until the permit is decided; this request is past that point or not there yet, so its survey is not kept.',
    );
  }
  if (body.ruleProfileVersionId) await loadPublishedProfile(db, body.ruleProfileVersionId);
  const values = {
    requestId: request.id,
    userId: user.id,
    survey: body.survey,
    ruleProfileVersionId: body.ruleProfileVersionId,
    updatedAt: new Date(),
  };
  const [row] = await db
    .insert(gradeCheckDrafts)
    .values(values)
    .onConflictDoUpdate({
      target: [gradeCheckDrafts.requestId, gradeCheckDrafts.userId],
      set: { survey: values.survey, ruleProfileVersionId: values.ruleProfileVersionId, updatedAt: values.updatedAt },
    })
    .returning();
  return draftView(row);
}

/** Forgets the caller's draft when they start the survey over (saving a check forgets it in its own transaction). */
export async function discardGradeCheckDraft(db: DbOrTx, user: SessionUser, requestId: string) {
  const request = await loadVisibleRequest(db, user, requestId);
  await db
    .delete(gradeCheckDrafts)
    .where(and(eq(gradeCheckDrafts.requestId, request.id), eq(gradeCheckDrafts.userId, user.id)));
}
