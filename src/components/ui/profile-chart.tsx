import { useMemo } from 'react';
import { profileChartSvg, type ProfileChartInput } from '@shared/charts/profile-chart';

/**
 * The profile chart the PDF report prints, drawn by the same function on every screen (the live check, the field
 * sheet). The string is built by our own code from numbers and escaped labels, so setting it as markup carries
 * nothing a user typed unescaped.
 */
export function ProfileChart({ chart, className = '' }: { chart: ProfileChartInput; className?: string }) {
  const svg = useMemo(() => profileChartSvg({ ...chart, fontFamily: 'ui-sans-serif, system-ui, sans-serif' }), [chart]);
  return (
    <div
      className={`w-full overflow-hidden bg-white [&>svg]:h-auto [&>svg]:w-full ${className}`}
      dangerouslySetInnerHTML={{ __html: svg }}
    />
  );
}
