import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { gradeChecks } from '../../server/db/schema';
import { requestStatuses, statusText } from '@shared/workflow/statuses';
import { transitionActions } from '@shared/workflow/transitions';
import { createCrewCheck, createReleasedJob } from '../factories/crew-jobs';
import { type Cast, withCastApp } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import type { TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
withCastApp((app, signedIn) => {
  t = app;
  cast = signedIn;
});

const cursor = (value: unknown) => Buffer.from(JSON.stringify(value)).toString('base64url');
const someId = '7d3e9b6a-1c2f-4e8a-9b0c-123456789abc';
type Who = Cast[keyof Cast];
const everyone = () => [cast.applicant, cast.otherApplicant, cast.staff, cast.crew, cast.admin] as Who[];

/** Any answer but a 500; a 400 must name at least one field. */
function sane(res: { status: number; body: { error?: { fields?: Record<string, string> } } }, what: string) {
  expect(res.status, `${what}: ${JSON.stringify(res.body)}`).toBeLessThan(500);
  if (res.status === 400) expect(Object.keys(res.body.error?.fields ?? {}), what).not.toHaveLength(0);
}

const oddValues: unknown[] = [null, true, 0, -1, 1.5, 2 ** 53, '1', '', [], {}, ['x'], { $gt: 1 }, 'x'.repeat(20000)];

describe('every status change with odd fields answers 4xx naming a field, never 500', () => {
  it('each action, by each role, with each field given odd values, extra fields and stale versions', async () => {
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id });
    for (const action of transitionActions) {
      for (const who of everyone()) {
        const base = { action, expectedVersion: row.version };
        sane(await who.agent.post(`/api/requests/${row.id}/transitions`).send(base), `${action} bare`);
        sane(
          await who.agent.post(`/api/requests/${row.id}/transitions`).send({ ...base, sneaky: 1, status: 'closed' }),
          `${action} extra`,
        );
        sane(
          await who.agent.post(`/api/requests/${row.id}/transitions`).send({ ...base, expectedVersion: 99 }),
          `${action} stale`,
        );
      }
      for (const field of [
        'expectedVersion',
        'note',
        'answer',
        'visitAt',
        'permitReference',
        'permitDecidedOn',
        'permitConditions',
        'permitExpiresOn',
      ]) {
        for (const value of oddValues) {
          const res = await cast.staff.agent
            .post(`/api/requests/${row.id}/transitions`)
            .send({ action, expectedVersion: row.version, [field]: value });
          sane(res, `${action} ${field}=${JSON.stringify(value).slice(0, 30)}`);
        }
      }
    }
    for (const body of ['null', '[]', '"x"', '7', '{"action":["submit"]}', '{"action":"nope"}', '{"action":null}']) {
      const res = await cast.staff.agent
        .post(`/api/requests/${row.id}/transitions`)
        .set('Content-Type', 'application/json')
        .send(body);
      sane(res, body);
    }
    sane(
      await cast.staff.agent
        .post(`/api/requests/not-a-uuid/transitions`)
        .send({ action: 'submit', expectedVersion: 1 }),
      'bad id',
    );
    sane(
      await cast.staff.agent
        .post(`/api/requests/${someId}/transitions`)
        .send({ action: 'mark-checked', expectedVersion: 1 }),
      'no such',
    );
    // Every action by every role with every odd value: thousands of requests, more with each action in the table.
  }, 120_000);

  it('the crew’s four addresses take odd bodies, wrong roles and wrong jobs without a 500', async () => {
    const job = await createReleasedJob(t.ctx.db, { applicantId: cast.applicant.id, staffId: cast.staff.id });
    const plain = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id });
    for (const step of ['accept', 'hand-back', 'start', 'mark-built']) {
      for (const id of [job.id, plain.id, someId, 'nope']) {
        for (const who of everyone()) {
          for (const body of [
            {},
            { expectedVersion: job.version },
            { expectedVersion: job.version, action: 'close' },
            { expectedVersion: String(job.version) },
            { expectedVersion: 99, note: 'x' },
            { expectedVersion: job.version, note: 42 },
            { expectedVersion: job.version, note: ['a'] },
          ]) {
            const res = await who.agent.post(`/api/crew/jobs/${id}/${step}`).send(body);
            sane(res, `${step} ${who.role} ${JSON.stringify(body)}`);
            if (who.role !== 'crew') expect(res.status, `${step} by ${who.role}`).toBeGreaterThanOrEqual(400);
          }
        }
      }
    }
  });
});

describe('withdrawing a grade check, in every status and by every role', () => {
  it('answers 2xx, 403, 404 or 409, never 500, and never to the owner', async () => {
    for (const status of requestStatuses) {
      for (const attached of [true, false]) {
        const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status });
        const { check } = await createCrewCheck(t.ctx.db, row.id, cast.staff.id);
        if (!attached) await t.ctx.db.update(gradeChecks).set({ attachedAt: null }).where(eq(gradeChecks.id, check.id));
        for (const who of everyone()) {
          const res = await who.agent.post(`/api/grade-checks/${check.id}/withdraw`).send({ junk: [1] });
          sane(res, `withdraw ${status} ${who.role}`);
          if (who.role === 'applicant' || who.role === 'crew') expect(res.status).toBeGreaterThanOrEqual(400);
        }
      }
    }
    sane(await cast.staff.agent.post(`/api/grade-checks/${someId}/withdraw`), 'no such check');
    sane(await cast.staff.agent.post(`/api/grade-checks/x/withdraw`), 'bad id');
  });

  it('says why a check cannot be withdrawn in words true of the request', async () => {
    for (const status of ['declined', 'withdrawn', 'submitted'] as const) {
      const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status });
      const { check } = await createCrewCheck(t.ctx.db, row.id, cast.staff.id);
      const res = await cast.staff.agent.post(`/api/grade-checks/${check.id}/withdraw`).expect(409);
      expect(res.body.error.message, status).not.toMatch(/went to the crew/);
      expect(res.body.error.message).toContain(statusText[status].label);
    }
    const job = await createReleasedJob(t.ctx.db, { applicantId: cast.applicant.id, staffId: cast.staff.id });
    const res = await cast.staff.agent.post(`/api/grade-checks/${job.gradeCheckId}/withdraw`).expect(409);
    expect(res.body.error.message).toMatch(/went to the crew/);
  });

  it('attach refuses a confirmFailing that is not true or false, naming it', async () => {
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'visit_booked' });
    const { check } = await createCrewCheck(t.ctx.db, row.id, cast.staff.id);
    await t.ctx.db.update(gradeChecks).set({ attachedAt: null }).where(eq(gradeChecks.id, check.id));
    for (const value of ['true', 1, null, [], {}, 'yes']) {
      const res = await cast.staff.agent.post(`/api/grade-checks/${check.id}/attach`).send({ confirmFailing: value });
      expect(res.status, JSON.stringify(res.body)).toBe(400);
      expect(res.body.error.fields).toHaveProperty('confirmFailing');
    }
    for (const who of [cast.applicant, cast.crew])
      sane(await who.agent.post(`/api/grade-checks/${check.id}/attach`).send({ confirmFailing: true }), 'role');
  });
});

describe('the queue’s query string', () => {
  it('answers 200 or 400 naming the field, never 500', async () => {
    const queries: Record<string, unknown>[] = [
      { status: 'submitted,submitted,submitted' },
      { status: 'submitted,nope' },
      { status: ',,,' },
      { status: ['submitted', 'checked'] },
      { sort: 'nope' },
      { sort: ['waiting', 'created'] },
      { dir: 'sideways' },
      { limit: '100000000' },
      { limit: '1e3' },
      { limit: '-5' },
      { limit: 'NaN' },
      { limit: ['5', '6'] },
      { q: 'a\u0000b' },
      { q: 'road \ud800' },
      { q: "'&|!:*()<->" },
      { q: ['a', 'b'] },
      { q: '1 2 3 4 5 6 7 8 9 10' },
      { q: '日本語 ǅx ١٢٣ ²³ ⅷ' },
      { q: 'x'.repeat(120) },
      { q: '9'.repeat(120) },
      { q: 'GP-2026-00001 ' },
      { cursor: 'garbage!!' },
      { cursor: '' },
      { cursor: cursor(null) },
      { cursor: cursor([1, 2, 3]) },
      { cursor: cursor(['x', someId, 'yes']) },
      { cursor: cursor(['x', someId]), sort: 'reference' },
      { cursor: cursor(['x\ud800', someId]), sort: 'road' },
      { jurisdiction: 'x' },
      { assignee: ['me', 'none'] },
      { waiting: 'yes' },
    ];
    for (const query of queries) {
      const res = await cast.staff.agent.get('/api/queue').query(query);
      sane(res, JSON.stringify(query));
    }
    for (const who of [cast.applicant, cast.crew])
      expect((await who.agent.get('/api/queue').query({ status: 'submitted' })).status).toBe(403);
  });
});

describe('a value of the wrong type', () => {
  it('is named in plain words, not the validator’s', async () => {
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'permit_filed' });
    const granted = await cast.staff.agent.post(`/api/requests/${row.id}/transitions`).send({
      action: 'record-granted',
      expectedVersion: row.version,
      permitDecidedOn: '2026-11-20',
      permitConditions: 7,
      note: ['a'],
    });
    expect(granted.status).toBe(400);
    expect(granted.body.error.fields).toEqual({ permitConditions: 'must be text', note: 'must be text' });
    const queue = await cast.staff.agent.get('/api/queue').query({ status: ['submitted', 'checked'] });
    expect(queue.status).toBe(400);
    expect(queue.body.error.fields).toEqual({ status: 'give each status once in one list, separated by commas' });
  });
});

describe('a time-sorted page position PostgreSQL could not read as a time', () => {
  // JavaScript's date parser takes each of these; PostgreSQL refuses them when the cursor is cast in the query.
  it('is refused as a cursor from another list, not answered with a 500', async () => {
    for (const sort of ['waiting', 'created'] as const) {
      const at = (time: string) => cursor(sort === 'waiting' ? [time, someId, false] : [time, someId]);
      for (const time of [
        '0000-01-01 00:00:00+00',
        '2026-02-30 10:00:00+00',
        '2025-02-29 10:00:00+00',
        '2026-01-01 10:00:00+23',
        '2026-01-01 10:00:00+05:75',
      ]) {
        const res = await cast.staff.agent.get('/api/queue').query({ sort, cursor: at(time) });
        expect(res.status, `${sort} ${time}: ${JSON.stringify(res.body)}`).toBe(400);
        expect(res.body.error.fields).toHaveProperty('cursor');
      }
      for (const time of ['2024-02-29 10:00:00+00', '2026-01-01 10:00:00.999999+15:59', '9999-12-31 23:59:59+00'])
        await cast.staff.agent
          .get('/api/queue')
          .query({ sort, cursor: at(time) })
          .expect(200);
    }
  });
});

describe('messages and photos with odd bodies', () => {
  it('answers 4xx naming the field, never 500', async () => {
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id });
    for (const who of everyone()) {
      for (const body of [
        {},
        { body: 42 },
        { body: '' },
        { body: 'x'.repeat(100000) },
        { body: 'hi', visibility: 'secret' },
        { body: 'hi', visibility: 'internal' },
        { body: ['hi'] },
        { body: 'hi', extra: true },
      ]) {
        sane(
          await who.agent.post(`/api/requests/${row.id}/messages`).send(body),
          `message ${who.role} ${JSON.stringify(body).slice(0, 40)}`,
        );
      }
      sane(await who.agent.get(`/api/requests/${row.id}/messages`).query({ cursor: 'x', limit: '1e9' }), 'list');
      for (const body of [
        {},
        { fileName: 42 },
        { fileName: 'a.jpg', size: -1 },
        { fileName: 'a\u0000.jpg' },
        { contentType: 'text/html', size: 1e12 },
      ]) {
        sane(
          await who.agent.post(`/api/requests/${row.id}/photos`).send(body),
          `photo ${who.role} ${JSON.stringify(body)}`,
        );
        for (const photoId of [someId, 'x']) {
          const at = `/api/requests/${row.id}/photos/${photoId}`;
          sane(await who.agent.post(`${at}/confirm`).send(body), `photo confirm ${who.role}`);
          sane(await who.agent.patch(at).send({ caption: body.fileName ?? ['x'] }), `photo caption ${who.role}`);
          sane(await who.agent.get(`${at}/url`), `photo url ${who.role}`);
        }
      }
    }
  });
});
