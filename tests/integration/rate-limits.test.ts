import request from 'supertest';
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import type { AppContext } from '../../server/config/context';
import { closeContext, createContext } from '../../server/context-factory';
import { parseEnv } from '../../server/config/env';
import { leaseSize } from '../../server/security/rate-limits';
import { maxOpenDrafts } from '../../server/services/requests/drafts.service';
import { createRequestRow } from '../factories/request-rows';
import { createTestApp, signIn, type TestApp } from '../setup/test-app';

// Two instances of the app on one database, as behind a load balancer; small limits so a test can reach them.
let t: TestApp;
let secondCtx: AppContext;
let second: TestApp['app'];
beforeAll(async () => {
  t = await createTestApp({
    RATE_LIMIT_API_PER_MINUTE: '12',
    RATE_LIMIT_MESSAGES_PER_HOUR: '4',
    RATE_LIMIT_DRAFTS_PER_HOUR: '3',
    RATE_LIMIT_UPLOADS_PER_HOUR: '3',
    RATE_LIMIT_SIGN_INS_PER_HOUR: '3',
    RATE_LIMIT_ADDRESS_FACTOR: '2',
  });
  secondCtx = createContext(parseEnv(t.env));
  second = createApp(secondCtx);
});
afterAll(async () => {
  await closeContext(secondCtx);
  await t.close();
});
beforeEach(() => t.ctx.pool.query('delete from rate_limits'));

const owner = (label: string) => `${label}-${Date.now()}-${Math.round(Math.random() * 1e6)}@example.test`;
async function bothInstances(email: string) {
  const a = await signIn(t.app, email);
  const b = await signIn(second, email);
  await t.ctx.pool.query('delete from rate_limits');
  const me = await a.get('/api/me').expect(200);
  return { a, b, id: me.body.user.id as string };
}

function expectLimited(res: request.Response, words: RegExp) {
  expect(res.status).toBe(429);
  expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
  expect(res.body.error?.message ?? res.text).toMatch(words);
  expect(res.body.error?.message ?? res.text).toMatch(/Please wait \d+ (seconds|minutes)/);
}

describe('rate limits hold across two instances sharing one database', () => {
  it('messages: the fifth in the hour is refused, whichever instance takes it', async () => {
    const { a, b, id } = await bothInstances(owner('writer'));
    const row = await createRequestRow(t.ctx.db, { applicantId: id, status: 'submitted' });
    const post = (agent: typeof a, n: number) =>
      agent.post(`/api/requests/${row.id}/messages`).send({ body: `Question ${n}` });
    for (let n = 1; n <= 4; n += 1) expect((await post(n % 2 ? a : b, n)).status).toBe(201);
    expectLimited(await post(a, 5), /Too many messages/);
    expectLimited(await post(b, 6), /Too many messages/);
    const { rows } = await t.ctx.pool.query('select count(*)::int as n from messages where request_id = $1', [row.id]);
    expect(rows[0].n).toBe(4);
  });

  it('per address as well: a second person at the same address meets the address limit', async () => {
    const first = await bothInstances(owner('first'));
    const other = await signIn(second, owner('second'));
    const otherId = (await other.get('/api/me').expect(200)).body.user.id as string;
    await t.ctx.pool.query('delete from rate_limits');
    const mine = await createRequestRow(t.ctx.db, { applicantId: first.id, status: 'submitted' });
    const theirs = await createRequestRow(t.ctx.db, { applicantId: otherId, status: 'submitted' });
    // 4 per person, 8 per address: 4 from the first person, then the second person's 5th is the address's 9th.
    for (let n = 0; n < 4; n += 1)
      await first.a.post(`/api/requests/${mine.id}/messages`).send({ body: 'Hello' }).expect(201);
    for (let n = 0; n < 4; n += 1)
      await other.post(`/api/requests/${theirs.id}/messages`).send({ body: 'Hello' }).expect(201);
    const res = await other.post(`/api/requests/${theirs.id}/messages`).send({ body: 'Hello' });
    expectLimited(res, /Too many messages/);
  });

  it('sign-in starts: the fourth from one address in the hour is refused', async () => {
    for (const app of [t.app, second, t.app]) await request(app).get('/auth/google').expect(302);
    const refused = await request(second).get('/auth/google');
    expectLimited(refused, /Too many sign-ins/);
    expect(refused.headers['content-type']).toMatch(/text\/plain/);
  });

  it('the general API ceiling counts a person’s requests on both instances', async () => {
    const { a, b } = await bothInstances(owner('reader'));
    // bothInstances has spent one already.
    for (let n = 1; n < 12; n += 1) await (n % 2 ? a : b).get('/api/me').expect(200);
    expectLimited(await a.get('/api/me'), /Too many requests/);
    expectLimited(await b.get('/api/requests/mine'), /Too many requests/);
    await a.get('/api/health').expect((res) => expect(res.status).not.toBe(429));
  });

  it('a window that has ended starts again from one, and one still running keeps its end', async () => {
    const { a, id } = await bothInstances(owner('returner'));
    for (let n = 1; n < 12; n += 1) await a.get('/api/me').expect(200);
    expectLimited(await a.get('/api/me'), /Too many requests/);
    const key = `api-person:${id}`;
    const [spent] = (await t.ctx.pool.query('select points, expire from rate_limits where key = $1', [key])).rows;
    expect(spent.points).toBeGreaterThanOrEqual(12);
    // The minute is over: the next request opens a new window with one point spent and a minute to run.
    await t.ctx.pool.query(`update rate_limits set expire = now() - interval '1 second' where key = $1`, [key]);
    await a.get('/api/me').expect(200);
    const [fresh] = (await t.ctx.pool.query('select points, expire from rate_limits where key = $1', [key])).rows;
    expect(fresh.points).toBe(1);
    expect(Math.abs(fresh.expire.getTime() - (Date.now() + 60_000))).toBeLessThan(5_000);
    // Within it, a request adds a point and leaves the end where it was.
    await a.get('/api/me').expect(200);
    const [added] = (await t.ctx.pool.query('select points, expire from rate_limits where key = $1', [key])).rows;
    expect(added.points).toBe(2);
    expect(added.expire.getTime()).toBe(fresh.expire.getTime());
  });

  it('new drafts and photo upload links are limited too', async () => {
    const { a, b } = await bothInstances(owner('drafter'));
    const ids: string[] = [];
    for (const agent of [a, b, a]) ids.push((await agent.post('/api/requests').send({}).expect(201)).body.request.id);
    expectLimited(await b.post('/api/requests').send({}), /Too many new requests/);

    const announce = (agent: typeof a) =>
      agent
        .post(`/api/requests/${ids[0]}/photos`)
        .send({ fileName: 'ditch.jpg', contentType: 'image/jpeg', sizeBytes: 1000 });
    for (const agent of [a, b, a]) expect((await announce(agent)).status).toBe(201);
    expectLimited(await announce(b), /Too many photo uploads/);
  });
});

describe('open drafts per owner', () => {
  it(`stop at ${maxOpenDrafts} with a plain explanation`, async () => {
    const { a, id } = await bothInstances(owner('many'));
    for (let n = 0; n < maxOpenDrafts; n += 1) await createRequestRow(t.ctx.db, { applicantId: id, status: 'draft' });
    const res = await a.post('/api/requests').send({});
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/5 requests that are not sent yet/);
  });
});

describe('the API ceiling at its everyday size', () => {
  // 100 a minute: each instance takes the shared count in blocks of five (a twentieth) rather than one by one.
  let ctxs: AppContext[];
  let apps: TestApp['app'][];
  beforeAll(() => {
    ctxs = [0, 1].map(() => createContext(parseEnv({ ...t.env, RATE_LIMIT_API_PER_MINUTE: '100' })));
    apps = ctxs.map((ctx) => createApp(ctx));
  });
  afterAll(() => Promise.all(ctxs.map((ctx) => closeContext(ctx))));
  const pointsOf = async (id: string) =>
    (await t.ctx.pool.query('select points from rate_limits where key = $1', [`api-person:${id}`])).rows[0]?.points;

  it('writes the shared count once per block, also for requests that arrive together', async () => {
    expect(leaseSize(100)).toBe(5);
    const email = owner('steady');
    const agent = await signIn(apps[0], email);
    const { id } = (await signIn(t.app, email).then((a) => a.get('/api/me'))).body.user as { id: string };
    await t.ctx.pool.query('delete from rate_limits');
    for (let n = 0; n < 7; n += 1) await agent.get('/api/me').expect(200);
    // Seven requests took two blocks: two writes, not seven.
    expect(await pointsOf(id)).toBe(10);
    const together = await Promise.all(Array.from({ length: 12 }, () => agent.get('/api/me')));
    expect(together.map((r) => r.status)).toEqual(Array(12).fill(200));
    // Three left in hand, nine more needed: two more blocks, not one claim per waiting request.
    expect(await pointsOf(id)).toBe(20);
  });

  it('never lets more than the ceiling through across instances, and refuses at most a block early', async () => {
    const email = owner('busy');
    const agents = await Promise.all(apps.map((app) => signIn(app, email)));
    await t.ctx.pool.query('delete from rate_limits');
    const statuses: number[] = [];
    for (let n = 0; n < 130; n += 1) statuses.push((await agents[n % 2].get('/api/me')).status);
    const passed = statuses.filter((s) => s === 200).length;
    expect(statuses.filter((s) => s !== 200 && s !== 429)).toEqual([]);
    expect(passed).toBeLessThanOrEqual(100);
    expect(passed).toBeGreaterThanOrEqual(100 - (leaseSize(100) - 1));
    expectLimited(await agents[0].get('/api/me'), /Too many requests/);
    expectLimited(await agents[1].get('/api/me'), /Too many requests/);
  });
});
