import { warpStakeColumns, warpStakeRows, warpWords } from '@shared/charts/check-words';
import type { ApronSummary } from '@shared/engine';
import { ScrollRegion } from '@/components/ui/scroll-region';

/** The warp in words and the stakes the crew sets along both edges; the edge findings are in the findings table. */
export function ApronPanel({ apron }: { apron?: ApronSummary }) {
  if (!apron)
    return (
      <p className="text-sm text-stone-600">
        Tick "Check both edges of the entrance" under Entrance edges to see the warp stakes.
      </p>
    );
  return (
    <div className="space-y-3 text-sm">
      <p>{warpWords(apron)}</p>
      <ScrollRegion label="Warp stakes">
        <table className="w-full" aria-label="Warp stakes">
          <thead>
            <tr className="border-b border-stone-300 text-left text-stone-600">
              {warpStakeColumns.map((c) => (
                <th key={c} className="pr-2">
                  {c}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {warpStakeRows(apron).map((row) => (
              <tr key={row[0]} className="border-b border-stone-100">
                {row.map((cell, i) => (
                  <td key={warpStakeColumns[i]} className="pr-2 font-mono">
                    {cell}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollRegion>
    </div>
  );
}
