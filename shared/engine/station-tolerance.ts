/**
 * The one station tolerance of the engine. Field stations are taped and typed to a hundredth of a foot, so two
 * stations less than a hundredth apart are not two surveyed places, and a sum such as 0.1 + 0.2 must not fall on
 * the wrong side of a boundary because of binary rounding. The profile checks, the as-built check and the design
 * model all compare stations through these helpers.
 */
export const STATION_TOLERANCE_FT = 0.01;

/** Elevations are read to the same hundredth; two shots at one station that agree this closely are one shot. */
export const SURVEY_ELEVATION_PRECISION_FT = 0.01;

// Binary floating noise on typed hundredths is around 1e-12 ft; this keeps "exactly a hundredth apart" distinct.
const FLOAT_SLACK_FT = 1e-9;
const HALF_TOLERANCE_FT = STATION_TOLERANCE_FT / 2;

/** Reads as the same station at the survey's precision (rounds to the same hundredth). */
export const sameStation = (a: number, b: number): boolean => Math.abs(a - b) < HALF_TOLERANCE_FT;

/** Strictly before `boundary`, by more than the survey could mean as "at" it. */
export const stationBefore = (station: number, boundary: number): boolean => station < boundary - HALF_TOLERANCE_FT;

/** At `boundary` or past it, at the survey's precision. */
export const stationAtOrAfter = (station: number, boundary: number): boolean => !stationBefore(station, boundary);

/** Strictly past `boundary` at the survey's precision. */
export const stationAfter = (station: number, boundary: number): boolean => station > boundary + HALF_TOLERANCE_FT;

/** Two shots closer than the tolerance cannot both be surveyed places: they are merged or refused. */
export const tooCloseToSurvey = (a: number, b: number): boolean =>
  Math.abs(a - b) < STATION_TOLERANCE_FT - FLOAT_SLACK_FT;
