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
