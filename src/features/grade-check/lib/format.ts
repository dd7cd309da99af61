import { displayLength, displaySmallLength, type DisplayUnits, type FindingStatus } from '@shared/engine';

/** A finding's number in the trade's units, or metric where the rule profile asks for it. */
export function showValue(value: number | null, unit: string, units: DisplayUnits = 'us'): string {
  if (value === null) return '–';
  if (unit === 'ft') {
    const d = displayLength(value, units);
    return `${d.value.toFixed(d.unit === 'm' ? 2 : 1)} ${d.unit}`;
  }
  if (unit === 'in') {
    const d = displaySmallLength(value, units);
    return `${d.value.toFixed(d.unit === 'mm' ? 0 : 1)} ${d.unit}`;
  }
  if (unit === '%') return `${value.toFixed(1)}%`;
  if (unit === 'ft/ft' || unit === 'HW/D') return `${value.toFixed(3)}${unit === 'HW/D' ? '' : ' ft/ft'}`;
  return `${value.toFixed(2)} ${unit}`;
}

export const statusLabel: Record<FindingStatus, string> = {
  pass: 'Pass',
  fail: 'Fail',
  advisory: 'Look closer',
  'not-checked': 'Not checked',
};

export const statusTone: Record<FindingStatus, string> = {
  pass: 'bg-pine-50 text-pine-800 border-pine-200',
  fail: 'bg-red-50 text-red-900 border-clay/50',
  advisory: 'bg-amber-50 text-amber-950 border-tape',
  'not-checked': 'bg-stone-100 text-stone-600 border-stone-300',
};
