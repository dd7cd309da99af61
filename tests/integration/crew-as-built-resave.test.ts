import { describe, expect, it } from 'vitest';
import { createReleasedJob } from '../factories/crew-jobs';
import { type Cast, withCastApp } from '../factories/office-cast';
import type { TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
withCastApp((app, signedIn) => {
  t = app;
  cast = signedIn;
});

async function startedJob() {
  const job = await createReleasedJob(t.ctx.db, { applicantId: cast.applicant.id, staffId: cast.staff.id });
  const crew = cast.crew.agent;
  await crew.post(`/api/crew/jobs/${job.id}/accept`).send({ expectedVersion: job.version }).expect(200);
  await crew
    .post(`/api/crew/jobs/${job.id}/start`)
    .send({ expectedVersion: job.version + 1 })
    .expect(200);
  return job.id;
}
const readings = [
  { stationFt: 5, gradePercent: 3 },
  { stationFt: 12, gradePercent: 9 },
  { stationFt: 40, gradePercent: 10 },
];

describe('correcting a saved as-built set', () => {
  it('saves the edited readings as a new set that names the one it corrects, and keeps the earlier set', async () => {
    const id = await startedJob();
    const url = `/api/crew/jobs/${id}/as-built`;
    const first = (await cast.crew.agent.post(url).send({ readings, note: 'first pass' }).expect(201)).body.set;
    expect(first.status).toBe('fail');
    expect(first.replacesSetId).toBeNull();

    const fixed = readings.map((r) => (r.stationFt === 12 ? { ...r, gradePercent: 3.5 } : r));
    const second = (
      await cast.crew.agent.post(url).send({ readings: fixed, note: 'first pass', replacesSetId: first.id }).expect(201)
    ).body.set;
    expect(second.replacesSetId).toBe(first.id);
    expect(second.status).toBe('pass');

    // The page lists both, newest first: the record shows what was read before the correction.
    const page = (await cast.crew.agent.get(url).expect(200)).body;
    expect(page.sets.map((s: { id: string }) => s.id)).toEqual([second.id, first.id]);
    expect(page.sets[1].readings).toEqual(readings);

    // An edit of a set that is no longer the latest would hide the one saved after it.
    const stale = await cast.crew.agent.post(url).send({ readings, replacesSetId: first.id }).expect(409);
    expect(stale.body.error.message).toMatch(/no longer the latest/);
    const bad = await cast.crew.agent.post(url).send({ readings, replacesSetId: 'not-an-id' }).expect(400);
    expect(bad.body.error.fields).toHaveProperty('replacesSetId');
  });
});
