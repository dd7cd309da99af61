import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createReleasedJob } from '../factories/crew-jobs';
import { signInCast, type Cast } from '../factories/office-cast';
import { createTestApp, type TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
beforeAll(async () => {
  t = await createTestApp();
  cast = await signInCast(t);
});
afterAll(() => t.close());

/** The office's bookkeeping, which the request view keeps from everyone outside the office. */
const officeOnly = ['applicantId', 'assigneeId', 'crewId', 'jurisdictionId', 'searchVector'];

function expectCrewView(request: Record<string, unknown>, status: string) {
  expect(request.status).toBe(status);
  expect(request.statusLabel).toEqual(expect.any(String));
  expect(request.version).toEqual(expect.any(Number));
  for (const key of officeOnly) expect(request, key).not.toHaveProperty(key);
}

describe('what the crew endpoints answer about a request', () => {
  it('is the request view for a crew lead at every step, never the stored row', async () => {
    const job = await createReleasedJob(t.ctx.db, { applicantId: cast.applicant.id, staffId: cast.staff.id });
    const crew = cast.crew.agent;
    const path = (step: string) => `/api/crew/jobs/${job.id}/${step}`;

    const accepted = await crew.post(path('accept')).send({ expectedVersion: job.version }).expect(200);
    expectCrewView(accepted.body.request, 'crew_assigned');
    const handedBack = await crew
      .post(path('hand-back'))
      .send({ expectedVersion: accepted.body.request.version, note: 'Machine is down' })
      .expect(200);
    expectCrewView(handedBack.body.request, 'released');
    const again = await crew
      .post(path('accept'))
      .send({ expectedVersion: handedBack.body.request.version })
      .expect(200);
    const started = await crew.post(path('start')).send({ expectedVersion: again.body.request.version }).expect(200);
    expectCrewView(started.body.request, 'under_construction');

    await crew
      .post(path('as-built'))
      .send({ readings: [{ stationFt: 5, gradePercent: 5.2 }] })
      .expect(201);
    const built = await crew
      .post(path('mark-built'))
      .send({ expectedVersion: started.body.request.version, note: 'Landing matched to the neighbour’s apron.' })
      .expect(200);
    expectCrewView(built.body.request, 'built');
  });
});
