import { z } from 'zod';
import { parseInput } from './errors';
import { bounded, snap } from './numbers';
import { STATION_TOLERANCE_FT } from './station-tolerance';
import { profileInputSchema, normalizeParsedProfile, type ProfilePoint } from './profile';
import { designVehicleSchema, type DesignVehicle } from './rule-profile';
import { vertexEvents } from './scrape-events';
import { clearanceAt, type Ground, newCursor, type Position, type ScrapeLocation } from './scrape-position';

export type { ScrapeLocation } from './scrape-position';
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
    const change = (c.elevationFt - b.elevationFt) / (c.stationFt - b.stationFt) - (b.elevationFt - a.elevationFt) / (b.stationFt - a.stationFt);
    if (Math.abs(snap(change)) === 0) continue;
    const surveyedPastFt = end - b.stationFt;
    return surveyedPastFt < neededFt - STATION_TOLERANCE_FT / 2 ? { breakStationFt: b.stationFt, surveyedPastFt, neededFt } : undefined;
  }
  return undefined;
}

interface Worst extends Position {
  positions: number;
}

// Past this step a stretch between two samples could hold two separate low points and a local search finds only
// one; with the vertex events and the search, the answer at this step no longer depends on the step asked for.
const MAX_STEP_FT = 1;
// Low points refined by a local search, lowest first; further ones sit well clear of the worst.
const REFINED_LOW_POINTS = 16;
const SEARCH_ROUNDS = 30;
const GOLDEN = (Math.sqrt(5) - 1) / 2;

/** Golden-section search for the least clearance between two sample positions (smooth in between). */
function searchBetween(g: Ground, v: DesignVehicle, lo: number, hi: number): Position | null {
  let a = lo;
  let b = hi;
  const value = (x: number) => clearanceAt(g, v, x)?.clearanceFt ?? Infinity;
  let c = b - GOLDEN * (b - a);
  let d = a + GOLDEN * (b - a);
  let fc = value(c);
  let fd = value(d);
  for (let k = 0; k < SEARCH_ROUNDS && b - a > 1e-6; k++) {
    if (fc <= fd) {
      b = d; d = c; fd = fc; c = b - GOLDEN * (b - a); fc = value(c);
    } else {
      a = c; c = d; fc = fd; d = a + GOLDEN * (b - a); fd = value(d);
    }
  }
  return clearanceAt(g, v, fc <= fd ? c : d);
}

/** The grid and the vertex events merged in increasing order; only the events need sorting. */
function samplePositions(g: Ground, v: DesignVehicle, stepFt: number): Float64Array {
  const start = g.xs[0];
  const end = g.xs[g.xs.length - 1];
  const step = Math.min(stepFt, MAX_STEP_FT);
  const events = vertexEvents(g, v);
  const grid = Math.ceil((end - start) / step);
  const all = new Float64Array(grid + events.length);
  let m = 0;
  let e = 0;
  while (e < events.length && events[e] < start) e++;
  for (let k = 0; k < grid; k++) {
    const x = start + k * step;
    while (e < events.length && events[e] < x) all[m++] = events[e++];
    all[m++] = x;
  }
  while (e < events.length && events[e] < end) all[m++] = events[e++];
  return all.subarray(0, m);
}

/** Drives the vehicle forward along increasing x over the grid, every vertex event, and a search near each low. */
function drive(g: Ground, v: DesignVehicle, stepFt: number): Worst {
  const candidates = samplePositions(g, v, stepFt);
  const at = new Float64Array(candidates.length);
  const clear = new Float64Array(candidates.length);
  const worst: Worst = { clearanceFt: Infinity, x: g.xs[0], where: 'between-axles', ux: 1, positions: 0 };
  const keep = (p: Position | null) => {
    if (p && p.clearanceFt < worst.clearanceFt) {
      worst.clearanceFt = p.clearanceFt;
      worst.x = p.x;
      worst.where = p.where;
    }
  };
  const scratch: Position = { clearanceFt: 0, x: 0, where: 'between-axles', ux: 1 };
  const cursor = newCursor();
  let m = 0;
  for (const x of candidates) {
    if (m > 0 && x - at[m - 1] < 1e-9) continue;
    const p = clearanceAt(g, v, x, scratch, cursor);
    if (!p) break;
    at[m] = x;
    clear[m++] = p.clearanceFt;
    keep(p);
  }
  worst.positions = m;
  const lows: number[] = [];
  for (let i = 0; i < m; i++) {
    if ((i === 0 || clear[i] <= clear[i - 1]) && (i === m - 1 || clear[i] <= clear[i + 1])) lows.push(i);
  }
  lows.sort((i, j) => clear[i] - clear[j]);
  for (const i of lows.slice(0, REFINED_LOW_POINTS)) {
    if (i > 0) keep(searchBetween(g, v, at[i - 1], at[i]));
    if (i < m - 1) keep(searchBetween(g, v, at[i], at[i + 1]));
  }
  return worst;
}

export function scrapeCheckPoints(points: readonly ProfilePoint[], vehicle: DesignVehicle, stepFt: number): ScrapeResult {
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
  const into = drive({ xs, ys }, vehicle, stepFt);
  const out = drive({ xs: mxs, ys: mys }, vehicle, stepFt);
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
