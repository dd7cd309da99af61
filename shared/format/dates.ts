/**
 * Dates as people read them: "Dec 2, 2026". A bare day (YYYY-MM-DD) is read as that calendar day wherever the reader
 * is; a moment is shown in the reader's own time zone unless one is given.
 */
export function formatDay(value: string | Date | null | undefined, timeZone?: string): string {
  if (value === null || value === undefined || value === '') return '—';
  const bareDay = typeof value === 'string' && /^\d{4}-\d{2}-\d{2}$/.test(value);
  const date = bareDay ? new Date(`${value}T12:00:00Z`) : new Date(value);
  if (Number.isNaN(date.getTime())) return '—';
  return date.toLocaleDateString('en-US', {
    month: 'short',
    day: 'numeric',
    year: 'numeric',
    timeZone: bareDay ? 'UTC' : timeZone,
  });
}

/** "Dec 2, 2026, 3:05 PM". */
export function formatMoment(value: string | Date | null | undefined, timeZone?: string): string {
  if (value === null || value === undefined || value === '') return '—';
  const date = new Date(value);
  if (Number.isNaN(date.getTime())) return '—';
  return date.toLocaleString('en-US', {
    month: 'short',
    day: 'numeric',
    year: 'numeric',
    hour: 'numeric',
    minute: '2-digit',
    timeZone,
  });
}
