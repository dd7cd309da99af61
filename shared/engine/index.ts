export { ENGINE_VERSION } from './version';
export { EngineInputError, unlessRefused, type EngineIssue } from './errors';
export { formatStation, parseStation } from './station';
export { displayLength, displaySmallLength, type DisplayUnits } from './units';
export {
  ruleProfileSchema,
  designVehicleSchema,
  passengerCarPreset,
  commonRuralTemplate,
  inspectionDefault,
  inspectionRequired,
  inspectionSettings,
  type InspectionSetting,
  type RuleProfile,
  type RuleProfileInput,
  type DesignVehicle,
} from './rule-profile';
export {
  profileInputSchema,
  normalizeProfile,
  segmentGrades,
  gradeBreaks,
  elevationAt,
  type ProfileInput,
  type ProfilePoint,
  type ProfileSegment,
  type GradeBreak,
} from './profile';
export {
  stoppingSightDistance,
  stoppingSightDistanceInputSchema,
  intersectionSightDistance,
  intersectionSightDistanceInputSchema,
  approachGradeReadings,
  type ApproachGradeReading,
  type StoppingSightDistanceInput,
  type IntersectionSightDistanceInput,
  type DesignVehicleClass,
} from './sight-distance';
export {
  pipeFullFlow,
  pipeFullFlowInputSchema,
  rationalFlow,
  rationalFlowInputSchema,
  type PipeFullFlowInput,
  type RationalFlowInput,
} from './pipe-flow';
export {
  inletControlHeadwater,
  inletControlHeadwaterInputSchema,
  inletTypes,
  criticalSpecificHeadFt,
  type InletType,
  type InletControlHeadwaterInput,
} from './inlet-control';
export {
  outletControlHeadwater,
  outletControlHeadwaterInputSchema,
  entranceLossCoefficients,
  type OutletControlHeadwaterInput,
  type OutletControlResult,
} from './outlet-control';
export {
  earthworkVolume,
  earthworkVolumeInputSchema,
  bankToLoose,
  bankToLooseInputSchema,
  bankToCompacted,
  bankToCompactedInputSchema,
  compactedToBank,
  compactedToBankInputSchema,
  truckLoads,
  truckLoadsInputSchema,
  soilFactors,
  type EarthworkSection,
  type EarthworkSegment,
  type EarthworkVolumeInput,
} from './earthwork';
export {
  earthworkFromProfiles,
  earthworkFromProfilesInputSchema,
  crossSectionAreas,
  sectionTemplateSchema,
  type EarthworkFromProfilesInput,
  type SectionTemplate,
  type StationSection,
} from './cross-sections';
export {
  scrapeCheck,
  scrapeCheckInputSchema,
  type ScrapeCheckInput,
  type ScrapeResult,
  type ScrapeLocation,
  type DriveDirection,
} from './scrape';
export { type Finding, type FindingStatus } from './findings';
export { culvertInputSchema, type CulvertInput, type CulvertSummary } from './culvert-checks';
export {
  sightInputSchema,
  geometryInputSchema,
  type SightInput,
  type GeometryInput,
  type SightSummary,
} from './site-checks';
export { type CheckSummary } from './summary';
export { roadSideInputSchema, type RoadSideInput } from './road-edge';
export { apronInputSchema, apronWarpLength, type ApronInput, type ApronSummary, type WarpStake } from './apron-edges';
export {
  checkEntrance,
  checkEntranceInputSchema,
  type CheckEntranceInput,
  type EntranceReport,
} from './check-entrance';
export {
  proposeProfile,
  proposeProfileInputSchema,
  type ProposeProfileInput,
  type ProposedProfile,
  type CutFillAtStation,
} from './propose-profile';
export {
  laserSetup,
  laserSetupInputSchema,
  laserStepAtChangeFt,
  type LaserSetupInput,
  type LaserWarp,
  type PlaneSetting,
  type StakeResult,
} from './laser';
export {
  classifyAsBuiltReading,
  classifyAsBuiltReadingInputSchema,
  checkAsBuilt,
  checkAsBuiltInputSchema,
  type AsBuiltStatus,
  type AsBuiltReadingResult,
  type CheckAsBuiltInput,
} from './as-built';
export { gradePercentToDegrees, breakOverAngleDeg, breakOverAngleInputSchema } from './angles';
export { SAFETY_CAUTIONS } from './cautions';
export {
  STATION_TOLERANCE_FT,
  SURVEY_ELEVATION_PRECISION_FT,
  sameStation,
  stationBefore,
  stationAtOrAfter,
  stationAfter,
  tooCloseToSurvey,
} from './station-tolerance';
