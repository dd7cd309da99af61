/**
 * How people read dates and times everywhere (screens, e-mails, documents): "Dec 2, 2026" and "9:30 AM". A day
 * without a time ("2026-12-02") is read as that calendar day wherever the reader is.
 */
const dayFormat = (timeZone?: string) =>
  new Intl.DateTimeFormat('en-US', { month: 'short', day: 'numeric', year: 'numeric', timeZone });
const timeFormat = (timeZone?: string) =>
  new Intl.DateTimeFormat('en-US', { hour: 'numeric', minute: '2-digit', timeZone });

const isDayOnly = (value: string) => /^\d{4}-\d{2}-\d{2}$/.test(value);

/** "Dec 2, 2026". A plain day string is taken as that day, not as midnight UTC. */
export function formatDay(value: Date | string, timeZone?: string): string {
  if (typeof value === 'string' && isDayOnly(value)) return dayFormat('UTC').format(new Date(`${value}T00:00:00Z`));
  return dayFormat(timeZone).format(new Date(value));
}

/** "9:30 AM", with a plain space (newer ICU data puts a narrow no-break space before AM, which plain text mangles). */
export function formatTime(value: Date | string, timeZone?: string): string {
  return timeFormat(timeZone)
    .format(new Date(value))
    .replace(/[\u202f\u00a0]/g, ' ');
}

/** "Dec 2, 2026 at 9:30 AM". */
export function formatMoment(value: Date | string, timeZone?: string): string {
  return `${formatDay(value, timeZone)} at ${formatTime(value, timeZone)}`;
}
