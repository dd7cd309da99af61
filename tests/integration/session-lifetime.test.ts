import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { seedDemo } from '../../server/dev/seed';
import { statementsDuring } from '../setup/statements';
import { createTestApp, signIn, type TestApp } from '../setup/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ SESSION_IDLE_MINUTES: '30', SESSION_MAX_DAYS: '14' });
  await seedDemo(t.ctx.db);
});
afterAll(() => t.close());

const staff = demoPeople.find((p) => p.role === 'staff')!.email;
const minuteMs = 60_000;
const toleranceMs = minuteMs;

async function sessionRows() {
  const { rows } = await t.ctx.pool.query<{ sid: string; expire: Date; sess: { signedInAt?: number } }>(
    'select sid, expire, sess from session',
  );
  return rows;
}

describe('sessions', () => {
  it('are not written for sign-ins that are only started', async () => {
    await t.ctx.pool.query('delete from session');
    for (let i = 0; i < 5; i += 1) {
      const start = await request(t.app).get('/auth/google').expect(302);
      expect(String(start.headers['set-cookie'])).not.toMatch(/gradepass\.sid=/);
      expect(String(start.headers['set-cookie'])).toMatch(/gradepass\.oauth=.+HttpOnly/i);
    }
    expect(await sessionRows()).toHaveLength(0);
  });

  it('end after the idle time, which every request moves on', async () => {
    await t.ctx.pool.query('delete from session');
    const agent = await signIn(t.app, staff);
    const [row] = await sessionRows();
    expect(Math.abs(row.expire.getTime() - (Date.now() + 30 * minuteMs))).toBeLessThan(toleranceMs);
    expect(Math.abs(row.sess.signedInAt! - Date.now())).toBeLessThan(toleranceMs);

    await t.ctx.pool.query(`update session set expire = now() + interval '1 minute'`);
    const me = await agent.get('/api/me').expect(200);
    const expires = String(me.headers['set-cookie']).match(/gradepass\.sid=[^,]*Expires=([^;]+)/)?.[1];
    expect(Math.abs(new Date(expires!).getTime() - (Date.now() + 30 * minuteMs))).toBeLessThan(toleranceMs);
    const [rolled] = await sessionRows();
    expect(Math.abs(rolled.expire.getTime() - (Date.now() + 30 * minuteMs))).toBeLessThan(toleranceMs);

    // Past the idle time the stored session no longer counts, even if someone kept the cookie.
    await t.ctx.pool.query(`update session set expire = now() - interval '1 second'`);
    expect((await agent.get('/api/me').expect(200)).body.user).toBeNull();
  });

  it('are not rewritten by every request of a busy person: only once the stored expiry lags by a minute', async () => {
    await t.ctx.pool.query('delete from session');
    const agent = await signIn(t.app, staff);
    // Moved on 20 s ago: close enough that the row need not be written again.
    await t.ctx.pool.query(`update session set expire = now() + interval '30 minutes' - interval '20 seconds'`);
    const [before] = await sessionRows();
    for (let i = 0; i < 5; i += 1) await agent.get('/api/me').expect(200);
    const [after] = await sessionRows();
    expect(after.expire.getTime()).toBe(before.expire.getTime());
    // Moved on 90 s ago: past the slack, so the next request writes it.
    await t.ctx.pool.query(`update session set expire = now() + interval '30 minutes' - interval '90 seconds'`);
    await agent.get('/api/me').expect(200);
    const [rolled] = await sessionRows();
    expect(Math.abs(rolled.expire.getTime() - (Date.now() + 30 * minuteMs))).toBeLessThan(5_000);
  });

  it('end 14 days after sign-in however busy they were', async () => {
    await t.ctx.pool.query('delete from session');
    const agent = await signIn(t.app, staff);
    await agent.get('/api/me').expect(200);
    const fifteenDaysAgo = Date.now() - 15 * 86_400_000;
    await t.ctx.pool.query(`update session set sess = jsonb_set(sess, '{signedInAt}', to_jsonb($1::bigint))`, [
      fifteenDaysAgo,
    ]);
    const [old] = await sessionRows();
    expect((await agent.get('/api/me').expect(200)).body.user).toBeNull();
    const left = await sessionRows();
    expect(left.map((r) => r.sid)).not.toContain(old.sid);
    expect(left.every((r) => !('passport' in r.sess))).toBe(true);
  });
});

describe('who is signed in', () => {
  it('is read with the session in one round trip, fresh on every request', async () => {
    await t.ctx.pool.query('delete from session');
    const agent = await signIn(t.app, staff);
    await agent.get('/api/me').expect(200);
    let me: { body: { user: unknown } } | undefined;
    const sent = await statementsDuring(t.ctx.pool, async () => (me = await agent.get('/api/me').expect(200)));
    expect(me?.body.user).toMatchObject({ email: staff, role: 'staff' });
    // The session with its person, and nothing more: the API's rate-limit point comes from a block this
    // instance already took from the shared count on the request before (security/rate-limits.ts).
    expect(sent, sent.join('\n')).toHaveLength(1);
  });

  it('sees a rename, a new role and a turned-off sign-in on the very next request', async () => {
    await t.ctx.pool.query('delete from session');
    const agent = await signIn(t.app, staff);
    const { id } = (await agent.get('/api/me').expect(200)).body.user as { id: string };
    try {
      await t.ctx.pool.query(`update users set name = 'Renamed Person', role = 'crew' where id = $1`, [id]);
      expect((await agent.get('/api/me').expect(200)).body.user).toMatchObject({
        name: 'Renamed Person',
        role: 'crew',
      });
      await t.ctx.pool.query('update users set disabled = true where id = $1', [id]);
      expect((await agent.get('/api/me').expect(200)).body.user).toBeNull();
      await t.ctx.pool.query('update users set disabled = false where id = $1', [id]);
      // Turned off means signed out: turning sign-in back on does not revive the old session.
      expect((await agent.get('/api/me').expect(200)).body.user).toBeNull();
    } finally {
      const person = demoPeople.find((p) => p.email === staff)!;
      await t.ctx.pool.query('update users set name = $2, role = $3, disabled = false where id = $1', [
        id,
        person.name,
        person.role,
      ]);
    }
  });

  it('is nobody when the session names a person who is not there, or names them in a shape we never write', async () => {
    await t.ctx.pool.query('delete from session');
    const agent = await signIn(t.app, staff);
    await agent.get('/api/me').expect(200);
    await t.ctx.pool.query(`update session set sess = jsonb_set(sess, '{passport,user}', '"not-an-id"')`);
    expect((await agent.get('/api/me').expect(200)).body.user).toBeNull();
    const again = await signIn(t.app, staff);
    await t.ctx.pool.query(
      `update session set sess = jsonb_set(sess, '{passport,user}', to_jsonb(gen_random_uuid()::text))`,
    );
    expect((await again.get('/api/me').expect(200)).body.user).toBeNull();
  });
});

describe('API answers', () => {
  it('carry Cache-Control: no-store and no validator to revalidate with, signed in or not, found or not', async () => {
    const agent = await signIn(t.app, staff);
    for (const res of [
      await agent.get('/api/me'),
      await request(t.app).get('/api/me'),
      await agent.get('/api/no-such-thing'),
      await agent.get('/api/queue'),
    ]) {
      expect(res.headers['cache-control']).toBe('no-store');
      // Nothing stores them, so an ETag (a hash of every body) would only cost the server.
      expect(res.headers.etag).toBeUndefined();
    }
  });
});
