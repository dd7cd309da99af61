import { commonRuralTemplate, type RuleProfile } from '@shared/engine';

/** Points from a start elevation and a list of [lengthFt, gradePercent] runs. */
export function profileFromRuns(runs: [number, number][], start = 100): { stationFt: number; elevationFt: number }[] {
  const points = [{ stationFt: 0, elevationFt: start }];
  for (const [length, grade] of runs) {
    const last = points[points.length - 1];
    points.push({ stationFt: last.stationFt + length, elevationFt: last.elevationFt + (length * grade) / 100 });
  }
  return points;
}

/** A rule profile built on the common rural template with overrides, as an admin would edit one. */
export const ruleProfile = (overrides: Partial<RuleProfile> = {}): RuleProfile => ({
  ...commonRuralTemplate,
  ...overrides,
});

export const findingOf = <T extends { ruleId: string }>(findings: T[], ruleId: string): T => {
  const f = findings.find((x) => x.ruleId === ruleId);
  if (!f) throw new Error(`no finding ${ruleId}`);
  return f;
};
