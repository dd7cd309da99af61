import { z } from 'zod';
import { earthworkFromProfiles, sectionTemplateSchema } from './cross-sections';
import { designSolver } from './design-solver';
import { EngineInputError, parseInput } from './errors';
import { bounded, elevationFt } from './numbers';
import { normalizeParsedProfile, profileInputSchema, type ProfilePoint } from './profile';
import { type RuleProfile, type RuleProfileInput, ruleProfileSchema } from './rule-profile';
import { searchDesign } from './design-search';
import { roadSideInputSchema } from './road-edge';
import { ENGINE_VERSION } from './version';

export const proposeProfileInputSchema = z.object({
  // The first station is the road edge; the design starts there at roadEdgeElevationFt.
  existing: profileInputSchema,
  roadEdgeElevationFt: elevationFt(),
  targetEndElevationFt: elevationFt().optional(),
  // 12 ft top and 2:1 slopes: common practice (no source) for a single-car rural entrance.
  template: sectionTemplateSchema.default({
    topWidthFt: 12,
    cutSlopeHPerV: 2,
    fillSlopeHPerV: 2,
    groundCrossSlopePercent: 0,
  }),
  scrapeStepFt: bounded(0.01, 10).default(0.1),
  // The road's cross slope or shoulder in front of the road edge: the design then keeps the break there and the
  // scrape over it within the limits, as checkEntrance checks them with the same road side.
  roadSide: roadSideInputSchema.optional(),
});
export type ProposeProfileInput = z.input<typeof proposeProfileInputSchema>;

export interface CutFillAtStation {
  stationFt: number;
  existingFt: number;
  designFt: number;
  /** + cut (lower the ground), - fill (raise it). */
  cutFillFt: number;
}

export interface ProposedProfile {
  engineVersion: string;
  feasible: boolean;
  reason?: string;
  profile: ProfilePoint[];
  cutFillByStation: CutFillAtStation[];
  cutCuYd: number;
  fillCuYd: number;
}

const MAX_STATIONS = 2_000;

/**
 * The least-earth profile: minimise the sum of |design - existing| x station spacing under the landing, grade,
 * drainage, grade-change and clearance limits, with no low point that holds water. Asynchronous only because
 * the solver's WebAssembly loads asynchronously; run it off the main thread (see design-worker files).
 */
export async function proposeProfile(
  input: ProposeProfileInput,
  ruleProfile: RuleProfileInput,
): Promise<ProposedProfile> {
  const p = parseInput(proposeProfileInputSchema, input);
  const rules: RuleProfile = parseInput(ruleProfileSchema, ruleProfile, 'ruleProfile');
  const ground = normalizeParsedProfile(p.existing, 'existing');
  if (ground.length > MAX_STATIONS) {
    throw new EngineInputError(
      'existing',
      `at most ${MAX_STATIONS} stations can be designed at once (got ${ground.length})`,
    );
  }
  const found = searchDesign(
    await designSolver(),
    ground,
    rules,
    p.roadEdgeElevationFt,
    p.targetEndElevationFt,
    p.scrapeStepFt,
    p.roadSide,
  );
  if (!found.design) {
    return {
      engineVersion: ENGINE_VERSION,
      feasible: false,
      reason: found.reason,
      profile: [],
      cutFillByStation: [],
      cutCuYd: 0,
      fillCuYd: 0,
    };
  }
  return result(found.ground, found.design, p.template);
}

function result(
  existing: ProfilePoint[],
  design: ProfilePoint[],
  template: z.output<typeof sectionTemplateSchema>,
): ProposedProfile {
  const cutFillByStation = design.map((d, i) => ({
    stationFt: d.stationFt,
    existingFt: existing[i].elevationFt,
    designFt: d.elevationFt,
    cutFillFt: existing[i].elevationFt - d.elevationFt,
  }));
  const volumes = earthworkFromProfiles({ existing, design, template });
  return {
    engineVersion: ENGINE_VERSION,
    feasible: true,
    profile: design,
    cutFillByStation,
    cutCuYd: volumes.cutCuYd,
    fillCuYd: volumes.fillCuYd,
  };
}
