import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { gradeChecks } from '../../server/db/schema';
import { signInCast, type Cast } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import { createTestApp, type TestApp } from '../setup/test-app';
import { currentVersionId, surveyInputs } from './grade-check-survey';

let t: TestApp;
let cast: Cast;
let marrow: string;
let elderbrook: string;
beforeAll(async () => {
  t = await createTestApp();
  cast = await signInCast(t);
  marrow = await currentVersionId(t.ctx.db, 'marrow-county');
  elderbrook = await currentVersionId(t.ctx.db, 'town-of-elderbrook');
});
afterAll(() => t.close());

const visitBooked = () => createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'visit_booked' });
const save = (requestId: string, body: unknown) =>
  cast.staff.agent.post(`/api/requests/${requestId}/grade-checks`).send(body as object);

describe('saving a grade check', () => {
  it('runs the engine on the server: the same survey fails in Marrow County and passes in Elderbrook', async () => {
    const request = await visitBooked();
    const county = await save(request.id, { ruleProfileVersionId: marrow, inputs: surveyInputs() }).expect(201);
    const town = await save(request.id, { ruleProfileVersionId: elderbrook, inputs: surveyInputs() }).expect(201);
    expect(county.body.check.number).toBe(1);
    expect(town.body.check.number).toBe(2);
    expect(county.body.check.passed).toBe(false);
    const landing = county.body.check.results.report.findings.find(
      (f: { ruleId: string }) => f.ruleId === 'landing.max-grade',
    );
    expect(landing).toMatchObject({ status: 'fail', limit: 4, stationFt: 0 });
    expect(landing.measured).toBeCloseTo(5.5, 9);
    expect(town.body.check.passed).toBe(true);
    expect(town.body.check.summary).toMatch(/meets Town of Elderbrook's rules \(version 1\)/);
    expect(county.body.check.summary).toMatch(/does not yet meet Marrow County's rules/);
    expect(county.body.check.results.proposal.feasible).toBe(true);
    expect(county.body.check.results.laser.stakes[0].instruction).toBe('cut 0.60 ft');
  });

  it('refuses inputs that fail validation with 400 naming the field, and stores nothing', async () => {
    const request = await visitBooked();
    const badPoint = surveyInputs({
      profile: {
        kind: 'elevations',
        points: [
          { stationFt: 0, elevationFt: 100 },
          { stationFt: 'ten', elevationFt: 101 },
        ],
      },
    });
    const res = await save(request.id, { ruleProfileVersionId: marrow, inputs: badPoint }).expect(400);
    expect(res.body.error.fields).toHaveProperty(['profile.points.1.stationFt']);

    const badCulvert = await save(request.id, {
      ruleProfileVersionId: marrow,
      inputs: surveyInputs({ culvert: { ...surveyInputs().culvert, diameterIn: -3 } }),
    }).expect(400);
    expect(Object.keys(badCulvert.body.error.fields)).toEqual(['culvert.diameterIn']);

    const badLaser = await save(request.id, {
      ruleProfileVersionId: marrow,
      inputs: surveyInputs({ laser: { originElevationFt: 100 } }),
    }).expect(400);
    expect(Object.keys(badLaser.body.error.fields)).toContain('laser.roadGradePercent');

    const twice = surveyInputs({
      profile: [
        { stationFt: 0, elevationFt: 100 },
        { stationFt: 0, elevationFt: 101 },
        { stationFt: 20, elevationFt: 101 },
      ],
    });
    const conflict = await save(request.id, { ruleProfileVersionId: marrow, inputs: twice }).expect(400);
    // The repeated shot, the second one typed at 0+00, is the box named.
    expect(conflict.body.error.fields).toHaveProperty(['profile.1.stationFt']);

    await save(request.id, { ruleProfileVersionId: '00000000-0000-4000-8000-000000000000', inputs: surveyInputs() })
      .expect(400)
      .then((r) => expect(r.body.error.fields).toHaveProperty(['ruleProfileVersionId']));
    await save(request.id, { ruleProfileVersionId: marrow })
      .expect(400)
      .then((r) => expect(r.body.error.fields).toHaveProperty(['inputs']));
    await save(request.id, ['not', 'an', 'object']).expect(400);
    expect(await t.ctx.db.select().from(gradeChecks).where(eq(gradeChecks.requestId, request.id))).toHaveLength(0);
  });

  it('never stores a result the client sends', async () => {
    const request = await visitBooked();
    const forged = { report: { passes: true, findings: [] } };
    const res = await save(request.id, {
      ruleProfileVersionId: marrow,
      inputs: surveyInputs(),
      results: forged,
    }).expect(400);
    expect(res.body.error.fields).toHaveProperty(['results']);
    const inInputs = await save(request.id, {
      ruleProfileVersionId: marrow,
      inputs: { ...surveyInputs(), results: forged, passed: true },
    }).expect(201);
    const [row] = await t.ctx.db.select().from(gradeChecks).where(eq(gradeChecks.id, inInputs.body.check.id));
    expect(row.passed).toBe(false);
    expect(row.inputs).not.toHaveProperty('results');
    expect(row.inputs).not.toHaveProperty('passed');
  });

  it('keeps checks to the office and to requests at the survey stage', async () => {
    const request = await visitBooked();
    await cast.applicant.agent
      .post(`/api/requests/${request.id}/grade-checks`)
      .send({ ruleProfileVersionId: marrow, inputs: surveyInputs() })
      .expect(403);
    await cast.otherApplicant.agent.get(`/api/requests/${request.id}/grade-checks`).expect(404);
    const submitted = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'submitted' });
    await save(submitted.id, { ruleProfileVersionId: marrow, inputs: surveyInputs() }).expect(409);
    const saved = await save(request.id, { ruleProfileVersionId: marrow, inputs: surveyInputs() }).expect(201);
    // Not attached yet: the owner does not see it.
    await cast.applicant.agent.get(`/api/grade-checks/${saved.body.check.id}`).expect(404);
    const mine = await cast.applicant.agent.get(`/api/requests/${request.id}/grade-checks`).expect(200);
    expect(mine.body.checks).toHaveLength(0);
    await cast.staff.agent.get('/api/grade-checks/not-a-uuid').expect(400);
  });
});
