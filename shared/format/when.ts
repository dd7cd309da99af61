import { formatDay as day, formatTime as time } from './dates';

/**
 * Visit and work-day times as the calendar screens and invitations say them: "Dec 2, 2026", "9:30 AM" and
 * "Dec 2, 2026 at 9:30 AM", in the given time zone (the runtime's own when left out). The words themselves come from
 * `shared/format/dates.ts`, the one formatter of dates.
 */
export function formatDay(value: Date | string, timeZone?: string): string {
  return day(value, { timeZone });
}

/** "9:30 AM". */
export function formatTime(value: Date | string, timeZone?: string): string {
  return time(value, { timeZone });
}

/** "Dec 2, 2026 at 9:30 AM". */
export function formatMoment(value: Date | string, timeZone?: string): string {
  return `${formatDay(value, timeZone)} at ${formatTime(value, timeZone)}`;
}
