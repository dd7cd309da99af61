import { z } from 'zod';
import { dayInput } from '../workflow/dates';
import type { RequestStatus } from '../workflow/statuses';
import type { Moment } from './wire';

/** GET /api/calendar?from=&to=: the days shown, at most about six weeks at once. */
export const calendarQuerySchema = z
  .object({
    from: dayInput('First day: pick a day, e.g. 2026-12-01'),
    to: dayInput('Last day: pick a day, e.g. 2026-12-31'),
  })
  .refine((q) => q.from <= q.to, { path: ['to'], message: 'Last day: must be on or after the first day' })
  .refine((q) => (Date.parse(q.to) - Date.parse(q.from)) / 86_400_000 <= 62, {
    path: ['to'],
    message: 'Last day: show at most 62 days at once',
  });
export type CalendarQuery = z.infer<typeof calendarQuerySchema>;

/** One thing on the calendar: the office's site visit (a moment) or a crew's work day (a day). */
export type CalendarEntry<M extends Moment = string> = {
  requestId: string;
  reference: string;
  siteAddress: string;
  applicantName: string;
  status: RequestStatus;
} & (
  { kind: 'visit'; at: M; assigneeName: string | null } | { kind: 'work-day'; day: string; crewLeadName: string | null }
);

export interface CalendarAnswer<M extends Moment = string> {
  entries: CalendarEntry<M>[];
}
