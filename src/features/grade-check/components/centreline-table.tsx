import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { TextArea } from '@/components/ui/field';
import { parsePastedCentreline } from '../lib/paste-centreline';
import type { FieldErrors } from '../lib/read-number';
import {
  centrelineColumns,
  emptyRow,
  type CentrelineMode,
  type CentrelineRow,
  type SurveyState,
} from '../lib/survey-state';
import { ChoiceBox, NumberBox } from './number-box';

type Centreline = SurveyState['centreline'];
const modes = [
  ['elevations', 'Elevations'],
  ['rod-readings', 'Rod readings (with instrument height)'],
  ['segment-grades', 'Segment grades (digital level)'],
] as const;

const cell =
  'w-full rounded border border-stone-300 px-2 py-1 font-mono text-sm aria-[invalid=true]:border-clay aria-[invalid=true]:bg-red-50';

/** The centreline shots: typed, pasted from a spreadsheet, reordered; each cell shows its own error. */
export function CentrelineTable({
  centreline,
  errors,
  onChange,
}: {
  centreline: Centreline;
  errors: FieldErrors;
  onChange: (patch: Partial<Centreline>) => void;
}) {
  const [pasted, setPasted] = useState('');
  const cols = centrelineColumns[centreline.mode];
  const rows = centreline.rows;
  const setRows = (next: CentrelineRow[]) => onChange({ rows: next });
  const edit = (i: number, patch: Partial<CentrelineRow>) =>
    setRows(rows.map((r, j) => (j === i ? { ...r, ...patch } : r)));
  const move = (i: number, by: number) => {
    const next = [...rows];
    const [row] = next.splice(i, 1);
    next.splice(i + by, 0, row);
    setRows(next);
  };
  // Errors name the row's index among the rows that have something in them, as the inputs were built.
  const filled = rows.map((r) => Boolean(r.station.trim() || r.value.trim()));
  const indexOf = (i: number) => filled.slice(0, i).filter(Boolean).length;
  const cellError = (i: number, field: string) =>
    filled[i] ? errors[`profile.${cols.list}.${indexOf(i)}.${field}`] : undefined;

  return (
    <div className="space-y-4">
      <div className="grid gap-4 sm:grid-cols-3">
        <ChoiceBox
          label="Shots as"
          value={centreline.mode}
          options={modes}
          onChange={(mode: CentrelineMode) => onChange({ mode })}
        />
        {centreline.mode === 'rod-readings' && (
          <NumberBox
            label="Instrument height, HI (ft)"
            value={centreline.instrumentHeightFt}
            error={errors['profile.instrumentHeightFt']}
            onChange={(instrumentHeightFt) => onChange({ instrumentHeightFt })}
          />
        )}
        {centreline.mode === 'segment-grades' && (
          <>
            <NumberBox
              label="Start station"
              value={centreline.startStation}
              error={errors['profile.startStationFt']}
              onChange={(startStation) => onChange({ startStation })}
            />
            <NumberBox
              label="Start elevation (ft)"
              value={centreline.startElevationFt}
              error={errors['profile.startElevationFt']}
              onChange={(startElevationFt) => onChange({ startElevationFt })}
            />
          </>
        )}
      </div>
      {errors.profile && (
        <p role="alert" className="text-sm font-medium text-clay">
          {errors.profile}
        </p>
      )}
      <table className="w-full text-sm">
        <thead>
          <tr className="text-left text-stone-600">
            <th className="w-10">#</th>
            <th>{cols.station}</th>
            <th>{cols.value}</th>
            <th className="w-36">
              <span className="sr-only">Row actions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row, i) => {
            const stationError = cellError(i, cols.stationField);
            const valueError = cellError(i, cols.valueField);
            return (
              <tr key={row.key} className="align-top">
                <td className="py-1 text-stone-600">{i + 1}</td>
                <td className="py-1 pr-2">
                  <input
                    aria-label={`${cols.station}, row ${i + 1}`}
                    className={cell}
                    value={row.station}
                    aria-invalid={Boolean(stationError)}
                    onChange={(e) => edit(i, { station: e.target.value })}
                  />
                  {stationError && <p className="text-xs text-clay">{stationError}</p>}
                </td>
                <td className="py-1 pr-2">
                  <input
                    aria-label={`${cols.value}, row ${i + 1}`}
                    className={cell}
                    inputMode="decimal"
                    value={row.value}
                    aria-invalid={Boolean(valueError)}
                    onChange={(e) => edit(i, { value: e.target.value })}
                  />
                  {valueError && <p className="text-xs text-clay">{valueError}</p>}
                </td>
                <td className="flex gap-1 py-1">
                  <Button
                    variant="quiet"
                    className="px-1"
                    aria-label={`Move row ${i + 1} up`}
                    disabled={i === 0}
                    onClick={() => move(i, -1)}
                  >
                    ↑
                  </Button>
                  <Button
                    variant="quiet"
                    className="px-1"
                    aria-label={`Move row ${i + 1} down`}
                    disabled={i === rows.length - 1}
                    onClick={() => move(i, 1)}
                  >
                    ↓
                  </Button>
                  <Button
                    variant="quiet"
                    className="px-1"
                    aria-label={`Remove row ${i + 1}`}
                    onClick={() => setRows(rows.filter((_, j) => j !== i))}
                  >
                    Remove
                  </Button>
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <Button variant="secondary" onClick={() => setRows([...rows, emptyRow()])}>
        Add a shot
      </Button>
      <details className="rounded border border-stone-200 p-3">
        <summary className="cursor-pointer text-sm font-semibold text-pine-800">Paste from a spreadsheet</summary>
        <div className="mt-2 space-y-2">
          <TextArea
            aria-label="Pasted centreline"
            placeholder={`${cols.station}\t${cols.value}\n0+00\t100.00\n0+20\t101.10`}
            value={pasted}
            onChange={(e) => setPasted(e.target.value)}
          />
          <Button
            variant="secondary"
            disabled={!pasted.trim()}
            onClick={() => {
              setRows(parsePastedCentreline(pasted));
              setPasted('');
            }}
          >
            Use the pasted rows
          </Button>
        </div>
      </details>
    </div>
  );
}
