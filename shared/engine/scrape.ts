import { z } from 'zod';
import { parseInput } from './errors';
import { bounded, snap } from './numbers';
import { STATION_TOLERANCE_FT } from './station-tolerance';
import { profileInputSchema, normalizeParsedProfile, type ProfilePoint } from './profile';
import { designVehicleSchema, type DesignVehicle } from './rule-profile';
import { drive, type ScrapeLocation } from './scrape-drive';
import { vertexEvents } from './scrape-events';

export type { ScrapeLocation } from './scrape-drive';
export type DriveDirection = 'into-property' | 'out-of-property';

export const scrapeCheckInputSchema = z.object({
  profile: profileInputSchema,
  vehicle: designVehicleSchema,
  stepFt: bounded(0.01, 10).default(0.1),
});
export type ScrapeCheckInput = z.input<typeof scrapeCheckInputSchema>;

export interface ScrapeResult {
  minClearanceIn: number;
  atStationFt: number;
  where: ScrapeLocation;
  direction: DriveDirection;
  passes: boolean;
  /** Vehicle positions tried; 0 when the profile is shorter than the wheelbase. */
  positionsChecked: number;
  /** Set when the survey ends before the whole vehicle has crossed its last grade break, either way. */
  partialCoverage?: { breakStationFt: number; surveyedPastFt: number; neededFt: number };
}

/**
 * Driving in, the rear overhang clears the last break only once the front wheel is a wheelbase and a rear overhang
 * past it; driving out, the front overhang sweeps it only if it starts that far back. Short of the longer of the
 * two, part of the crossing was never tried.
 */
function coverageAtEnd(points: readonly ProfilePoint[], v: DesignVehicle): ScrapeResult['partialCoverage'] {
  const neededFt = v.wheelbaseFt + Math.max(v.frontOverhangFt, v.rearOverhangFt);
  const end = points[points.length - 1].stationFt;
  for (let i = points.length - 2; i >= 1; i--) {
    const [a, b, c] = [points[i - 1], points[i], points[i + 1]];
    const change =
      (c.elevationFt - b.elevationFt) / (c.stationFt - b.stationFt) -
      (b.elevationFt - a.elevationFt) / (b.stationFt - a.stationFt);
    if (Math.abs(snap(change)) === 0) continue;
    const surveyedPastFt = end - b.stationFt;
    return surveyedPastFt < neededFt - STATION_TOLERANCE_FT / 2
      ? { breakStationFt: b.stationFt, surveyedPastFt, neededFt }
      : undefined;
  }
  return undefined;
}

export function scrapeCheckPoints(
  points: readonly ProfilePoint[],
  vehicle: DesignVehicle,
  stepFt: number,
): ScrapeResult {
  const n = points.length;
  const xs = new Float64Array(n);
  const ys = new Float64Array(n);
  const mxs = new Float64Array(n);
  const mys = new Float64Array(n);
  const last = points[n - 1].stationFt;
  for (let i = 0; i < n; i++) {
    xs[i] = points[i].stationFt;
    ys[i] = points[i].elevationFt;
    // Driving out is driving the mirrored profile forward.
    mxs[i] = last - points[n - 1 - i].stationFt;
    mys[i] = points[n - 1 - i].elevationFt;
  }
  const into = drive({ xs, ys }, vehicle, stepFt, vertexEvents({ xs, ys }, vehicle));
  const out = drive({ xs: mxs, ys: mys }, vehicle, stepFt, vertexEvents({ xs: mxs, ys: mys }, vehicle));
  const positions = into.positions + out.positions;
  if (positions === 0) {
    return {
      minClearanceIn: vehicle.clearanceIn,
      atStationFt: points[0].stationFt,
      where: 'between-axles',
      direction: 'into-property',
      passes: true,
      positionsChecked: 0,
    };
  }
  const partialCoverage = coverageAtEnd(points, vehicle);
  const useOut = out.clearanceFt < into.clearanceFt;
  const worst = useOut ? out : into;
  const minClearanceIn = Math.round(worst.clearanceFt * 12 * 1e9) / 1e9;
  return {
    minClearanceIn,
    atStationFt: useOut ? last - worst.x : worst.x,
    where: worst.where,
    direction: useOut ? 'out-of-property' : 'into-property',
    passes: minClearanceIn >= 0,
    positionsChecked: positions,
    ...(partialCoverage ? { partialCoverage } : {}),
  };
}

/** Smallest clearance under the design vehicle driven both into and out of the property. */
export function scrapeCheck(input: ScrapeCheckInput): ScrapeResult {
  const p = parseInput(scrapeCheckInputSchema, input);
  return scrapeCheckPoints(normalizeParsedProfile(p.profile, 'profile'), p.vehicle, p.stepFt);
}
