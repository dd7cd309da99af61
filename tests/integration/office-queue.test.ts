import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { requestEvents } from '../../server/db/schema';
import { terminalStatuses, type RequestStatus } from '@shared/workflow/statuses';
import { createJurisdiction } from '../factories/grade-checks';
import { signInCast, type Cast } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import { createTestApp, type TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
let fenwick: string;
const made: { id: string; status: RequestStatus; name: string; road: string }[] = [];

const statuses: RequestStatus[] = [
  'submitted',
  'needs_details',
  'visit_booked',
  'checked',
  'permit_filed',
  'released',
  'closed',
  'draft',
];
const names = ['Ada Quill', 'Bram Osei', 'Cora Vance', 'Dmitri Hale', 'Esme Tolliver', 'Fen Ashgrove'];

beforeAll(async () => {
  t = await createTestApp();
  cast = await signInCast(t);
  fenwick = (await createJurisdiction(t.ctx.db, { name: 'Fenwick County' })).jurisdiction.id;
  for (let i = 0; i < 48; i++) {
    const status = statuses[i % statuses.length];
    const name = names[i % names.length];
    const road = i % 3 === 0 ? 'Quarry Ridge Road' : 'Tamsin Mill Lane';
    const row = await createRequestRow(t.ctx.db, {
      applicantId: cast.applicant.id,
      status,
      applicantName: name,
      roadName: road,
      siteAddress: `${100 + i} ${road}`,
      jurisdictionId: i % 2 === 0 ? fenwick : null,
      assigneeId: i % 4 === 0 ? cast.staff.id : null,
      statusChangedAt: new Date(Date.UTC(2026, 2, 1, 8, i)),
    });
    made.push({ id: row.id, status, name, road });
  }
});
afterAll(() => t.close());

const queue = (query: string) => cast.staff.agent.get(`/api/queue?${query}`);

describe('the office queue', () => {
  it('lists every submitted request (never drafts) oldest-waiting first, with what to do next', async () => {
    const res = await queue('limit=100').expect(200);
    const open = made.filter((m) => m.status !== 'draft');
    expect(res.body.requests).toHaveLength(open.length);
    // Oldest wait first means the open requests, longest in their status first; finished ones come after them.
    const rows = res.body.requests as { status: RequestStatus; statusChangedAt: string }[];
    const ended = rows.map((r) => terminalStatuses.includes(r.status));
    expect(ended).toEqual([...ended].sort((a, b) => Number(a) - Number(b)));
    expect(ended).toContain(true);
    for (const part of [rows.filter((_, i) => !ended[i]), rows.filter((_, i) => ended[i])]) {
      const times = part.map((r) => r.statusChangedAt);
      expect([...times].sort()).toEqual(times);
    }
    const first = res.body.requests.find((r: { status: string }) => r.status === 'submitted');
    expect(first.nextAction).toBe('Ask for details or Book the site visit');
    expect(first.statusLabel).toBe('Sent to the office');
  });

  it('keeps finished requests after the open ones when the newest in status come first', async () => {
    const rows = (await queue('sort=waiting&dir=desc&limit=100').expect(200)).body.requests as {
      status: RequestStatus;
      statusChangedAt: string;
    }[];
    const ended = rows.map((r) => terminalStatuses.includes(r.status));
    expect(ended).toEqual([...ended].sort((a, b) => Number(a) - Number(b)));
    const open = rows.filter((_, i) => !ended[i]).map((r) => r.statusChangedAt);
    expect([...open].sort().reverse()).toEqual(open);
  });

  it('filters by status, jurisdiction, assignee and "waiting on us"', async () => {
    const submitted = await queue('status=submitted,checked&limit=100').expect(200);
    expect(submitted.body.requests.every((r: { status: string }) => ['submitted', 'checked'].includes(r.status))).toBe(
      true,
    );
    expect(submitted.body.total).toBe(made.filter((m) => m.status === 'submitted' || m.status === 'checked').length);

    const inFenwick = await queue(`jurisdiction=${fenwick}&limit=100`).expect(200);
    expect(inFenwick.body.requests.length).toBeGreaterThan(0);
    expect(
      inFenwick.body.requests.every(
        (r: { jurisdiction: { name: string } }) => r.jurisdiction?.name === 'Fenwick County',
      ),
    ).toBe(true);

    const mine = await queue('assignee=me&limit=100').expect(200);
    expect(mine.body.requests.length).toBeGreaterThan(0);
    expect(mine.body.requests.every((r: { assignee: { id: string } }) => r.assignee?.id === cast.staff.id)).toBe(true);
    const unassigned = await queue('assignee=none&limit=100').expect(200);
    expect(unassigned.body.requests.every((r: { assignee: unknown }) => r.assignee === null)).toBe(true);

    const waiting = await queue('waiting=true&limit=100').expect(200);
    expect(new Set(waiting.body.requests.map((r: { status: string }) => r.status))).toEqual(
      new Set(['submitted', 'visit_booked', 'checked']),
    );
  });

  it('searches reference, name, address and road as words or prefixes', async () => {
    const byName = await queue('q=cora').expect(200);
    expect(byName.body.requests.length).toBeGreaterThan(0);
    expect(byName.body.requests.every((r: { applicantName: string }) => r.applicantName === 'Cora Vance')).toBe(true);
    const byRoad = await queue('q=quarry rid&limit=100').expect(200);
    expect(byRoad.body.requests.every((r: { roadName: string }) => r.roadName === 'Quarry Ridge Road')).toBe(true);
    const one = byRoad.body.requests[0];
    const byReference = await queue(`q=${one.reference}`).expect(200);
    expect(byReference.body.requests.map((r: { id: string }) => r.id)).toEqual([one.id]);
    const byNumber = await queue(`q=${one.reference.split('-').at(-1)}`).expect(200);
    expect(byNumber.body.requests.map((r: { id: string }) => r.id)).toContain(one.id);
    await queue(`q=${encodeURIComponent("'):* | !(")}`).expect(200);
  });

  it('pages with a cursor through every row exactly once, in any sort', async () => {
    for (const [sort, dir] of [
      ['applicant', 'asc'],
      ['road', 'desc'],
      ['waiting', 'desc'],
      ['reference', 'asc'],
    ]) {
      const seen: string[] = [];
      let cursor = '';
      for (let pageNo = 0; pageNo < 20; pageNo++) {
        const res = await queue(`sort=${sort}&dir=${dir}&limit=7${cursor ? `&cursor=${cursor}` : ''}`).expect(200);
        seen.push(...res.body.requests.map((r: { id: string }) => r.id));
        if (!res.body.nextCursor) break;
        cursor = res.body.nextCursor;
      }
      expect(new Set(seen).size).toBe(seen.length);
      expect(seen.length).toBe(made.filter((m) => m.status !== 'draft').length);
    }
  });

  it('answers bad parameters with 400 naming them, and keeps the queue from other roles', async () => {
    const bad = await queue('status=submitted,nonsense&sort=colour&limit=1000&assignee=someone&cursor=zzz').expect(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(['status', 'sort', 'limit', 'assignee']));
    const cursor = await queue('cursor=bm90LWEtY3Vyc29y').expect(400);
    expect(cursor.body.error.fields).toHaveProperty('cursor');
    await cast.applicant.agent.get('/api/queue').expect(403);
    await cast.crew.agent.get('/api/queue').expect(403);
    await cast.admin.agent.get('/api/queue').expect(200);
  });
});

describe('assignment', () => {
  it('assigns to me and to a colleague as internal events the owner never sees', async () => {
    const target = made.find((m) => m.status === 'submitted')!;
    const options = await cast.staff.agent.get('/api/queue/options').expect(200);
    expect(options.body.people.map((p: { id: string }) => p.id)).toEqual(
      expect.arrayContaining([cast.staff.id, cast.otherStaff.id, cast.admin.id]),
    );
    await cast.staff.agent
      .put(`/api/requests/${target.id}/assignee`)
      .send({ assigneeId: cast.otherStaff.id })
      .expect(200);
    const theirs = (
      await queue(`q=${encodeURIComponent(target.name)}&assignee=${cast.otherStaff.id}&limit=100`).expect(200)
    ).body.requests;
    expect(theirs.map((r: { id: string }) => r.id)).toContain(target.id);
    // Giving it to the person who already has it writes nothing.
    await cast.staff.agent
      .put(`/api/requests/${target.id}/assignee`)
      .send({ assigneeId: cast.otherStaff.id })
      .expect(200);
    await cast.staff.agent.put(`/api/requests/${target.id}/assignee`).send({ assigneeId: cast.staff.id }).expect(200);
    const mine = (await queue('assignee=me&limit=100').expect(200)).body.requests;
    expect(mine.map((r: { id: string }) => r.id)).toContain(target.id);

    const events = await t.ctx.db.select().from(requestEvents).where(eq(requestEvents.requestId, target.id));
    expect(events.filter((e) => e.kind === 'assignment').map((e) => e.internal)).toEqual([true, true]);
    const seenByOwner = await cast.applicant.agent.get(`/api/requests/${target.id}/events`).expect(200);
    expect(seenByOwner.body.events.some((e: { kind: string }) => e.kind === 'assignment')).toBe(false);
  });

  it('refuses people outside the office, other roles, and unknown requests', async () => {
    const target = made.find((m) => m.status === 'checked')!;
    const crew = await cast.staff.agent
      .put(`/api/requests/${target.id}/assignee`)
      .send({ assigneeId: cast.crew.id })
      .expect(400);
    expect(crew.body.error.fields).toHaveProperty('assigneeId');
    await cast.staff.agent.put(`/api/requests/${target.id}/assignee`).send({ assigneeId: 'me' }).expect(400);
    await cast.applicant.agent.put(`/api/requests/${target.id}/assignee`).send({ assigneeId: null }).expect(403);
    await cast.staff.agent
      .put('/api/requests/00000000-0000-4000-8000-000000000000/assignee')
      .send({ assigneeId: null })
      .expect(404);
  });
});
