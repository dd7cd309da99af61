import type { AsBuiltReadingInput } from '@shared/crew/crew-inputs';
import { countOf } from '@shared/format/counts';
import type { AsBuiltSetView } from '@shared/crew/crew-views';
import type { AsBuiltReadingResult } from '@shared/engine';
import { formatMoment } from '@shared/format/when';
import { ft, pct, station } from './format';
import { designWords, type CheckBasis } from './reading-checks';
import { StatusWords, resultWords } from './status-words';

const measured = (r: AsBuiltReadingInput) =>
  r.gradePercent !== undefined ? `grade ${pct(r.gradePercent)}` : `elevation ${ft(r.elevationFt ?? 0)}`;

const worst = (list: AsBuiltReadingResult[]) =>
  list.some((r) => r.status === 'fail') ? 'fail' : list.some((r) => r.status === 'advisory') ? 'advisory' : 'pass';

/**
 * Every reading of one set beside what the design asks there and the engine's verdict from that station on: the
 * office reads the whole set, not only what went wrong. One card per reading on a phone.
 */
function EveryReading({ set, basis, caption }: { set: AsBuiltSetView; basis: CheckBasis; caption: string }) {
  const readings = [...set.readings].sort((a, b) => a.stationFt - b.stationFt);
  return (
    <table className="stack-table mt-3 w-full border-collapse text-left text-base">
      <caption className="text-left font-semibold">{caption}</caption>
      <thead>
        <tr className="border-b-2 border-stone-700">
          <th scope="col" className="py-1 pr-3">
            Station
          </th>
          <th scope="col" className="pr-3">
            Measured
          </th>
          <th scope="col" className="pr-3">
            The design there
          </th>
          <th scope="col">Verdict</th>
        </tr>
      </thead>
      <tbody>
        {readings.map((r, n) => {
          const results = set.results.filter((x) => Math.abs(x.stationFt - r.stationFt) < 1e-6);
          return (
            <tr key={`${r.stationFt}-${n}`} className="border-b border-stone-300 align-top">
              <td data-label="Station" className="py-1 pr-3 font-semibold">
                {station(r.stationFt)}
              </td>
              <td data-label="Measured" className="pr-3">
                {measured(r)}
              </td>
              <td data-label="The design there" className="pr-3">
                {designWords(basis, r.stationFt).replace(/^Design here: /, '')}
              </td>
              <td data-label="Verdict">
                {results.length === 0 ? (
                  'judged with the shots beside it'
                ) : (
                  <span className="flex flex-wrap items-center gap-2">
                    <StatusWords status={worst(results)} />
                    <span>{results.map(resultWords).join('; ')}</span>
                  </span>
                )}
              </td>
            </tr>
          );
        })}
      </tbody>
    </table>
  );
}

/** Every set saved for this job, newest first, as the server's engine judged it: the record the office reviews. */
export function SavedSets({ sets, basis }: { sets: AsBuiltSetView[]; basis: CheckBasis }) {
  if (sets.length === 0) return <p>No readings saved yet.</p>;
  return (
    <ul className="space-y-3">
      {sets.map((set, n) => {
        const corrects = set.replacesSetId ? sets.find((s) => s.id === set.replacesSetId) : undefined;
        const correctedBy = sets.find((s) => s.replacesSetId === set.id);
        return (
          <li key={set.id} className="rounded-lg border-2 border-stone-300 bg-white p-3">
            <p className="flex flex-wrap items-center gap-2 font-semibold">
              <StatusWords status={set.status} /> {n === 0 ? 'Latest set' : 'Earlier set'} ·{' '}
              {countOf(set.readings.length, 'reading')} · {set.crewName} · {formatMoment(set.createdAt)}
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
            <EveryReading
              set={set}
              basis={basis}
              caption={`Every reading in the ${n === 0 ? 'latest' : 'earlier'} set, by station`}
            />
          </li>
        );
      })}
    </ul>
  );
}
