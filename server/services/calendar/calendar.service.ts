import { and, asc, eq, gte, inArray, lt } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import type { CalendarEntry, CalendarQuery } from '@shared/contracts/calendar';
import type { DbOrTx } from '../../db/client';
import { jobs, requests, users } from '../../db/schema';

const dayMs = 86_400_000;

/**
 * Booked site visits and planned work days between two days, for the office's calendar. Visits are read a day
 * either side, since the day a moment falls on depends on the reader's time zone; the screen places each one.
 */
export async function calendarEntries(db: DbOrTx, q: CalendarQuery): Promise<CalendarEntry<Date>[]> {
  const from = new Date(Date.parse(`${q.from}T00:00:00Z`) - dayMs);
  const to = new Date(Date.parse(`${q.to}T00:00:00Z`) + 2 * dayMs);
  const assignee = alias(users, 'assignee');
  const visits = await db
    .select({
      requestId: requests.id,
      reference: requests.reference,
      siteAddress: requests.siteAddress,
      applicantName: requests.applicantName,
      status: requests.status,
      at: requests.visitAt,
      assigneeName: assignee.name,
    })
    .from(requests)
    .leftJoin(assignee, eq(assignee.id, requests.assigneeId))
    .where(and(eq(requests.status, 'visit_booked'), gte(requests.visitAt, from), lt(requests.visitAt, to)))
    .orderBy(asc(requests.visitAt))
    .limit(500);
  const crewLead = alias(users, 'crew_lead');
  const days = await db
    .select({
      requestId: requests.id,
      reference: requests.reference,
      siteAddress: requests.siteAddress,
      applicantName: requests.applicantName,
      status: requests.status,
      day: jobs.scheduledFor,
      crewLeadName: crewLead.name,
    })
    .from(jobs)
    .innerJoin(requests, eq(requests.id, jobs.requestId))
    .leftJoin(crewLead, eq(crewLead.id, jobs.crewId))
    .where(
      and(
        inArray(requests.status, ['crew_assigned', 'under_construction']),
        gte(jobs.scheduledFor, q.from),
        lt(jobs.scheduledFor, new Date(Date.parse(`${q.to}T00:00:00Z`) + dayMs).toISOString().slice(0, 10)),
      ),
    )
    .orderBy(asc(jobs.scheduledFor))
    .limit(500);
  return [
    ...visits.map((v) => ({ ...v, kind: 'visit' as const, at: v.at! })),
    ...days.map((d) => ({ ...d, kind: 'work-day' as const, day: d.day! })),
  ];
}
