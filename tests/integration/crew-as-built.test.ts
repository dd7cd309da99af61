import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { asBuiltSets } from '../../server/db/schema';
import { createReleasedJob, harlowRules } from '../factories/crew-jobs';
import { type Cast, withCastApp } from '../factories/office-cast';
import type { TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
withCastApp((app, signedIn) => {
  t = app;
  cast = signedIn;
});

/** A job this crew has taken and started: the state in which readings are taken. */
async function startedJob(rules = harlowRules) {
  const job = await createReleasedJob(t.ctx.db, { applicantId: cast.applicant.id, staffId: cast.staff.id, rules });
  const crew = cast.crew.agent;
  await crew.post(`/api/crew/jobs/${job.id}/accept`).send({ expectedVersion: job.version }).expect(200);
  const started = await crew
    .post(`/api/crew/jobs/${job.id}/start`)
    .send({ expectedVersion: job.version + 1 })
    .expect(200);
  return { id: job.id, version: started.body.request.version as number };
}

type Reading = { stationFt: number; gradePercent?: number; elevationFt?: number };
async function save(id: string, readings: Reading[], note?: string) {
  const res = await cast.crew.agent.post(`/api/crew/jobs/${id}/as-built`).send({ readings, note });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body.set as {
    status: string;
    passed: boolean;
    results: { stationFt: number; ruleId: string; status: string }[];
  };
}
const statuses = (set: Awaited<ReturnType<typeof save>>) => set.results.map((r) => r.status);

describe('as-built readings against the approved check’s rule profile (landing 4%, beyond it 15%, tolerance 0.5%)', () => {
  it('exactly at the limit passes, in both directions on the landing and beyond it', async () => {
    const { id } = await startedJob();
    const set = await save(id, [
      { stationFt: 5, gradePercent: 4 },
      { stationFt: 12, gradePercent: -4 },
      { stationFt: 40, gradePercent: 15 },
    ]);
    expect(statuses(set)).toEqual(['pass', 'pass', 'pass']);
    expect(set).toMatchObject({ status: 'pass', passed: true });
  });

  it('over the limit but within the tolerance is advisory, and the set still passes', async () => {
    const { id } = await startedJob();
    const set = await save(id, [
      { stationFt: 5, gradePercent: 4.01 },
      { stationFt: 15, gradePercent: 4.5 },
      { stationFt: 40, gradePercent: 15.5 },
    ]);
    expect(statuses(set)).toEqual(['advisory', 'advisory', 'advisory']);
    expect(set).toMatchObject({ status: 'advisory', passed: true });
  });

  it('one hundredth beyond the tolerance fails', async () => {
    const { id } = await startedJob();
    const set = await save(id, [
      { stationFt: 5, gradePercent: 4.51 },
      { stationFt: 40, gradePercent: 15.51 },
    ]);
    expect(statuses(set)).toEqual(['fail', 'fail']);
    expect(set).toMatchObject({ status: 'fail', passed: false });
  });

  it('with no tolerance in the profile, one hundredth over the limit fails', async () => {
    const { id } = await startedJob({
      ...harlowRules,
      asBuilt: { gradeTolerancePercent: 0, elevationToleranceFt: 0.1 },
    });
    const set = await save(id, [
      { stationFt: 5, gradePercent: 4 },
      { stationFt: 8, gradePercent: 4.01 },
    ]);
    expect(statuses(set)).toEqual(['pass', 'fail']);
  });

  it('elevations are held to the design within 0.1 ft: 0.10 off passes, 0.11 off fails', async () => {
    const { id } = await startedJob();
    const on = await save(id, [
      { stationFt: 0, elevationFt: 100.1 },
      { stationFt: 20, elevationFt: 100.6 },
    ]);
    expect(on.results.filter((r) => r.ruleId === 'as-built.elevation').map((r) => r.status)).toEqual(['pass', 'pass']);
    const off = await save(id, [
      { stationFt: 0, elevationFt: 100.1 },
      { stationFt: 20, elevationFt: 100.61 },
    ]);
    expect(off.results.filter((r) => r.ruleId === 'as-built.elevation').map((r) => r.status)).toEqual(['pass', 'fail']);
  });

  it('the set is stored against the check the job was released with', async () => {
    const { id } = await startedJob();
    await save(id, [{ stationFt: 5, gradePercent: 2 }]);
    const page = await cast.crew.agent.get(`/api/crew/jobs/${id}/as-built`).expect(200);
    const [stored] = await t.ctx.db.select().from(asBuiltSets).where(eq(asBuiltSets.requestId, id));
    expect(page.body.ruleProfile.id).toBe((stored.results as { ruleProfileVersionId: string }).ruleProfileVersionId);
    expect(page.body.sets).toHaveLength(1);
  });

  it('refuses readings it cannot check, naming the reading', async () => {
    const { id } = await startedJob();
    const res = await cast.crew.agent
      .post(`/api/crew/jobs/${id}/as-built`)
      .send({ readings: [{ stationFt: 5 }, { stationFt: 'x', gradePercent: 1 }] });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(
      expect.arrayContaining(['readings.0.gradePercent', 'readings.1.stationFt']),
    );
    const twice = await cast.crew.agent.post(`/api/crew/jobs/${id}/as-built`).send({
      readings: [
        { stationFt: 5, elevationFt: 100 },
        { stationFt: 5, elevationFt: 101 },
      ],
    });
    expect(twice.status).toBe(400);
    expect(twice.body.error.message).toMatch(/readings/);
    // A hundred feet of rise in a thousandth of a foot: the engine's derived grade is out of range; the field named
    // is what the crew typed, not the engine's own working value.
    const cliff = await cast.crew.agent.post(`/api/crew/jobs/${id}/as-built`).send({
      readings: [
        { stationFt: 0, elevationFt: 100 },
        { stationFt: 0.001, elevationFt: 200 },
      ],
    });
    expect(cliff.status).toBe(400);
    for (const field of Object.keys(cliff.body.error.fields)) expect(field).toMatch(/^readings/);
  });
});

describe('marking built and the office’s review', () => {
  it('needs a set; a failing set needs the crew’s note; send-back needs fresh readings; then the office closes', async () => {
    const { id, version } = await startedJob();
    const crew = cast.crew.agent;
    const none = await crew.post(`/api/crew/jobs/${id}/mark-built`).send({ expectedVersion: version });
    expect(none.status).toBe(409);

    await save(id, [{ stationFt: 5, gradePercent: 5.2 }]);
    const noNote = await crew.post(`/api/crew/jobs/${id}/mark-built`).send({ expectedVersion: version });
    expect(noNote.status).toBe(400);
    expect(noNote.body.error.fields).toHaveProperty('note');

    const built = await crew
      .post(`/api/crew/jobs/${id}/mark-built`)
      .send({ expectedVersion: version, note: 'Landing steepened to match the neighbour’s apron; inspector to judge.' })
      .expect(200);
    expect(built.body.request.status).toBe('built');

    const office = cast.staff.agent;
    const back = await office.post(`/api/requests/${id}/transitions`).send({
      action: 'send-back',
      expectedVersion: version + 1,
      note: 'Regrade the landing to 4% and shoot it again.',
    });
    expect(back.status, JSON.stringify(back.body)).toBe(200);
    const mine = await crew.get('/api/crew/my-jobs').expect(200);
    expect(mine.body.jobs.find((j: { requestId: string }) => j.requestId === id).sentBackNote).toContain(
      'Regrade the landing',
    );

    const stale = await crew
      .post(`/api/crew/jobs/${id}/mark-built`)
      .send({ expectedVersion: version + 2, note: 'done' });
    expect(stale.status).toBe(409);
    await save(id, [
      { stationFt: 5, gradePercent: 3.9 },
      { stationFt: 40, gradePercent: 12 },
    ]);
    await crew
      .post(`/api/crew/jobs/${id}/mark-built`)
      .send({ expectedVersion: version + 2 })
      .expect(200);
    const closed = await office
      .post(`/api/requests/${id}/transitions`)
      .send({ action: 'close', expectedVersion: version + 3 });
    expect(closed.status, JSON.stringify(closed.body)).toBe(200);
    expect(closed.body.request.status).toBe('closed');
  });
});

describe('the office’s generic status endpoint holds "built" to the same rule', () => {
  it('refuses a failing set without the crew’s note, accepts one saved with it', async () => {
    const { id, version } = await startedJob();
    const crew = cast.crew.agent;
    await save(id, [{ stationFt: 5, gradePercent: 6 }]);
    const bare = await crew
      .post(`/api/requests/${id}/transitions`)
      .send({ action: 'mark-built', expectedVersion: version });
    expect(bare.status).toBe(400);
    expect(bare.body.error.fields).toHaveProperty('note');
    await save(
      id,
      [{ stationFt: 5, gradePercent: 6 }],
      'Ledge rock at 0+05; the inspector agreed on site to leave it.',
    );
    const noted = await crew
      .post(`/api/requests/${id}/transitions`)
      .send({ action: 'mark-built', expectedVersion: version });
    expect(noted.status, JSON.stringify(noted.body)).toBe(200);
  });
});
