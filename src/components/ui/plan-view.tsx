import { useMemo } from 'react';
import { planViewSvg, type PlanViewInput } from '@shared/charts/plan-view';

/**
 * The plan view the permit packet prints, drawn by the same function on screen (the live check, the field sheet).
 * The string is built by our own code from numbers and escaped labels, so setting it as markup carries nothing a
 * user typed unescaped.
 */
export function PlanView({ plan, className = '' }: { plan: PlanViewInput; className?: string }) {
  const svg = useMemo(() => planViewSvg({ ...plan, fontFamily: 'ui-sans-serif, system-ui, sans-serif' }), [plan]);
  return (
    <div
      data-testid="plan-view"
      className={`w-full overflow-hidden bg-white [&>svg]:h-auto [&>svg]:w-full ${className}`}
      dangerouslySetInnerHTML={{ __html: svg }}
    />
  );
}
