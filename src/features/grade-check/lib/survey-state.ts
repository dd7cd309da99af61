import type { ProfilePoint } from '@shared/engine';
import type { Soil } from '@shared/charts/cut-fill-table';

export type CentrelineMode = 'elevations' | 'rod-readings' | 'segment-grades';
export interface CentrelineRow {
  key: string;
  station: string;
  value: string;
}
export interface StakeRow {
  key: string;
  label: string;
  offsetFt: string;
  distanceFt: string;
  rodReadingFt: string;
}

/** The survey as typed: text everywhere, so a half-typed number stays on screen with its error beside it. */
export interface SurveyState {
  road: {
    gradePercent: string;
    rises: 'right' | 'left';
    edgeElevationFt: string;
    edgeStation: string;
    crossSlopePercent: string;
    shoulderWidthFt: string;
    shoulderSlopePercent: string;
    speedMph: string;
    sightLeftFt: string;
    sightRightFt: string;
    movements: 'all' | 'right-only';
  };
  centreline: {
    mode: CentrelineMode;
    instrumentHeightFt: string;
    startStation: string;
    startElevationFt: string;
    rows: CentrelineRow[];
  };
  culvert: {
    present: boolean;
    diameterIn: string;
    inlet: string;
    manningN: string;
    inletInvertFt: string;
    outletInvertFt: string;
    inletDitchDepthFt: string;
    outletDitchDepthFt: string;
    tailwaterDepthFt: string;
    surfaceElevationFt: string;
    lengthFt: string;
    flow: 'design' | 'rational';
    designFlowCfs: string;
    areaAcres: string;
    runoffC: string;
    intensityInPerHr: string;
  };
  geometry: {
    topWidthFt: string;
    sideSlopeHPerV: string;
    flareRadiusFt: string;
    distanceToIntersectionFt: string;
    distanceToPropertyLineFt: string;
  };
  /** What only the plan view and the permit packet read; '' for a side or material not given. */
  plan: {
    rightOfWayFt: string;
    roadWidthFt: string;
    bearingDeg: string;
    intersectionSide: '' | 'left' | 'right';
    intersectionName: string;
    propertyLineSide: '' | 'left' | 'right';
    culvertStation: string;
    culvertMaterial: string;
  };
  laser: { receiverOffsetFt: string; stakes: StakeRow[] };
  apron: { checked: boolean; drivewayCrossSlopePercent: string; warpLengthFt: string; stakeIntervalFt: string };
  design: {
    proposed: boolean;
    applied: ProfilePoint[] | null;
    targetEndElevationFt: string;
    soil: Soil;
    truckCuYd: string;
  };
}

let counter = 0;
export const newKey = () => `k${++counter}`;
export const emptyRow = (): CentrelineRow => ({ key: newKey(), station: '', value: '' });

export function initialSurvey(speedMph?: number | null): SurveyState {
  return {
    road: {
      gradePercent: '0',
      rises: 'right',
      edgeElevationFt: '',
      edgeStation: '0+00',
      crossSlopePercent: '',
      shoulderWidthFt: '',
      shoulderSlopePercent: '',
      speedMph: speedMph ? String(speedMph) : '',
      sightLeftFt: '',
      sightRightFt: '',
      movements: 'all',
    },
    centreline: {
      mode: 'elevations',
      instrumentHeightFt: '',
      startStation: '0+00',
      startElevationFt: '',
      rows: [emptyRow(), emptyRow(), emptyRow()],
    },
    culvert: {
      present: false,
      diameterIn: '18',
      inlet: 'cmp-projecting',
      manningN: '0.024',
      inletInvertFt: '',
      outletInvertFt: '',
      inletDitchDepthFt: '',
      outletDitchDepthFt: '',
      tailwaterDepthFt: '',
      surfaceElevationFt: '',
      lengthFt: '',
      flow: 'design',
      designFlowCfs: '',
      areaAcres: '',
      runoffC: '',
      intensityInPerHr: '',
    },
    geometry: {
      topWidthFt: '12',
      sideSlopeHPerV: '2',
      flareRadiusFt: '',
      distanceToIntersectionFt: '',
      distanceToPropertyLineFt: '',
    },
    plan: {
      rightOfWayFt: '',
      roadWidthFt: '',
      bearingDeg: '',
      intersectionSide: '',
      intersectionName: '',
      propertyLineSide: '',
      culvertStation: '',
      culvertMaterial: '',
    },
    laser: { receiverOffsetFt: '6', stakes: [] },
    apron: { checked: false, drivewayCrossSlopePercent: '0', warpLengthFt: '', stakeIntervalFt: '5' },
    design: { proposed: false, applied: null, targetEndElevationFt: '', soil: 'loam', truckCuYd: '10' },
  };
}

export const centrelineColumns: Record<
  CentrelineMode,
  { station: string; value: string; stationField: string; valueField: string; list: string }
> = {
  elevations: {
    station: 'Station',
    value: 'Elevation (ft)',
    stationField: 'stationFt',
    valueField: 'elevationFt',
    list: 'points',
  },
  'rod-readings': {
    station: 'Station',
    value: 'Rod reading (ft)',
    stationField: 'stationFt',
    valueField: 'rodFt',
    list: 'readings',
  },
  'segment-grades': {
    station: 'Length (ft)',
    value: 'Grade (%)',
    stationField: 'lengthFt',
    valueField: 'gradePercent',
    list: 'segments',
  },
};
