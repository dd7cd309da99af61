import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoPeople } from '../../server/dev/seed/demo-people';
import type { RequestStatus } from '@shared/workflow/statuses';
import { createReleasedJob, createCrewCheck } from '../factories/crew-jobs';
import { signInCast, type Agent, type Cast } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import { createTestApp, signIn, type TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
let otherCrew: Agent;
let otherCrewId: string;
beforeAll(async () => {
  t = await createTestApp();
  cast = await signInCast(t);
  otherCrew = await signIn(t.app, demoPeople.filter((p) => p.role === 'crew')[1].email);
  otherCrewId = (await otherCrew.get('/api/me').expect(200)).body.user.id;
});
afterAll(() => t.close());

const released = () => createReleasedJob(t.ctx.db, { applicantId: cast.applicant.id, staffId: cast.staff.id });

async function requestIn(status: RequestStatus, crewId: string | null = null) {
  const row = await createRequestRow(t.ctx.db, {
    applicantId: cast.applicant.id,
    status,
    crewId,
    permitReference: 'HT-ACC-0001',
  });
  await createCrewCheck(t.ctx.db, row.id, cast.staff.id);
  return row;
}

const reads = (id: string) => [`/api/crew/jobs/${id}/field-sheet`, `/api/crew/jobs/${id}/as-built`];
const writes = (id: string): [string, object][] => [
  [`/api/crew/jobs/${id}/accept`, { expectedVersion: 1 }],
  [`/api/crew/jobs/${id}/hand-back`, { expectedVersion: 1, note: 'Machine is down' }],
  [`/api/crew/jobs/${id}/schedule`, { date: '2027-01-12' }],
  [`/api/crew/jobs/${id}/start`, { expectedVersion: 1 }],
  [`/api/crew/jobs/${id}/as-built`, { readings: [{ stationFt: 5, gradePercent: 2 }] }],
  [`/api/crew/jobs/${id}/mark-built`, { expectedVersion: 1 }],
];

describe('an applicant cannot reach any crew API', () => {
  it('gets 403 on every crew route, even for their own request', async () => {
    const job = await released();
    const gets = ['/api/crew/board', '/api/crew/my-jobs', '/api/crew/yard', ...reads(job.id)];
    for (const path of gets) expect((await cast.applicant.agent.get(path)).status, path).toBe(403);
    for (const [path, body] of writes(job.id))
      expect((await cast.applicant.agent.post(path).send(body)).status, path).toBe(403);
    expect((await cast.applicant.agent.put('/api/crew/yard').send({ label: 'Yard', lat: 44, lng: -72 })).status).toBe(
      403,
    );
  });

  it('nobody signed in gets 401', async () => {
    const job = await released();
    const anonymous = (await import('supertest')).default(t.app);
    expect((await anonymous.get('/api/crew/board')).status).toBe(401);
    expect((await anonymous.post(`/api/crew/jobs/${job.id}/accept`).send({ expectedVersion: 1 })).status).toBe(401);
  });
});

describe('crew see released jobs and their own, nothing else', () => {
  const hidden: RequestStatus[] = [
    'draft',
    'submitted',
    'visit_booked',
    'checked',
    'permit_filed',
    'permit_granted',
    'permit_refused',
    'declined',
  ];

  it.each(hidden)('a request that is %s is not on the board and its sheet is 404', async (status) => {
    const row = await requestIn(status);
    const board = await cast.crew.agent.get('/api/crew/board').expect(200);
    expect(board.body.jobs.map((j: { requestId: string }) => j.requestId)).not.toContain(row.id);
    for (const path of reads(row.id)) expect((await cast.crew.agent.get(path)).status, path).toBe(404);
    expect(
      (await cast.crew.agent.post(`/api/crew/jobs/${row.id}/accept`).send({ expectedVersion: row.version })).status,
    ).toBe(404);
  });

  it.each(['crew_assigned', 'under_construction', 'built'] as const)(
    'another crew’s %s job is invisible: 404 everywhere',
    async (status) => {
      const row = await requestIn(status, otherCrewId);
      for (const path of reads(row.id)) expect((await cast.crew.agent.get(path)).status, path).toBe(404);
      for (const [path, body] of writes(row.id)) {
        const res = await cast.crew.agent.post(path).send(body);
        // Taking it names who has it (the one thing the board promises); every other action cannot see it.
        expect(res.status, path).toBe(path.endsWith('/accept') ? 409 : 404);
      }
      const mine = await cast.crew.agent.get('/api/crew/my-jobs').expect(200);
      expect(mine.body.jobs.map((j: { requestId: string }) => j.requestId)).not.toContain(row.id);
      const theirs = await otherCrew.get('/api/crew/my-jobs').expect(200);
      expect(theirs.body.jobs.map((j: { requestId: string }) => j.requestId)).toContain(row.id);
    },
  );

  it('the office may read the board and a sheet but cannot take a job', async () => {
    const job = await released();
    await cast.staff.agent.get('/api/crew/board').expect(200);
    await cast.staff.agent.get(`/api/crew/jobs/${job.id}/field-sheet`).expect(200);
    expect(
      (await cast.staff.agent.post(`/api/crew/jobs/${job.id}/accept`).send({ expectedVersion: job.version })).status,
    ).toBe(403);
  });
});

describe('bad input gets 400 naming the field', () => {
  it('names bad ids, versions, dates and readings', async () => {
    const job = await released();
    const badId = await cast.crew.agent.get('/api/crew/jobs/not-an-id/field-sheet');
    expect(badId.status).toBe(400);
    expect(badId.body.error.fields).toHaveProperty('id');
    const noVersion = await cast.crew.agent.post(`/api/crew/jobs/${job.id}/accept`).send({});
    expect(noVersion.body.error.fields).toHaveProperty('expectedVersion');
    const sort = await cast.crew.agent.get('/api/crew/board?sort=nearest');
    expect(sort.status).toBe(400);
    expect(sort.body.error.fields).toHaveProperty('sort');
    const yard = await cast.admin.agent.put('/api/crew/yard').send({ label: '', lat: 120, lng: 'east' });
    expect(yard.status).toBe(400);
    expect(Object.keys(yard.body.error.fields).sort()).toEqual(['label', 'lat', 'lng']);
  });

  it('odd bodies on a job the crew holds are 400s naming the field, never 500s', async () => {
    const job = await released();
    const crew = cast.crew.agent;
    await crew.post(`/api/crew/jobs/${job.id}/accept`).send({ expectedVersion: job.version }).expect(200);
    const cases: [string, unknown, string][] = [
      ['schedule', { date: '2027-02-30' }, 'date'],
      ['schedule', { date: '2027-01-12', extra: 1 }, '(body)'],
      ['schedule', [1, 2], '(body)'],
      ['hand-back', { expectedVersion: 2, note: 'x'.repeat(2001) }, 'note'],
      ['as-built', { readings: 'many' }, 'readings'],
      ['as-built', { readings: [] }, 'readings'],
      ['as-built', { readings: [{ stationFt: 1e308, gradePercent: 2 }] }, 'readings.0.stationFt'],
      ['mark-built', { expectedVersion: 0 }, 'expectedVersion'],
    ];
    for (const [action, body, field] of cases) {
      const res = await crew.post(`/api/crew/jobs/${job.id}/${action}`).send(body as object);
      expect(res.status, `${action} ${JSON.stringify(body)}`).toBe(400);
      expect(
        Object.keys(res.body.error.fields ?? {}).some((k) => k === field || k.startsWith(field)),
        JSON.stringify(res.body),
      ).toBe(true);
    }
  });
});
