import type {
  ApronSummary,
  AsBuiltReadingResult,
  AsBuiltStatus,
  CutFillAtStation,
  LaserWarp,
  PlaneSetting,
  ProfilePoint,
  RuleProfile,
  StakeResult,
} from '../engine';
import type { ProfileChartInput } from '../charts/profile-chart';
import type { PlanViewInput } from '../charts/plan-view';
import type { RequestStatus } from '../workflow/statuses';
import type { AsBuiltReadingInput } from './crew-inputs';

/** The yard the crews drive from, set by the owner; distances on the board are measured from it. */
export interface Yard {
  label: string;
  lat: number;
  lng: number;
}

export interface PermitView {
  reference: string | null;
  conditions: string | null;
  decidedOn: string | null;
  expiresOn: string | null;
}

export interface EarthworkEstimate {
  cutCuYd: number;
  fillCuYd: number;
  /** What leaves or arrives by truck once cut is reused as fill: + haul away, - bring in (loose cu yd). */
  netLooseCuYd: number;
  truckCuYd: number;
  truckLoads: number;
  basis: string;
}

export interface Wanted {
  timing: string;
  label: string;
  wantedBy: string | null;
}

export interface BoardJob {
  requestId: string;
  reference: string;
  version: number;
  siteAddress: string;
  roadName: string;
  jurisdictionName: string | null;
  permit: PermitView;
  check: { summary: string; passed: boolean } | null;
  earthwork: EarthworkEstimate | null;
  wanted: Wanted;
  releasedAt: string;
  distanceMiles: number | null;
}

export interface BoardView {
  sort: 'date' | 'distance';
  yard: Yard | null;
  jobs: BoardJob[];
}

export interface MyJob {
  requestId: string;
  reference: string;
  version: number;
  status: RequestStatus;
  siteAddress: string;
  roadName: string;
  applicantName: string;
  wanted: Wanted;
  permit: PermitView;
  acceptedAt: string | null;
  scheduledFor: string | null;
  startedAt: string | null;
  builtAt: string | null;
  lastAsBuilt: { passed: boolean; createdAt: string } | null;
  sentBackNote: string | null;
}

export interface CulvertSheet {
  diameterIn: number;
  lengthFt: number | null;
  lengthIsMinimum: boolean;
  inletInvertFt: number;
  outletInvertFt: number;
  coverIn: number | null;
  slopePercent: number | null;
  /** Which control sets the headwater, in words; null without a design flow (or for checks saved before). */
  headwaterText: string | null;
}

export interface LaserSheet {
  first: PlaneSetting;
  second: PlaneSetting;
  /** Set from stakes between the setups where the driveway's cross slope differs from the road's. */
  warp: LaserWarp | null;
  receiverOffsetFt: number;
  landingLengthFt: number;
  stakes: (StakeResult & { offsetFt: number; distanceFt: number; rodReadingFt: number })[];
}

export interface FieldSheetView {
  job: {
    requestId: string;
    reference: string;
    status: RequestStatus;
    version: number;
    siteAddress: string;
    roadName: string;
    applicantName: string;
    crewId: string | null;
    crewName: string | null;
    scheduledFor: string | null;
  };
  access: {
    parcelNumber: string;
    roadOwner: string;
    postedSpeedMph: number | null;
    whereText: string;
    notes: string;
    lat: number | null;
    lng: number | null;
  };
  permit: PermitView & { authority: string | null; jurisdictionName: string | null };
  check: { number: number; summary: string; passed: boolean; ruleProfileLabel: string; engineVersion: string } | null;
  rules: {
    landingLengthFt: number;
    landingMinPercent: number;
    landingMaxPercent: number;
    maxGradePercent: number;
  } | null;
  laser: LaserSheet | null;
  culvert: CulvertSheet | null;
  /** The warped apron's edges and the warp stakes; null when the check did not take the apron. */
  apron: ApronSummary | null;
  /** `chart`: what is built over the ground as surveyed, drawn by shared/charts as on the check screen and in the report. */
  design: {
    points: ProfilePoint[];
    existing: ProfilePoint[] | null;
    cutFill: CutFillAtStation[];
    chart: ProfileChartInput;
  } | null;
  /** The entrance seen from above, drawn by shared/charts as on the check screen and in the permit packet. */
  plan: PlanViewInput | null;
  earthwork: EarthworkEstimate | null;
  cautions: string[];
}

export interface AsBuiltSetView {
  id: string;
  readings: AsBuiltReadingInput[];
  results: AsBuiltReadingResult[];
  status: AsBuiltStatus;
  passed: boolean;
  note: string;
  crewName: string;
  createdAt: string;
  /** The earlier set this one corrects, when it was edited from one. */
  replacesSetId: string | null;
}

/** What the as-built screen needs to check each reading in the browser exactly as the server will. */
export interface AsBuiltPageView {
  job: { requestId: string; reference: string; status: RequestStatus; version: number; siteAddress: string };
  ruleProfile: RuleProfile;
  ruleProfileLabel: string;
  design: ProfilePoint[] | null;
  roadEdgeStationFt: number;
  sets: AsBuiltSetView[];
}
