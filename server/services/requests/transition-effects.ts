import { and, desc, eq, isNotNull } from 'drizzle-orm';
import type { SessionUser } from '../../auth/session-user';
import type { Tx } from '../../db/client';
import { gradeChecks, jobs, messages } from '../../db/schema';
import { badRequest, conflict } from '../../lib/errors';
import type { RequestRow } from './request-access';
import { assertReadyToSubmit } from './submission';
import { assertBuildable } from '../crew/mark-built.service';

export interface EffectInput {
  action: string;
  actor: SessionUser;
  answer?: string;
  /** The columns the route is about to set, so a check can look at old and new values together. */
  patch: Partial<RequestRow>;
  /** Filled in here when a step has words to add to the e-mails (the grade check's summary). */
  emailDetail?: string;
}

async function attachedGradeCheck(tx: Tx, requestId: string) {
  const [check] = await tx.select({ id: gradeChecks.id, summary: gradeChecks.summary, passed: gradeChecks.passed })
    .from(gradeChecks)
    .where(and(eq(gradeChecks.requestId, requestId), isNotNull(gradeChecks.attachedAt)))
    .orderBy(desc(gradeChecks.attachedAt))
    .limit(1);
  return check;
}

/**
 * The checks and writes a status change carries besides the status itself, run inside its transaction after the
 * request row is locked, so they see the same state the change is made from.
 */
export async function runTransitionEffects(tx: Tx, row: RequestRow, input: EffectInput) {
  const { action, actor } = input;
  if (action === 'submit') {
    await assertReadyToSubmit(row);
  } else if (action === 'answer' && input.answer) {
    await tx.insert(messages).values({ requestId: row.id, authorId: actor.id, visibility: 'shared', body: input.answer });
  } else if (action === 'mark-checked') {
    const check = await attachedGradeCheck(tx, row.id);
    if (!check) throw conflict('Attach a grade check to this request before marking it checked.');
    input.emailDetail = `Grade check: ${check.summary}`;
  } else if (action === 'record-granted' || action === 'record-refused') {
    if (!input.patch.permitReference && !row.permitReference) {
      throw badRequest('Enter the permit reference.', { permitReference: 'enter the road authority’s permit number' });
    }
  } else if (action === 'release') {
    const check = await attachedGradeCheck(tx, row.id);
    await tx.insert(jobs).values({ requestId: row.id, gradeCheckId: check?.id ?? null })
      .onConflictDoUpdate({ target: jobs.requestId, set: { releasedAt: new Date(), crewId: null, acceptedAt: null, gradeCheckId: check?.id ?? null } });
  } else if (action === 'hand-back') {
    await tx.update(jobs).set({ crewId: null, acceptedAt: null, scheduledFor: null }).where(eq(jobs.requestId, row.id));
  } else if (action === 'mark-built') {
    // The same rule as the crew's own endpoint: a passing set, or a failing one that carries the crew's note.
    input.emailDetail = await assertBuildable(tx, row, '');
  }
}

/** Columns set by the action itself rather than typed by the person making it. */
export function actionPatch(action: string, actor: SessionUser, now = new Date()): Partial<RequestRow> {
  if (action === 'submit') return { submittedAt: now };
  if (action === 'hand-back') return { crewId: null };
  return {};
}
