import type { InspectionView } from '@shared/contracts/inspections';
import { formatDay } from '@shared/format/dates';

/** The road authority's inspections, newest first: passed, or failed with what must be fixed. */
export function InspectionList({ inspections }: { inspections: InspectionView[] }) {
  if (inspections.length === 0) return <p className="text-sm text-stone-600">No inspection recorded yet.</p>;
  return (
    <ul className="space-y-3" aria-label="Inspections">
      {inspections.map((i) => (
        <li
          key={i.id}
          className={`rounded-md border-l-4 bg-white p-3 text-sm ${i.passed ? 'border-pine-600' : 'border-clay'}`}
        >
          <p className="font-semibold text-stone-900">
            {i.passed ? 'Passed' : 'Failed'} · {i.inspectorName} · {formatDay(i.createdAt)}
          </p>
          {i.items.length > 0 && (
            <>
              <p className="mt-1 text-stone-700">To fix:</p>
              <ul className="list-disc pl-5 text-stone-800">
                {i.items.map((item, n) => (
                  <li key={n} className="break-words">
                    {item}
                  </li>
                ))}
              </ul>
            </>
          )}
          {i.note && <p className="mt-1 break-words text-stone-700">{i.note}</p>}
        </li>
      ))}
    </ul>
  );
}
