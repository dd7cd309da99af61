import { formatStation } from '@shared/engine';

/** Numbers the way a crew reads them off a sheet: fixed places, a real minus sign, units spelled short. */
export const ft = (v: number, places = 2) => `${v < 0 ? '−' : ''}${Math.abs(v).toFixed(places)} ft`;
export const pct = (v: number, places = 2) => `${v < 0 ? '−' : ''}${Math.abs(v).toFixed(places)}%`;
export const cuYd = (v: number) => `${Math.round(v)} cu yd`;
export const station = (v: number) => formatStation(v);

export function day(iso: string | null | undefined): string {
  if (!iso) return '—';
  const d = iso.length === 10 ? new Date(`${iso}T12:00:00Z`) : new Date(iso);
  return d.toLocaleDateString('en-US', {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    timeZone: iso.length === 10 ? 'UTC' : undefined,
  });
}

export function cutFillWords(cutFillFt: number): string {
  if (Math.abs(cutFillFt) < 0.005) return 'on grade';
  return `${cutFillFt > 0 ? 'cut' : 'fill'} ${Math.abs(cutFillFt).toFixed(2)} ft`;
}

/** Today as YYYY-MM-DD in the person's own time zone, for date inputs. */
export function todayLocal(): string {
  const now = new Date();
  return new Date(now.getTime() - now.getTimezoneOffset() * 60_000).toISOString().slice(0, 10);
}

/** A moment as people read it: "Dec 2, 2026, 3:05 PM", in the phone's own time zone. */
export function formatDateTime(iso: string): string {
  const d = new Date(iso);
  if (Number.isNaN(d.getTime())) return '—';
  return d.toLocaleString('en-US', {
    month: 'short',
    day: 'numeric',
    year: 'numeric',
    hour: 'numeric',
    minute: '2-digit',
  });
}
