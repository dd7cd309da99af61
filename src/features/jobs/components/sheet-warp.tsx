import { warpStakeColumns, warpStakeRows, warpWords } from '@shared/charts/check-words';
import type { ApronSummary } from '@shared/engine';

/** The warp stakes along both edges of the entrance: set each to its design elevation and the apron takes its twist. */
export function SheetWarp({ apron }: { apron: ApronSummary | null }) {
  if (!apron) return <p>No warp in the saved check: the edges follow the laser setups.</p>;
  return (
    <div className="space-y-1">
      <p>{warpWords(apron)}</p>
      <table className="stack-table w-full border-collapse text-left" aria-label="Warp stakes">
        <thead>
          <tr className="border-b-2 border-stone-800">
            {warpStakeColumns.map((c) => (
              <th key={c} className="pr-2">
                {c}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {warpStakeRows(apron).map((row) => (
            <tr key={row[0]} className="border-b border-stone-400">
              {row.map((cell, i) => (
                <td
                  key={warpStakeColumns[i]}
                  data-label={warpStakeColumns[i]}
                  className={`pr-2 ${i === 3 || i === 6 ? 'font-bold' : ''}`}
                >
                  {cell}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
