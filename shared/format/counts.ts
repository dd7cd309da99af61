/**
 * "1 reading", "3 readings", "0 readings": a count with its noun in the right number. `many` is for nouns whose
 * plural is not the singular plus "s" ("1 entry", "2 entries").
 */
export function countOf(n: number, one: string, many = `${one}s`): string {
  return `${n.toLocaleString('en-US')} ${Math.abs(n) === 1 ? one : many}`;
}
