import { z } from 'zod';

// Limits are compared after rounding to 1e-9 so that 17.000000000000004% (floating noise from
// elevation differences) is "at the limit", not over it.
const SNAP = 1e9;
export const snap = (value: number): number => Math.round(value * SNAP) / SNAP;

export const roundTo = (value: number, places: number): number => {
  const f = 10 ** places;
  return Math.round(value * f) / f;
};

export const roundUpTo = (value: number, step: number): number => Math.ceil(snap(value / step)) * step;

/** Finite number within a range that keeps every formula downstream finite. */
export const bounded = (min: number, max: number) => z.number().min(min).max(max);
export const positive = (max: number) => z.number().positive().max(max);
export const nonNegative = (max: number) => z.number().min(0).max(max);

// Station and elevation ranges wide enough for any driveway and any datum, narrow enough to never overflow.
export const stationFt = () => bounded(-10_000, 100_000);
export const elevationFt = () => bounded(-2_000, 30_000);
export const gradePercent = () => bounded(-100, 100);
