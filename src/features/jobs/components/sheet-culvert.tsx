import type { CulvertSheet } from '@shared/crew/crew-views';
import { ft, pct } from './format';

export function SheetCulvert({ culvert }: { culvert: CulvertSheet | null }) {
  if (!culvert) return <p>No culvert in the saved check.</p>;
  const length =
    culvert.lengthFt === null
      ? 'not worked out'
      : `${culvert.lengthFt} ft${culvert.lengthIsMinimum ? ' (at least)' : ''}`;
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5">
      <dt className="font-semibold">Pipe</dt>
      <dd>
        {culvert.diameterIn} in diameter, {length}
      </dd>
      <dt className="font-semibold">Inlet invert</dt>
      <dd>{ft(culvert.inletInvertFt)}</dd>
      <dt className="font-semibold">Outlet invert</dt>
      <dd>{ft(culvert.outletInvertFt)}</dd>
      <dt className="font-semibold">Slope</dt>
      <dd>{culvert.slopePercent === null ? '—' : `${pct(culvert.slopePercent)} toward the outlet`}</dd>
      <dt className="font-semibold">Cover</dt>
      <dd>{culvert.coverIn === null ? '—' : `${culvert.coverIn.toFixed(1)} in over the crown`}</dd>
      {culvert.headwaterText && (
        <>
          <dt className="font-semibold">Headwater</dt>
          <dd>{culvert.headwaterText}</dd>
        </>
      )}
    </dl>
  );
}
