import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { gradeChecks } from '../../server/db/schema';
import { closeDesignPool } from '../../server/services/design/design-pool';
import { loadPublishedProfile } from '../../server/services/grade-checks/grade-checks.service';
import { GRADE_CHECK_FORMAT_VERSION, gradeCheckInputsSchema } from '@shared/contracts/grade-checks';
import { runGradeCheck } from '@shared/grade-check/run-check';
import { proposeProfile } from '@shared/engine';
import { parsePastedCentreline } from '../../src/features/grade-check/lib/paste-centreline';
import { initialSurvey } from '../../src/features/grade-check/lib/survey-state';
import { runLiveCheckWithProposal } from '../../src/features/grade-check/lib/use-live-check';
import { signInCast, type Cast } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import { createTestApp, type TestApp } from '../setup/test-app';
import { currentVersionId, surveyInputs } from './grade-check-survey';

let t: TestApp;
let cast: Cast;
let marrow: string;
beforeAll(async () => {
  t = await createTestApp();
  cast = await signInCast(t);
  marrow = await currentVersionId(t.ctx.db, 'marrow-county');
});
afterAll(async () => {
  await closeDesignPool();
  await t.close();
});

const json = (v: unknown) => JSON.parse(JSON.stringify(v));
const visitBooked = () => createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'visit_booked' });
const save = (requestId: string, inputs: unknown) =>
  cast.staff.agent
    .post(`/api/requests/${requestId}/grade-checks`)
    .send({ ruleProfileVersionId: marrow, inputs })
    .expect(201);

describe('one grade check, live and saved', () => {
  it('stores exactly what the shared runGradeCheck returns for the stored inputs, in the current format', async () => {
    const request = await visitBooked();
    const saved = await save(request.id, surveyInputs());
    const { profile } = await loadPublishedProfile(t.ctx.db, marrow);
    const inputs = gradeCheckInputsSchema.parse(surveyInputs());
    const shared = json(await runGradeCheck(inputs, profile, proposeProfile));
    expect(saved.body.check.results).toEqual(shared);
    expect(saved.body.check.inputs).toEqual(json(inputs));
    expect(saved.body.check.formatVersion).toBe(GRADE_CHECK_FORMAT_VERSION);
    const [row] = await t.ctx.db.select().from(gradeChecks).where(eq(gradeChecks.id, saved.body.check.id));
    expect(row.formatVersion).toBe(GRADE_CHECK_FORMAT_VERSION);
    expect(row.results).toEqual(shared);
    const listed = await cast.staff.agent.get(`/api/requests/${request.id}/grade-checks`).expect(200);
    expect(listed.body.checks[0].results).toEqual(shared);
  });

  it('saves, for what the office typed, the very result the live check showed', async () => {
    const s = initialSurvey(45);
    s.centreline.rows = parsePastedCentreline('0+00\t100\n0+10\t100.55\n0+20\t101.1\n0+40\t103.5\n0+80\t108.3');
    Object.assign(s.road, { sightLeftFt: '650', sightRightFt: '600', edgeElevationFt: '100' });
    s.design.proposed = true;
    const { profile } = await loadPublishedProfile(t.ctx.db, marrow);
    const live = await runLiveCheckWithProposal(s, profile, proposeProfile);
    expect(live.ready).toBe(true);
    expect(live.results?.proposal?.feasible).toBe(true);
    const saved = await save((await visitBooked()).id, live.inputs);
    expect(saved.body.check.results).toEqual(json(live.results));
  });

  it('names a refused box by the path the form marks, on the server and in the live check alike', async () => {
    const s = initialSurvey(45);
    s.centreline.rows = parsePastedCentreline('0+00\t100\n0+20\t101');
    Object.assign(s.culvert, { present: true, diameterIn: '-3', inletInvertFt: '98', outletInvertFt: '97.7' });
    const { profile } = await loadPublishedProfile(t.ctx.db, marrow);
    const live = await runLiveCheckWithProposal(s, profile, proposeProfile);
    expect(Object.keys(live.errors)).toEqual(['culvert.diameterIn']);
    const refused = await cast.staff.agent
      .post(`/api/requests/${(await visitBooked()).id}/grade-checks`)
      .send({ ruleProfileVersionId: marrow, inputs: live.inputs })
      .expect(400);
    expect(Object.keys(refused.body.error.fields)).toEqual(Object.keys(live.errors));
  });
});
