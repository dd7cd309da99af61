import { z } from 'zod';
import { apronInputSchema, checkApron, type ApronSummary } from './apron-edges';
import { SAFETY_CAUTIONS } from './cautions';
import { culvertInputSchema, checkCulvert, type CulvertSummary } from './culvert-checks';
import { EngineInputError, parseInput } from './errors';
import type { Finding } from './findings';
import { bounded, stationFt } from './numbers';
import { roadEdgeFinding, roadSideInputSchema, withRoadSide } from './road-edge';
import { checkProfileRules } from './profile-checks';
import {
  elevationAt,
  normalizeParsedProfile,
  profileInputSchema,
  segmentGrades,
  type ProfilePoint,
  type ProfileSegment,
} from './profile';
import { designVehicleSchema, type RuleProfile, type RuleProfileInput, ruleProfileSchema } from './rule-profile';
import type { ScrapeResult } from './scrape';
import { checkGeometry, checkSight, geometryInputSchema, sightInputSchema, type SightSummary } from './site-checks';
import { formatStation } from './station';
import { stationBefore } from './station-tolerance';
import { summarise, type CheckSummary } from './summary';
import { ENGINE_VERSION } from './version';

export const checkEntranceInputSchema = z.object({
  profile: profileInputSchema,
  // Where the road edge sits on the profile's stations; shots before it (on the road) are not graded.
  roadEdgeStationFt: stationFt().optional(),
  // Older saved checks have none: the road-edge break is then "not checked" and the scrape sees the survey alone.
  roadSide: roadSideInputSchema.optional(),
  // Both edges through the warp from the road's grade to the driveway's cross slope; older checks have none.
  apron: apronInputSchema.optional(),
  scrapeStepFt: bounded(0.01, 10).default(0.1),
  // Overrides the rule profile's design vehicle for this check only.
  vehicle: designVehicleSchema.optional(),
  culvert: culvertInputSchema.optional(),
  sight: sightInputSchema.optional(),
  geometry: geometryInputSchema.optional(),
});
export type CheckEntranceInput = z.input<typeof checkEntranceInputSchema>;

export interface EntranceReport {
  engineVersion: string;
  ruleProfileId?: string;
  ruleProfileVersion?: string | number;
  jurisdictionName?: string;
  passes: boolean;
  findings: Finding[];
  summary: CheckSummary;
  profile: { points: ProfilePoint[]; segments: ProfileSegment[] };
  scrape: ScrapeResult;
  culvert?: CulvertSummary;
  sight?: SightSummary;
  apron?: ApronSummary;
  cautions: readonly string[];
}

export function profileLabel(rules: RuleProfile): string {
  const name = rules.jurisdictionName ?? rules.name ?? 'the rule profile';
  return rules.version === undefined ? name : `${name} (version ${rules.version})`;
}

/** The whole entrance check: every rule comes back, the ones without data as "not-checked". */
export function checkEntrance(input: CheckEntranceInput, ruleProfile: RuleProfileInput): EntranceReport {
  const p = parseInput(checkEntranceInputSchema, input);
  const parsedRules = parseInput(ruleProfileSchema, ruleProfile, 'ruleProfile');
  const rules: RuleProfile = p.vehicle ? { ...parsedRules, designVehicle: p.vehicle } : parsedRules;
  const points = normalizeParsedProfile(p.profile, 'profile');
  const roadEdge = p.roadEdgeStationFt ?? points[0].stationFt;
  const lastStation = points[points.length - 1].stationFt;
  if (!stationBefore(roadEdge, lastStation)) {
    throw new EngineInputError(
      'roadEdgeStationFt',
      `the road edge (station ${formatStation(roadEdge)}) is at or past the end of the survey (station ${formatStation(lastStation)}): nothing of the entrance was surveyed`,
    );
  }

  // Road-side segments end at the road edge, so only the scrape sees them; the landing and grade rules start at the edge.
  const graded = checkProfileRules(
    withRoadSide(points, roadEdge, p.roadSide, rules.designVehicle),
    rules,
    roadEdge,
    p.scrapeStepFt,
    points,
  );
  const profile = { ...graded, segments: p.roadSide ? segmentGrades(points) : graded.segments };
  const landingEnd = Math.min(roadEdge + rules.landing.lengthFt, points[points.length - 1].stationFt);
  // A car leaving climbs toward the road when the landing falls away from it.
  const approachPercent =
    landingEnd > roadEdge
      ? -((elevationAt(points, landingEnd) - elevationAt(points, roadEdge)) / (landingEnd - roadEdge)) * 100
      : 0;
  const culvert = checkCulvert(p.culvert, rules);
  const sight = checkSight(p.sight, rules, approachPercent);
  const geometry = checkGeometry(p.geometry, rules);
  const apron = checkApron(p.apron, {
    points,
    roadEdgeFt: roadEdge,
    rules,
    roadSide: p.roadSide,
    geometryWidthFt: p.geometry?.widthFt,
  });

  const stamp = { ruleProfileId: rules.id, ruleProfileVersion: rules.version };
  const findings = [
    ...profile.findings,
    roadEdgeFinding(points, roadEdge, p.roadSide, rules),
    ...culvert.findings,
    ...sight.findings,
    ...geometry,
    ...apron.findings,
  ].map((f) => ({ ...f, ...stamp }));
  const summary = summarise(findings, profileLabel(rules));
  return {
    engineVersion: ENGINE_VERSION,
    ruleProfileId: rules.id,
    ruleProfileVersion: rules.version,
    jurisdictionName: rules.jurisdictionName,
    passes: summary.fail === 0,
    findings,
    summary,
    profile: { points, segments: profile.segments },
    scrape: profile.scrape,
    culvert: culvert.culvert,
    sight: sight.sight,
    apron: apron.apron,
    cautions: SAFETY_CAUTIONS,
  };
}
