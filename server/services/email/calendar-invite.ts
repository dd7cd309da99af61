import { createEvent, type DateTime, type EventAttributes } from 'ics';
import type { EmailAttachment } from '../../db/schema';

/** A visit at a moment (an hour long), or a work day (the whole day). */
export type InviteWhen = { at: Date; minutes: number } | { day: string };

export interface CalendarInvite {
  /** Stable for the one visit or work day, so each update or cancellation replaces the same calendar entry. */
  uid: string;
  /** 0 when first sent, raised with every update; calendars ignore an invitation older than the one they hold. */
  sequence: number;
  cancelled: boolean;
  when: InviteWhen;
  title: string;
  description: string;
  location: string;
  organizer: { name: string; email: string };
}

const dayParts = (day: string): DateTime => {
  const [y, m, d] = day.split('-').map(Number);
  return [y, m, d];
};
const nextDay = (day: string): DateTime => {
  const next = new Date(`${day}T00:00:00Z`);
  next.setUTCDate(next.getUTCDate() + 1);
  return [next.getUTCFullYear(), next.getUTCMonth() + 1, next.getUTCDate()];
};

/** The invitation as an `.ics` file (iCalendar, RFC 5545), made by the `ics` package. */
export function calendarAttachment(invite: CalendarInvite): EmailAttachment {
  const timing: Pick<EventAttributes, 'start' | 'startInputType' | 'startOutputType'> &
    ({ end: DateTime } | { duration: { minutes: number } }) =
    'day' in invite.when
      ? { start: dayParts(invite.when.day), end: nextDay(invite.when.day) }
      : {
          start: invite.when.at.getTime(),
          startInputType: 'utc',
          startOutputType: 'utc',
          duration: { minutes: invite.when.minutes },
        };
  const method = invite.cancelled ? 'CANCEL' : 'REQUEST';
  const { error, value } = createEvent({
    ...timing,
    productId: 'gradepass/calendar',
    method,
    uid: invite.uid,
    sequence: invite.sequence,
    status: invite.cancelled ? 'CANCELLED' : 'CONFIRMED',
    title: invite.title,
    description: invite.description,
    location: invite.location,
    organizer: invite.organizer,
  } as EventAttributes);
  if (error || !value) throw error ?? new Error('the calendar invitation could not be made');
  return {
    filename: invite.cancelled ? 'cancelled.ics' : 'invite.ics',
    contentType: `text/calendar; charset=utf-8; method=${method}`,
    content: value,
  };
}

/** The invitation's id for a request's site visit, and for its work day: one each, whatever the date becomes. */
export const visitUid = (requestId: string) => `visit-${requestId}@gradepass`;
export const workDayUid = (requestId: string) => `work-day-${requestId}@gradepass`;
