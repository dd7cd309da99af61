import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { emails } from '../../server/db/schema';
import { signInCast, type Cast } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import { createTestApp, type TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
let reference: string;
beforeAll(async () => {
  t = await createTestApp();
  cast = await signInCast(t);
  const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id });
  reference = row.reference;
  const base = { requestId: row.id, template: 'transition.ask-details', textBody: 'text', htmlBody: '<p>html</p>' };
  await t.ctx.db.insert(emails).values([
    ...Array.from({ length: 7 }, (_, i) => ({
      ...base,
      toAddress: `owner${i}@example.test`,
      subject: `${row.reference}: More details needed`,
      status: 'sent' as const,
      attempts: 1,
      createdAt: new Date(Date.UTC(2026, 3, 1, 9, i)),
    })),
    {
      ...base,
      toAddress: 'bounce@example.test',
      subject: 'Gave up',
      status: 'dead',
      attempts: 6,
      lastError: 'ECONNREFUSED: connect ECONNREFUSED 127.0.0.1:25',
    },
    { ...base, toAddress: 'later@example.test', subject: 'Waiting', status: 'queued' },
  ]);
});
afterAll(() => t.close());

describe('the e-mail log', () => {
  it('lists newest first with totals per status, and pages with a cursor', async () => {
    const first = await cast.staff.agent.get('/api/emails?limit=4').expect(200);
    expect(first.body.totals).toMatchObject({ sent: 7, dead: 1, queued: 1, failed: 0 });
    const seen = first.body.emails.map((e: { id: string }) => e.id);
    let cursor = first.body.nextCursor;
    while (cursor) {
      const next = await cast.staff.agent.get(`/api/emails?limit=4&cursor=${cursor}`).expect(200);
      seen.push(...next.body.emails.map((e: { id: string }) => e.id));
      cursor = next.body.nextCursor;
    }
    expect(new Set(seen).size).toBe(9);
  });

  it('filters by status and searches address, subject and reference', async () => {
    const dead = await cast.admin.agent.get('/api/emails?status=dead').expect(200);
    expect(dead.body.emails).toEqual([
      expect.objectContaining({ toAddress: 'bounce@example.test', lastError: expect.stringContaining('ECONNREFUSED') }),
    ]);
    const byRef = await cast.staff.agent.get(`/api/emails?search=${reference}`).expect(200);
    expect(byRef.body.emails.length).toBe(9);
    const odd = await cast.staff.agent.get('/api/emails?search=%25_').expect(200);
    expect(odd.body.emails).toEqual([]);
    const one = await cast.staff.agent.get(`/api/emails/${dead.body.emails[0].id}`).expect(200);
    expect(one.body.email).toMatchObject({ textBody: 'text', htmlBody: '<p>html</p>' });
  });

  it('answers bad input with 400 naming the field and keeps the log from other roles', async () => {
    const bad = await cast.staff.agent.get('/api/emails?status=lost&limit=0&cursor=bm9wZQ').expect(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(['status', 'limit', 'cursor']));
    await cast.staff.agent.get('/api/emails/not-an-id').expect(400);
    await cast.staff.agent.get('/api/emails/00000000-0000-4000-8000-000000000000').expect(404);
    await cast.staff.agent.post('/api/emails/00000000-0000-4000-8000-000000000000/retry').expect(404);
    await cast.applicant.agent.get('/api/emails').expect(403);
    await cast.crew.agent.get('/api/emails').expect(403);
  });
});
