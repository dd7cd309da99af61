import { z } from 'zod';

/**
 * Turns what someone typed into a prefix query over the search column. Only letters and digits survive, so the
 * text can never be read as query syntax; digits also match the signed numbers the parser makes of "GP-2026-00042".
 */
export function searchQuery(text: string): string | null {
  const words = text
    .toLowerCase()
    .split(/[^\p{L}\p{N}]+/u)
    .filter(Boolean)
    .slice(0, 8);
  if (words.length === 0) return null;
  return words.map((w) => (/^\d+$/.test(w) ? `('${w}':* | '-${w}':*)` : `'${w}':*`)).join(' & ');
}

/** The position after the last row of a page: the sort value, the id that breaks ties, and for the wait sort whether it had ended. */
export function encodeQueueCursor(value: string, id: string, ended?: boolean) {
  return Buffer.from(JSON.stringify(ended === undefined ? [value, id] : [value, id, ended])).toString('base64url');
}

// A time as PostgreSQL writes timestamptz as text, which is what a time-sorted page's cursor carries.
const pgTimestamp = /^(\d{4})-(\d{2})-(\d{2}) (\d{2}):(\d{2}):(\d{2})(\.\d{1,6})?[+-](\d{2})(?::(\d{2}))?$/;

/**
 * Whether PostgreSQL will read the text back as a time. JavaScript's parser is looser (it takes year 0, 30 February
 * and offsets past 15 hours), and each of those makes the cast fail in the query instead of here.
 */
function readsAsPgTime(value: string): boolean {
  const m = pgTimestamp.exec(value);
  if (!m) return false;
  const [year, month, day, hour, minute, second, offsetHours, offsetMinutes] = [1, 2, 3, 4, 5, 6, 8, 9].map((i) =>
    Number(m[i] ?? 0),
  );
  const date = new Date(Date.UTC(2000, month - 1, day));
  date.setUTCFullYear(year);
  return (
    year >= 1 &&
    date.getUTCMonth() === month - 1 &&
    date.getUTCDate() === day &&
    hour <= 23 &&
    minute <= 59 &&
    second <= 59 &&
    offsetHours <= 15 &&
    offsetMinutes <= 59
  );
}

/** A cursor this list gave out for the sort in use, or null: the value must read back in the sort column's type. */
export function decodeQueueCursor(
  cursor: string,
  sortsBy: 'time' | 'text',
  withEnded = false,
): { value: string; id: string; ended?: boolean } | null {
  try {
    const parsed: unknown = JSON.parse(Buffer.from(cursor, 'base64url').toString());
    if (!Array.isArray(parsed) || parsed.length !== (withEnded ? 3 : 2)) return null;
    const [value, id, ended] = parsed as unknown[];
    if (typeof value !== 'string' || typeof id !== 'string' || !z.uuid().safeParse(id).success) return null;
    if (withEnded && typeof ended !== 'boolean') return null;
    if (value.includes('\u0000')) return null;
    if (sortsBy === 'time' && !readsAsPgTime(value)) return null;
    return { value, id, ...(withEnded ? { ended: ended as boolean } : {}) };
  } catch {
    return null;
  }
}
