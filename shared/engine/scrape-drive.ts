import type { DesignVehicle } from './rule-profile';

export type ScrapeLocation = 'between-axles' | 'front-overhang' | 'rear-overhang';

export interface Ground {
  xs: Float64Array;
  ys: Float64Array;
}

export interface Position {
  /** Clearance left at the tightest point under the body (ft); negative is a scrape. */
  clearanceFt: number;
  /** Where along the ground that tightest point is. */
  x: number;
  where: ScrapeLocation;
  /** Horizontal part of the unit vector along the body, rear to front. */
  ux: number;
}

/** Index of the segment holding x (the last one for x at or past its end). */
function segmentOf(xs: Float64Array, x: number): number {
  let lo = 0;
  let hi = xs.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (xs[mid] <= x) lo = mid;
    else hi = mid;
  }
  return lo;
}

/**
 * Where the previous position had its wheels and its rear-most vertex. Positions taken in increasing order only
 * move these forward, so each starts from the last instead of searching again; this runs for every sample.
 */
export interface Cursor {
  rx: number;
  rearSeg: number;
  frontSeg: number;
  low: number;
  ry: number;
  ux: number;
  uy: number;
}

export const newCursor = (): Cursor => ({ rx: Infinity, rearSeg: 0, frontSeg: 0, low: 0, ry: 0, ux: 1, uy: 0 });

/**
 * The body's line with the rear wheel at `rx`, written into the cursor: the front contact is the first point
 * along the ground at chord length w. False when the front wheel would be past the survey's end.
 */
export function bodyAt(g: Ground, v: DesignVehicle, rx: number, c: Cursor = newCursor()): boolean {
  const { xs, ys } = g;
  const n = xs.length;
  const w = v.wheelbaseFt;
  const w2 = w * w;
  const onward = rx >= c.rx;
  let rearSeg = onward ? c.rearSeg : segmentOf(xs, rx);
  while (rearSeg < n - 2 && xs[rearSeg + 1] <= rx) rearSeg++;
  const ry = ys[rearSeg] + ((rx - xs[rearSeg]) / (xs[rearSeg + 1] - xs[rearSeg])) * (ys[rearSeg + 1] - ys[rearSeg]);
  let frontSeg = onward ? Math.max(rearSeg, c.frontSeg) : rearSeg;
  while (frontSeg < n - 1 && (xs[frontSeg + 1] - rx) ** 2 + (ys[frontSeg + 1] - ry) ** 2 < w2) frontSeg++;
  // A fresh start finds its rear-most vertex by looking back from the rear wheel instead.
  if (!onward) c.low = -1;
  c.rx = rx;
  c.rearSeg = rearSeg;
  c.frontSeg = frontSeg;
  if (frontSeg >= n - 1) return false;
  const ax = frontSeg === rearSeg ? rx : xs[frontSeg];
  const ay = frontSeg === rearSeg ? ry : ys[frontSeg];
  const dx = xs[frontSeg + 1] - ax;
  const dy = ys[frontSeg + 1] - ay;
  const ox = ax - rx;
  const oy = ay - ry;
  const qa = dx * dx + dy * dy;
  const qb = 2 * (ox * dx + oy * dy);
  const t = (-qb + Math.sqrt(qb * qb - 4 * qa * (ox * ox + oy * oy - w2))) / (2 * qa);
  c.ry = ry;
  c.ux = (ox + t * dx) / w;
  c.uy = (oy + t * dy) / w;
  return true;
}

/**
 * The vehicle with its rear wheel on the ground at `rx`. Wheels are points on the ground line; the body is the
 * rigid chord between the two contact points, raised by the clearance, so ground above the chord eats clearance.
 * Only ground vertices and the two overhang ends can be the highest point under a straight body over a
 * piecewise-linear ground, so only those are measured. Writes into `out` and returns it; null when the front
 * wheel would be past the survey's end.
 */
export function clearanceAt(
  g: Ground,
  v: DesignVehicle,
  rx: number,
  out?: Position,
  c: Cursor = newCursor(),
): Position | null {
  if (!bodyAt(g, v, rx, c)) return null;
  const { xs, ys } = g;
  const n = xs.length;
  const w = v.wheelbaseFt;
  const { ry, ux, uy } = c;
  const clearanceFt = v.clearanceIn / 12;
  const rearEnd = -v.rearOverhangFt;
  const frontEnd = w + v.frontOverhangFt;
  const worst: Position = out ?? { clearanceFt: Infinity, x: rx, where: 'between-axles', ux };
  worst.clearanceFt = Infinity;
  worst.x = rx;
  worst.where = 'between-axles';
  worst.ux = ux;
  // Along the chord a = (P - rear) . u; height above it h = (P - rear) . (-uy, ux).
  // The last vertex behind the rear overhang's end (or the first vertex): measuring starts there.
  let low = c.low;
  if (low < 0) {
    low = c.rearSeg;
    while (low > 0 && (xs[low] - rx) * ux + (ys[low] - ry) * uy >= rearEnd) low--;
  }
  while (low < n - 1 && (xs[low + 1] - rx) * ux + (ys[low + 1] - ry) * uy < rearEnd) low++;
  c.low = low;
  let prevA = NaN;
  let prevH = NaN;
  for (let i = low; i < n; i++) {
    const px = xs[i] - rx;
    const py = ys[i] - ry;
    const a = px * ux + py * uy;
    const h = py * ux - px * uy;
    if (a < rearEnd) {
      prevA = a;
      prevH = h;
      continue;
    }
    if (i > low && prevA < rearEnd) {
      // The rear overhang's end lies between the previous vertex and this one.
      const f = (rearEnd - prevA) / (a - prevA);
      const hTip = prevH + f * (h - prevH);
      if (clearanceFt - hTip < worst.clearanceFt) {
        worst.clearanceFt = clearanceFt - hTip;
        worst.x = xs[i - 1] + f * (xs[i] - xs[i - 1]);
        worst.where = 'rear-overhang';
      }
    }
    let hAt = h;
    let aAt = a;
    let xAt = xs[i];
    if (a > frontEnd) {
      if (i === low) break;
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
  return worst;
}

export interface Worst extends Position {
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
      b = d;
      d = c;
      fd = fc;
      c = b - GOLDEN * (b - a);
      fc = value(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + GOLDEN * (b - a);
      fd = value(d);
    }
  }
  return clearanceAt(g, v, fc <= fd ? c : d);
}

/** The lowest local minima seen so far, each with the samples either side of it, lowest first. */
class Lows {
  readonly items: { value: number; lo: number; at: number; hi: number }[] = [];

  offer(value: number, lo: number, at: number, hi: number) {
    const items = this.items;
    if (items.length === REFINED_LOW_POINTS && value >= items[items.length - 1].value) return;
    let i = items.length;
    while (i > 0 && items[i - 1].value > value) i--;
    items.splice(i, 0, { value, lo, at, hi });
    if (items.length > REFINED_LOW_POINTS) items.pop();
  }
}

/**
 * Drives the vehicle forward along increasing x over the grid merged with the vertex events (sorted), keeping the
 * lowest local minima, then searches between the samples either side of each of them. In the same module as
 * clearanceAt because it calls it for every sample.
 */
export function drive(g: Ground, v: DesignVehicle, stepFt: number, events: Float64Array): Worst {
  const start = g.xs[0];
  const end = g.xs[g.xs.length - 1];
  const step = Math.min(stepFt, MAX_STEP_FT);
  const worst: Worst = { clearanceFt: Infinity, x: start, where: 'between-axles', ux: 1, positions: 0 };
  const keep = (p: Position | null) => {
    if (p && p.clearanceFt < worst.clearanceFt) {
      worst.clearanceFt = p.clearanceFt;
      worst.x = p.x;
      worst.where = p.where;
    }
  };
  const scratch: Position = { clearanceFt: 0, x: 0, where: 'between-axles', ux: 1 };
  const cursor = newCursor();
  const lows = new Lows();
  // The last two samples, to tell a local minimum once the next one is known.
  let x1 = NaN;
  let c1 = Infinity;
  let x2 = NaN;
  let c2 = Infinity;
  let e = 0;
  while (e < events.length && events[e] < start) e++;
  for (let k = 0; ;) {
    const gridX = start + k * step;
    const fromGrid = gridX < end && !(e < events.length && events[e] < gridX);
    const x = fromGrid ? gridX : e < events.length && events[e] < end ? events[e] : NaN;
    if (Number.isNaN(x)) break;
    if (fromGrid) k++;
    else e++;
    if (x - x2 < 1e-9) continue;
    const p = clearanceAt(g, v, x, scratch, cursor);
    if (!p) break;
    worst.positions++;
    keep(p);
    if (c2 <= c1 && c2 <= p.clearanceFt) lows.offer(c2, Number.isNaN(x1) ? x2 : x1, x2, x);
    x1 = x2;
    c1 = c2;
    x2 = x;
    c2 = p.clearanceFt;
  }
  // The last sample is a low when nothing after it is lower.
  if (c2 <= c1) lows.offer(c2, Number.isNaN(x1) ? x2 : x1, x2, x2);
  for (const low of lows.items) {
    if (low.lo < low.at) keep(searchBetween(g, v, low.lo, low.at));
    if (low.at < low.hi) keep(searchBetween(g, v, low.at, low.hi));
  }
  return worst;
}
