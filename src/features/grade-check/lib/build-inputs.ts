import {
  elevationAt,
  normalizeProfile,
  type CheckEntranceInput,
  type ProfileInput,
  type RuleProfile,
} from '@shared/engine';
import type { GradeCheckInputsInput } from '@shared/contracts/grade-checks';
import { laserFromProfile } from './laser-from-profile';
import { type FieldErrors, readNumber, readStation } from './read-number';
import { centrelineColumns, type SurveyState } from './survey-state';

function readCentreline(s: SurveyState['centreline'], errors: FieldErrors): ProfileInput | undefined {
  const cols = centrelineColumns[s.mode];
  const at = (i: number, key: string) => `profile.${cols.list}.${i}.${key}`;
  const rows = s.rows.filter((r) => r.station.trim() || r.value.trim());
  if (rows.length < 2) {
    errors.profile = 'enter at least two shots along the centreline';
    return undefined;
  }
  if (s.mode === 'segment-grades') {
    const startStationFt = readStation(s.startStation, 'profile.startStationFt', errors);
    const startElevationFt = readNumber(s.startElevationFt, 'profile.startElevationFt', errors, true);
    const segments = rows.map((r, i) => ({
      lengthFt: readNumber(r.station, at(i, 'lengthFt'), errors, true),
      gradePercent: readNumber(r.value, at(i, 'gradePercent'), errors, true),
    }));
    if (
      startStationFt === undefined ||
      startElevationFt === undefined ||
      segments.some((g) => g.lengthFt === undefined || g.gradePercent === undefined)
    )
      return undefined;
    return {
      kind: 'segment-grades',
      startStationFt,
      startElevationFt,
      segments: segments as { lengthFt: number; gradePercent: number }[],
    };
  }
  const shots = rows.map((r, i) => ({
    stationFt: readStation(r.station, at(i, 'stationFt'), errors),
    value: readNumber(r.value, at(i, cols.valueField), errors, true),
  }));
  if (shots.some((p) => p.stationFt === undefined || p.value === undefined)) return undefined;
  const ok = shots as { stationFt: number; value: number }[];
  if (s.mode === 'elevations')
    return { kind: 'elevations', points: ok.map((p) => ({ stationFt: p.stationFt, elevationFt: p.value })) };
  const instrumentHeightFt = readNumber(s.instrumentHeightFt, 'profile.instrumentHeightFt', errors, true);
  if (instrumentHeightFt === undefined) return undefined;
  return {
    kind: 'rod-readings',
    instrumentHeightFt,
    readings: ok.map((p) => ({ stationFt: p.stationFt, rodFt: p.value })),
  };
}

/** The road beside the entrance; left out (the break not checked) until its cross slope is typed. */
function readRoadSide(r: SurveyState['road'], errors: FieldErrors): CheckEntranceInput['roadSide'] {
  const roadCrossSlopePercent = readNumber(r.crossSlopePercent, 'roadSide.roadCrossSlopePercent', errors);
  const shoulderWidthFt = readNumber(r.shoulderWidthFt, 'roadSide.shoulderWidthFt', errors);
  const shoulderSlopePercent = readNumber(r.shoulderSlopePercent, 'roadSide.shoulderSlopePercent', errors);
  if (shoulderWidthFt && shoulderSlopePercent === undefined)
    errors['roadSide.shoulderSlopePercent'] ??= 'give the shoulder slope for a shoulder this wide';
  if (roadCrossSlopePercent === undefined) {
    if (shoulderWidthFt !== undefined || shoulderSlopePercent !== undefined)
      errors['roadSide.roadCrossSlopePercent'] ??= 'give the road cross slope with the shoulder';
    return undefined;
  }
  return { roadCrossSlopePercent, shoulderWidthFt, shoulderSlopePercent };
}

/** The warped apron is checked only when asked for; its width is the geometry's top width. */
function readApron(
  a: SurveyState['apron'],
  roadGradePercent: number,
  widthFt: number | undefined,
  errors: FieldErrors,
): CheckEntranceInput['apron'] {
  if (!a.checked) return undefined;
  if (widthFt === undefined) errors['geometry.widthFt'] ??= 'give the top width to place the edges of the entrance';
  const drivewayCrossSlopePercent = readNumber(
    a.drivewayCrossSlopePercent,
    'apron.drivewayCrossSlopePercent',
    errors,
    true,
  );
  const warpLengthFt = readNumber(a.warpLengthFt, 'apron.warpLengthFt', errors);
  const stakeIntervalFt = readNumber(a.stakeIntervalFt, 'apron.stakeIntervalFt', errors, true);
  return { roadGradePercent, drivewayCrossSlopePercent, warpLengthFt, stakeIntervalFt };
}

/** A flowline typed as an elevation, or as the ditch's depth below the road edge there. */
function readFlowline(elevation: string, depth: string, key: string, edgeFt: number | undefined, errors: FieldErrors) {
  if (elevation.trim() || !depth.trim()) return readNumber(elevation, `culvert.${key}`, errors, true);
  const depthFt = readNumber(depth, `culvert.${key}`, errors, true);
  if (depthFt === undefined) return undefined;
  if (edgeFt === undefined) {
    errors[`culvert.${key}`] = 'needs the road-edge elevation to turn a ditch depth into a flowline';
    return undefined;
  }
  return Math.round((edgeFt - depthFt) * 1000) / 1000;
}

function groundAt(profile: ProfileInput | undefined, stationFt: number | undefined) {
  if (!profile || stationFt === undefined) return undefined;
  try {
    return elevationAt(normalizeProfile(profile), stationFt);
  } catch {
    return undefined;
  }
}

function readCulvert(
  c: SurveyState['culvert'],
  errors: FieldErrors,
  edgeFt: number | undefined,
  topWidthFt?: number,
  sideSlopeHPerV?: number,
): CheckEntranceInput['culvert'] {
  if (!c.present) return undefined;
  const n = (text: string, key: string, required = false) => readNumber(text, `culvert.${key}`, errors, required);
  const drainage =
    c.flow === 'rational'
      ? {
          runoffC: n(c.runoffC, 'drainage.runoffC', true),
          intensityInPerHr: n(c.intensityInPerHr, 'drainage.intensityInPerHr', true),
          areaAcres: n(c.areaAcres, 'drainage.areaAcres', true),
        }
      : undefined;
  const culvert = {
    diameterIn: n(c.diameterIn, 'diameterIn', true),
    inlet: c.inlet as NonNullable<CheckEntranceInput['culvert']>['inlet'],
    manningN: n(c.manningN, 'manningN', true),
    inletInvertFt: readFlowline(c.inletInvertFt, c.inletDitchDepthFt, 'inletInvertFt', edgeFt, errors),
    outletInvertFt: readFlowline(c.outletInvertFt, c.outletDitchDepthFt, 'outletInvertFt', edgeFt, errors),
    surfaceElevationFt: n(c.surfaceElevationFt, 'surfaceElevationFt'),
    lengthFt: n(c.lengthFt, 'lengthFt'),
    topWidthFt,
    sideSlopeHPerV,
    designFlowCfs: c.flow === 'design' ? n(c.designFlowCfs, 'designFlowCfs') : undefined,
    tailwaterDepthFt: n(c.tailwaterDepthFt, 'tailwaterDepthFt'),
    drainage: drainage as { runoffC: number; intensityInPerHr: number; areaAcres: number } | undefined,
  };
  return culvert as NonNullable<CheckEntranceInput['culvert']>;
}

/** The plan view's extras; left out when none is given, so a check without them stores as it always did. */
function readPlan(p: SurveyState['plan'], errors: FieldErrors): GradeCheckInputsInput['plan'] {
  const plan = {
    rightOfWayFt: readNumber(p.rightOfWayFt, 'plan.rightOfWayFt', errors),
    roadWidthFt: readNumber(p.roadWidthFt, 'plan.roadWidthFt', errors),
    bearingDeg: readNumber(p.bearingDeg, 'plan.bearingDeg', errors),
    intersectionSide: p.intersectionSide || undefined,
    intersectionName: p.intersectionName.trim() || undefined,
    propertyLineSide: p.propertyLineSide || undefined,
    culvertStationFt: p.culvertStation.trim()
      ? readStation(p.culvertStation, 'plan.culvertStationFt', errors)
      : undefined,
    culvertMaterial: (p.culvertMaterial || undefined) as NonNullable<GradeCheckInputsInput['plan']>['culvertMaterial'],
  };
  return Object.values(plan).some((v) => v !== undefined) ? plan : undefined;
}

/**
 * Turns the typed survey into the check's inputs. Errors are keyed by the same field paths the engine and the
 * server use, so one map marks the cells whoever found the problem. Inputs come back whenever the centreline and
 * road can be read, so the live check keeps running; a survey with any error left is not ready to save.
 */
export function buildInputs(
  s: SurveyState,
  rules: RuleProfile | undefined,
): { inputs?: GradeCheckInputsInput; errors: FieldErrors } {
  const errors: FieldErrors = {};
  const surveyed = readCentreline(s.centreline, errors);
  const roadEdgeStationFt = readStation(s.road.edgeStation, 'roadEdgeStationFt', errors);
  const roadGrade = readNumber(s.road.gradePercent, 'road.gradePercent', errors, true);
  const edgeElevation = readNumber(s.road.edgeElevationFt, 'road.edgeElevationFt', errors);
  const roadSide = readRoadSide(s.road, errors);
  const g = s.geometry;
  const topWidthFt = readNumber(g.topWidthFt, 'geometry.widthFt', errors);
  const sideSlopeHPerV = readNumber(g.sideSlopeHPerV, 'design.template.cutSlopeHPerV', errors);
  const sight = {
    speedMph: readNumber(s.road.speedMph, 'sight.speedMph', errors),
    measuredLeftFt: readNumber(s.road.sightLeftFt, 'sight.measuredLeftFt', errors),
    measuredRightFt: readNumber(s.road.sightRightFt, 'sight.measuredRightFt', errors),
    movements: s.road.movements,
  };
  const geometry = {
    widthFt: topWidthFt,
    flareRadiusFt: readNumber(g.flareRadiusFt, 'geometry.flareRadiusFt', errors),
    distanceToIntersectionFt: readNumber(g.distanceToIntersectionFt, 'geometry.distanceToIntersectionFt', errors),
    distanceToPropertyLineFt: readNumber(g.distanceToPropertyLineFt, 'geometry.distanceToPropertyLineFt', errors),
  };
  // A half-entered culvert or stake leaves itself out of the live check (its boxes show why) instead of stopping it.
  const culvertErrors: FieldErrors = {};
  const culvertRead = readCulvert(
    s.culvert,
    culvertErrors,
    edgeElevation ?? groundAt(surveyed, roadEdgeStationFt),
    topWidthFt,
    sideSlopeHPerV,
  );
  const culvert = Object.keys(culvertErrors).length === 0 ? culvertRead : undefined;
  Object.assign(errors, culvertErrors);
  const receiverOffsetFt = readNumber(s.laser.receiverOffsetFt, 'laser.receiverOffsetFt', errors, true);
  const stakes = s.laser.stakes.flatMap((k, i) => {
    const offsetFt = readNumber(k.offsetFt, `laser.stakes.${i}.offsetFt`, errors, true);
    const distanceFt = readNumber(k.distanceFt, `laser.stakes.${i}.distanceFt`, errors, true);
    const rodReadingFt = readNumber(k.rodReadingFt, `laser.stakes.${i}.rodReadingFt`, errors, true);
    return offsetFt === undefined || distanceFt === undefined || rodReadingFt === undefined
      ? []
      : [{ label: k.label.trim() || `Stake ${i + 1}`, offsetFt, distanceFt, rodReadingFt }];
  });
  const plan = readPlan(s.plan, errors);
  const target = readNumber(s.design.targetEndElevationFt, 'design.targetEndElevationFt', errors);
  const truckCuYd = readNumber(s.design.truckCuYd, 'design.haul.truckCuYd', errors, true) ?? 10;
  if (!surveyed || roadEdgeStationFt === undefined || roadGrade === undefined || receiverOffsetFt === undefined)
    return { errors };

  const signedRoadGrade = s.road.rises === 'right' ? roadGrade : -roadGrade;
  const checked: ProfileInput = s.design.applied ? { kind: 'elevations', points: s.design.applied } : surveyed;
  const apron = readApron(s.apron, signedRoadGrade, topWidthFt, errors);
  // The driveway setup carries the cross slope the warp ends on, so the stakes and the second plane agree.
  const crew = {
    roadGradePercent: signedRoadGrade,
    receiverOffsetFt,
    stakes,
    drivewayCrossSlopePercent: apron?.drivewayCrossSlopePercent,
    warpLengthFt: apron?.warpLengthFt,
  };
  const laser = rules ? laserFromProfile(checked, roadEdgeStationFt, rules, crew) : undefined;
  const edge = edgeElevation ?? laser?.originElevationFt;
  const inputs: GradeCheckInputsInput = {
    profile: checked,
    roadEdgeStationFt,
    culvert,
    geometry,
    sight: Object.values(sight).some((v) => typeof v === 'number') ? sight : undefined,
    road: edge === undefined ? undefined : { gradePercent: signedRoadGrade, edgeElevationFt: edge },
    roadSide,
    apron,
    plan,
    laser,
    design:
      edge === undefined
        ? undefined
        : {
            existing: surveyed,
            roadEdgeElevationFt: edge,
            targetEndElevationFt: target,
            applied: Boolean(s.design.applied),
            template: {
              topWidthFt: topWidthFt ?? 12,
              cutSlopeHPerV: sideSlopeHPerV ?? 2,
              fillSlopeHPerV: sideSlopeHPerV ?? 2,
              groundCrossSlopePercent: 0,
            },
            haul: { soil: s.design.soil, truckCuYd },
          },
  };
  return { inputs, errors };
}
