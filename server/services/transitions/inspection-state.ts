import { and, desc, eq, isNotNull, isNull } from 'drizzle-orm';
import { inspectionRequired, ruleProfileSchema } from '@shared/engine';
import type { DbOrTx, Tx } from '../../db/client';
import { gradeChecks, inspections, inspectorLinks, jobs, ruleProfileVersions } from '../../db/schema';
import { conflict } from '../../lib/errors';

export async function latestInspection(db: DbOrTx, requestId: string) {
  const [row] = await db
    .select()
    .from(inspections)
    .where(eq(inspections.requestId, requestId))
    .orderBy(desc(inspections.createdAt))
    .limit(1);
  return row ?? null;
}

/**
 * Whether the rule profile the job was checked under asks for a passed inspection before closing: the version the
 * job was released with (else the request's latest attached check's). A version saved before the setting existed
 * reads as not required.
 */
export async function jobNeedsInspection(db: DbOrTx, requestId: string): Promise<boolean> {
  const [job] = await db.select({ gradeCheckId: jobs.gradeCheckId }).from(jobs).where(eq(jobs.requestId, requestId));
  const where = job?.gradeCheckId
    ? eq(gradeChecks.id, job.gradeCheckId)
    : and(eq(gradeChecks.requestId, requestId), isNotNull(gradeChecks.attachedAt));
  const [row] = await db
    .select({ profile: ruleProfileVersions.profile })
    .from(gradeChecks)
    .innerJoin(ruleProfileVersions, eq(ruleProfileVersions.id, gradeChecks.ruleProfileVersionId))
    .where(where)
    .orderBy(desc(gradeChecks.attachedAt))
    .limit(1);
  if (!row) return false;
  const parsed = ruleProfileSchema.safeParse(row.profile);
  return parsed.success && inspectionRequired(parsed.data);
}

/**
 * Takes a link's one outcome inside the change's transaction: the link must belong to this request, be neither
 * withdrawn nor expired, and have no outcome yet. Two sends at once: the second finds it taken.
 */
export async function claimLinkOutcome(tx: Tx, requestId: string, linkId: string, now: Date) {
  const [link] = await tx
    .select()
    .from(inspectorLinks)
    .where(and(eq(inspectorLinks.id, linkId), eq(inspectorLinks.requestId, requestId)))
    .for('update');
  if (!link || link.revokedAt || link.expiresAt.getTime() <= now.getTime()) {
    throw conflict('This inspection link no longer works. Ask the office for a new one.');
  }
  const [claimed] = await tx
    .update(inspectorLinks)
    .set({ outcomeAt: now })
    .where(and(eq(inspectorLinks.id, linkId), isNull(inspectorLinks.outcomeAt)))
    .returning();
  if (!claimed) throw conflict('An outcome was already recorded through this link.');
  return claimed;
}

export async function recordInspection(
  tx: Tx,
  values: {
    requestId: string;
    passed: boolean;
    inspectorName: string;
    items: string[];
    note: string;
    linkId: string | null;
    recordedById: string | null;
    createdAt: Date;
  },
) {
  const [row] = await tx.insert(inspections).values(values).returning();
  return row;
}
