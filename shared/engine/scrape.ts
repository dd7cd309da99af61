import { z } from 'zod';
import { parseInput } from './errors';
import { bounded } from './numbers';
import { profileInputSchema, normalizeParsedProfile, type ProfilePoint } from './profile';
import { designVehicleSchema, type DesignVehicle } from './rule-profile';

export type ScrapeLocation = 'between-axles' | 'front-overhang' | 'rear-overhang';
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
}

interface Worst {
  clearanceFt: number;
  x: number;
  where: ScrapeLocation;
  positions: number;
}

/**
 * Drives the vehicle forward along increasing x. Wheels are points on the ground line; the body is the rigid
 * chord between the two contact points, raised by the clearance, so ground above the chord eats clearance.
 * Only ground vertices and the two overhang ends can be the highest point under a straight body over a
 * piecewise-linear ground, so only those are measured.
 */
function drive(xs: Float64Array, ys: Float64Array, v: DesignVehicle, stepFt: number): Worst {
  const n = xs.length;
  const w = v.wheelbaseFt;
  const w2 = w * w;
  const clearanceFt = v.clearanceIn / 12;
  const worst: Worst = { clearanceFt: Infinity, x: xs[0], where: 'between-axles', positions: 0 };
  let rearSeg = 0;
  let frontSeg = 0;
  let lowVertex = 0;
  const end = xs[n - 1];
  for (let k = 0; ; k++) {
    const rx = xs[0] + k * stepFt;
    if (rx >= end) break;
    while (rearSeg < n - 2 && xs[rearSeg + 1] <= rx) rearSeg++;
    const ry = ys[rearSeg] + ((rx - xs[rearSeg]) / (xs[rearSeg + 1] - xs[rearSeg])) * (ys[rearSeg + 1] - ys[rearSeg]);
    if (frontSeg < rearSeg) frontSeg = rearSeg;
    // First point along the ground at chord length w from the rear contact.
    while (frontSeg < n - 1 && (xs[frontSeg + 1] - rx) ** 2 + (ys[frontSeg + 1] - ry) ** 2 < w2) frontSeg++;
    if (frontSeg >= n - 1) break;
    const ax = frontSeg === rearSeg ? rx : xs[frontSeg];
    const ay = frontSeg === rearSeg ? ry : ys[frontSeg];
    const dx = xs[frontSeg + 1] - ax;
    const dy = ys[frontSeg + 1] - ay;
    const ox = ax - rx;
    const oy = ay - ry;
    const qa = dx * dx + dy * dy;
    const qb = 2 * (ox * dx + oy * dy);
    const qc = ox * ox + oy * oy - w2;
    const t = (-qb + Math.sqrt(qb * qb - 4 * qa * qc)) / (2 * qa);
    const ux = (ox + t * dx) / w;
    const uy = (oy + t * dy) / w;
    worst.positions++;
    const rearEnd = -v.rearOverhangFt;
    const frontEnd = w + v.frontOverhangFt;
    // Along the chord a = (P - rear) . u; height above it h = (P - rear) . (-uy, ux). Written out inline
    // because this loop runs for every step in both directions.
    while (lowVertex < n - 1 && (xs[lowVertex + 1] - rx) * ux + (ys[lowVertex + 1] - ry) * uy < rearEnd) lowVertex++;
    let prevA = NaN;
    let prevH = NaN;
    for (let i = lowVertex; i < n; i++) {
      const px = xs[i] - rx;
      const py = ys[i] - ry;
      const a = px * ux + py * uy;
      const h = py * ux - px * uy;
      let hAt = h;
      let aAt = a;
      let xAt = xs[i];
      if (a < rearEnd) {
        prevA = a;
        prevH = h;
        continue;
      }
      if (i > lowVertex && prevA < rearEnd) {
        // The rear overhang's end lies between the previous vertex and this one.
        const f = (rearEnd - prevA) / (a - prevA);
        const hTip = prevH + f * (h - prevH);
        if (clearanceFt - hTip < worst.clearanceFt) {
          worst.clearanceFt = clearanceFt - hTip;
          worst.x = xs[i - 1] + f * (xs[i] - xs[i - 1]);
          worst.where = 'rear-overhang';
        }
      }
      if (a > frontEnd) {
        if (i === lowVertex) break;
        const f = (frontEnd - prevA) / (a - prevA);
        hAt = prevH + f * (h - prevH);
        aAt = frontEnd;
        xAt = xs[i - 1] + f * (xs[i] - xs[i - 1]);
      }
      if (clearanceFt - hAt < worst.clearanceFt) {
        worst.clearanceFt = clearanceFt - hAt;
        worst.x = xAt;
        worst.where = aAt < 0 ? 'rear-overhang' : aAt > w ? 'front-overhang' : 'between-axles';
      }
      if (a > frontEnd) break;
      prevA = a;
      prevH = h;
    }
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
  const into = drive(xs, ys, vehicle, stepFt);
  const out = drive(mxs, mys, vehicle, stepFt);
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
  };
}

/** Smallest clearance under the design vehicle driven both into and out of the property. */
export function scrapeCheck(input: ScrapeCheckInput): ScrapeResult {
  const p = parseInput(scrapeCheckInputSchema, input);
  return scrapeCheckPoints(normalizeParsedProfile(p.profile, 'profile'), p.vehicle, p.stepFt);
}
