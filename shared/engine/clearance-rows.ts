import type { ProfilePoint } from './profile';
import type { DesignVehicle } from './rule-profile';

export interface ClearanceBudget {
  vehicle: DesignVehicle;
  /** Share of the clearance the rows at vertex i may use: 1 at first, lowered where the exact check scraped. */
  share: Float64Array;
  /** Fixed ground before the first design station (the road side), which the vehicle drives over first. */
  before?: readonly ProfilePoint[];
}

/** sum(k * z[station]) <= upper, over design elevations by station index. */
export interface ClearanceRow {
  terms: [number, number][];
  upper: number;
  /** The vertex whose share sets the upper limit. */
  vertex: number;
  /** The road side's fixed part of the row, already taken off `upper`: the limit is (clearance x share) - fixedFt. */
  fixedFt: number;
}

/** z at station s as a weighted pair of neighbouring stations, or null off the profile. */
function at(x: readonly number[], s: number): [number, number][] | null {
  const n = x.length;
  if (s < x[0] - 1e-9 || s > x[n - 1] + 1e-9) return null;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (x[mid] <= s) lo = mid;
    else hi = mid;
  }
  const t = Math.min(1, Math.max(0, (s - x[lo]) / (x[hi] - x[lo])));
  return [
    [lo, 1 - t],
    [hi, t],
  ];
}

const scaled = (terms: [number, number][] | null, k: number): [number, number][] =>
  (terms ?? []).map(([i, w]) => [i, w * k]);

/**
 * The clearance at each vertex, linear in the design elevations (small-angle geometry, horizontal distances),
 * for the vehicle positions where a break at that vertex costs the most:
 * - crest: the vertex midway between the wheels, where one break of A lifts the ground A·W/4 into the body;
 * - sag: a wheel on the vertex and the overhang L reaching over the ground beyond it, which a single break of A
 *   raises by L·A above the body's line. Either overhang can lead (driving in or out), so the longer is used on
 *   both sides.
 * Because the body's line runs through the other wheel wherever it stands, a break spread into a short curve
 * is measured as it is, which is what lets the design clear with a transition rather than a flatter break.
 * The exact scrape check then confirms the design, positions in between included.
 */
export function clearanceRows(design: readonly number[], budget: ClearanceBudget): ClearanceRow[] {
  const before = budget.before ?? [];
  const fixed = before.length;
  // Stations over the road side and the design together; the road side's elevations are constants.
  const x = [...before.map((p) => p.stationFt), ...design];
  const rows: ClearanceRow[] = [];
  for (const row of rowsOver(x, budget, fixed)) {
    let fixedFt = 0;
    const terms: [number, number][] = [];
    for (const [i, k] of row.terms) {
      if (i < fixed) fixedFt += k * before[i].elevationFt;
      else terms.push([i - fixed, k]);
    }
    // A row on the road side alone is nothing the design can change.
    if (terms.length > 0)
      rows.push({ terms, upper: row.upper - fixedFt, vertex: Math.max(0, row.vertex - fixed), fixedFt });
  }
  return rows;
}

function rowsOver(x: readonly number[], budget: ClearanceBudget, fixed: number): ClearanceRow[] {
  const v = budget.vehicle;
  const c = v.clearanceIn / 12;
  const w = v.wheelbaseFt;
  const overhang = Math.max(v.frontOverhangFt, v.rearOverhangFt);
  const rows: ClearanceRow[] = [];
  for (let i = 1; i < x.length - 1; i++) {
    const limit = c * budget.share[Math.max(0, i - fixed)];
    const here: [number, number][] = [[i, 1]];
    const left = at(x, x[i] - w / 2);
    const right = at(x, x[i] + w / 2);
    if (left && right)
      rows.push({
        terms: [...here, ...scaled(left, -0.5), ...scaled(right, -0.5)],
        upper: limit,
        vertex: i,
        fixedFt: 0,
      });
    if (overhang <= 0) continue;
    for (const side of [1, -1]) {
      // Wheel at x_i, the other wheel W behind it, the overhang's end L beyond: z(end) - z_i - (L/W)(z_i - z(other)) <= c.
      const other = at(x, x[i] - side * w);
      const end = at(x, x[i] + side * overhang);
      if (!other || !end) continue;
      const k = overhang / w;
      rows.push({ terms: [...scaled(end, 1), [i, -1 - k], ...scaled(other, k)], upper: limit, vertex: i, fixedFt: 0 });
    }
  }
  return rows;
}
