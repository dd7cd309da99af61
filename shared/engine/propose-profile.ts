import { solve } from 'yalps';
import { z } from 'zod';
import { earthworkFromProfiles, sectionTemplateSchema } from './cross-sections';
import { EngineInputError, parseInput } from './errors';
import { bounded, elevationFt } from './numbers';
import { checkProfileRules } from './profile-checks';
import { elevationAt, normalizeParsedProfile, profileInputSchema, type ProfilePoint } from './profile';
import { type RuleProfile, type RuleProfileInput, ruleProfileSchema } from './rule-profile';
import { buildLeastEarthModel, type GradeLimits, segmentLimits } from './least-earth-model';
import { explainInfeasible } from './infeasible-reason';
import { ENGINE_VERSION } from './version';

export const proposeProfileInputSchema = z.object({
  // The first station is the road edge; the design starts there at roadEdgeElevationFt.
  existing: profileInputSchema,
  roadEdgeElevationFt: elevationFt(),
  targetEndElevationFt: elevationFt().optional(),
  // 12 ft top and 2:1 slopes: common practice (no source) for a single-car rural entrance.
  template: sectionTemplateSchema.default({ topWidthFt: 12, cutSlopeHPerV: 2, fillSlopeHPerV: 2, groundCrossSlopePercent: 0 }),
  scrapeStepFt: bounded(0.01, 10).default(0.1),
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

const MAX_TIGHTENING = 6;
// The solver keeps a dense tableau: 2,000 stations take about a second here, so more is refused, not left to hang.
const MAX_STATIONS = 2_000;

function withLandingBreak(points: ProfilePoint[], landingEndFt: number): ProfilePoint[] {
  // The design needs a station where the landing ends so it can break there rather than at the next shot.
  const first = points[0].stationFt;
  const last = points[points.length - 1].stationFt;
  if (landingEndFt <= first || landingEndFt >= last || points.some((p) => Math.abs(p.stationFt - landingEndFt) < 1e-6)) return points;
  return [...points, { stationFt: landingEndFt, elevationFt: elevationAt(points, landingEndFt) }].sort((a, b) => a.stationFt - b.stationFt);
}

const failed = (reason: string): ProposedProfile => ({ engineVersion: ENGINE_VERSION, feasible: false, reason, profile: [], cutFillByStation: [], cutCuYd: 0, fillCuYd: 0 });

/**
 * The least-earth profile: minimise the sum of |design - existing| x station spacing under the landing,
 * grade and grade-change limits. The scrape check is not linear, so when a solution scrapes, the allowed
 * rate of grade change is tightened and the programme solved again.
 */
export function proposeProfile(input: ProposeProfileInput, ruleProfile: RuleProfileInput): ProposedProfile {
  const p = parseInput(proposeProfileInputSchema, input);
  const rules: RuleProfile = parseInput(ruleProfileSchema, ruleProfile, 'ruleProfile');
  const raw = normalizeParsedProfile(p.existing, 'existing');
  if (raw.length > MAX_STATIONS) {
    throw new EngineInputError('existing', `at most ${MAX_STATIONS} stations can be designed at once (got ${raw.length})`);
  }
  const existing = withLandingBreak(raw, raw[0].stationFt + rules.landing.lengthFt);
  const limits: GradeLimits[] = segmentLimits(existing, rules);
  const reason = explainInfeasible(existing, limits, rules, p.roadEdgeElevationFt, p.targetEndElevationFt);
  if (reason) return failed(reason);

  let changeRatePerFt = Infinity;
  const vehicle = rules.designVehicle;
  for (let attempt = 0; attempt < MAX_TIGHTENING; attempt++) {
    const model = buildLeastEarthModel(existing, limits, rules, p.roadEdgeElevationFt, p.targetEndElevationFt, changeRatePerFt);
    const solution = solve(model.model);
    if (solution.status !== 'optimal' && solution.status !== 'infeasible') {
      return failed(`the solver stopped without an answer (${solution.status})`);
    }
    if (solution.status === 'infeasible') {
      return failed(
        attempt === 0
          ? `the ${rules.maxGradeChangePercent}% grade-change limit cannot bend the profile enough to reach the end elevation` +
              (rules.minDrainageGradePercent === undefined ? '' : ` while keeping the ${rules.minDrainageGradePercent}% drainage grade`)
          : `no profile keeps a ${vehicle.name.toLowerCase()} from scraping while meeting the other limits`,
      );
    }
    const design = model.read(solution.variables);
    const check = checkProfileRules(design, rules, design[0].stationFt, p.scrapeStepFt);
    const failing = check.findings.filter((f) => f.status === 'fail');
    if (failing.length === 0) return result(existing, design, p.template);
    if (failing.some((f) => f.ruleId !== 'scrape.clearance')) {
      return failed(`the solver's profile still breaks ${failing.map((f) => f.label.toLowerCase()).join(', ')}`);
    }
    // Spread the bends over more ground. A single break of A costs A*W/4 between the axles and about A times
    // the overhang beyond them, so the change allowed across one body length is what keeps both clear.
    const overhang = Math.max(vehicle.frontOverhangFt, vehicle.rearOverhangFt);
    const span = vehicle.wheelbaseFt + overhang;
    const clearanceFt = vehicle.clearanceIn / 12;
    const safeChange = Math.min(rules.maxGradeChangePercent / 100, (4 * clearanceFt) / vehicle.wheelbaseFt, overhang > 0 ? clearanceFt / overhang : Infinity);
    changeRatePerFt = Math.min(changeRatePerFt, safeChange / span) / (attempt === 0 ? 1 : 2);
  }
  return failed(`no profile keeps a ${vehicle.name.toLowerCase()} from scraping while meeting the other limits`);
}

function result(existing: ProfilePoint[], design: ProfilePoint[], template: z.output<typeof sectionTemplateSchema>): ProposedProfile {
  const cutFillByStation = design.map((d, i) => ({
    stationFt: d.stationFt,
    existingFt: existing[i].elevationFt,
    designFt: d.elevationFt,
    cutFillFt: existing[i].elevationFt - d.elevationFt,
  }));
  const volumes = earthworkFromProfiles({ existing, design, template });
  return { engineVersion: ENGINE_VERSION, feasible: true, profile: design, cutFillByStation, cutCuYd: volumes.cutCuYd, fillCuYd: volumes.fillCuYd };
}
