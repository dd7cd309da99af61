import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { requestEvents, requests } from '../../server/db/schema';
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

// Steeper than the landing allows right from the road edge: this survey fails the county's rules.
const steep = {
  kind: 'elevations',
  points: [
    { stationFt: 0, elevationFt: 100 },
    { stationFt: 20, elevationFt: 100.6 },
    { stationFt: 40, elevationFt: 104.6 },
    { stationFt: 80, elevationFt: 110 },
  ],
};
// A 2% landing, then 6%: inside the county's rules.
const gentle = {
  kind: 'elevations',
  points: [0, 10, 20, 40, 60, 80].map((stationFt) => ({
    stationFt,
    elevationFt: 100 + (stationFt <= 20 ? 0.02 * stationFt : 0.4 + 0.06 * (stationFt - 20)),
  })),
};

async function savedCheck(profile: typeof steep) {
  const request = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'visit_booked' });
  const inputs = surveyInputs({
    profile,
    design: { existing: profile, roadEdgeElevationFt: 100, applied: false },
    laser: undefined,
  });
  const saved = await cast.staff.agent
    .post(`/api/requests/${request.id}/grade-checks`)
    .send({ ruleProfileVersionId: marrow, inputs });
  expect(saved.status, JSON.stringify(saved.body)).toBe(201);
  return { request, check: saved.body.check as { id: string; passed: boolean; number: number } };
}

const ownerSees = async (requestId: string) => ({
  checks: (await cast.applicant.agent.get(`/api/requests/${requestId}/grade-checks`).expect(200)).body.checks as {
    id: string;
  }[],
  documents: (await cast.applicant.agent.get(`/api/requests/${requestId}/documents`).expect(200)).body.documents as {
    gradeCheckId: string;
  }[],
});

describe('attaching a check that fails the rules', () => {
  it('needs the office to confirm it, naming the confirmation', async () => {
    const { request, check } = await savedCheck(steep);
    expect(check.passed).toBe(false);
    const unconfirmed = await cast.staff.agent
      .post(`/api/grade-checks/${check.id}/attach`)
      .send({ shareWithApplicant: true });
    expect(unconfirmed.status, JSON.stringify(unconfirmed.body)).toBe(400);
    expect(unconfirmed.body.error.fields.confirmFailing).toMatch(/Attach it anyway/);
    expect((await ownerSees(request.id)).checks).toEqual([]);
    await cast.staff.agent
      .post(`/api/grade-checks/${check.id}/attach`)
      .send({ shareWithApplicant: true, confirmFailing: true })
      .expect(200);
    expect((await ownerSees(request.id)).checks.map((c) => c.id)).toEqual([check.id]);
  });

  it('a passing check attaches without asking', async () => {
    const { check } = await savedCheck(gentle);
    expect(check.passed).toBe(true);
    await cast.staff.agent.post(`/api/grade-checks/${check.id}/attach`).send({ shareWithApplicant: true }).expect(200);
  });
});

describe('withdrawing an attached check', () => {
  it('takes the check and its report from the owner, keeps it for the office and records it', async () => {
    const { request, check } = await savedCheck(steep);
    await cast.staff.agent
      .post(`/api/grade-checks/${check.id}/attach`)
      .send({ shareWithApplicant: true, confirmFailing: true })
      .expect(200);
    expect((await ownerSees(request.id)).documents.map((d) => d.gradeCheckId)).toEqual([check.id]);

    await cast.applicant.agent.post(`/api/grade-checks/${check.id}/withdraw`).send({}).expect(403);
    const res = await cast.staff.agent.post(`/api/grade-checks/${check.id}/withdraw`).send({}).expect(200);
    expect(res.body.check.attachedAt).toBeNull();
    expect(await ownerSees(request.id)).toEqual({ checks: [], documents: [] });
    await cast.applicant.agent.get(`/api/grade-checks/${check.id}`).expect(404);
    const office = (await cast.staff.agent.get(`/api/requests/${request.id}/grade-checks`).expect(200)).body.checks as {
      id: string;
    }[];
    expect(office.map((c) => c.id)).toEqual([check.id]);
    const events = await t.ctx.db
      .select()
      .from(requestEvents)
      .where(and(eq(requestEvents.requestId, request.id), eq(requestEvents.kind, 'grade-check-withdrawn')));
    expect(events).toEqual([expect.objectContaining({ actorId: cast.staff.id, internal: false })]);
    await cast.staff.agent
      .post(`/api/requests/${request.id}/transitions`)
      .send({ action: 'mark-checked', expectedVersion: request.version })
      .expect(409);

    // Attached again, the stored report comes back to the owner.
    await cast.staff.agent
      .post(`/api/grade-checks/${check.id}/attach`)
      .send({ shareWithApplicant: true, confirmFailing: true })
      .expect(200);
    expect((await ownerSees(request.id)).documents.map((d) => d.gradeCheckId)).toEqual([check.id]);
  });

  it('is refused once the job has gone to the crews', async () => {
    const { request, check } = await savedCheck(gentle);
    await cast.staff.agent.post(`/api/grade-checks/${check.id}/attach`).send({ shareWithApplicant: true }).expect(200);
    await t.ctx.db.update(requests).set({ status: 'released' }).where(eq(requests.id, request.id));
    await cast.staff.agent.post(`/api/grade-checks/${check.id}/withdraw`).send({}).expect(409);
  });
});
