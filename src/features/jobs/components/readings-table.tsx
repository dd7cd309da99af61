import { designWords, type CheckBasis, type ReadingRow, type RowCheck } from './reading-checks';
import { StatusWords, resultWords } from './status-words';

interface Props {
  rows: ReadingRow[];
  checks: RowCheck[];
  /** The design and rules the readings are judged on: each row shows what its station should be built to. */
  basis: CheckBasis;
  serverFields: Record<string, string>;
  onChange: (key: number, change: Partial<ReadingRow>) => void;
  onRemove: (key: number) => void;
}

const box =
  'w-full rounded-md border-2 border-stone-500 bg-white px-3 py-2 text-lg text-black aria-[invalid=true]:border-clay';

/** One row per shot, laid out as a stack on a phone; the verdict sits beside the value as it is typed. */
export function ReadingsTable({ rows, checks, basis, serverFields, onChange, onRemove }: Props) {
  return (
    <ol className="space-y-3">
      {rows.map((row, i) => {
        const check = checks[i];
        const serverError = Object.entries(serverFields)
          .filter(([k]) => k.startsWith(`readings.${i}.`))
          .map(([, v]) => v)[0];
        const error = check?.error ?? serverError;
        return (
          <li key={row.key} className="rounded-lg border-2 border-stone-300 bg-white p-3">
            <div className="grid grid-cols-2 gap-3 sm:grid-cols-[1fr_1fr_1fr_auto] sm:items-end">
              <label className="flex flex-col gap-1 font-semibold">
                Station {i + 1}
                <input
                  className={box}
                  inputMode="decimal"
                  placeholder="0+20"
                  value={row.station}
                  aria-invalid={Boolean(error)}
                  onChange={(e) => onChange(row.key, { station: e.target.value })}
                />
              </label>
              <label className="flex flex-col gap-1 font-semibold">
                Reading is
                <select
                  className={box}
                  value={row.kind}
                  onChange={(e) => onChange(row.key, { kind: e.target.value as ReadingRow['kind'] })}
                >
                  <option value="grade">Grade (%)</option>
                  <option value="elevation">Elevation (ft)</option>
                </select>
              </label>
              <label className="flex flex-col gap-1 font-semibold">
                {row.kind === 'grade' ? 'Grade %' : 'Elevation ft'}
                <input
                  className={box}
                  inputMode="decimal"
                  value={row.value}
                  aria-invalid={Boolean(error)}
                  onChange={(e) => onChange(row.key, { value: e.target.value })}
                />
              </label>
              <button
                type="button"
                onClick={() => onRemove(row.key)}
                className="min-h-11 rounded-md border-2 border-stone-400 px-3 font-semibold"
              >
                Remove
              </button>
            </div>
            {check?.reading && (
              <p className="mt-2 text-base text-stone-800">{designWords(basis, check.reading.stationFt)}</p>
            )}
            <div aria-live="polite" className="mt-2 flex flex-wrap items-center gap-2">
              {check?.status && <StatusWords status={check.status} />}
              {check?.results.map((r) => (
                <span key={`${r.ruleId}-${r.stationFt}`} className="text-base">
                  {resultWords(r)}
                </span>
              ))}
              {error && <span className="font-semibold text-clay">{error}</span>}
            </div>
          </li>
        );
      })}
    </ol>
  );
}
