import { z } from 'zod';
import { atMost, type Finding, notChecked } from './findings';
import { bounded, nonNegative } from './numbers';
import { elevationAt, type ProfilePoint } from './profile';
import { sameStation, stationAfter } from './station-tolerance';
import type { DesignVehicle, RuleProfile } from './rule-profile';

/**
 * The road beside the entrance, as the office measures it. Slopes are + where the surface falls toward the road
 * edge (a normal crown, a shoulder draining to the ditch), - where it rises toward the edge (a road banked away
 * from the entrance). A shoulder lies on the road side of the road-edge station: the landing starts at its outer edge.
 */
export const roadSideInputSchema = z
  .object({
    roadCrossSlopePercent: bounded(-15, 15),
    shoulderWidthFt: nonNegative(30).default(0),
    shoulderSlopePercent: bounded(-25, 25).optional(),
  })
  .refine((r) => r.shoulderWidthFt === 0 || r.shoulderSlopePercent !== undefined, {
    message: 'give the shoulder slope for a shoulder this wide',
    path: ['shoulderSlopePercent'],
  });
export type RoadSideInput = z.input<typeof roadSideInputSchema>;
export type RoadSide = z.output<typeof roadSideInputSchema>;

const RULE = { ruleId: 'grade.road-edge-change', label: 'Grade change at the road edge', unit: '%' };

/** The grade just before the road edge, along the stations (into the property): a surface falling to the edge is negative. */
const approachGradePercent = (r: RoadSide) =>
  -(r.shoulderWidthFt > 0 ? r.shoulderSlopePercent! : r.roadCrossSlopePercent);

/**
 * The profile with the road side put in front of the road edge: the shoulder, then the lane for a whole car length,
 * so the design vehicle starts fully on the road and drives over both breaks. Shots surveyed on the road before the
 * edge give way to the stated slopes, which are what the road authority measures.
 */
export function withRoadSide(
  points: readonly ProfilePoint[],
  roadEdgeFt: number,
  road: RoadSide | undefined,
  vehicle: DesignVehicle,
): readonly ProfilePoint[] {
  if (!road) return points;
  const edge = edgePoint(points, roadEdgeFt);
  return [...roadSidePoints(edge, road, vehicle), edge, ...pastEdge(points, roadEdgeFt)];
}

/** The road side's own points in front of the road edge (lane start, then the shoulder's outer edge if any). */
export function roadSidePoints(edge: ProfilePoint, road: RoadSide, vehicle: DesignVehicle): ProfilePoint[] {
  const laneRunFt = vehicle.wheelbaseFt + vehicle.frontOverhangFt + vehicle.rearOverhangFt;
  const front: ProfilePoint[] = [];
  let at = edge;
  if (road.shoulderWidthFt > 0) {
    at = {
      stationFt: at.stationFt - road.shoulderWidthFt,
      elevationFt: at.elevationFt + (road.shoulderSlopePercent! / 100) * road.shoulderWidthFt,
    };
    front.unshift(at);
  }
  front.unshift({
    stationFt: at.stationFt - laneRunFt,
    elevationFt: at.elevationFt + (road.roadCrossSlopePercent / 100) * laneRunFt,
  });
  return front;
}

/** The first grade past the road edge (a fraction) that keeps the break there within the grade-change limit. */
export function firstGradeRange(road: RoadSide, rules: RuleProfile): { lo: number; hi: number } {
  const approach = approachGradePercent(road);
  return { lo: (approach - rules.maxGradeChangePercent) / 100, hi: (approach + rules.maxGradeChangePercent) / 100 };
}

/** The road side in words, as the road-edge finding and the proposal's reasons say it. */
export const roadSideWords = (road: RoadSide) =>
  road.shoulderWidthFt > 0
    ? slopeWords(road.shoulderSlopePercent!, 'shoulder')
    : slopeWords(road.roadCrossSlopePercent, 'road');

/** The road edge as a profile point: a shot a floating-point hair from the edge station is the edge, not a new segment. */
export function edgePoint(points: readonly ProfilePoint[], roadEdgeFt: number): ProfilePoint {
  const shot = points.find((p) => sameStation(p.stationFt, roadEdgeFt));
  return { stationFt: roadEdgeFt, elevationFt: shot ? shot.elevationFt : elevationAt(points, roadEdgeFt) };
}

/** Shots beyond the road edge, leaving out one that is the edge itself. */
export const pastEdge = (points: readonly ProfilePoint[], roadEdgeFt: number) =>
  points.filter((p) => stationAfter(p.stationFt, roadEdgeFt));

const slopeWords = (percent: number, what: string) =>
  percent === 0
    ? `the ${what} is level`
    : `the ${what} ${percent > 0 ? 'falls' : 'rises'} ${Math.abs(percent)}% toward the road edge`;

/** The break between the road side and the first landing grade, against the rule profile's grade-change limit. */
export function roadEdgeFinding(
  points: readonly ProfilePoint[],
  roadEdgeFt: number,
  road: RoadSide | undefined,
  rules: RuleProfile,
): Finding {
  if (!road) return notChecked(RULE, 'no road cross slope in the input');
  const [first] = pastEdge(points, roadEdgeFt);
  if (!first) return notChecked(RULE, 'the survey ends at the road edge');
  const edge = edgePoint(points, roadEdgeFt);
  const landingPercent = ((first.elevationFt - edge.elevationFt) / (first.stationFt - edge.stationFt)) * 100;
  const side = roadSideWords(road);
  const landing = `the landing ${landingPercent >= 0 ? 'rises' : 'falls'} ${Math.abs(Math.round(landingPercent * 100) / 100)}%`;
  const change = Math.abs(landingPercent - approachGradePercent(road));
  return atMost({ ...RULE, stationFt: roadEdgeFt, note: `${side}; ${landing}` }, change, rules.maxGradeChangePercent);
}
