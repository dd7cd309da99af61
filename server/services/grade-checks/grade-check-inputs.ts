import { z } from 'zod';
import {
  checkEntranceInputSchema, laserSetupInputSchema, proposeProfileInputSchema, type EntranceReport, type laserSetup, type ProposedProfile,
} from '../../../shared/engine';
import { defaultHaul } from '../../../shared/charts/cut-fill-table';

/** What the office measured about the road itself; the laser's road axis and the report's site notes come from it. */
export const roadPartSchema = z.object({
  // Signed: + rises to the right for someone standing on the road edge facing into the property.
  gradePercent: z.number().min(-25).max(25),
  edgeElevationFt: z.number().min(-2_000).max(30_000),
  crossSlopePercent: z.number().min(-15).max(15).optional(),
});

/**
 * The design side of a check: the surveyed ground the least-earth proposal starts from, and whether the
 * profile being checked is that proposal (applied) rather than the ground as found.
 */
export const designPartSchema = proposeProfileInputSchema.extend({
  applied: z.boolean().default(false),
  haul: z.object({ soil: z.enum(['loam', 'clay', 'sand']), truckCuYd: z.number().positive().max(40) }).default(defaultHaul),
});

/**
 * A saved check's inputs: exactly what checkEntrance takes, plus the laser setup input and the design part.
 * The parsed form is what gets stored, so a re-run reads the same values the first run did.
 */
export const gradeCheckInputsSchema = checkEntranceInputSchema.extend({
  road: roadPartSchema.optional(),
  laser: laserSetupInputSchema.optional(),
  design: designPartSchema.optional(),
}).superRefine((inputs, ctx) => {
  // The engine accepts survey-sized and far larger profiles; a saved check is run inside a web request, so it is
  // held to what a driveway survey needs and the least-earth solve stays well under a second.
  for (const [path, profile] of [[['profile'], inputs.profile], [['design', 'existing'], inputs.design?.existing]] as const) {
    if (profile && shotCount(profile) > MAX_SHOTS) ctx.addIssue({ code: 'custom', path: [...path], message: `a grade check takes at most ${MAX_SHOTS} shots` });
  }
  const steps = spanFt(inputs.profile) / inputs.scrapeStepFt;
  if (steps > MAX_SCRAPE_STEPS) ctx.addIssue({ code: 'custom', path: ['scrapeStepFt'], message: `too fine for a profile this long: use at least ${Math.ceil((spanFt(inputs.profile) / MAX_SCRAPE_STEPS) * 100) / 100} ft` });
});

const MAX_SCRAPE_STEPS = 50_000;

function spanFt(profile: z.output<typeof checkEntranceInputSchema>['profile']): number {
  if (!Array.isArray(profile) && profile.kind === 'segment-grades') return profile.segments.reduce((sum, seg) => sum + seg.lengthFt, 0);
  const stations = (Array.isArray(profile) ? profile : profile.kind === 'elevations' ? profile.points : profile.readings).map((p) => p.stationFt);
  return Math.max(...stations) - Math.min(...stations);
}

const MAX_SHOTS = 500;

function shotCount(profile: z.output<typeof checkEntranceInputSchema>['profile']): number {
  if (Array.isArray(profile)) return profile.length;
  if (profile.kind === 'elevations') return profile.points.length;
  if (profile.kind === 'rod-readings') return profile.readings.length;
  return profile.segments.length + 1;
}
export type GradeCheckInputs = z.output<typeof gradeCheckInputsSchema>;

export interface GradeCheckResults {
  report: EntranceReport;
  laser?: ReturnType<typeof laserSetup>;
  proposal?: ProposedProfile;
  /** When a proposal was applied: the ground as surveyed, checked against the same rules, for comparison. */
  surveyed?: EntranceReport;
}
