import { and, eq, isNull } from 'drizzle-orm';
import type { SessionUser } from '../../lib/session-user';
import type { AppContext } from '../../config/context';
import { documents, gradeChecks, jurisdictions, requestEvents, ruleProfileVersions, users } from '../../db/schema';
import { badRequest } from '../../lib/errors';
import { loadVisibleRequest } from '../requests/request-access';
import { buildGradeCheckReport } from '../reports/grade-check-report';
import { storeReport } from '../reports/report-storage';
import type { RuleProfile } from '@shared/engine';
import { loadVisibleGradeCheck } from '../grade-checks/grade-checks.service';

export const REPORT_KIND = 'grade-check-report';

async function reportData(ctx: Pick<AppContext, 'db' | 'env'>, user: SessionUser, checkId: string) {
  const check = await loadVisibleGradeCheck(ctx.db, user, checkId);
  const request = await loadVisibleRequest(ctx.db, user, check.requestId);
  const [version] = await ctx.db
    .select()
    .from(ruleProfileVersions)
    .where(eq(ruleProfileVersions.id, check.ruleProfileVersionId));
  const [jurisdiction] = await ctx.db.select().from(jurisdictions).where(eq(jurisdictions.id, version.jurisdictionId));
  const [checker] = check.createdById
    ? await ctx.db.select({ name: users.name }).from(users).where(eq(users.id, check.createdById))
    : [];
  return {
    check,
    request,
    profile: version.profile as RuleProfile,
    version,
    jurisdiction,
    companyName: ctx.env.COMPANY_NAME,
    checkedBy: checker?.name ?? null,
  };
}

/** Builds the PDF for one check from the stored record alone. */
export async function reportFor(ctx: Pick<AppContext, 'db' | 'env'>, user: SessionUser, checkId: string) {
  const data = await reportData(ctx, user, checkId);
  return { check: data.check, request: data.request, pdf: await buildGradeCheckReport(data) };
}

/**
 * Makes the report, stores it and attaches it to the request as a document. Attaching twice is harmless: the key is
 * fixed per check and the second call finds the first's document. A check that fails the rules is attached only
 * when the office confirms it, since the owner reads it as the office's finding.
 */
export async function attachGradeCheck(
  ctx: Pick<AppContext, 'db' | 's3' | 'env'>,
  user: SessionUser,
  checkId: string,
  share: boolean,
  confirmFailing = false,
) {
  const data = await reportData(ctx, user, checkId);
  const { check, request } = data;
  if (!check.passed && !check.attachedAt && !confirmFailing) {
    throw badRequest(
      `Check ${check.number} does not meet the road authority's rules: confirm with "Attach it anyway" to attach it.`,
      {
        confirmFailing: `Attach it anyway: check ${check.number} does not meet the rules; confirm that the owner should read it`,
      },
    );
  }
  const objectKey = `reports/${request.id}/grade-check-${check.number}-${check.id}.pdf`;
  const [existing] = await ctx.db.select().from(documents).where(eq(documents.objectKey, objectKey));
  if (existing && check.attachedAt) return { document: existing, check };
  // A withdrawn check attached again reuses its stored report.
  const pdf = existing ? null : await buildGradeCheckReport(data);
  if (pdf) await storeReport(ctx, objectKey, pdf);
  return ctx.db.transaction(async (tx) => {
    const [document] = pdf
      ? await tx
          .insert(documents)
          .values({
            requestId: request.id,
            gradeCheckId: check.id,
            kind: REPORT_KIND,
            title: `Grade check ${check.number} report`,
            objectKey,
            contentType: 'application/pdf',
            sizeBytes: pdf.length,
            sharedWithApplicant: share,
            createdById: user.id,
          })
          .onConflictDoNothing({ target: documents.objectKey })
          .returning()
      : await tx
          .update(documents)
          .set({ sharedWithApplicant: share })
          .where(eq(documents.objectKey, objectKey))
          .returning();
    const [attached] = await tx
      .update(gradeChecks)
      .set({ attachedAt: new Date() })
      .where(and(eq(gradeChecks.id, check.id), isNull(gradeChecks.attachedAt)))
      .returning();
    if (document) {
      await tx.insert(requestEvents).values({
        requestId: request.id,
        actorId: user.id,
        kind: 'grade-check-report',
        internal: !share,
        note: `Grade check ${check.number} report attached${share ? ' and shared with the homeowner' : ''}.`,
      });
    }
    const [saved] = document ? [document] : await tx.select().from(documents).where(eq(documents.objectKey, objectKey));
    return { document: saved, check: attached ? { ...check, attachedAt: attached.attachedAt } : check };
  });
}
