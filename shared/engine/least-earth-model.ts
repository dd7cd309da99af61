import type { Constraint, Model } from 'yalps';
import type { ProfilePoint } from './profile';
import type { RuleProfile } from './rule-profile';

/** Allowed grade of one segment, as a fraction. */
export interface GradeLimits {
  lo: number;
  hi: number;
  inLanding: boolean;
}

// LP answers sit on their constraints to within the solver's precision; pulling every limit in by this much
// keeps the answer on the right side of the exact check that follows.
const SHRINK = 1e-7;

export function segmentLimits(points: readonly ProfilePoint[], rules: RuleProfile): GradeLimits[] {
  const landingEnd = points[0].stationFt + rules.landing.lengthFt;
  const max = rules.maxGradePercent / 100;
  const min = rules.minDrainageGradePercent === undefined ? undefined : rules.minDrainageGradePercent / 100;
  const limits: GradeLimits[] = [];
  for (let i = 0; i < points.length - 1; i++) {
    const a = points[i];
    const b = points[i + 1];
    if (a.stationFt < landingEnd) {
      limits.push({ lo: rules.landing.minGradePercent / 100, hi: rules.landing.maxGradePercent / 100, inLanding: true });
    } else if (min === undefined) {
      limits.push({ lo: -max, hi: max, inLanding: false });
    } else {
      // |grade| >= min is not convex; following the ground's own direction keeps it linear and moves the least earth.
      const rising = b.elevationFt >= a.elevationFt;
      limits.push(rising ? { lo: min, hi: max, inLanding: false } : { lo: -max, hi: -min, inLanding: false });
    }
  }
  return limits;
}

/**
 * Variables: for each station, cut c_i >= 0 and fill f_i >= 0 with design z_i = e_i - c_i + f_i, because
 * the solver only takes non-negative variables and |z - e| = c + f at the optimum.
 */
export function buildLeastEarthModel(
  points: readonly ProfilePoint[],
  limits: readonly GradeLimits[],
  rules: RuleProfile,
  roadEdgeFt: number,
  targetEndFt: number | undefined,
  changeRatePerFt: number,
) {
  const n = points.length;
  const e = points.map((p) => p.elevationFt);
  const len = points.slice(1).map((p, i) => p.stationFt - points[i].stationFt);
  const constraints: [string, Constraint][] = [];
  const coef: Map<string, number>[] = Array.from({ length: 2 * n }, () => new Map());
  // Coefficient of design offset (f_i - c_i) in constraint `key`.
  const add = (key: string, i: number, k: number) => {
    coef[2 * i].set(key, (coef[2 * i].get(key) ?? 0) - k);
    coef[2 * i + 1].set(key, (coef[2 * i + 1].get(key) ?? 0) + k);
  };
  for (let i = 0; i < n; i++) {
    const weight = ((len[i - 1] ?? 0) + (len[i] ?? 0)) / 2;
    coef[2 * i].set('earth', weight);
    coef[2 * i + 1].set('earth', weight);
  }
  constraints.push(['start', { equal: roadEdgeFt - e[0] }]);
  add('start', 0, 1);
  if (targetEndFt !== undefined) {
    constraints.push(['end', { equal: targetEndFt - e[n - 1] }]);
    add('end', n - 1, 1);
  }
  for (let i = 0; i < n - 1; i++) {
    const de = e[i + 1] - e[i];
    const key = `g${i}`;
    constraints.push([key, { min: (limits[i].lo + SHRINK) * len[i] - de, max: (limits[i].hi - SHRINK) * len[i] - de }]);
    add(key, i + 1, 1);
    add(key, i, -1);
  }
  const maxChange = rules.maxGradeChangePercent / 100;
  for (let i = 0; i < n - 2; i++) {
    const midSpacing = (len[i] + len[i + 1]) / 2;
    const allowed = Math.min(maxChange, changeRatePerFt * midSpacing) - SHRINK;
    const existingChange = (e[i + 2] - e[i + 1]) / len[i + 1] - (e[i + 1] - e[i]) / len[i];
    const key = `c${i}`;
    constraints.push([key, { min: -allowed - existingChange, max: allowed - existingChange }]);
    add(key, i + 2, 1 / len[i + 1]);
    add(key, i + 1, -1 / len[i + 1] - 1 / len[i]);
    add(key, i, 1 / len[i]);
  }
  const variables: [number, Map<string, number>][] = coef.map((c, j) => [j, c]);
  const model: Model<number, string> = { direction: 'minimize', objective: 'earth', constraints, variables };
  const read = (solved: [number, number][]): ProfilePoint[] => {
    const value = new Float64Array(2 * n);
    for (const [j, v] of solved) value[j] = v;
    return points.map((p, i) => ({ stationFt: p.stationFt, elevationFt: e[i] - value[2 * i] + value[2 * i + 1] }));
  };
  return { model, read };
}
