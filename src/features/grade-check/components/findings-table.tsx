import { formatStation, type DisplayUnits, type Finding } from '@shared/engine';
import { showValue, statusLabel, statusTone } from '../lib/format';
import { ScrollRegion } from '@/components/ui/scroll-region';

/** Every rule the engine checked, failing ones first, with the measured value, the limit and the room to spare. */
export function FindingsTable({ findings, units }: { findings: readonly Finding[]; units?: DisplayUnits }) {
  const order = { fail: 0, advisory: 1, pass: 2, 'not-checked': 3 };
  const sorted = [...findings].sort((a, b) => order[a.status] - order[b.status]);
  return (
    <ScrollRegion label="Findings">
      <table className="w-full text-sm" aria-label="Findings">
        <thead>
          <tr className="border-b border-stone-300 text-left text-stone-600">
            <th className="py-1 pr-2">Result</th>
            <th className="pr-2">Rule</th>
            <th className="pr-2">Station</th>
            <th className="pr-2 text-right">Measured</th>
            <th className="pr-2 text-right">Limit</th>
            <th className="text-right">Room to spare</th>
          </tr>
        </thead>
        <tbody>
          {sorted.map((f) => (
            <tr
              key={f.ruleId}
              data-rule={f.ruleId}
              data-status={f.status}
              className={`border-b border-stone-100 align-top ${f.status === 'fail' ? 'bg-red-50/60' : ''}`}
            >
              <td className="py-1 pr-2">
                <span
                  className={`inline-block whitespace-nowrap rounded-full border px-2 text-xs font-semibold ${statusTone[f.status]}`}
                >
                  {statusLabel[f.status]}
                </span>
              </td>
              <td className="pr-2">
                {f.label}
                {f.note && <span className="block text-xs text-stone-600">{f.note}</span>}
              </td>
              <td className="pr-2 font-mono">{f.stationFt === undefined ? '' : formatStation(f.stationFt)}</td>
              <td className="pr-2 text-right font-mono">{showValue(f.measured, f.unit, units)}</td>
              <td className="pr-2 text-right font-mono">{showValue(f.limit, f.unit, units)}</td>
              <td className={`text-right font-mono ${f.margin !== null && f.margin < 0 ? 'text-clay' : ''}`}>
                {showValue(f.margin, f.unit, units)}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
