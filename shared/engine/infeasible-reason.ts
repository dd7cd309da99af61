import type { SegmentRanges } from './least-earth-model';
import type { ProfilePoint } from './profile';
import type { RuleProfile } from './rule-profile';

const ft = (v: number) => `${Math.round(v * 100) / 100} ft`;
const TOL = 1e-6;

interface Reach {
  /** Segments rising before the crest. */
  k: number;
  lo: number;
  hi: number;
}

/**
 * How far the end can sit above the road edge when the design rises over its first k segments and falls over
 * the rest (the only shapes that hold no water), for every k the segment limits allow.
 */
function reachByCrest(points: readonly ProfilePoint[], ranges: readonly SegmentRanges[]): Reach[] {
  const m = ranges.length;
  const len = (i: number) => points[i + 1].stationFt - points[i].stationFt;
  // Suffix sums of the falling limits, prefix sums of the rising ones.
  const fallLo = new Float64Array(m + 1);
  const fallHi = new Float64Array(m + 1);
  const fallOk = new Uint8Array(m + 1).fill(1);
  for (let i = m - 1; i >= 0; i--) {
    const f = ranges[i].fall;
    fallOk[i] = f && fallOk[i + 1] ? 1 : 0;
    fallLo[i] = fallLo[i + 1] + (f ? f.lo * len(i) : 0);
    fallHi[i] = fallHi[i + 1] + (f ? f.hi * len(i) : 0);
  }
  const reach: Reach[] = [];
  let riseLo = 0;
  let riseHi = 0;
  for (let k = 0; k <= m; k++) {
    if (fallOk[k]) reach.push({ k, lo: riseLo + fallLo[k], hi: riseHi + fallHi[k] });
    if (k === m) break;
    const r = ranges[k].rise;
    if (!r) break;
    riseLo += r.lo * len(k);
    riseHi += r.hi * len(k);
  }
  return reach;
}

/** Crest positions whose rising and falling limits can end at the target (any, with no target). */
export function crestAllowed(
  points: readonly ProfilePoint[],
  ranges: readonly SegmentRanges[],
  roadEdgeFt: number,
  targetEndFt: number | undefined,
): (k: number) => boolean {
  const need = targetEndFt === undefined ? undefined : targetEndFt - roadEdgeFt;
  const ok = new Set(
    reachByCrest(points, ranges)
      .filter((r) => need === undefined || (need >= r.lo - TOL && need <= r.hi + TOL))
      .map((r) => r.k),
  );
  return (k) => ok.has(k);
}

/**
 * The limit that makes the end elevation unreachable, in words, found before solving. Exact for the grade,
 * landing and drainage limits; the grade-change and clearance limits are left to the solver.
 */
export function explainInfeasible(
  points: readonly ProfilePoint[],
  ranges: readonly SegmentRanges[],
  rules: RuleProfile,
  roadEdgeFt: number,
  targetEndFt: number | undefined,
): string | undefined {
  const drain = rules.minDrainageGradePercent;
  if (drain !== undefined && drain > rules.maxGradePercent) {
    return `the ${drain}% drainage grade is steeper than the ${rules.maxGradePercent}% limit`;
  }
  const reach = reachByCrest(points, ranges);
  if (reach.length === 0) return 'no profile meets the landing limits without leaving a low point that holds water';
  if (targetEndFt === undefined) return undefined;
  const need = targetEndFt - roadEdgeFt;
  if (reach.some((r) => need >= r.lo - TOL && need <= r.hi + TOL)) return undefined;
  const most = Math.max(...reach.map((r) => r.hi));
  const least = Math.min(...reach.map((r) => r.lo));
  const length = points[points.length - 1].stationFt - points[0].stationFt;
  const landing =
    rules.landing.lengthFt > 0
      ? `with the landing held to ${rules.landing.minGradePercent}% to ${rules.landing.maxGradePercent}% for ${rules.landing.lengthFt} ft, `
      : '';
  if (need > most)
    return `the ${rules.maxGradePercent}% limit cannot climb ${ft(need)} in ${ft(length)} (${landing}it climbs at most ${ft(most)})`;
  if (need < least)
    return `the ${rules.maxGradePercent}% limit cannot drop ${ft(-need)} in ${ft(length)} (${landing}it drops at most ${ft(-least)})`;
  // Between the extremes but in a gap: the drainage minimum forbids the nearly level runs that would end there.
  const below = Math.max(...reach.filter((r) => r.hi < need).map((r) => r.hi));
  const above = Math.min(...reach.filter((r) => r.lo > need).map((r) => r.lo));
  const sign = (v: number) => (v >= 0 ? `+${ft(v)}` : `-${ft(-v)}`);
  return (
    `with the ${drain ?? 0}% drainage grade and no low point to hold water, the end can sit at most ${sign(below)} or at least ` +
    `${sign(above)} from the road edge, not ${sign(need)}`
  );
}
