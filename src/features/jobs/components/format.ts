import { formatDay, todayIso } from '@shared/format/dates';
import { formatStation } from '@shared/engine';

/** Numbers the way a crew reads them off a sheet: fixed places, a real minus sign, units spelled short. */
export const ft = (v: number, places = 2) => `${v < 0 ? '−' : ''}${Math.abs(v).toFixed(places)} ft`;
export const pct = (v: number, places = 2) => `${v < 0 ? '−' : ''}${Math.abs(v).toFixed(places)}%`;
export const cuYd = (v: number) => `${Math.round(v)} cu yd`;
export const station = (v: number) => formatStation(v);

/** A work day or a permit date, with its weekday: "Wed, Dec 2, 2026" (the shared formatter). */
export const day = (iso: string | null | undefined): string => formatDay(iso, { weekday: true });

export function cutFillWords(cutFillFt: number): string {
  if (Math.abs(cutFillFt) < 0.005) return 'on grade';
  return `${cutFillFt > 0 ? 'cut' : 'fill'} ${Math.abs(cutFillFt).toFixed(2)} ft`;
}

/** Today as YYYY-MM-DD in the person's own time zone, for date inputs. */
export const todayLocal = (): string => todayIso();
