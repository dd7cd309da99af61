import { formatStation, type ProfileInput } from '@shared/engine';
import type { GradeCheckInputsInput } from '@shared/contracts/grade-checks';
import { initialSurvey, newKey, type CentrelineRow, type SurveyState } from './survey-state';

const str = (v: number | undefined) => (v === undefined ? '' : String(v));

function centrelineOf(profile: ProfileInput): SurveyState['centreline'] {
  const base = { instrumentHeightFt: '', startStation: '0+00', startElevationFt: '' };
  const row = (station: string, value: number): CentrelineRow => ({ key: newKey(), station, value: String(value) });
  if (Array.isArray(profile))
    return { ...base, mode: 'elevations', rows: profile.map((p) => row(formatStation(p.stationFt), p.elevationFt)) };
  if (profile.kind === 'elevations')
    return {
      ...base,
      mode: 'elevations',
      rows: profile.points.map((p) => row(formatStation(p.stationFt), p.elevationFt)),
    };
  if (profile.kind === 'rod-readings') {
    return {
      ...base,
      mode: 'rod-readings',
      instrumentHeightFt: String(profile.instrumentHeightFt),
      rows: profile.readings.map((r) => row(formatStation(r.stationFt), r.rodFt)),
    };
  }
  return {
    ...base,
    mode: 'segment-grades',
    startStation: formatStation(profile.startStationFt ?? 0),
    startElevationFt: String(profile.startElevationFt),
    rows: profile.segments.map((g) => row(String(g.lengthFt), g.gradePercent)),
  };
}

/** A saved check's inputs back in the form, to survey again from where that check left off (as a new check). */
export function surveyFromInputs(inputs: GradeCheckInputsInput): SurveyState {
  const s = initialSurvey(inputs.sight?.speedMph);
  const applied =
    inputs.design?.applied && !Array.isArray(inputs.profile) && inputs.profile.kind === 'elevations'
      ? inputs.profile.points
      : null;
  const surveyed = applied && inputs.design ? inputs.design.existing : inputs.profile;
  const road = inputs.road;
  const c = inputs.culvert;
  return {
    road: {
      ...s.road,
      gradePercent: road ? String(Math.abs(road.gradePercent)) : '0',
      rises: road && road.gradePercent < 0 ? 'left' : 'right',
      edgeElevationFt: str(road?.edgeElevationFt),
      edgeStation: formatStation(inputs.roadEdgeStationFt ?? 0),
      crossSlopePercent: str(inputs.roadSide?.roadCrossSlopePercent ?? road?.crossSlopePercent),
      shoulderWidthFt: str(inputs.roadSide?.shoulderWidthFt || undefined),
      shoulderSlopePercent: str(inputs.roadSide?.shoulderSlopePercent),
      sightLeftFt: str(inputs.sight?.measuredLeftFt),
      sightRightFt: str(inputs.sight?.measuredRightFt),
      movements: inputs.sight?.movements ?? 'all',
    },
    centreline: centrelineOf(surveyed),
    culvert: c
      ? {
          ...s.culvert,
          present: true,
          diameterIn: String(c.diameterIn),
          inlet: c.inlet ?? s.culvert.inlet,
          manningN: String(c.manningN),
          inletInvertFt: String(c.inletInvertFt),
          outletInvertFt: String(c.outletInvertFt),
          surfaceElevationFt: str(c.surfaceElevationFt),
          lengthFt: str(c.lengthFt),
          tailwaterDepthFt: str(c.tailwaterDepthFt),
          flow: c.drainage ? 'rational' : 'design',
          designFlowCfs: str(c.designFlowCfs),
          areaAcres: str(c.drainage?.areaAcres),
          runoffC: str(c.drainage?.runoffC),
          intensityInPerHr: str(c.drainage?.intensityInPerHr),
        }
      : s.culvert,
    geometry: {
      topWidthFt: str(inputs.geometry?.widthFt ?? inputs.design?.template?.topWidthFt),
      sideSlopeHPerV: str(inputs.design?.template?.cutSlopeHPerV ?? 2),
      flareRadiusFt: str(inputs.geometry?.flareRadiusFt),
      distanceToIntersectionFt: str(inputs.geometry?.distanceToIntersectionFt),
      distanceToPropertyLineFt: str(inputs.geometry?.distanceToPropertyLineFt),
    },
    plan: {
      rightOfWayFt: str(inputs.plan?.rightOfWayFt),
      roadWidthFt: str(inputs.plan?.roadWidthFt),
      bearingDeg: str(inputs.plan?.bearingDeg),
      intersectionSide: inputs.plan?.intersectionSide ?? '',
      intersectionName: inputs.plan?.intersectionName ?? '',
      propertyLineSide: inputs.plan?.propertyLineSide ?? '',
      culvertStation: inputs.plan?.culvertStationFt === undefined ? '' : formatStation(inputs.plan.culvertStationFt),
      culvertMaterial: inputs.plan?.culvertMaterial ?? '',
    },
    laser: {
      receiverOffsetFt: str(inputs.laser?.receiverOffsetFt ?? 6),
      stakes: (inputs.laser?.stakes ?? []).map((k) => ({
        key: newKey(),
        label: k.label,
        offsetFt: String(k.offsetFt),
        distanceFt: String(k.distanceFt),
        rodReadingFt: String(k.rodReadingFt),
      })),
    },
    apron: inputs.apron
      ? {
          checked: true,
          drivewayCrossSlopePercent: str(inputs.apron.drivewayCrossSlopePercent ?? 0),
          warpLengthFt: str(inputs.apron.warpLengthFt),
          stakeIntervalFt: str(inputs.apron.stakeIntervalFt ?? 5),
        }
      : s.apron,
    design: {
      proposed: Boolean(inputs.design),
      applied,
      targetEndElevationFt: str(inputs.design?.targetEndElevationFt),
      soil: inputs.design?.haul?.soil ?? 'loam',
      truckCuYd: str(inputs.design?.haul?.truckCuYd ?? 10),
    },
  };
}
