import { useMemo } from 'react';
import { planInputFor, type PlanSource } from '@shared/charts/plan-input';
import type { GradeCheckResults } from '@shared/contracts/grade-checks';
import { PlanView } from '@/components/ui/plan-view';

/** The live check's plan view: the same input the permit packet and the field sheet draw from a saved check. */
export function PlanViewPanel({
  inputs,
  results,
  roadName,
}: {
  inputs: PlanSource;
  results: GradeCheckResults;
  roadName?: string;
}) {
  const plan = useMemo(() => planInputFor(inputs, results.report, { roadName }), [inputs, results, roadName]);
  return <PlanView plan={plan} className="rounded border border-stone-200" />;
}
