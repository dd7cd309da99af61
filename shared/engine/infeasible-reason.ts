import type { GradeLimits } from './least-earth-model';
import type { ProfilePoint } from './profile';
import type { RuleProfile } from './rule-profile';

const ft = (v: number) => `${Math.round(v * 10) / 10} ft`;

/**
 * The one limit that makes a fixed end elevation unreachable, in words, found before solving: the most the
 * landing and grade limits allow the profile to climb or drop over its length.
 */
export function explainInfeasible(
  points: readonly ProfilePoint[],
  limits: readonly GradeLimits[],
  rules: RuleProfile,
  roadEdgeFt: number,
  targetEndFt: number | undefined,
): string | undefined {
  if (targetEndFt === undefined) return undefined;
  let most = 0;
  let least = 0;
  for (let i = 0; i < limits.length; i++) {
    const l = points[i + 1].stationFt - points[i].stationFt;
    most += limits[i].hi * l;
    least += limits[i].lo * l;
  }
  const need = targetEndFt - roadEdgeFt;
  const length = points[points.length - 1].stationFt - points[0].stationFt;
  const landing =
    rules.landing.lengthFt > 0
      ? `with the landing held to ${rules.landing.minGradePercent}% to ${rules.landing.maxGradePercent}% for ${rules.landing.lengthFt} ft, `
      : '';
  const tol = 1e-6;
  if (need > most + tol) {
    return `the ${rules.maxGradePercent}% limit cannot climb ${ft(need)} in ${ft(length)} (${landing}it climbs at most ${ft(most)})`;
  }
  if (need < least - tol) {
    return `the ${rules.maxGradePercent}% limit cannot drop ${ft(-need)} in ${ft(length)} (${landing}it drops at most ${ft(-least)})`;
  }
  return undefined;
}
