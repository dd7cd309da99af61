import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { requests } from '../../server/db/schema';
import { signInCast, type Cast } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import { createTestApp, type TestApp } from '../setup/test-app';
import { currentVersionId, pdfText, surveyInputs } from './grade-check-survey';

let t: TestApp;
let cast: Cast;
let elderbrook: string;
beforeAll(async () => {
  t = await createTestApp();
  cast = await signInCast(t);
  elderbrook = await currentVersionId(t.ctx.db, 'town-of-elderbrook');
});
afterAll(() => t.close());

/** The invented site with the road side, a tailwater in the outlet ditch and the warped apron. */
const withEdges = () => {
  const base = surveyInputs();
  return surveyInputs({
    roadSide: { roadCrossSlopePercent: 2, shoulderWidthFt: 3, shoulderSlopePercent: 4 },
    apron: { roadGradePercent: 1.5, drivewayCrossSlopePercent: 0, warpLengthFt: 20, stakeIntervalFt: 10 },
    culvert: { ...base.culvert, tailwaterDepthFt: 1.2 },
  });
};

async function save(inputs: unknown) {
  const request = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'visit_booked' });
  const res = await cast.staff.agent
    .post(`/api/requests/${request.id}/grade-checks`)
    .send({ ruleProfileVersionId: elderbrook, inputs });
  return { request, res };
}

describe('road edge, outlet control and the warped apron in the saved check', () => {
  it('the server runs them as the record and keeps the inputs', async () => {
    const { res } = await save(withEdges());
    expect(res.status).toBe(201);
    const { check } = res.body;
    expect(check.inputs.roadSide).toEqual({ roadCrossSlopePercent: 2, shoulderWidthFt: 3, shoulderSlopePercent: 4 });
    const ids = check.results.report.findings.map((f: { ruleId: string }) => f.ruleId);
    expect(ids).toEqual(
      expect.arrayContaining([
        'grade.road-edge-change',
        'apron.left.landing.max-grade',
        'apron.right.grade.max-change',
        'apron.left.grade.road-edge-change',
      ]),
    );
    expect(check.results.report.culvert.control).toMatch(/^(inlet|outlet)$/);
    expect(check.results.report.culvert.outletHeadwaterFt).toBeGreaterThan(0);
    expect(check.results.report.apron.stakes.map((s: { stationFt: number }) => s.stationFt)).toEqual([
      0, 10, 20, 30, 35,
    ]);
    // The 15 ft landing keeps the road's grade across; the 20 ft warp after it ends at 0+35.
    expect(check.results.report.apron.warpStartStationFt).toBe(15);
  });

  it('an older check without the new inputs saves and re-runs, with the road-edge break and the edges not checked', async () => {
    const { res } = await save(surveyInputs());
    expect(res.status).toBe(201);
    const byId = (id: string) =>
      res.body.check.results.report.findings.find((f: { ruleId: string }) => f.ruleId === id);
    expect(byId('grade.road-edge-change')).toMatchObject({
      status: 'not-checked',
      note: 'no road cross slope in the input',
    });
    expect(byId('apron.edges')).toMatchObject({ status: 'not-checked' });
  });

  it('names the field when the apron has no width to place its edges, or a shoulder has no slope', async () => {
    const { geometry: _g, ...noGeometry } = withEdges();
    const { res } = await save(noGeometry);
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty(['apron.entranceWidthFt']);
    const shoulder = await save({ ...withEdges(), roadSide: { roadCrossSlopePercent: 2, shoulderWidthFt: 3 } });
    expect(shoulder.res.status).toBe(400);
    expect(shoulder.res.body.error.fields).toHaveProperty(['roadSide.shoulderSlopePercent']);
  });

  it('the PDF report says which control sets the headwater and prints the warp stakes and the edge findings', async () => {
    const { request, res } = await save(withEdges());
    const attached = await cast.staff.agent
      .post(`/api/grade-checks/${res.body.check.id}/attach`)
      .send({ shareWithApplicant: false, confirmFailing: true })
      .expect(200);
    const list = await cast.staff.agent.get(`/api/requests/${request.id}/documents`).expect(200);
    const bytes = Buffer.from(await (await fetch(list.body.documents[0].url)).arrayBuffer());
    // Kept for review beside the other reports' renderings.
    const dir = path.join(inject('stack').artifactsDir, 'reports');
    mkdirSync(dir, { recursive: true });
    writeFileSync(path.join(dir, 'grade-check-edges-outlet.pdf'), bytes);
    const text = await pdfText(bytes);
    expect(text).toMatch(/(inlet|outlet) control governs \(inlet control \d+\.\d\d ft, outlet control \d+\.\d\d ft\)/);
    expect(text).toContain('Entrance edges and warp stakes');
    expect(text).toContain('Left elevation');
    expect(text).toContain('Grade change at the road edge');
    expect(text).toContain('Left edge of the entrance: landing grade');
    expect(text).toContain('road cross slope 2% toward the road edge');
    expect(attached.body.check.id).toBe(res.body.check.id);
  });

  it('the crew field sheet carries the warp stakes and the controlling headwater', async () => {
    const { request, res } = await save(withEdges());
    await cast.staff.agent
      .post(`/api/grade-checks/${res.body.check.id}/attach`)
      .send({ shareWithApplicant: false, confirmFailing: true })
      .expect(200);
    await t.ctx.db.update(requests).set({ status: 'released' }).where(eq(requests.id, request.id));
    const sheet = (await cast.staff.agent.get(`/api/crew/jobs/${request.id}/field-sheet`).expect(200)).body;
    expect(sheet.apron.stakes).toHaveLength(5);
    expect(sheet.apron.stakes[0]).toMatchObject({ stationFt: 0, leftOffsetFt: -8, rightOffsetFt: 8 });
    // The right edge starts up the road's 1.5% grade over half the 16 ft entrance.
    expect(sheet.apron.stakes[0].rightElevationFt - sheet.apron.stakes[0].centreElevationFt).toBeCloseTo(0.12, 9);
    expect(sheet.culvert.headwaterText).toMatch(/control governs/);
  });
});
