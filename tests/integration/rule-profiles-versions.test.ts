import { eq } from 'drizzle-orm';
import { PDFParse } from 'pdf-parse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { gradeChecks, jurisdictions } from '../../server/db/schema';
import { seedJurisdictions } from '../../server/dev/seed/jurisdictions';
import { loadGradeCheck, loadPublishedProfile } from '../../server/services/grade-checks/grade-checks.service';
import { runGradeCheck } from '../../server/services/grade-checks/run-grade-check';
import { reportFor } from '../../server/services/documents/attach-grade-check';
import { ENGINE_VERSION } from '@shared/engine';
import { signInCast, type Cast } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import { createTestApp, type TestApp } from '../setup/test-app';
import { surveyInputs } from './grade-check-survey';

let t: TestApp;
let cast: Cast;
let marrowId: string;
beforeAll(async () => {
  t = await createTestApp();
  cast = await signInCast(t);
  await seedJurisdictions(t.ctx.db);
  const [row] = await t.ctx.db.select().from(jurisdictions).where(eq(jurisdictions.slug, 'marrow-county'));
  marrowId = row.id;
});
afterAll(() => t.close());

const staffUser = () => ({ id: cast.staff.id, email: cast.staff.email, name: 'Office', role: cast.staff.role });
const current = async () =>
  (await cast.staff.agent.get(`/api/jurisdictions/${marrowId}`).expect(200)).body.jurisdiction;
const pdfText = async (bytes: Buffer) => {
  const parser = new PDFParse({ data: bytes });
  try {
    return (await parser.getText()).text;
  } finally {
    await parser.destroy();
  }
};

describe('rule profile versions', () => {
  it('re-running a stored check with the same engine and profile version reproduces its results exactly', async () => {
    const request = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'visit_booked' });
    const j = await current();
    const saved = await cast.staff.agent
      .post(`/api/requests/${request.id}/grade-checks`)
      .send({ ruleProfileVersionId: j.currentVersionId, inputs: surveyInputs() })
      .expect(201);
    const stored = await loadGradeCheck(t.ctx.db, saved.body.check.id);
    expect(stored.engineVersion).toBe(ENGINE_VERSION);
    const { profile } = await loadPublishedProfile(t.ctx.db, stored.ruleProfileVersionId);
    const again = JSON.parse(JSON.stringify(await runGradeCheck(stored.inputs, profile)));
    expect(again).toEqual(stored.results);
  });

  it('publishing a new version leaves earlier checks and their reports unchanged', async () => {
    const request = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'visit_booked' });
    const before = await current();
    const v1 = before.currentVersionId as string;
    const saved = await cast.staff.agent
      .post(`/api/requests/${request.id}/grade-checks`)
      .send({ ruleProfileVersionId: v1, inputs: surveyInputs() })
      .expect(201);
    await cast.staff.agent
      .post(`/api/grade-checks/${saved.body.check.id}/attach`)
      .send({ confirmFailing: true })
      .expect(200);
    const [rowBefore] = await t.ctx.db.select().from(gradeChecks).where(eq(gradeChecks.id, saved.body.check.id));
    const reportBefore = await pdfText((await reportFor(t.ctx, staffUser(), saved.body.check.id)).pdf);

    await cast.staff.agent.post(`/api/jurisdictions/${marrowId}/versions`).send({}).expect(403);
    const draft = (await cast.admin.agent.post(`/api/jurisdictions/${marrowId}/versions`).send({}).expect(201)).body
      .version;
    expect(draft).toMatchObject({ status: 'draft', version: before.versions[0].version + 1 });
    await cast.admin.agent.post(`/api/jurisdictions/${marrowId}/versions`).send({}).expect(409);
    const looser = {
      ...draft.profile,
      landing: { ...draft.profile.landing, maxGradePercent: 6 },
      sources: { ...draft.profile.sources, 'landing.maxGradePercent': 'Amended Access Standards (2026), sec. 3.2: 6%' },
    };
    await cast.admin.agent
      .put(`/api/rule-profile-versions/${draft.id}`)
      .send({ profile: looser, changeNote: 'Landing limit raised to 6%' })
      .expect(200);
    await cast.admin.agent.post(`/api/rule-profile-versions/${draft.id}/publish`).expect(200);
    await cast.admin.agent.put(`/api/rule-profile-versions/${draft.id}`).send({ profile: looser }).expect(409);
    await cast.admin.agent.put(`/api/rule-profile-versions/${v1}`).send({ profile: looser }).expect(409);
    expect((await current()).currentVersionId).toBe(draft.id);

    const [rowAfter] = await t.ctx.db.select().from(gradeChecks).where(eq(gradeChecks.id, saved.body.check.id));
    expect(rowAfter).toEqual(rowBefore);
    const reportAfter = await pdfText((await reportFor(t.ctx, staffUser(), saved.body.check.id)).pdf);
    expect(reportAfter).toEqual(reportBefore);
    expect(reportAfter).toContain('version 1');
    expect(reportAfter).not.toContain('Amended Access Standards');

    const recheck = await cast.staff.agent
      .post(`/api/requests/${request.id}/grade-checks`)
      .send({ ruleProfileVersionId: draft.id, inputs: surveyInputs() })
      .expect(201);
    expect(recheck.body.check).toMatchObject({ number: 2, passed: true });
  });

  it('validates a draft with the engine schema, naming the field', async () => {
    const j = await cast.admin.agent
      .post('/api/jurisdictions')
      .send({ name: 'Corvin Township', authority: 'Corvin Township Roads' })
      .expect(201);
    const draft = (await cast.admin.agent.get(`/api/rule-profile-versions/${j.body.draftId}`).expect(200)).body.version;
    expect(draft.profile).toMatchObject({
      maxGradePercent: 17,
      landing: { lengthFt: 20, maxGradePercent: 4 },
      jurisdictionName: 'Corvin Township',
      version: 1,
    });
    const bad = await cast.admin.agent
      .put(`/api/rule-profile-versions/${draft.id}`)
      .send({
        profile: {
          ...draft.profile,
          landing: { ...draft.profile.landing, minGradePercent: 9 },
          maxGradePercent: 'steep',
        },
      })
      .expect(400);
    expect(bad.body.error.fields).toHaveProperty(['profile.maxGradePercent']);
    expect(bad.body.error.fields).toHaveProperty(['profile.landing.minGradePercent']);
    await cast.admin.agent.post('/api/jurisdictions').send({ name: 'Corvin Township', authority: 'x' }).expect(409);
    await cast.admin.agent.post('/api/jurisdictions').send({ name: '' }).expect(400);
    await cast.applicant.agent.get('/api/jurisdictions').expect(403);
    await cast.staff.agent.get('/api/jurisdictions/00000000-0000-4000-8000-000000000000').expect(404);
    // A draft cannot be checked against: only published rules make a record.
    const request = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'visit_booked' });
    const refused = await cast.staff.agent
      .post(`/api/requests/${request.id}/grade-checks`)
      .send({ ruleProfileVersionId: draft.id, inputs: surveyInputs() })
      .expect(400);
    expect(refused.body.error.fields).toHaveProperty(['ruleProfileVersionId']);
  });
});
