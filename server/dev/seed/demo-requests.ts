import { eq } from 'drizzle-orm';
import type { SubmittedApplication } from '@shared/requests/application-schema';
import type { RequestStatus } from '@shared/workflow/statuses';
import { loadJobCheck } from '../../services/crew/saved-check';
import { verifyReadings } from '../../services/crew/as-built.service';
import { nextReference } from '../../services/requests/reference';
import type { Tx } from '../../db/client';
import { asBuiltSets, gradeChecks, jobs, messages, requestEvents, requests, users } from '../../db/schema';
import { demoScenario, type DemoRequest } from './demo-scenario';
import { currentRules, demoCheck } from './demo-survey';

const mainPath: RequestStatus[] = [
  'draft',
  'submitted',
  'visit_booked',
  'checked',
  'permit_filed',
  'permit_granted',
  'released',
  'crew_assigned',
  'under_construction',
  'built',
  'closed',
];
const sideExits: Partial<Record<RequestStatus, RequestStatus[]>> = {
  needs_details: ['draft', 'submitted', 'needs_details'],
  declined: ['draft', 'submitted', 'declined'],
  withdrawn: ['draft', 'submitted', 'visit_booked', 'withdrawn'],
  permit_refused: ['draft', 'submitted', 'visit_booked', 'checked', 'permit_filed', 'permit_refused'],
};

const pathTo = (status: RequestStatus) => sideExits[status] ?? mainPath.slice(0, mainPath.indexOf(status) + 1);
const reached = (path: RequestStatus[], status: RequestStatus) => path.includes(status);
const byApplicant = new Set<RequestStatus>(['submitted', 'withdrawn']);
const byCrew = new Set<RequestStatus>(['crew_assigned', 'under_construction', 'built']);

type People = Record<string, typeof users.$inferSelect>;
const DAY = 86_400_000;
const isoDate = (d: Date) => d.toISOString().slice(0, 10);

/**
 * The rest of the demo: one request in each status, written as the workflow would have left it (events with
 * their actors, the saved and attached grade check, the permit, the crew job, the as-built set). Skipped per
 * address when already there, so running it again changes nothing.
 */
export async function seedDemoRequests(tx: Tx, now = Date.now()) {
  const people: People = Object.fromEntries((await tx.select().from(users)).map((u) => [u.email.toLowerCase(), u]));
  for (const demo of demoScenario) {
    const [existing] = await tx
      .select({ id: requests.id })
      .from(requests)
      .where(eq(requests.siteAddress, demo.application.site.address));
    if (!existing) await seedOne(tx, people, demo, now);
  }
}

async function seedOne(tx: Tx, people: People, demo: DemoRequest, now: number) {
  const applicant = people[demo.applicant];
  const office = people[demo.office ?? 'priya.lindqvist@gradepass.test'];
  const crew = demo.crew ? people[demo.crew] : undefined;
  const found = await currentRules(tx, demo.jurisdiction);
  if (!applicant || !office || !found) return;
  const path = pathTo(demo.status);
  const day = (offset: number) => new Date(now + (offset - demo.ageDays) * DAY);
  const eventAt = (i: number) => day(i * Math.max(1, Math.floor(demo.ageDays / path.length)));
  const site: SubmittedApplication['site'] = demo.application.site;
  const past = (s: RequestStatus) => reached(path, s) && demo.status !== s;

  const [request] = await tx
    .insert(requests)
    .values({
      reference: await nextReference(tx),
      applicantId: applicant.id,
      status: demo.status,
      version: path.length,
      statusChangedAt: eventAt(path.length - 1),
      createdAt: eventAt(0),
      updatedAt: eventAt(path.length - 1),
      application: demo.application,
      wizardStep: demo.status === 'draft' ? 1 : 3,
      applicantName: applicant.name,
      siteAddress: site.address,
      roadName: site.roadName,
      siteLat: site.siteLat,
      siteLng: site.siteLng,
      jurisdictionId: reached(path, 'submitted') ? found.jurisdictionId : null,
      assigneeId: reached(path, 'submitted') && demo.status !== 'submitted' ? office.id : null,
      crewId: reached(path, 'crew_assigned') ? crew?.id : null,
      submittedAt: reached(path, 'submitted') ? eventAt(1) : null,
      visitAt: reached(path, 'visit_booked')
        ? demo.status === 'visit_booked'
          ? day(demo.ageDays + 3)
          : eventAt(3)
        : null,
      permitReference: reached(path, 'permit_filed') ? demo.permitReference : null,
      permitDecidedOn: past('permit_filed') ? isoDate(eventAt(5)) : null,
      permitConditions: past('permit_filed') ? demo.permitConditions : null,
      permitExpiresOn:
        past('permit_filed') && demo.status !== 'permit_refused' ? isoDate(day(demo.ageDays + 300)) : null,
    })
    .returning();

  for (let i = 1; i < path.length; i++) {
    const to = path[i];
    const actor = byApplicant.has(to) ? applicant : byCrew.has(to) ? (crew ?? office) : office;
    await tx.insert(requestEvents).values({
      requestId: request.id,
      actorId: actor.id,
      fromStatus: path[i - 1],
      toStatus: to,
      note: demo.notes?.[to] ?? '',
      createdAt: eventAt(i),
    });
  }
  for (const message of demo.messages ?? []) {
    const author = people[message.from];
    if (author)
      await tx.insert(messages).values({
        requestId: request.id,
        authorId: author.id,
        visibility: message.visibility,
        body: message.body,
        createdAt: day(demo.ageDays - 1),
      });
  }
  if (!reached(path, 'checked') || !demo.site) return;

  const check = await demoCheck(found.rules, demo.site);
  const [saved] = await tx
    .insert(gradeChecks)
    .values({
      requestId: request.id,
      number: 1,
      ruleProfileVersionId: found.versionId,
      ...check,
      createdAt: eventAt(3),
      attachedAt: eventAt(3),
      createdById: office.id,
    })
    .returning();
  if (!reached(path, 'released')) return;
  await tx.insert(jobs).values({
    requestId: request.id,
    gradeCheckId: saved.id,
    releasedAt: eventAt(6),
    crewId: reached(path, 'crew_assigned') ? crew?.id : null,
    acceptedAt: reached(path, 'crew_assigned') ? eventAt(7) : null,
    scheduledFor: reached(path, 'crew_assigned')
      ? isoDate(demo.status === 'crew_assigned' ? day(demo.ageDays + 6) : eventAt(8))
      : null,
    startedAt: reached(path, 'under_construction') ? eventAt(8) : null,
    builtAt: reached(path, 'built') ? eventAt(9) : null,
  });
  if (!reached(path, 'built') || !crew) return;
  const jobCheck = await loadJobCheck(tx, request.id);
  if (!jobCheck) return;
  // Finished grades a little off the design, as a digital level reads them: inside the limits and tolerance.
  const readings = jobCheck.designPoints.slice(1).map((point, i) => {
    const prev = jobCheck.designPoints[i];
    const grade = ((point.elevationFt - prev.elevationFt) / (point.stationFt - prev.stationFt)) * 100;
    return { stationFt: (prev.stationFt + point.stationFt) / 2, gradePercent: Math.round((grade + 0.1) * 10) / 10 };
  });
  const verdict = verifyReadings(jobCheck, readings);
  await tx.insert(asBuiltSets).values({
    requestId: request.id,
    gradeCheckId: saved.id,
    crewId: crew.id,
    readings,
    results: { readings: verdict.readings, status: verdict.status, ruleProfileVersionId: jobCheck.ruleProfile.id },
    passed: verdict.passes,
    note: verdict.passes ? '' : 'Within a hair of the limit; the inspector has seen it.',
    createdAt: eventAt(9),
  });
}
