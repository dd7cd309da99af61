import { eq } from 'drizzle-orm';
import { statusText } from '@shared/workflow/statuses';
import type { ScheduleJobInput } from '@shared/crew/crew-inputs';
import type { SessionUser } from '../../lib/session-user';
import { jobs, requestEvents, requests, users } from '../../db/schema';
import { badRequest, conflict } from '../../lib/errors';
import { enqueueEmails } from '../email/outbox';
import { dayInWords, scheduleEmails } from '../email/schedule-emails';
import { calendarAttachment, workDayUid } from '../email/calendar-invite';
import { loadVisibleRequest } from '../requests/request-access';
import type { TransitionContext } from '../transitions/apply-transition';

const DAY_MS = 86_400_000;
const isoDay = (ms: number) => new Date(ms).toISOString().slice(0, 10);

/** A day the crew can still work on under the permit; one day of slack covers a crew west of UTC at night. */
function checkDate(date: string, permitExpiresOn: string | null, now: Date) {
  if (date < isoDay(now.getTime() - DAY_MS))
    throw badRequest('The work cannot be planned in the past.', { date: 'must be today or a later day' });
  if (date > isoDay(now.getTime() + 400 * DAY_MS))
    throw badRequest('Plan the work within the next 13 months.', { date: 'must be within the next 13 months' });
  if (permitExpiresOn && date > permitExpiresOn) {
    throw badRequest(`The permit expires on ${dayInWords(permitExpiresOn)}.`, {
      date: `must be on or before the permit's expiry, ${dayInWords(permitExpiresOn)}`,
    });
  }
}

/**
 * Planning the day is not a status change, but it is written like one: the job row, an event for the timeline
 * and the homeowner's e-mail in one transaction, with the request row locked so it cannot move under us.
 */
export async function scheduleJob(
  ctx: TransitionContext,
  crew: SessionUser,
  requestId: string,
  input: ScheduleJobInput,
  now = new Date(),
) {
  return ctx.db.transaction(async (tx) => {
    const row = await loadVisibleRequest(tx, crew, requestId, { forUpdate: true });
    if (row.status !== 'crew_assigned' || row.crewId !== crew.id) {
      throw conflict(
        `This job is "${statusText[row.status].label}"; only a job you have taken and not yet started can be planned.`,
      );
    }
    checkDate(input.date, row.permitExpiresOn, now);
    const [job] = await tx
      .select({ scheduledFor: jobs.scheduledFor, sequence: jobs.workDaySequence })
      .from(jobs)
      .where(eq(jobs.requestId, row.id));
    const previous = job?.scheduledFor ?? null;
    const sequence = job?.sequence ?? 0;
    await tx
      .update(jobs)
      .set({ scheduledFor: input.date, workDaySequence: sequence + 1 })
      .where(eq(jobs.requestId, row.id));
    await tx.update(requests).set({ updatedAt: now }).where(eq(requests.id, row.id));
    const note = input.note ?? '';
    const [event] = await tx
      .insert(requestEvents)
      .values({
        requestId: row.id,
        actorId: crew.id,
        kind: 'work-day-planned',
        note: `Work planned for ${dayInWords(input.date)}.${note ? ` ${note}` : ''}`,
      })
      .returning({ id: requestEvents.id });
    const [applicant] = await tx
      .select({ email: users.email, name: users.name })
      .from(users)
      .where(eq(users.id, row.applicantId));
    const emails = scheduleEmails({
      request: row,
      applicant,
      crew,
      officeEmail: ctx.env.OFFICE_EMAIL,
      date: input.date,
      previousDate: previous,
      note,
      appOrigin: ctx.env.APP_ORIGIN,
    });
    // The owner's e-mail carries the work day's one invitation: the same id each time the day moves.
    const invite = calendarAttachment({
      uid: workDayUid(row.id),
      sequence,
      cancelled: false,
      when: { day: input.date },
      title: `Driveway entrance work (${row.reference})`,
      description: `${crew.name}'s crew builds the entrance. Keep the entrance area clear of vehicles that day.`,
      location: row.siteAddress,
      organizer: { name: 'Gradepass office', email: ctx.env.OFFICE_EMAIL },
    });
    await enqueueEmails(
      tx,
      emails.map((e) => ({
        ...e,
        eventId: event.id,
        ...(e.to === applicant.email ? { attachments: [invite] } : {}),
      })),
    );
    return { scheduledFor: input.date, previousDate: previous };
  });
}
