import type { LinearModel, LinearStart } from './design-solver';
import type { ProfilePoint } from './profile';
import type { RuleProfile } from './rule-profile';
import { SparseRows } from './sparse-rows';
import { STATION_TOLERANCE_FT } from './station-tolerance';
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

// HiGHS basis statuses.
const [LOWER, BASIC, UPPER, ZERO] = [0, 1, 2, 3];

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
  /** The design at every station: straight between vertices. */
  read(x: Float64Array): ProfilePoint[];
  /** Each vertex segment's direction, 1 rising to 0 falling. */
  rising(x: Float64Array): Float64Array;
  /** The direction columns (one per vertex segment, from `first`) and the bounds they were built with. */
  directionCols: { first: number; lower: Float64Array; upper: Float64Array };
  /** The clearance rows (from `first`): the vertex each belongs to, the clearance that share scales and each row's fixed part. */
  clearance: { first: number; vertex: Int32Array; clearanceFt: number; fixedFt: Float64Array };
  /** A start at the design `at` (elevation per vertex) with the first k segments rising (see startAt). */
  startAt(at: Float64Array, k: number): LinearStart;
}

/**
 * Columns: design elevation z_j at each vertex, earth moved u_i >= |z(x_i) - e_i| at every station (z read on
 * the straight line between the vertices either side), and a 0/1 direction r_j per vertex segment (1 rises,
 * 0 falls). Directions are non-increasing along the profile, so the design climbs and then falls at most once:
 * a profile shaped like that has no low point for water to stand in, on the driveway or against the road.
 * Every grade, break and clearance limit is linear in z, so the whole design is one mixed-integer programme.
 */
export function buildLeastEarthModel(
  points: readonly ProfilePoint[],
  vertices: readonly number[],
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
  const m = vertices.length;
  const x = vertices.map((i) => points[i].stationFt);
  const len = x.slice(1).map((s, j) => s - x[j]);
  const Z = (j: number) => j;
  const U = (i: number) => m + i;
  const Q = (i: number) => m + n + i;
  const R = (j: number) => m + 2 * n + j;
  const cols = 2 * m + 2 * n - 1;
  const cost = new Float64Array(cols);
  const colLower = new Float64Array(cols).fill(-Infinity);
  const colUpper = new Float64Array(cols).fill(Infinity);
  const binary = new Uint8Array(cols);
  const rows = new SparseRows();

  // Station i sits on vertex segment seg[i] at fraction t[i] of its length.
  const seg = new Int32Array(n);
  const t = new Float64Array(n);
  for (let i = 0, j = 0; i < n; i++) {
    while (j < m - 2 && vertices[j + 1] <= i) j++;
    seg[i] = j;
    t[i] = m > 1 ? (points[i].stationFt - x[j]) / len[j] : 0;
  }
  for (let i = 0; i < n; i++) {
    const e = points[i].elevationFt;
    cost[U(i)] = cost[Q(i)] =
      (i > 0 ? points[i].stationFt - points[i - 1].stationFt : 0) / 2 +
      (i < n - 1 ? points[i + 1].stationFt - points[i].stationFt : 0) / 2;
    colLower[U(i)] = colLower[Q(i)] = 0;
    const j = seg[i];
    const terms: [number, number][] =
      t[i] === 0
        ? [[Z(j), 1]]
        : t[i] === 1
          ? [[Z(j + 1), 1]]
          : [
              [Z(j), 1 - t[i]],
              [Z(j + 1), t[i]],
            ];
    terms.push([U(i), -1], [Q(i), 1]);
    rows.add(terms, e, e);
  }
  colLower[Z(0)] = colUpper[Z(0)] = roadEdgeFt;
  if (targetEndFt !== undefined) colLower[Z(m - 1)] = colUpper[Z(m - 1)] = targetEndFt;

  for (let j = 0; j < m - 1; j++) {
    const { rise, fall } = ranges[j];
    const up = rise ?? fall!;
    const down = fall ?? rise!;
    binary[R(j)] = directions === 'choose' ? 1 : 0;
    colLower[R(j)] = fall ? 0 : 1;
    colUpper[R(j)] = rise ? 1 : 0;
    if (typeof directions === 'number') colLower[R(j)] = colUpper[R(j)] = j < directions ? 1 : 0;
    const L = len[j];
    // z_{j+1} - z_j between L*fall and L*rise as r_j goes 0 -> 1.
    rows.add(
      [
        [Z(j + 1), 1],
        [Z(j), -1],
        [R(j), -L * (up.lo - down.lo)],
      ],
      L * (down.lo + SHRINK),
      Infinity,
    );
    rows.add(
      [
        [Z(j + 1), 1],
        [Z(j), -1],
        [R(j), -L * (up.hi - down.hi)],
      ],
      -Infinity,
      L * (down.hi - SHRINK),
    );
    if (j > 0)
      rows.add(
        [
          [R(j), 1],
          [R(j - 1), -1],
        ],
        -Infinity,
        0,
      );
  }

  const maxChange = rules.maxGradeChangePercent / 100 - SHRINK;
  // Grade after vertex v less grade before it.
  for (let v = 1; v < m - 1; v++) {
    const [after, before] = [1 / len[v], 1 / len[v - 1]];
    rows.add(
      [
        [Z(v + 1), after],
        [Z(v), -after - before],
        [Z(v - 1), before],
      ],
      -maxChange,
      maxChange,
    );
  }

  const firstClearance = rows.count;
  const clearance = budget ? clearanceRows(x, budget) : [];
  for (const row of clearance)
    rows.add(
      row.terms.map(([j, k]): [number, number] => [Z(j), k]),
      -Infinity,
      row.upper,
    );

  const read = (solution: Float64Array): ProfilePoint[] =>
    points.map((p, i) => {
      const j = seg[i];
      const z =
        t[i] === 0
          ? solution[Z(j)]
          : t[i] === 1
            ? solution[Z(j + 1)]
            : (1 - t[i]) * solution[Z(j)] + t[i] * solution[Z(j + 1)];
      return { stationFt: p.stationFt, elevationFt: z };
    });
  const startAt = (at: Float64Array, k: number): LinearStart => {
    const origin = new Float64Array(cols);
    origin.set(at, Z(0));
    const colStatus = new Int32Array(cols);
    for (let j = 0; j < m; j++) colStatus[Z(j)] = colLower[Z(j)] === colUpper[Z(j)] ? LOWER : ZERO;
    for (let i = 0; i < n; i++) {
      const j = seg[i];
      const z = (1 - t[i]) * at[j] + (j + 1 < m ? t[i] * at[j + 1] : 0);
      colStatus[z >= points[i].elevationFt ? U(i) : Q(i)] = BASIC;
    }
    for (let j = 0; j < m - 1; j++) colStatus[R(j)] = j < k ? UPPER : LOWER;
    const rowStatus = new Int32Array(rows.count).fill(BASIC);
    rowStatus.fill(LOWER, 0, n);
    return { origin, basis: { colStatus, rowStatus } };
  };
  return {
    startAt,
    model: { cost, colLower, colUpper, binary, rows },
    read,
    rising: (solution) => solution.slice(R(0), R(0) + m - 1),
    directionCols: {
      first: R(0),
      lower: colLower.slice(R(0), R(0) + m - 1),
      upper: colUpper.slice(R(0), R(0) + m - 1),
    },
    clearance: {
      first: firstClearance,
      vertex: Int32Array.from(clearance, (r) => r.vertex),
      clearanceFt: rules.designVehicle.clearanceIn / 12,
      fixedFt: Float64Array.from(clearance, (r) => r.fixedFt),
    },
  };
}
