/**
 * How every screen, e-mail and document writes a date: "Dec 2, 2026", a day with its weekday "Wed, Dec 2, 2026",
 * a moment "Dec 2, 2026, 3:05 PM", a time "3:05 PM". One place, so no screen shows 2026-12-02 while another says
 * words.
 *
 * A calendar day (YYYY-MM-DD: a permit's expiry, a work day) is the day itself: it is written the same in every time
 * zone. A moment (an ISO timestamp or a Date) is written in the reader's time zone: the browser's own, or the one
 * given (e-mails and documents made on the server pass the company's).
 */

export type DateValue = string | Date | null | undefined;

const calendarDay = /^\d{4}-\d{2}-\d{2}$/;

export interface DateWords {
  /** IANA time zone for moments; the runtime's own when left out. Calendar days ignore it. */
  timeZone?: string;
  /** Put the short weekday first: "Wed, Dec 2, 2026". */
  weekday?: boolean;
  /** Text for a missing or unreadable date. */
  missing?: string;
}

const DEFAULT_MISSING = '—';

function asInstant(value: string | Date, timeZone: string | undefined): { at: Date; timeZone: string | undefined } {
  if (typeof value === 'string' && calendarDay.test(value)) {
    // Noon UTC, read in UTC: the day never slips to its neighbour whatever the reader's zone.
    return { at: new Date(`${value}T12:00:00Z`), timeZone: 'UTC' };
  }
  return { at: value instanceof Date ? value : new Date(value), timeZone };
}

/** "Dec 2, 2026" (or "Wed, Dec 2, 2026" with `weekday`). */
export function formatDay(value: DateValue, words: DateWords = {}): string {
  if (value === null || value === undefined || value === '') return words.missing ?? DEFAULT_MISSING;
  const { at, timeZone } = asInstant(value, words.timeZone);
  if (Number.isNaN(at.getTime())) return words.missing ?? DEFAULT_MISSING;
  return at.toLocaleDateString('en-US', {
    ...(words.weekday ? { weekday: 'short' as const } : {}),
    month: 'short',
    day: 'numeric',
    year: 'numeric',
    timeZone,
  });
}

/** "3:05 PM". */
export function formatTime(value: DateValue, words: DateWords = {}): string {
  if (value === null || value === undefined || value === '') return words.missing ?? DEFAULT_MISSING;
  const at = value instanceof Date ? value : new Date(value);
  if (Number.isNaN(at.getTime())) return words.missing ?? DEFAULT_MISSING;
  // A plain space before AM/PM: newer ICU data puts a narrow no-break space there, which plain text mangles.
  return at
    .toLocaleTimeString('en-US', { hour: 'numeric', minute: '2-digit', timeZone: words.timeZone })
    .replace(/[\u202f\u00a0]/g, ' ');
}

/** "Dec 2, 2026, 3:05 PM" (or "Wed, Dec 2, 2026, 3:05 PM" with `weekday`). A calendar day alone has no time. */
export function formatMoment(value: DateValue, words: DateWords = {}): string {
  if (value === null || value === undefined || value === '') return words.missing ?? DEFAULT_MISSING;
  if (typeof value === 'string' && calendarDay.test(value)) return formatDay(value, words);
  const day = formatDay(value, words);
  if (day === (words.missing ?? DEFAULT_MISSING)) return day;
  return `${day}, ${formatTime(value, words)}`;
}

/** Today as YYYY-MM-DD in the given zone (the runtime's own when left out), for date inputs and comparisons. */
export function todayIso(timeZone?: string, now: Date = new Date()): string {
  // en-CA writes dates as YYYY-MM-DD.
  return now.toLocaleDateString('en-CA', { year: 'numeric', month: '2-digit', day: '2-digit', timeZone });
}
