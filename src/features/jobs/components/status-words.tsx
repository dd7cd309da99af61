import type { AsBuiltReadingResult, AsBuiltStatus } from '@shared/engine';
import { station } from './format';

const looks: Record<AsBuiltStatus, { text: string; className: string }> = {
  pass: { text: 'PASS', className: 'bg-pine-800 text-white' },
  advisory: { text: 'CLOSE: inside tolerance', className: 'bg-tape text-black' },
  fail: { text: 'FAIL', className: 'bg-clay text-white' },
};

/** Words as well as colour, so the verdict reads in glare and for anyone who cannot tell the colours apart. */
export function StatusWords({ status }: { status: AsBuiltStatus }) {
  const look = looks[status];
  return <span className={`inline-block rounded px-2 py-0.5 text-base font-bold ${look.className}`}>{look.text}</span>;
}

const ruleWords: Record<string, string> = {
  'landing.max-grade': 'landing grade',
  'landing.min-grade': 'landing grade',
  'grade.max': 'driveway grade',
  'grade.min-drainage': 'drainage grade',
  'grade.max-change': 'grade change',
  'as-built.elevation': 'off design',
};

export function resultWords(r: AsBuiltReadingResult): string {
  const what = ruleWords[r.ruleId] ?? r.ruleId;
  const unit = r.unit === '%' ? '%' : ` ${r.unit}`;
  // A grade runs from its station; a change between two grades happens at one.
  const from =
    r.ruleId === 'as-built.elevation'
      ? ''
      : r.ruleId === 'grade.max-change'
        ? ` at ${station(r.stationFt)}`
        : ` from ${station(r.stationFt)}`;
  return `${what}${from}: ${r.measured.toFixed(2)}${unit} (limit ${r.limit.toFixed(2)}${unit})`;
}
