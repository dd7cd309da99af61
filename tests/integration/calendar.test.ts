import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { jobs } from '../../server/db/schema';
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

describe('the office calendar', () => {
  it('lists booked visits and planned work days in the days asked for, and nothing outside them', async () => {
    const visit = await createRequestRow(t.ctx.db, {
      applicantId: cast.applicant.id,
      status: 'visit_booked',
      visitAt: new Date('2027-03-10T14:30:00Z'),
    });
    const later = await createRequestRow(t.ctx.db, {
      applicantId: cast.applicant.id,
      status: 'visit_booked',
      visitAt: new Date('2027-05-10T14:30:00Z'),
    });
    const work = await createRequestRow(t.ctx.db, {
      applicantId: cast.applicant.id,
      status: 'crew_assigned',
      crewId: cast.crew.id,
    });
    await t.ctx.db.update(jobs).set({ scheduledFor: '2027-03-12' }).where(eq(jobs.requestId, work.id));

    const res = await cast.staff.agent.get('/api/calendar?from=2027-03-01&to=2027-03-31').expect(200);
    const entries = res.body.entries as { kind: string; requestId: string; at?: string; day?: string }[];
    expect(entries.find((e) => e.requestId === visit.id)).toMatchObject({
      kind: 'visit',
      at: '2027-03-10T14:30:00.000Z',
    });
    expect(entries.find((e) => e.requestId === work.id)).toMatchObject({ kind: 'work-day', day: '2027-03-12' });
    expect(entries.some((e) => e.requestId === later.id)).toBe(false);
  });

  it('is the office’s, and a bad range names the box in plain words', async () => {
    await cast.applicant.agent.get('/api/calendar?from=2027-03-01&to=2027-03-31').expect(403);
    await cast.crew.agent.get('/api/calendar?from=2027-03-01&to=2027-03-31').expect(403);
    const backwards = await cast.staff.agent.get('/api/calendar?from=2027-03-31&to=2027-03-01').expect(400);
    expect(backwards.body.error.fields.to).toBe('Last day: must be on or after the first day');
    const long = await cast.staff.agent.get('/api/calendar?from=2027-01-01&to=2027-12-31').expect(400);
    expect(long.body.error.fields.to).toMatch(/at most 62 days/);
    const missing = await cast.staff.agent.get('/api/calendar').expect(400);
    expect(Object.keys(missing.body.error.fields).sort()).toEqual(['from', 'to']);
  });
});
