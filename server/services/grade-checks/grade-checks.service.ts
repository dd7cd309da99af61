import { and, desc, eq, isNotNull, max } from 'drizzle-orm';
import type { RuleProfile } from '@shared/engine';
import { gradeCheckOpenStatuses, isOfficeRole } from '@shared/workflow/statuses';
import type { SessionUser } from '../../lib/session-user';
import type { Db, DbOrTx } from '../../db/client';
import { gradeCheckDrafts, gradeChecks, jurisdictions, requestEvents, ruleProfileVersions } from '../../db/schema';
import { AppError, conflict, notFound } from '../../lib/errors';
import { loadVisibleRequest } from '../requests/request-access';
import type { GradeCheckRecord } from '@shared/contracts/grade-checks';
import { readGradeCheckRecord, toStoredColumns } from '@shared/grade-check/stored-check';
import { plainSummary } from './plain-summary';
import { parseGradeCheckInputs, runGradeCheck } from './run-grade-check';

export type GradeCheckRow = typeof gradeChecks.$inferSelect;
/** A saved check with its inputs and results read (and upgraded) through the contract's one reader. */
export type GradeCheck = Omit<GradeCheckRow, 'formatVersion' | 'inputs' | 'results'> & GradeCheckRecord;

export const readGradeCheckRow = ({ formatVersion, inputs, results, ...row }: GradeCheckRow): GradeCheck => ({
  ...row,
  ...readGradeCheckRecord({ formatVersion, inputs, results }),
});

/** A saved check with its parts typed, for the report, the crew's field sheet and the as-built comparison. */
export async function loadGradeCheck(db: DbOrTx, id: string): Promise<GradeCheck> {
  const [row] = await db.select().from(gradeChecks).where(eq(gradeChecks.id, id));
  if (!row) throw notFound('Grade check');
  return readGradeCheckRow(row);
}

/** Homeowners and crews see a check once the office has attached it to the request; the office sees all. */
export async function loadVisibleGradeCheck(db: DbOrTx, user: SessionUser, id: string) {
  const check = await loadGradeCheck(db, id);
  await loadVisibleRequest(db, user, check.requestId);
  if (!isOfficeRole(user.role) && !check.attachedAt) throw notFound('Grade check');
  return check;
}

export async function loadPublishedProfile(
  db: DbOrTx,
  versionId: string,
): Promise<{ id: string; profile: RuleProfile }> {
  const [row] = await db
    .select({ id: ruleProfileVersions.id, status: ruleProfileVersions.status, profile: ruleProfileVersions.profile })
    .from(ruleProfileVersions)
    .innerJoin(jurisdictions, eq(jurisdictions.id, ruleProfileVersions.jurisdictionId))
    .where(eq(ruleProfileVersions.id, versionId));
  if (!row || row.status !== 'published') {
    throw new AppError(400, 'invalid_input', 'Pick a published rule profile version.', {
      ruleProfileVersionId: 'must be a published rule profile version',
    });
  }
  return { id: row.id, profile: row.profile as RuleProfile };
}

/**
 * Runs the engine on the server and stores inputs, results, the engine version and the profile version as check
 * number n+1 of the request. The request row is locked so two saves at once get consecutive numbers.
 */
export async function saveGradeCheck(
  db: Db,
  user: SessionUser,
  requestId: string,
  body: { ruleProfileVersionId: string; inputs: unknown },
) {
  const inputs = parseGradeCheckInputs(body.inputs);
  return db.transaction(async (tx) => {
    const request = await loadVisibleRequest(tx, user, requestId, { forUpdate: true });
    // From the visit until the crew has it, a new survey may still be checked; after release the record is settled.
    if (!gradeCheckOpenStatuses.includes(request.status)) {
      throw conflict(
        'Grade checks are saved from the site visit until the permit is decided; this request is past that point or not there yet.',
      );
    }
    const { id: versionId, profile } = await loadPublishedProfile(tx, body.ruleProfileVersionId);
    const results = await runGradeCheck(inputs, profile);
    const [{ last }] = await tx
      .select({ last: max(gradeChecks.number) })
      .from(gradeChecks)
      .where(eq(gradeChecks.requestId, request.id));
    const [row] = await tx
      .insert(gradeChecks)
      .values({
        requestId: request.id,
        number: (last ?? 0) + 1,
        ruleProfileVersionId: versionId,
        engineVersion: results.report.engineVersion,
        ...toStoredColumns(inputs, results),
        passed: results.report.passes,
        summary: plainSummary(inputs, results, profile),
        createdById: user.id,
      })
      .returning();
    // The survey typed for it is now the saved check: the saver's draft of it is done with.
    await tx
      .delete(gradeCheckDrafts)
      .where(and(eq(gradeCheckDrafts.requestId, request.id), eq(gradeCheckDrafts.userId, user.id)));
    // The office's history shows each check as it is made; the owner hears of it once a report is attached.
    await tx.insert(requestEvents).values({
      requestId: request.id,
      actorId: user.id,
      kind: 'grade-check',
      internal: true,
      note: `Grade check ${row.number} saved against ${profile.jurisdictionName ?? 'the rule profile'} version ${profile.version}: ${row.passed ? 'meets the rules' : 'does not meet the rules'}.`,
    });
    return readGradeCheckRow(row);
  });
}

export async function listGradeChecks(db: DbOrTx, user: SessionUser, requestId: string) {
  const request = await loadVisibleRequest(db, user, requestId);
  const where = isOfficeRole(user.role)
    ? eq(gradeChecks.requestId, request.id)
    : and(eq(gradeChecks.requestId, request.id), isNotNull(gradeChecks.attachedAt));
  const rows = await db.select().from(gradeChecks).where(where).orderBy(desc(gradeChecks.number));
  return { request, checks: rows.map(readGradeCheckRow) };
}
