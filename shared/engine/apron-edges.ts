import { z } from 'zod';
import { EngineInputError } from './errors';
import type { Finding } from './findings';
import { notChecked } from './findings';
import { bounded, positive } from './numbers';
import { checkProfileRules } from './profile-checks';
import { elevationAt, type ProfilePoint } from './profile';
import { sameStation, stationBefore } from './station-tolerance';
import { edgePoint, pastEdge, roadEdgeFinding, type roadSideInputSchema, withRoadSide } from './road-edge';
import type { RuleProfile } from './rule-profile';

export const apronInputSchema = z.object({
  // Along the road at the entrance, + rising to the right facing into the property (the laser's road axis).
  roadGradePercent: bounded(-25, 25),
  // The driveway's own cross slope once the warp is done, same sign as the road grade.
  drivewayCrossSlopePercent: bounded(-25, 25).default(0),
  // Each edge runs at half this width from the centreline; without it the check's geometry width is used.
  entranceWidthFt: positive(200).optional(),
  // Without it: the rule profile's warp length, else the landing length.
  warpLengthFt: positive(500).optional(),
  stakeIntervalFt: bounded(1, 100).default(5),
});
export type ApronInput = z.input<typeof apronInputSchema>;
type Apron = z.output<typeof apronInputSchema>;

export interface WarpStake {
  stationFt: number;
  crossSlopePercent: number;
  leftOffsetFt: number;
  leftElevationFt: number;
  centreElevationFt: number;
  rightOffsetFt: number;
  rightElevationFt: number;
}

export interface ApronSummary {
  halfWidthFt: number;
  warpLengthFt: number;
  warpLengthFrom: 'input' | 'rule profile' | 'landing length';
  /** The warp starts where the landing (the first laser setup's plane) ends. */
  warpStartStationFt: number;
  roadGradePercent: number;
  drivewayCrossSlopePercent: number;
  edges: { left: ProfilePoint[]; right: ProfilePoint[] };
  stakes: WarpStake[];
}

interface Context {
  points: readonly ProfilePoint[];
  roadEdgeFt: number;
  rules: RuleProfile;
  roadSide?: z.output<typeof roadSideInputSchema>;
  geometryWidthFt?: number;
}

// The rules an edge is held to; drainage and survey length are the centreline's business.
const EDGE_RULES = ['landing.max-grade', 'landing.min-grade', 'grade.max', 'grade.max-change'];
const SIDES = { left: 'Left edge of the entrance', right: 'Right edge of the entrance' } as const;

/** The warp's length: the check's own, else the rule profile's, else the landing length. The laser setup uses it too. */
export function apronWarpLength(
  warpLengthFt: number | undefined,
  rules: RuleProfile,
): Pick<ApronSummary, 'warpLengthFt' | 'warpLengthFrom'> {
  if (warpLengthFt !== undefined) return { warpLengthFt, warpLengthFrom: 'input' };
  if (rules.geometry.warpLengthFt !== undefined)
    return { warpLengthFt: rules.geometry.warpLengthFt, warpLengthFrom: 'rule profile' };
  return { warpLengthFt: rules.landing.lengthFt, warpLengthFrom: 'landing length' };
}

/**
 * Cross slope at a distance in from the road edge. The landing is one plane with the road's grade across it (the
 * first laser setup), so the warp starts where the landing ends and turns linearly to the driveway's cross slope;
 * the driveway's laser setup takes over where the warp ends (see laser.ts).
 */
function crossSlopeAt(a: Apron, warp: Warp, distanceFt: number): number {
  const f =
    warp.lengthFt <= 0
      ? distanceFt > warp.startFt
        ? 1
        : 0
      : Math.min(1, Math.max(0, (distanceFt - warp.startFt) / warp.lengthFt));
  return a.roadGradePercent + (a.drivewayCrossSlopePercent - a.roadGradePercent) * f;
}

/** Where the warp starts and how long it is, in feet in from the road edge. */
interface Warp {
  startFt: number;
  lengthFt: number;
}

/**
 * Edge profiles are exact on straight lines between these stations: the centreline is linear between its shots and
 * the cross slope is linear within the warp, so edge = centre + slope x offset is linear too.
 */
function edgeStations(ctx: Context, warp: Warp): number[] {
  const stations = [
    edgePoint(ctx.points, ctx.roadEdgeFt).stationFt,
    ...pastEdge(ctx.points, ctx.roadEdgeFt).map((p) => p.stationFt),
  ];
  // The warp's start and end add vertices unless a shot already stands there (or they lie past the survey).
  const last = stations[stations.length - 1];
  for (const at of [ctx.roadEdgeFt + warp.startFt, ctx.roadEdgeFt + warp.startFt + warp.lengthFt]) {
    if (stationBefore(at, last) && !stations.some((s) => sameStation(s, at))) stations.push(at);
  }
  return stations.sort((x, y) => x - y);
}

function stakeTable(ctx: Context, a: Apron, warp: Warp, halfWidthFt: number): WarpStake[] {
  const last = ctx.points[ctx.points.length - 1].stationFt;
  const end = Math.min(ctx.roadEdgeFt + warp.startFt + warp.lengthFt, last);
  const stations: number[] = [];
  // Whole steps from the road edge, then the warp's end; a step within a hundredth of the end is the end itself.
  for (let s = ctx.roadEdgeFt; s < end - 0.01; s += a.stakeIntervalFt) stations.push(s);
  stations.push(end);
  return stations.map((stationFt) => {
    const crossSlopePercent = crossSlopeAt(a, warp, stationFt - ctx.roadEdgeFt);
    const centreElevationFt = elevationAt(ctx.points, stationFt);
    const rise = (crossSlopePercent / 100) * halfWidthFt;
    return {
      stationFt,
      crossSlopePercent,
      centreElevationFt,
      leftOffsetFt: -halfWidthFt,
      rightOffsetFt: halfWidthFt,
      leftElevationFt: centreElevationFt - rise,
      rightElevationFt: centreElevationFt + rise,
    };
  });
}

function edgeFindings(side: keyof typeof SIDES, edge: ProfilePoint[], ctx: Context): Finding[] {
  const graded = withRoadSide(edge, ctx.roadEdgeFt, ctx.roadSide, ctx.rules.designVehicle);
  // No wheel runs along an edge, so its scrape is not reported: one step the length of the edge keeps it to one position.
  const oneStepFt = graded[graded.length - 1].stationFt - graded[0].stationFt + 1;
  const found = checkProfileRules(graded, ctx.rules, ctx.roadEdgeFt, oneStepFt).findings.filter((f) =>
    EDGE_RULES.includes(f.ruleId),
  );
  if (ctx.roadSide) found.push(roadEdgeFinding(edge, ctx.roadEdgeFt, ctx.roadSide, ctx.rules));
  return found.map((f) => ({
    ...f,
    ruleId: `apron.${side}.${f.ruleId}`,
    label: `${SIDES[side]}: ${f.label[0].toLowerCase()}${f.label.slice(1)}`,
  }));
}

/** Both edges of the entrance through the warp, checked like the centreline, and the warp stakes the crew sets. */
export function checkApron(a: Apron | undefined, ctx: Context): { findings: Finding[]; apron?: ApronSummary } {
  const base = { ruleId: 'apron.edges', label: 'Edges of the entrance through the warp', unit: '%' };
  if (!a) return { findings: [notChecked(base, 'no entrance width and cross slopes in the input')] };
  const widthFt = a.entranceWidthFt ?? ctx.geometryWidthFt;
  if (widthFt === undefined)
    throw new EngineInputError(
      'apron.entranceWidthFt',
      'give the entrance width (here or under geometry) to place its edges',
    );
  const halfWidthFt = widthFt / 2;
  const length = apronWarpLength(a.warpLengthFt, ctx.rules);
  const last = ctx.points[ctx.points.length - 1].stationFt;
  const warp: Warp = {
    startFt: Math.max(0, Math.min(ctx.rules.landing.lengthFt, last - ctx.roadEdgeFt)),
    lengthFt: length.warpLengthFt,
  };
  const stations = edgeStations(ctx, warp);
  if (stations.length < 2) return { findings: [notChecked(base, 'the survey ends at the road edge')] };
  const edgeAt = (sign: number) =>
    stations.map((stationFt) => ({
      stationFt,
      elevationFt:
        elevationAt(ctx.points, stationFt) +
        sign * (crossSlopeAt(a, warp, stationFt - ctx.roadEdgeFt) / 100) * halfWidthFt,
    }));
  const edges = { left: edgeAt(-1), right: edgeAt(1) };
  return {
    findings: [...edgeFindings('left', edges.left, ctx), ...edgeFindings('right', edges.right, ctx)],
    apron: {
      halfWidthFt,
      ...length,
      warpStartStationFt: ctx.roadEdgeFt + warp.startFt,
      roadGradePercent: a.roadGradePercent,
      drivewayCrossSlopePercent: a.drivewayCrossSlopePercent,
      edges,
      stakes: stakeTable(ctx, a, warp, halfWidthFt),
    },
  };
}
