import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signInCast, type Cast } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import { createTestApp, type TestApp } from '../setup/test-app';
import { currentVersionId, surveyInputs } from './grade-check-survey';

let t: TestApp;
let cast: Cast;
let marrow: string;
let requestId: string;
beforeAll(async () => {
  t = await createTestApp();
  cast = await signInCast(t);
  marrow = await currentVersionId(t.ctx.db, 'marrow-county');
  requestId = (await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'visit_booked' })).id;
});
afterAll(() => t.close());

const junk: unknown[] = [
  null,
  0,
  'text',
  [],
  [1, 2],
  {},
  { inputs: null },
  { inputs: 'x' },
  { inputs: [] },
  { inputs: { profile: {} } },
  { inputs: { profile: { kind: 'rod-readings', readings: [] } } },
  { inputs: { profile: [{ stationFt: 1e308, elevationFt: -1e308 }] } },
  { ruleProfileVersionId: 7, inputs: {} },
  { profile: { landing: 'flat' } },
  { profile: null },
  { sharedWithApplicant: null },
  { shareWithApplicant: 'yes' },
  { fromVersionId: 'nope' },
  { name: 12, authority: [] },
];

function send(method: 'post' | 'put' | 'patch', url: string, body: unknown) {
  const a = cast.admin.agent;
  const req = method === 'post' ? a.post(url) : method === 'put' ? a.put(url) : a.patch(url);
  return req.set('Content-Type', 'application/json').send(JSON.stringify(body));
}

describe('nothing a client sends gets a 500', () => {
  it('answers junk on every grade check, rule profile and document route below 500, naming the field on a 400', async () => {
    const j = (await cast.admin.agent.get('/api/jurisdictions').expect(200)).body.jurisdictions[0];
    const routes: ['post' | 'put' | 'patch', string][] = [
      ['post', `/api/requests/${requestId}/grade-checks`],
      ['post', `/api/grade-checks/${requestId}/attach`],
      ['post', '/api/jurisdictions'],
      ['post', `/api/jurisdictions/${j.id}/versions`],
      ['put', `/api/rule-profile-versions/${marrow}`],
      ['patch', `/api/documents/${requestId}`],
    ];
    for (const [method, url] of routes) {
      for (const body of junk) {
        const res = await send(method, url, body);
        const what = `${method} ${url} ${JSON.stringify(body)}`;
        expect(res.status, what).toBeLessThan(500);
        if (res.status === 400) expect(Object.keys(res.body.error.fields ?? {}).length, what).toBeGreaterThan(0);
      }
    }
  });

  it('holds a saved check to survey size so one request cannot tie up the server', async () => {
    const many = Array.from({ length: 501 }, (_, i) => ({ stationFt: i, elevationFt: 100 + i * 0.02 }));
    const tooMany = await cast.staff.agent
      .post(`/api/requests/${requestId}/grade-checks`)
      .send({ ruleProfileVersionId: marrow, inputs: surveyInputs({ profile: many }) })
      .expect(400);
    expect(tooMany.body.error.fields).toHaveProperty(['profile']);
    const long = [
      { stationFt: 0, elevationFt: 100 },
      { stationFt: 90_000, elevationFt: 120 },
    ];
    const fine = await cast.staff.agent
      .post(`/api/requests/${requestId}/grade-checks`)
      .send({ ruleProfileVersionId: marrow, inputs: surveyInputs({ profile: long, scrapeStepFt: 0.01 }) })
      .expect(400);
    expect(fine.body.error.fields).toHaveProperty(['scrapeStepFt']);
  });
});
