import type { AsBuiltSetView } from '@shared/crew/crew-views';
import { formatMoment } from '@shared/format/when';
import { station } from './format';
import { StatusWords, resultWords } from './status-words';

/** Every set saved for this job, newest first, as the server's engine judged it: the record the office reviews. */
export function SavedSets({ sets }: { sets: AsBuiltSetView[] }) {
  if (sets.length === 0) return <p>No readings saved yet.</p>;
  return (
    <ul className="space-y-3">
      {sets.map((set, n) => {
        const corrects = set.replacesSetId ? sets.find((s) => s.id === set.replacesSetId) : undefined;
        const correctedBy = sets.find((s) => s.replacesSetId === set.id);
        return (
          <li key={set.id} className="rounded-lg border-2 border-stone-300 bg-white p-3">
            <p className="flex flex-wrap items-center gap-2 font-semibold">
              <StatusWords status={set.status} /> {n === 0 ? 'Latest set' : 'Earlier set'} · {set.readings.length}{' '}
              readings · {set.crewName} · {formatMoment(set.createdAt)}
            </p>
            {set.replacesSetId && (
              <p className="text-base text-stone-700">
                Corrects the set of {corrects ? formatMoment(corrects.createdAt) : 'earlier'}.
              </p>
            )}
            {correctedBy && (
              <p className="text-base text-stone-700">Corrected by the set of {formatMoment(correctedBy.createdAt)}.</p>
            )}
            {set.note && <p className="mt-1">Note: {set.note}</p>}
            <ul className="mt-2 space-y-0.5 text-base">
              {set.results
                .filter((r) => r.status !== 'pass')
                .map((r) => (
                  <li key={`${r.ruleId}-${r.stationFt}`}>
                    {station(r.stationFt)}: <StatusWords status={r.status} /> {resultWords(r)}
                  </li>
                ))}
              {set.results.every((r) => r.status === 'pass') && <li>Every reading is inside the limits.</li>}
            </ul>
          </li>
        );
      })}
    </ul>
  );
}
