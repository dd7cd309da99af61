import { and, desc, eq, isNotNull } from 'drizzle-orm';
import {
  laserSetup,
  laserStepAtChangeFt,
  normalizeProfile,
  ruleProfileSchema,
  SURVEY_ELEVATION_PRECISION_FT,
  type EntranceReport,
  type LaserSetupInput,
  type ProfilePoint,
  type RuleProfile,
} from '@shared/engine';
import type { GradeCheckInputs, GradeCheckRecord, GradeCheckResults } from '@shared/contracts/grade-checks';
import { readGradeCheckRecordOrNull } from '@shared/grade-check/stored-check';
import type { DbOrTx } from '../../db/client';
import { gradeChecks, jobs, jurisdictions, ruleProfileVersions } from '../../db/schema';

/**
 * A saved grade check as the crew builds from it: the stored record read through the grade check contract's one
 * reader (older formats upgraded), and the few things the crew's screens derive from it.
 */
export interface SavedCheck {
  id: string;
  number: number;
  summary: string;
  passed: boolean;
  engineVersion: string;
  ruleProfile: RuleProfile;
  record: GradeCheckRecord;
  /** The profile the check approved: the entrance as it is to be built. */
  designPoints: ProfilePoint[];
  roadEdgeStationFt: number;
  existingPoints: ProfilePoint[] | null;
  design: NonNullable<GradeCheckInputs['design']> | null;
  proposal: NonNullable<GradeCheckResults['proposal']> | null;
  culvert: NonNullable<GradeCheckInputs['culvert']> | null;
  culvertSummary: EntranceReport['culvert'] | null;
  /** Checks saved before the apron was an input have none. */
  apron: EntranceReport['apron'] | null;
  laser: ReturnType<typeof laserSetup> | null;
  laserInput: NonNullable<GradeCheckInputs['laser']> | null;
}

// Wider than any single-lane entrance, so a step anywhere across the driveway shows.
const STEP_CHECK_HALF_WIDTH_FT = 15;

function laserOf(input: LaserSetupInput | undefined, saved: GradeCheckResults['laser']) {
  if (!input) return null;
  // The stored result is the record; recompute only when it is missing, or when it was saved by an engine whose
  // second setup stepped away from the first at the change line (the crew must never be handed a step).
  const usable =
    saved && typeof saved.alongRoadPercent === 'number' && saved.secondSetup && Array.isArray(saved.stakes);
  if (usable && laserStepAtChangeFt(saved, STEP_CHECK_HALF_WIDTH_FT) < SURVEY_ELEVATION_PRECISION_FT) return saved;
  try {
    return laserSetup(input);
  } catch {
    return null;
  }
}

function existingOf(design: GradeCheckInputs['design']): ProfilePoint[] | null {
  if (!design) return null;
  try {
    return normalizeProfile(design.existing);
  } catch {
    return null;
  }
}

/** The check a job was released with, or the request's latest attached one for a job released before jobs rows existed. */
export async function loadJobCheck(db: DbOrTx, requestId: string): Promise<SavedCheck | null> {
  const [job] = await db.select({ gradeCheckId: jobs.gradeCheckId }).from(jobs).where(eq(jobs.requestId, requestId));
  const where = job?.gradeCheckId
    ? eq(gradeChecks.id, job.gradeCheckId)
    : and(eq(gradeChecks.requestId, requestId), isNotNull(gradeChecks.attachedAt));
  const [row] = await db
    .select({ check: gradeChecks, version: ruleProfileVersions, jurisdictionName: jurisdictions.name })
    .from(gradeChecks)
    .innerJoin(ruleProfileVersions, eq(ruleProfileVersions.id, gradeChecks.ruleProfileVersionId))
    .innerJoin(jurisdictions, eq(jurisdictions.id, ruleProfileVersions.jurisdictionId))
    .where(where)
    .orderBy(desc(gradeChecks.attachedAt))
    .limit(1);
  if (!row) return null;
  const rules = ruleProfileSchema.safeParse(row.version.profile);
  const record = readGradeCheckRecordOrNull(row.check);
  if (!rules.success || !record) return null;
  const { inputs, results } = record;
  const designPoints = results.report.profile.points;
  return {
    id: row.check.id,
    number: row.check.number,
    summary: row.check.summary,
    passed: row.check.passed,
    engineVersion: row.check.engineVersion,
    ruleProfile: {
      ...rules.data,
      id: row.version.id,
      version: row.version.version,
      jurisdictionName: row.jurisdictionName,
    },
    record,
    designPoints,
    roadEdgeStationFt: inputs.roadEdgeStationFt ?? designPoints[0].stationFt,
    existingPoints: existingOf(inputs.design),
    design: inputs.design ?? null,
    proposal: results.proposal ?? null,
    culvert: inputs.culvert ?? null,
    culvertSummary: results.report.culvert ?? null,
    apron: results.report.apron ?? null,
    laser: laserOf(inputs.laser, results.laser),
    laserInput: inputs.laser ?? null,
  };
}

export function ruleProfileLabel(rules: RuleProfile) {
  return `${rules.jurisdictionName ?? rules.name ?? 'Rule profile'}, version ${rules.version ?? '?'}`;
}
