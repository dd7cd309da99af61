import { useMemo } from 'react';
import type { RuleProfile } from '@shared/engine';
import { chartInputFor, type ChartSource } from '@shared/charts/chart-input';
import type { GradeCheckResults } from '@shared/contracts/grade-checks';
import { ProfileChart } from '@/components/ui/profile-chart';

/** The live check's chart: the same input the report and the field sheet draw from a saved check. */
export function ProfileChartView({
  inputs,
  results,
  rules,
}: {
  inputs: ChartSource;
  results: GradeCheckResults;
  rules: RuleProfile;
}) {
  const chart = useMemo(() => chartInputFor(inputs, results, rules), [inputs, results, rules]);
  return <ProfileChart chart={chart} className="rounded border border-stone-200" />;
}
