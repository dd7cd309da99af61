import type { EntranceReport, InletType } from '../engine';
import type { PlanViewInput, Side } from './plan-view';

/** The parts of a check's inputs the plan view reads (the contract's inputs fit it). */
export interface PlanSource {
  roadEdgeStationFt?: number;
  road?: { gradePercent: number };
  geometry?: {
    widthFt?: number;
    flareRadiusFt?: number;
    distanceToIntersectionFt?: number;
    distanceToPropertyLineFt?: number;
  };
  culvert?: {
    diameterIn: number;
    inlet?: InletType;
    inletInvertFt: number;
    outletInvertFt: number;
    lengthFt?: number;
  };
  sight?: { measuredLeftFt?: number; measuredRightFt?: number };
  plan?: {
    rightOfWayFt?: number;
    roadWidthFt?: number;
    bearingDeg?: number;
    intersectionSide?: Side;
    intersectionName?: string;
    propertyLineSide?: Side;
    culvertStationFt?: number;
    culvertMaterial?: string;
  };
}

/** How far past the road edge the ditch (and so the culvert) is looked for when its station is not given. */
const DITCH_SEARCH_FT = 40;

/** The material a culvert's inlet type tells, when none is entered: concrete or corrugated metal. */
export function materialOf(inlet: InletType): string {
  return inlet.startsWith('cmp') ? 'corrugated metal' : 'concrete';
}

/**
 * The plan view of a check, live or saved, from its inputs and its entrance report (for the profile's stations and
 * the sight distances required). Nothing is invented: what the inputs do not say is left for the notes.
 */
export function planInputFor(
  inputs: PlanSource,
  report: Pick<EntranceReport, 'profile' | 'culvert' | 'sight'>,
  extra: { roadName?: string } = {},
): PlanViewInput {
  const points = report.profile.points;
  const roadEdge = inputs.roadEdgeStationFt ?? points[0].stationFt;
  const plan = inputs.plan ?? {};
  const g = inputs.geometry ?? {};
  const out: PlanViewInput = {
    roadName: extra.roadName,
    roadGradePercent: inputs.road?.gradePercent,
    roadWidthFt: plan.roadWidthFt,
    rightOfWayFt: plan.rightOfWayFt,
    bearingDeg: plan.bearingDeg,
    drivewayLengthFt: points[points.length - 1].stationFt - roadEdge,
    widthFt: g.widthFt,
    flareRadiusFt: g.flareRadiusFt,
  };
  const c = inputs.culvert;
  if (c) {
    const near = points.filter((p) => p.stationFt >= roadEdge && p.stationFt <= roadEdge + DITCH_SEARCH_FT);
    const lowest = near.reduce((low, p) => (p.elevationFt < low.elevationFt ? p : low), near[0] ?? points[0]);
    // The ditch falls with the road, so the water comes from the higher side: the inlet faces up the road's grade.
    const grade = inputs.road?.gradePercent;
    const inletSide: Side | undefined = grade ? (grade > 0 ? 'right' : 'left') : undefined;
    const worked = report.culvert?.requiredLengthFt;
    out.culvert = {
      diameterIn: c.diameterIn,
      material: plan.culvertMaterial ?? materialOf(c.inlet ?? 'concrete-square-headwall'),
      lengthFt: c.lengthFt ?? worked,
      lengthWorkedOut: c.lengthFt === undefined && worked !== undefined,
      offsetFt: Math.max(0, (plan.culvertStationFt ?? Math.max(lowest.stationFt, roadEdge)) - roadEdge),
      offsetAssumed: plan.culvertStationFt === undefined,
      inletSide: inletSide ?? 'left',
      inletSideAssumed: inletSide === undefined,
      inletInvertFt: c.inletInvertFt,
      outletInvertFt: c.outletInvertFt,
    };
  }
  if (inputs.sight && report.sight) {
    out.sight = {
      left: { measuredFt: inputs.sight.measuredLeftFt, requiredFt: report.sight.requiredLeftFt },
      right: { measuredFt: inputs.sight.measuredRightFt, requiredFt: report.sight.requiredRightFt },
    };
  }
  if (g.distanceToIntersectionFt !== undefined)
    out.intersection = {
      distanceFt: g.distanceToIntersectionFt,
      side: plan.intersectionSide,
      name: plan.intersectionName,
    };
  if (g.distanceToPropertyLineFt !== undefined)
    out.propertyLine = { distanceFt: g.distanceToPropertyLineFt, side: plan.propertyLineSide };
  return out;
}
