import { randomUUID } from 'node:crypto';
import { sql } from 'drizzle-orm';
import type { DbOrTx } from '../../server/db/client';
import { asBuiltSets, gradeChecks, jurisdictions, ruleProfileVersions } from '../../server/db/schema';

/** An invented road authority with one published rule profile version. */
export async function createJurisdiction(db: DbOrTx, overrides: Partial<typeof jurisdictions.$inferInsert> = {}) {
  const tag = randomUUID().slice(0, 6);
  const [jurisdiction] = await db
    .insert(jurisdictions)
    .values({
      slug: `fenwick-${tag}`,
      name: `Fenwick County ${tag}`,
      authority: 'Fenwick County Road Department',
      ...overrides,
    })
    .returning();
  const [version] = await db
    .insert(ruleProfileVersions)
    .values({
      jurisdictionId: jurisdiction.id,
      version: 1,
      status: 'published',
      profile: { landingMaxPercent: 4 },
      publishedAt: new Date(),
    })
    .returning();
  return { jurisdiction, version };
}

/** A saved grade check; attached unless `attachedAt: null` is passed. */
export async function createGradeCheck(
  db: DbOrTx,
  overrides: Partial<typeof gradeChecks.$inferInsert> & { requestId: string; createdById: string },
) {
  const { version } = overrides.ruleProfileVersionId
    ? { version: { id: overrides.ruleProfileVersionId } }
    : await createJurisdiction(db);
  const [{ next }] = await db
    .select({ next: sql<number>`coalesce(max(${gradeChecks.number}), 0) + 1` })
    .from(gradeChecks)
    .where(sql`${gradeChecks.requestId} = ${overrides.requestId}`);
  const [row] = await db
    .insert(gradeChecks)
    .values({
      number: Number(next),
      ruleProfileVersionId: version.id,
      engineVersion: 'test',
      inputs: {},
      results: {},
      passed: true,
      summary: 'Landing 2.1% (limit 4%), steepest grade 9.8% (limit 17%): passes.',
      attachedAt: new Date(),
      ...overrides,
    })
    .returning();
  return row;
}

/** As-built readings recorded by a crew against a request's grade check. */
export async function createAsBuiltSet(
  db: DbOrTx,
  overrides: Partial<typeof asBuiltSets.$inferInsert> & { requestId: string; gradeCheckId: string; crewId: string },
) {
  const [row] = await db
    .insert(asBuiltSets)
    .values({
      readings: [{ stationFt: 0, elevationFt: 100 }],
      results: [],
      passed: true,
      ...overrides,
    })
    .returning();
  return row;
}
