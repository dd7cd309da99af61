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
});
export type GradeCheckInputs = z.output<typeof gradeCheckInputsSchema>;

export interface GradeCheckResults {
  report: EntranceReport;
  laser?: ReturnType<typeof laserSetup>;
  proposal?: ProposedProfile;
  /** When a proposal was applied: the ground as surveyed, checked against the same rules, for comparison. */
  surveyed?: EntranceReport;
}
