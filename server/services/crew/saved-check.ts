import { and, desc, eq, isNotNull } from 'drizzle-orm';
import { z } from 'zod';
import {
  culvertInputSchema, laserSetup, laserSetupInputSchema, laserStepAtChangeFt, SURVEY_ELEVATION_PRECISION_FT, normalizeProfile, profileInputSchema,
  ruleProfileSchema, type CulvertInput, type EntranceReport, type ProfilePoint, type RuleProfile,
} from '../../../shared/engine';
import type { DbOrTx } from '../../db/client';
import { gradeChecks, jobs, jurisdictions, ruleProfileVersions } from '../../db/schema';
// The design part is read with the very schema the check screen saved it with.
import { designPartSchema } from '../grade-checks/grade-check-inputs';

/**
 * A saved grade check read back for the crew. The stored JSON was written by the office's check screen through
 * the engine; it is parsed again here piece by piece, so one odd part (an older check without a laser setup)
 * leaves that section of the field sheet empty instead of breaking the whole sheet.
 */
const pointSchema = z.object({ stationFt: z.number(), elevationFt: z.number() });
const reportSchema = z.object({
  profile: z.object({ points: z.array(pointSchema).min(2) }),
  culvert: z.object({
    requiredLengthFt: z.number().optional(), coverIn: z.number().optional(), slopeFtPerFt: z.number().optional(), headwaterFt: z.number().optional(),
    hwOverD: z.number().optional(), control: z.enum(['inlet', 'outlet']).optional(), inletHeadwaterFt: z.number().optional(), outletHeadwaterFt: z.number().optional(),
  }).optional(),
  apron: z.object({
    halfWidthFt: z.number(), warpLengthFt: z.number(), warpLengthFrom: z.enum(['input', 'rule profile', 'landing length']), warpStartStationFt: z.number(),
    roadGradePercent: z.number(), drivewayCrossSlopePercent: z.number(),
    edges: z.object({ left: z.array(pointSchema), right: z.array(pointSchema) }),
    stakes: z.array(z.object({
      stationFt: z.number(), crossSlopePercent: z.number(), leftOffsetFt: z.number(), leftElevationFt: z.number(),
      centreElevationFt: z.number(), rightOffsetFt: z.number(), rightElevationFt: z.number(),
    })),
  }).optional(),
}).loose();
const proposalSchema = z.object({
  feasible: z.boolean(),
  profile: z.array(pointSchema),
  cutFillByStation: z.array(z.object({ stationFt: z.number(), existingFt: z.number(), designFt: z.number(), cutFillFt: z.number() })),
  cutCuYd: z.number(),
  fillCuYd: z.number(),
});

export interface SavedCheck {
  id: string;
  number: number;
  summary: string;
  passed: boolean;
  engineVersion: string;
  ruleProfile: RuleProfile;
  /** The profile the check approved: the entrance as it is to be built. */
  designPoints: ProfilePoint[];
  roadEdgeStationFt: number;
  existingPoints: ProfilePoint[] | null;
  design: z.output<typeof designPartSchema> | null;
  proposal: z.output<typeof proposalSchema> | null;
  culvert: z.output<typeof culvertInputSchema> | null;
  culvertSummary: EntranceReport['culvert'] | null;
  /** Checks saved before the apron was an input have none. */
  apron: EntranceReport['apron'] | null;
  laser: ReturnType<typeof laserSetup> | null;
  laserInput: z.output<typeof laserSetupInputSchema> | null;
}

const pick = <S extends z.ZodType>(schema: S, value: unknown): z.output<S> | null => {
  const parsed = schema.safeParse(value);
  return parsed.success ? parsed.data : null;
};

// Wider than any single-lane entrance, so a step anywhere across the driveway shows.
const STEP_CHECK_HALF_WIDTH_FT = 15;

function laserOf(input: z.output<typeof laserSetupInputSchema> | null, stored: unknown) {
  if (!input) return null;
  const saved = stored as ReturnType<typeof laserSetup> | undefined;
  // The stored result is the record; recompute only when it is missing, or when it was saved by an engine whose
  // second setup stepped away from the first at the change line (the crew must never be handed a step).
  const usable = saved && typeof saved.alongRoadPercent === 'number' && saved.secondSetup && Array.isArray(saved.stakes);
  if (usable && laserStepAtChangeFt(saved, STEP_CHECK_HALF_WIDTH_FT) < SURVEY_ELEVATION_PRECISION_FT) return saved;
  // Inputs saved before warps existed carry the old default cross slope of 0, which no screen ever let anyone
  // choose; without a warp length it is dropped so the driveway keeps the road's tilt and the setups meet.
  const { drivewayCrossSlopePercent, ...rest } = input;
  try {
    return laserSetup(input.warpLengthFt === undefined ? rest : { ...rest, drivewayCrossSlopePercent });
  } catch {
    return null;
  }
}

function pointsOf(report: z.output<typeof reportSchema> | null, rawProfile: unknown): ProfilePoint[] | null {
  if (report) return report.profile.points;
  const input = pick(profileInputSchema, rawProfile);
  if (!input) return null;
  try {
    return normalizeProfile(input);
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
  const [row] = await db.select({ check: gradeChecks, version: ruleProfileVersions, jurisdictionName: jurisdictions.name })
    .from(gradeChecks)
    .innerJoin(ruleProfileVersions, eq(ruleProfileVersions.id, gradeChecks.ruleProfileVersionId))
    .innerJoin(jurisdictions, eq(jurisdictions.id, ruleProfileVersions.jurisdictionId))
    .where(where)
    .orderBy(desc(gradeChecks.attachedAt))
    .limit(1);
  if (!row) return null;
  const rules = pick(ruleProfileSchema, row.version.profile);
  if (!rules) return null;
  const inputs = (row.check.inputs ?? {}) as Record<string, unknown>;
  const results = (row.check.results ?? {}) as Record<string, unknown>;
  const report = pick(reportSchema, results.report);
  const designPoints = pointsOf(report, inputs.profile);
  if (!designPoints) return null;
  const design = pick(designPartSchema, inputs.design);
  const laserInput = pick(laserSetupInputSchema, inputs.laser);
  let existingPoints: ProfilePoint[] | null = null;
  try {
    existingPoints = design ? normalizeProfile(design.existing) : null;
  } catch {
    existingPoints = null;
  }
  const roadEdge = typeof inputs.roadEdgeStationFt === 'number' ? inputs.roadEdgeStationFt : designPoints[0].stationFt;
  return {
    id: row.check.id,
    number: row.check.number,
    summary: row.check.summary,
    passed: row.check.passed,
    engineVersion: row.check.engineVersion,
    ruleProfile: { ...rules, id: row.version.id, version: row.version.version, jurisdictionName: row.jurisdictionName },
    designPoints,
    roadEdgeStationFt: roadEdge,
    existingPoints,
    design,
    proposal: pick(proposalSchema, results.proposal),
    culvert: pick(culvertInputSchema, inputs.culvert as CulvertInput | undefined),
    culvertSummary: report?.culvert ?? null,
    apron: report?.apron ?? null,
    laser: laserOf(laserInput, results.laser),
    laserInput,
  };
}

export function ruleProfileLabel(rules: RuleProfile) {
  return `${rules.jurisdictionName ?? rules.name ?? 'Rule profile'}, version ${rules.version ?? '?'}`;
}
