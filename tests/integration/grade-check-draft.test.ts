import { afterAll, beforeAll, describe, expect, it } from 'vitest';
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
afterAll(() => t.close());

const visitBooked = () => createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'visit_booked' });
const draftUrl = (id: string) => `/api/requests/${id}/grade-check-draft`;
// The form's own text, as the screen keeps it: a half-typed survey.
const typed = {
  road: { gradePercent: '1.5', edgeElevationFt: '100.0', rises: 'right' },
  centreline: {
    mode: 'elevations',
    rows: [
      { key: 'k1', station: '0+00', value: '100' },
      { key: 'k2', station: '0+10', value: '100.5' },
    ],
  },
};

describe('the survey draft', () => {
  it('keeps the survey as typed per request and person, and gives it back when the check is reopened', async () => {
    const request = await visitBooked();
    expect((await cast.staff.agent.get(draftUrl(request.id)).expect(200)).body).toEqual({ draft: null });

    const saved = await cast.staff.agent
      .put(draftUrl(request.id))
      .send({ survey: typed, ruleProfileVersionId: marrow })
      .expect(200);
    expect(saved.body.draft).toMatchObject({ survey: typed, ruleProfileVersionId: marrow });

    const again = await cast.staff.agent.get(draftUrl(request.id)).expect(200);
    expect(again.body.draft.survey).toEqual(typed);
    expect(again.body.draft.ruleProfileVersionId).toBe(marrow);

    // One row per person: a second save replaces the first, and a colleague's draft is theirs alone.
    const edited = { ...typed, road: { ...typed.road, gradePercent: '2' } };
    await cast.staff.agent.put(draftUrl(request.id)).send({ survey: edited }).expect(200);
    const mine = await cast.staff.agent.get(draftUrl(request.id)).expect(200);
    expect(mine.body.draft.survey.road.gradePercent).toBe('2');
    expect(mine.body.draft.ruleProfileVersionId).toBeNull();
    expect((await cast.otherStaff.agent.get(draftUrl(request.id)).expect(200)).body).toEqual({ draft: null });
  });

  it('is removed when a check is saved from it, and when its author starts over', async () => {
    const request = await visitBooked();
    await cast.staff.agent.put(draftUrl(request.id)).send({ survey: typed }).expect(200);
    await cast.otherStaff.agent.put(draftUrl(request.id)).send({ survey: typed }).expect(200);
    await cast.staff.agent
      .post(`/api/requests/${request.id}/grade-checks`)
      .send({ ruleProfileVersionId: marrow, inputs: surveyInputs() })
      .expect(201);
    expect((await cast.staff.agent.get(draftUrl(request.id)).expect(200)).body.draft).toBeNull();
    // The colleague's own draft is not theirs to lose.
    expect((await cast.otherStaff.agent.get(draftUrl(request.id)).expect(200)).body.draft).not.toBeNull();

    await cast.otherStaff.agent.delete(draftUrl(request.id)).expect(200);
    expect((await cast.otherStaff.agent.get(draftUrl(request.id)).expect(200)).body.draft).toBeNull();
  });

  it('is for the office only, and a request someone may not see answers 404', async () => {
    const request = await visitBooked();
    await cast.applicant.agent.get(draftUrl(request.id)).expect(403);
    await cast.applicant.agent.put(draftUrl(request.id)).send({ survey: typed }).expect(403);
    await cast.crew.agent.get(draftUrl(request.id)).expect(403);
    await cast.staff.agent.get(draftUrl('00000000-0000-4000-8000-000000000000')).expect(404);
    await cast.staff.agent.put(draftUrl('00000000-0000-4000-8000-000000000000')).send({ survey: typed }).expect(404);
  });

  it('refuses a bad body naming the field, and a request not at the survey stage', async () => {
    const request = await visitBooked();
    const notForm = await cast.staff.agent.put(draftUrl(request.id)).send({ survey: 'text' }).expect(400);
    expect(notForm.body.error.fields).toHaveProperty('survey');
    const unknownVersion = await cast.staff.agent
      .put(draftUrl(request.id))
      .send({ survey: typed, ruleProfileVersionId: '00000000-0000-4000-8000-000000000000' })
      .expect(400);
    expect(unknownVersion.body.error.fields).toHaveProperty('ruleProfileVersionId');
    const huge = await cast.staff.agent
      .put(draftUrl(request.id))
      .send({ survey: { road: { note: 'x'.repeat(200_001) } } });
    expect([400, 413]).toContain(huge.status);

    const submitted = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'submitted' });
    await cast.staff.agent.put(draftUrl(submitted.id)).send({ survey: typed }).expect(409);
  });
});
