import { useMemo } from 'react';
import type { RuleProfile } from '@shared/engine';
import { chartInputFor, type ChartSource } from '@shared/charts/chart-input';
import { profileChartSvg } from '@shared/charts/profile-chart';
import type { CheckResults } from '../lib/use-live-check';

/**
 * The same SVG the report prints, drawn from the same function. The string is built by our own code from numbers
 * and escaped labels, so setting it as markup carries nothing a user typed unescaped.
 */
export function ProfileChartView({ inputs, results, rules }: { inputs: ChartSource; results: CheckResults; rules: RuleProfile }) {
  const svg = useMemo(() => profileChartSvg({ ...chartInputFor(inputs, results, rules), fontFamily: 'ui-sans-serif, system-ui, sans-serif' }), [inputs, results, rules]);
  return <div className="w-full overflow-hidden rounded border border-stone-200 bg-white [&>svg]:h-auto [&>svg]:w-full" dangerouslySetInnerHTML={{ __html: svg }} />;
}
