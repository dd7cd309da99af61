import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { requests } from '../../server/db/schema';
import { seedDemo } from '../../server/dev/seed';
import { seedDemoJobs } from '../../server/dev/seed/demo-jobs';
import { signInCast, type Cast } from '../factories/office-cast';
import { createTestApp, type TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
beforeAll(async () => {
  t = await createTestApp();
  cast = await signInCast(t);
  // The whole demo seed (people, authorities, requests, this job), then the job's seed again: it must not repeat.
  await seedDemo(t.ctx.db);
  await seedDemoJobs(t.ctx.db);
});
afterAll(() => t.close());

describe('the demo job a fresh start puts on the board', () => {
  it('is there once, released, with a passing check and a field sheet to build from', async () => {
    const rows = await t.ctx.db
      .select()
      .from(requests)
      .where(eq(requests.siteAddress, '57 Juniper Ridge Road, Marrow Crossing'));
    expect(rows).toHaveLength(1);
    const board = await cast.crew.agent.get('/api/crew/board').expect(200);
    const job = board.body.jobs.find((j: { requestId: string }) => j.requestId === rows[0].id);
    expect(job.check.passed).toBe(true);
    expect(job.earthwork.cutCuYd).toBeGreaterThan(0);
    const sheet = await cast.crew.agent.get(`/api/crew/jobs/${rows[0].id}/field-sheet`).expect(200);
    expect(sheet.body.laser.first.alongDrivewayPercent).toBeLessThanOrEqual(4);
    expect(sheet.body.design.cutFill.some((c: { cutFillFt: number }) => c.cutFillFt > 0)).toBe(true);
    expect(sheet.body.culvert.diameterIn).toBe(18);
  });

  it('can be taken, built and verified like any other', async () => {
    const [row] = await t.ctx.db
      .select()
      .from(requests)
      .where(eq(requests.siteAddress, '57 Juniper Ridge Road, Marrow Crossing'));
    const crew = cast.crew.agent;
    await crew.post(`/api/crew/jobs/${row.id}/accept`).send({ expectedVersion: row.version }).expect(200);
    await crew
      .post(`/api/crew/jobs/${row.id}/start`)
      .send({ expectedVersion: row.version + 1 })
      .expect(200);
    const set = await crew
      .post(`/api/crew/jobs/${row.id}/as-built`)
      .send({
        readings: [
          { stationFt: 5, gradePercent: 3.5 },
          { stationFt: 50, gradePercent: 11 },
        ],
      })
      .expect(201);
    expect(set.body.set.passed).toBe(true);
    await crew
      .post(`/api/crew/jobs/${row.id}/mark-built`)
      .send({ expectedVersion: row.version + 2 })
      .expect(200);
  });
});
