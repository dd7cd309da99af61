import {
  displayLength,
  displaySmallLength,
  type DisplayUnits,
  type Finding,
  type FindingStatus,
  type RuleProfile,
} from '@shared/engine';
import { allFields, profileValueText, sourceKeyOf } from '@shared/rule-profiles/profile-fields';

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

/**
 * Every value of the profile as the rule profile form names it ("Landing: steepest rise away from the road"), in
 * words ("Passenger car", "US customary (ft, in)"), with the source note the administrator gave for it.
 */
export function profileValueRows(profile: RuleProfile): string[][] {
  return allFields.map((field) => [
    field.label,
    profileValueText(profile, field),
    profile.sources[sourceKeyOf(field)] ?? profile.sources[field.path.split('.')[0]] ?? '',
  ]);
}

/** "an 18 in", "a 24 in": the article a number takes when it is read aloud. */
export function withArticle(spoken: string): string {
  const digits = /^\d+/.exec(spoken)?.[0] ?? '';
  // Said with a vowel first: eight, eleven, eighteen, eighty-..., eight hundred..., and 11 or 18 thousand.
  const vowel = /^8/.test(digits) || (/^(11|18)$/.test(digits.slice(0, 2)) && [2, 5, 8].includes(digits.length));
  return `${vowel ? 'an' : 'a'} ${spoken}`;
}
