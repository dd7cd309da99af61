import { z } from 'zod';

// Dates a permit, a visit or a work day can have. The ISO forms allow year 0000, which PostgreSQL cannot store, and
// a typo such as 0226 or 20266 is better caught by the form than saved.
const plausibleYear = (text: string) => {
  const year = Number(text.slice(0, 4));
  return year >= 1900 && year <= 2999;
};
const yearMessage = 'must be in a year between 1900 and 2999';

export const dayInput = (message: string) => z.iso.date(message).refine(plausibleYear, yearMessage);
export const momentInput = (message: string) =>
  z.iso.datetime({ offset: true, message }).refine(plausibleYear, yearMessage);

/** A day as people read it on screen: "Dec 2, 2026". Plain dates (YYYY-MM-DD) are read as that day wherever one is. */
export function dateInWords(value: string | Date | null | undefined): string {
  if (!value) return '—';
  const plain = typeof value === 'string' && value.length === 10;
  const at = plain ? new Date(`${value}T12:00:00Z`) : new Date(value);
  return at.toLocaleDateString('en-US', {
    month: 'short',
    day: 'numeric',
    year: 'numeric',
    ...(plain ? { timeZone: 'UTC' } : {}),
  });
}
