import type { SegmentRanges } from './least-earth-model';
import { checkProfileRules, type ProfileCheck } from './profile-checks';
import type { ProfilePoint } from './profile';
import { firstGradeRange, roadEdgeFinding, roadSideWords, type RoadSide, withRoadSide } from './road-edge';
import type { RuleProfile } from './rule-profile';

/** The profile rules as checkEntrance applies them to a design: with the road side's break and scrape when it is given. */
export function checkDesign(
  design: readonly ProfilePoint[],
  rules: RuleProfile,
  road: RoadSide | undefined,
  stepFt: number,
): ProfileCheck {
  const edge = design[0].stationFt;
  const check = checkProfileRules(withRoadSide(design, edge, road, rules.designVehicle), rules, edge, stepFt, design);
  if (!road) return check;
  return { ...check, findings: [...check.findings, roadEdgeFinding(design, edge, road, rules)] };
}

/** Segment ranges with the first grade held to what the break at the road edge allows. */
export function withRoadEdge(ranges: SegmentRanges[], road: RoadSide | undefined, rules: RuleProfile): SegmentRanges[] {
  if (!road || ranges.length === 0) return ranges;
  const edge = firstGradeRange(road, rules);
  const cut = (r: { lo: number; hi: number } | null) => {
    if (!r) return null;
    const lo = Math.max(r.lo, edge.lo);
    const hi = Math.min(r.hi, edge.hi);
    return lo <= hi ? { lo, hi } : null;
  };
  return [{ ...ranges[0], rise: cut(ranges[0].rise), fall: cut(ranges[0].fall) }, ...ranges.slice(1)];
}

export function roadEdgeReason(rules: RuleProfile, road: RoadSide): string {
  const { landing, maxGradeChangePercent } = rules;
  return (
    `no first grade within the landing's ${landing.minGradePercent}% to ${landing.maxGradePercent}% keeps the break at the road edge ` +
    `within the ${maxGradeChangePercent}% grade-change limit (${roadSideWords(road)})`
  );
}
