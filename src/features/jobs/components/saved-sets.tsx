import { countOf } from '@shared/format/counts';
import type { AsBuiltSetView } from '@shared/crew/crew-views';
import { day, station } from './format';
import { StatusWords, resultWords } from './status-words';

/** Every set saved for this job, newest first, as the server's engine judged it: the record the office reviews. */
export function SavedSets({ sets }: { sets: AsBuiltSetView[] }) {
  if (sets.length === 0) return <p>No readings saved yet.</p>;
  return (
    <ul className="space-y-3">
      {sets.map((set, n) => (
        <li key={set.id} className="rounded-lg border-2 border-stone-300 bg-white p-3">
          <p className="flex flex-wrap items-center gap-2 font-semibold">
            <StatusWords status={set.status} /> {n === 0 ? 'Latest set' : 'Earlier set'} ·{' '}
            {countOf(set.readings.length, 'reading')} · {set.crewName} · {day(set.createdAt)}
          </p>
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
      ))}
    </ul>
  );
}
