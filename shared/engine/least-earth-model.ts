import type { LinearModel } from './design-solver';
import type { ProfilePoint } from './profile';
import type { RuleProfile } from './rule-profile';
import { SparseRows } from './sparse-rows';
import { STATION_TOLERANCE_FT } from './tolerance';
import { clearanceRows, type ClearanceBudget } from './clearance-rows';

/** The grades one segment may take when it rises away from the road and when it falls; null when it cannot. */
export interface SegmentRanges {
  rise: { lo: number; hi: number } | null;
  fall: { lo: number; hi: number } | null;
  inLanding: boolean;
}

/**
 * The solver meets its rows to about 1e-9 ft; pulling each grade limit in by this much (a ten-thousandth of a
 * percent) keeps its answer on the right side of the exact check that follows. A design that must sit exactly
 * on a limit is solved again with no margin (see design-search.ts).
 */
export const GRADE_MARGIN = 1e-6;

/**
 * A segment "rises" when its grade is at least zero (or the drainage minimum) and "falls" when it is at most
 * zero (or minus the minimum). The landing is graded as the check grades it: a segment starting before the
 * landing's end is landing, and the drainage minimum applies only beyond it.
 */
export function segmentRanges(points: readonly ProfilePoint[], rules: RuleProfile): SegmentRanges[] {
  const landingEnd = points[0].stationFt + rules.landing.lengthFt;
  const max = rules.maxGradePercent / 100;
  const drain = (rules.minDrainageGradePercent ?? 0) / 100;
  const ranges: SegmentRanges[] = [];
  for (let i = 0; i < points.length - 1; i++) {
    const inLanding = points[i].stationFt < landingEnd - STATION_TOLERANCE_FT;
    const lo = inLanding ? rules.landing.minGradePercent / 100 : -max;
    const hi = inLanding ? rules.landing.maxGradePercent / 100 : max;
    const m = inLanding ? 0 : drain;
    const rise = { lo: Math.max(lo, m), hi };
    const fall = { lo, hi: Math.min(hi, -m) };
    ranges.push({ rise: rise.lo <= rise.hi ? rise : null, fall: fall.lo <= fall.hi ? fall : null, inLanding });
  }
  return ranges;
}

/**
 * How segment directions are decided: 'choose' leaves them to the mixed-integer search, 'relaxed' lets each
 * lie between rising and falling (a linear programme whose cost is a lower bound), and a number k fixes the
 * first k segments rising and the rest falling.
 */
export type Directions = 'choose' | 'relaxed' | number;

export interface DesignModel {
  model: LinearModel;
  read(x: Float64Array): ProfilePoint[];
}

/**
 * Columns: design elevation z_i, earth moved u_i >= |z_i - e_i|, and a 0/1 direction r_i per segment (1 rises,
 * 0 falls). Directions are non-increasing along the profile, so the design climbs and then falls at most once:
 * a profile shaped like that has no low point for water to stand in, on the driveway or against the road.
 * Every grade, break and clearance limit is linear in z, so the whole design is one mixed-integer programme.
 */
export function buildLeastEarthModel(
  points: readonly ProfilePoint[],
  ranges: readonly SegmentRanges[],
  rules: RuleProfile,
  roadEdgeFt: number,
  targetEndFt: number | undefined,
  budget: ClearanceBudget | undefined,
  directions: Directions,
  margin = GRADE_MARGIN,
): DesignModel {
  const SHRINK = margin;
  const n = points.length;
  const x = points.map((p) => p.stationFt);
  const e = points.map((p) => p.elevationFt);
  const len = x.slice(1).map((s, i) => s - x[i]);
  const Z = (i: number) => i;
  const U = (i: number) => n + i;
  const R = (i: number) => 2 * n + i;
  const cols = 3 * n - 1;
  const cost = new Float64Array(cols);
  const colLower = new Float64Array(cols).fill(-Infinity);
  const colUpper = new Float64Array(cols).fill(Infinity);
  const binary = new Uint8Array(cols);
  const rows = new SparseRows();

  for (let i = 0; i < n; i++) {
    cost[U(i)] = ((len[i - 1] ?? 0) + (len[i] ?? 0)) / 2;
    colLower[U(i)] = 0;
    rows.add([[Z(i), 1], [U(i), -1]], -Infinity, e[i]);
    rows.add([[Z(i), 1], [U(i), 1]], e[i], Infinity);
  }
  colLower[Z(0)] = colUpper[Z(0)] = roadEdgeFt;
  if (targetEndFt !== undefined) colLower[Z(n - 1)] = colUpper[Z(n - 1)] = targetEndFt;

  for (let i = 0; i < n - 1; i++) {
    const { rise, fall } = ranges[i];
    const up = rise ?? fall!;
    const down = fall ?? rise!;
    binary[R(i)] = directions === 'choose' ? 1 : 0;
    colLower[R(i)] = fall ? 0 : 1;
    colUpper[R(i)] = rise ? 1 : 0;
    if (typeof directions === 'number') colLower[R(i)] = colUpper[R(i)] = i < directions ? 1 : 0;
    const L = len[i];
    // z_{i+1} - z_i between L*fall and L*rise as r_i goes 0 -> 1.
    rows.add([[Z(i + 1), 1], [Z(i), -1], [R(i), -L * (up.lo - down.lo)]], L * (down.lo + SHRINK), Infinity);
    rows.add([[Z(i + 1), 1], [Z(i), -1], [R(i), -L * (up.hi - down.hi)]], -Infinity, L * (down.hi - SHRINK));
    if (i > 0) rows.add([[R(i), 1], [R(i - 1), -1]], -Infinity, 0);
  }

  const grade = (i: number): [number, number][] => [[Z(i + 1), 1 / len[i]], [Z(i), -1 / len[i]]];
  const maxChange = rules.maxGradeChangePercent / 100 - SHRINK;
  for (let v = 1; v < n - 1; v++) rows.add([...grade(v), ...grade(v - 1).map(([c, k]): [number, number] => [c, -k])], -maxChange, maxChange);

  if (budget) {
    for (const row of clearanceRows(x, budget)) rows.add(row.terms.map(([i, k]): [number, number] => [Z(i), k]), -Infinity, row.upper);
  }

  const read = (solution: Float64Array): ProfilePoint[] => points.map((p, i) => ({ stationFt: p.stationFt, elevationFt: solution[Z(i)] }));
  return { model: { cost, colLower, colUpper, binary, rows }, read };
}
