import { and, eq, isNotNull, isNull, like } from 'drizzle-orm';
import type { AppContext } from '../../config/context';
import { attachGradeCheck } from '../../services/documents/attach-grade-check';
import { documents, gradeChecks, requestEvents, users } from '../../db/schema';

/**
 * The demo's attached grade checks get their PDF reports, made and stored exactly as attaching one in the app does,
 * and shared with the homeowner. The seed writes rows only, so this runs once storage is up; a check that
 * already has its report is left alone. Each report is dated with its check's attachment, so timelines stay in order.
 */
export async function seedDemoReports(ctx: Pick<AppContext, 'db' | 's3' | 'env'>) {
  const missing = await ctx.db
    .select({ check: gradeChecks, author: users })
    .from(gradeChecks)
    .innerJoin(users, eq(users.id, gradeChecks.createdById))
    .leftJoin(documents, eq(documents.gradeCheckId, gradeChecks.id))
    .where(and(isNotNull(gradeChecks.attachedAt), isNull(documents.id)));
  for (const { check, author } of missing) {
    const { document } = await attachGradeCheck(
      ctx,
      { id: author.id, email: author.email, name: author.name, role: author.role },
      check.id,
      true,
    );
    await ctx.db.update(documents).set({ createdAt: check.attachedAt! }).where(eq(documents.id, document.id));
    await ctx.db
      .update(requestEvents)
      .set({ createdAt: check.attachedAt! })
      .where(
        and(
          eq(requestEvents.requestId, check.requestId),
          eq(requestEvents.kind, 'grade-check-report'),
          like(requestEvents.note, `Grade check ${check.number} report%`),
        ),
      );
  }
  return missing.length;
}
