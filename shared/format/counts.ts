/**
 * "1 reading", "3 readings", "0 readings": a count with its noun in the right number. `many` is for nouns whose
 * plural is not the singular plus "s" ("1 entry", "2 entries").
 */
export function countOf(n: number, one: string, many = `${one}s`): string {
  return `${n.toLocaleString('en-US')} ${Math.abs(n) === 1 ? one : many}`;
}

// Units that are a countable noun, in the singular: "load" reads "1 truck load", "4 truck loads". Abbreviations
// ("cu yd", "sq ft", "ft") and "each" read as typed whatever the number.
const countableUnits = new Set(['load', 'ton', 'hour', 'day', 'trip', 'visit', 'bag', 'piece', 'section', 'stake']);

/** A quote line's quantity and unit: whole numbers as they are, others to the cent's two places. */
export function quantityWithUnit(quantity: number, unit: string): string {
  const amount = Number.isInteger(quantity) ? String(quantity) : quantity.toFixed(2);
  const words = unit.trim().split(/\s+/);
  const last = words.at(-1) ?? '';
  const singular = countableUnits.has(last)
    ? last
    : last.endsWith('s') && countableUnits.has(last.slice(0, -1))
      ? last.slice(0, -1)
      : null;
  if (!singular) return `${amount} ${unit}`.trim();
  words[words.length - 1] = quantity === 1 ? singular : `${singular}s`;
  return `${amount} ${words.join(' ')}`;
}
