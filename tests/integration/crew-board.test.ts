import { and, eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { emails, jobs, requestEvents, requests } from '../../server/db/schema';
import { createReleasedJob } from '../factories/crew-jobs';
import { type Cast, withCastApp } from '../factories/office-cast';
import type { TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
withCastApp((app, signedIn) => {
  t = app;
  cast = signedIn;
});

const newJob = (o: Partial<Parameters<typeof createReleasedJob>[1]> = {}) =>
  createReleasedJob(t.ctx.db, { applicantId: cast.applicant.id, staffId: cast.staff.id, ...o });
type BoardJob = {
  requestId: string;
  distanceMiles: number | null;
  wanted: { wantedBy: string | null };
  earthwork: { truckLoads: number; cutCuYd: number } | null;
  permit: { conditions: string };
};
const ids = (list: BoardJob[], among: string[]) => list.map((j) => j.requestId).filter((id) => among.includes(id));

describe('the board', () => {
  it('shows permit, check summary, earthwork and the wanted-by date; sorts by date or by distance from the yard', async () => {
    // Invented places: the yard near Harlow, jobs 3, 12 and 30-odd miles out, one with no coordinates.
    const near = await newJob({ siteLat: 44.03, siteLng: -72.6, timing: 'this_year' });
    const far = await newJob({ siteLat: 44.45, siteLng: -72.6, timing: 'soon' });
    const mid = await newJob({ siteLat: 44.17, siteLng: -72.6, timing: 'within_3_months' });
    const unknown = await newJob({ timing: 'flexible' });
    const all = [near.id, far.id, mid.id, unknown.id];

    await cast.admin.agent.put('/api/crew/yard').send({ label: 'Harlow yard', lat: 44, lng: -72.6 }).expect(200);
    const byDistance = await cast.crew.agent.get('/api/crew/board?sort=distance').expect(200);
    expect(byDistance.body.yard).toMatchObject({ label: 'Harlow yard' });
    expect(ids(byDistance.body.jobs, all)).toEqual([near.id, mid.id, far.id, unknown.id]);
    const miles = (id: string) => byDistance.body.jobs.find((j: BoardJob) => j.requestId === id).distanceMiles;
    expect(miles(near.id)).toBeCloseTo(2.1, 0);
    expect(miles(far.id)).toBeCloseTo(31.1, 0);
    expect(miles(unknown.id)).toBeNull();

    const byDate = await cast.crew.agent.get('/api/crew/board').expect(200);
    // Sent 2 Nov 2026: soon = that day, this year = 31 Dec, within three months = 2 Feb 2027, no hurry last.
    expect(ids(byDate.body.jobs, all)).toEqual([far.id, near.id, mid.id, unknown.id]);
    const card: BoardJob = byDate.body.jobs.find((j: BoardJob) => j.requestId === far.id);
    expect(card.wanted.wantedBy).toBe('2026-11-02');
    expect(card.permit.conditions).toContain('Culvert 18 in');
    expect(card.earthwork?.truckLoads).toBeGreaterThan(0);
    expect(card.earthwork?.cutCuYd).toBeGreaterThan(0);
  });

  it('only the owner sets the yard', async () => {
    expect((await cast.staff.agent.put('/api/crew/yard').send({ label: 'Mine', lat: 1, lng: 1 })).status).toBe(403);
    expect((await cast.crew.agent.put('/api/crew/yard').send({ label: 'Mine', lat: 1, lng: 1 })).status).toBe(403);
  });
});

describe('taking, planning and handing back', () => {
  it('plans the day: the homeowner is e-mailed in the same transaction, with an event for the timeline', async () => {
    const job = await newJob({ permitExpiresOn: '2027-03-01' });
    const crew = cast.crew.agent;
    await crew.post(`/api/crew/jobs/${job.id}/accept`).send({ expectedVersion: job.version }).expect(200);
    const late = await crew.post(`/api/crew/jobs/${job.id}/schedule`).send({ date: '2027-03-02' });
    expect(late.status).toBe(400);
    expect(late.body.error.fields.date).toMatch(/expiry/);
    const past = await crew.post(`/api/crew/jobs/${job.id}/schedule`).send({ date: '2020-01-01' });
    expect(past.body.error.fields.date).toMatch(/today/);

    const date = new Date(Date.now() + 10 * 86_400_000).toISOString().slice(0, 10);
    await crew
      .post(`/api/crew/jobs/${job.id}/schedule`)
      .send({ date, note: 'Bringing the small excavator.' })
      .expect(200);
    const [row] = await t.ctx.db.select().from(jobs).where(eq(jobs.requestId, job.id));
    expect(row.scheduledFor).toBe(date);
    const [event] = await t.ctx.db
      .select()
      .from(requestEvents)
      .where(and(eq(requestEvents.requestId, job.id), eq(requestEvents.kind, 'work-day-planned')));
    const mail = await t.ctx.db
      .select()
      .from(emails)
      .where(and(eq(emails.requestId, job.id), eq(emails.template, 'crew.schedule')));
    const toHomeowner = mail.find((m) => m.toAddress === cast.applicant.email);
    expect(toHomeowner?.eventId).toBe(event.id);
    expect(toHomeowner?.textBody).toContain('Bringing the small excavator.');
    expect(toHomeowner?.subject).toMatch(/work planned for/);

    const mine = await crew.get('/api/crew/my-jobs').expect(200);
    expect(mine.body.jobs.find((j: { requestId: string }) => j.requestId === job.id)).toMatchObject({
      status: 'crew_assigned',
      scheduledFor: date,
    });
  });

  it('handing back before work starts puts the job back on the board for every crew', async () => {
    const job = await newJob();
    const crew = cast.crew.agent;
    await crew.post(`/api/crew/jobs/${job.id}/accept`).send({ expectedVersion: job.version }).expect(200);
    const off = await cast.crew.agent.get('/api/crew/board').expect(200);
    expect(ids(off.body.jobs, [job.id])).toEqual([]);
    const noNote = await crew.post(`/api/crew/jobs/${job.id}/hand-back`).send({ expectedVersion: job.version + 1 });
    expect(noNote.body.error.fields).toHaveProperty('note');
    await crew
      .post(`/api/crew/jobs/${job.id}/hand-back`)
      .send({ expectedVersion: job.version + 1, note: 'Machine is in the shop this month.' })
      .expect(200);
    const [row] = await t.ctx.db.select().from(requests).where(eq(requests.id, job.id));
    expect(row).toMatchObject({ status: 'released', crewId: null });
    const on = await cast.crew.agent.get('/api/crew/board').expect(200);
    expect(ids(on.body.jobs, [job.id])).toEqual([job.id]);
  });

  it('cannot hand back once work has started', async () => {
    const job = await newJob();
    const crew = cast.crew.agent;
    await crew.post(`/api/crew/jobs/${job.id}/accept`).send({ expectedVersion: job.version }).expect(200);
    await crew
      .post(`/api/crew/jobs/${job.id}/start`)
      .send({ expectedVersion: job.version + 1 })
      .expect(200);
    const res = await crew
      .post(`/api/crew/jobs/${job.id}/hand-back`)
      .send({ expectedVersion: job.version + 2, note: 'Too hard' });
    expect(res.status).toBe(409);
  });

  it('the field sheet carries the laser setups, stakes, culvert, design and cautions from the saved check', async () => {
    const job = await newJob();
    const sheet = await cast.crew.agent.get(`/api/crew/jobs/${job.id}/field-sheet`).expect(200);
    const s = sheet.body;
    expect(s.laser.first.description).toContain('rising away from the road');
    expect(s.laser.first).toMatchObject({ alongRoadPercent: -1.2, alongDrivewayPercent: 2.5 });
    expect(s.laser.second.alongDrivewayPercent).toBe(12);
    // The second setup keeps the first's tilt across the driveway, so the two meet along the change line.
    expect(s.laser.second.alongRoadPercent).toBe(-1.2);
    expect(s.laser.warp).toBeNull();
    expect(s.laser.receiverOffsetFt).toBe(5);
    expect(s.laser.stakes.map((k: { instruction: string }) => k.instruction)).toEqual([
      'cut 0.38 ft',
      'fill 0.30 ft',
      'cut 0.90 ft',
    ]);
    expect(s.culvert).toMatchObject({
      diameterIn: 18,
      lengthFt: 26,
      lengthIsMinimum: true,
      inletInvertFt: 97.4,
      outletInvertFt: 97.1,
    });
    expect(s.culvert.coverIn).toBeCloseTo(13.2, 5);
    expect(s.design.points).toHaveLength(5);
    expect(s.design.cutFill[1]).toMatchObject({ stationFt: 20 });
    expect(s.design.cutFill[1].cutFillFt).toBeCloseTo(1.1, 6);
    expect(s.cautions.join(' ')).toMatch(/buried utilities.*trench.*right-of-way.*inspection prevails/s);
    expect(s.access.notes).toContain('Gate code');
  });
});
