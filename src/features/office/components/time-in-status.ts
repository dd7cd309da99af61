import { formatMoment } from '@shared/format/dates';
/** "3 d 4 h", "5 h 10 min", "12 min": how long a request has sat in its status, at a glance. */
export function timeInStatus(since: string, now = Date.now()): string {
  const minutes = Math.max(0, Math.floor((now - new Date(since).getTime()) / 60_000));
  if (minutes < 60) return `${minutes} min`;
  const hours = Math.floor(minutes / 60);
  if (hours < 24) return `${hours} h ${minutes % 60} min`;
  const days = Math.floor(hours / 24);
  return `${days} d ${hours % 24} h`;
}

export function formatWhen(iso: string | null): string {
  if (!iso) return '—';
  return formatMoment(iso);
}
