import {
  displayLength,
  displaySmallLength,
  type DisplayUnits,
  type Finding,
  type FindingStatus,
  type RuleProfile,
} from '@shared/engine';

/** Printed on every grade check report; the field sheet carries the same reminders. */
export const reportCautions = [
  'Have buried utilities located and marked (call the one-call centre) before any digging.',
  'Follow trench-safety rules: slope, bench or shore any excavation a person enters, and keep spoil back from the edge.',
  'Set up traffic control for any work in the road right-of-way, as the road authority requires.',
  "This check supports, and never replaces, the road authority's review, local codes and a licensed engineer where one is required. Where they differ from this report, the road authority's decision prevails.",
];

export const statusWords: Record<FindingStatus, string> = {
  pass: 'Meets',
  fail: 'Does not meet',
  advisory: 'Look closer',
  'not-checked': 'Not checked',
};

export function valueText(value: number | null, unit: string, units: DisplayUnits = 'us'): string {
  if (value === null) return '-';
  if (units === 'metric' && unit === 'ft') return `${displayLength(value, units).value.toFixed(2)} m`;
  if (units === 'metric' && unit === 'in') return `${displaySmallLength(value, units).value.toFixed(0)} mm`;
  const places = unit === 'ft/ft' || unit === 'HW/D' ? 3 : unit === 'cfs' ? 2 : 1;
  const shown = value.toFixed(places);
  return unit === '%' ? `${shown}%` : `${shown} ${unit}`;
}

export const findingCells = (f: Finding, station: (ft: number) => string, units: DisplayUnits) => [
  f.label + (f.note ? ` (${f.note})` : ''),
  f.stationFt === undefined ? '' : station(f.stationFt),
  valueText(f.measured, f.unit, units),
  valueText(f.limit, f.unit, units),
  valueText(f.margin, f.unit, units),
  statusWords[f.status],
];

const skipped = new Set(['id', 'version', 'jurisdictionName', 'name', 'sources']);

/** Every value of the profile as "dotted.path = value", with the source note the admin gave for it. */
export function profileValueRows(profile: RuleProfile): string[][] {
  const rows: string[][] = [];
  const walk = (value: unknown, pathParts: string[]) => {
    if (value !== null && typeof value === 'object' && !Array.isArray(value)) {
      for (const [key, inner] of Object.entries(value))
        if (pathParts.length > 0 || !skipped.has(key)) walk(inner, [...pathParts, key]);
      return;
    }
    const key = pathParts.join('.');
    const source = profile.sources[key] ?? profile.sources[pathParts[0]] ?? '';
    rows.push([key, String(value), source]);
  };
  walk(profile, []);
  return rows;
}
