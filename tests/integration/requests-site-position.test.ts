import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { jobs, requests } from '../../server/db/schema';
import { signInCast, type Cast } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import { createTestApp, type TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
beforeAll(async () => {
  t = await createTestApp();
  cast = await signInCast(t);
});
afterAll(() => t.close());

const url = (id: string) => `/api/requests/${id}/site-position`;

describe('the office sets the site position', () => {
  it('stores it on the request, where the crews’ board reads it, and notes it in the office’s history', async () => {
    const request = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'visit_booked' });
    const res = await cast.staff.agent.put(url(request.id)).send({ lat: 44.26157, lng: -72.57538 }).expect(200);
    expect(res.body.request).toMatchObject({ siteLat: 44.26157, siteLng: -72.57538 });
    const [row] = await t.ctx.db.select().from(requests).where(eq(requests.id, request.id));
    expect([row.siteLat, row.siteLng]).toEqual([44.26157, -72.57538]);
    const events = (await cast.staff.agent.get(`/api/requests/${request.id}/events`).expect(200)).body.events;
    expect(JSON.stringify(events)).toMatch(/Site position set to 44\.26157, -72\.57538/);
    // The owner's history does not show the office's bookkeeping.
    const theirs = (await cast.applicant.agent.get(`/api/requests/${request.id}/events`).expect(200)).body.events;
    expect(JSON.stringify(theirs)).not.toMatch(/Site position set/);
  });

  it('refuses a position out of range or not a number, naming the box by its label', async () => {
    const request = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'submitted' });
    const far = await cast.staff.agent.put(url(request.id)).send({ lat: 95, lng: -200 }).expect(400);
    expect(far.body.error.fields.lat).toBe('Latitude is between -90 and 90.');
    expect(far.body.error.fields.lng).toBe('Longitude is between -180 and 180.');
    const words = await cast.staff.agent.put(url(request.id)).send({ lat: 'north', lng: null }).expect(400);
    expect(words.body.error.fields.lat).toMatch(/^Latitude: enter a number in decimal degrees/);
    expect(words.body.error.fields.lng).toMatch(/^Longitude: enter a number/);
  });

  it('is the office’s to set, and a request nobody can see answers 404', async () => {
    const request = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'submitted' });
    await cast.applicant.agent.put(url(request.id)).send({ lat: 44, lng: -72 }).expect(403);
    await cast.crew.agent.put(url(request.id)).send({ lat: 44, lng: -72 }).expect(403);
    await cast.staff.agent.put(url('00000000-0000-4000-8000-000000000000')).send({ lat: 44, lng: -72 }).expect(404);
  });
});

describe('the request as read', () => {
  it('gives the office the crew lead and the work day, and the owner the work day', async () => {
    const request = await createRequestRow(t.ctx.db, {
      applicantId: cast.applicant.id,
      status: 'crew_assigned',
      crewId: cast.crew.id,
    });
    await t.ctx.db
      .update(jobs)
      .set({ crewId: cast.crew.id, scheduledFor: '2026-12-09' })
      .where(eq(jobs.requestId, request.id));
    const office = (await cast.staff.agent.get(`/api/requests/${request.id}`).expect(200)).body.request;
    expect(office.workDay).toBe('2026-12-09');
    expect(typeof office.crewLeadName).toBe('string');
    expect(office.crewLeadName.length).toBeGreaterThan(0);
    const owner = (await cast.applicant.agent.get(`/api/requests/${request.id}`).expect(200)).body.request;
    expect(owner.workDay).toBe('2026-12-09');
    expect(owner).not.toHaveProperty('crewLeadName');
  });
});
