import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { seedDemo } from '../../server/dev/seed';
import { createTestApp, signIn, type TestApp } from '../setup/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
  await seedDemo(t.ctx.db);
});
afterAll(() => t.close());

const person = (role: string) => demoPeople.find((p) => p.role === role)!;

describe('sign-in round trip through the OAuth provider', () => {
  it('signs in each demo role and /api/me reports it', async () => {
    for (const role of ['applicant', 'staff', 'crew', 'admin']) {
      const agent = await signIn(t.app, person(role).email);
      const me = await agent.get('/api/me').expect(200);
      expect(me.body.user).toMatchObject({ email: person(role).email, role });
    }
  });

  it('makes an unknown e-mail an applicant', async () => {
    const agent = await signIn(t.app, 'first.timer@example.test');
    const me = await agent.get('/api/me').expect(200);
    expect(me.body.user).toMatchObject({ email: 'first.timer@example.test', role: 'applicant' });
  });

  it('writes no session before sign-in and sets a fresh, guarded one at the callback', async () => {
    const agent = request.agent(t.app);
    const before = await agent.get('/auth/google').expect(302);
    expect(String(before.headers['set-cookie'])).not.toMatch(/gradepass\.sid=/);
    const authorize = new URL(before.headers.location);
    authorize.searchParams.set('login_hint', person('staff').email);
    const back = new URL((await fetch(authorize, { redirect: 'manual' })).headers.get('location')!);
    const done = await agent.get(back.pathname + back.search).expect(302);
    const cookieAfter = String(done.headers['set-cookie']).match(/gradepass\.sid=([^;]+)/)?.[1];
    expect(cookieAfter).toBeTruthy();
    expect(String(done.headers['set-cookie'])).toMatch(/HttpOnly/i);
    expect(String(done.headers['set-cookie'])).toMatch(/SameSite=Lax/i);
  });

  it('refuses a callback whose state does not match', async () => {
    const agent = request.agent(t.app);
    await agent.get('/auth/google').expect(302);
    const res = await agent.get('/auth/google/callback?code=made-up&state=wrong').expect(302);
    expect(res.headers.location).toMatch(/^\/sign-in\?error=/);
    expect((await agent.get('/api/me').expect(200)).body.user).toBeNull();
  });

  it('signs out', async () => {
    const agent = await signIn(t.app, person('applicant').email);
    await agent.post('/auth/sign-out').expect(204);
    expect((await agent.get('/api/me').expect(200)).body.user).toBeNull();
  });
});

describe('role guards', () => {
  it('answers 401 to anonymous callers and 403 to the wrong role', async () => {
    await request(t.app).get('/api/users').expect(401);
    // Asking who is signed in is the one question a stranger gets a plain answer to: nobody (no console error).
    expect((await request(t.app).get('/api/me').expect(200)).body).toEqual({ user: null });
    for (const role of ['applicant', 'staff', 'crew']) {
      const agent = await signIn(t.app, person(role).email);
      const res = await agent.get('/api/users').expect(403);
      expect(res.body.error.code).toBe('forbidden');
    }
    const admin = await signIn(t.app, person('admin').email);
    const res = await admin.get('/api/users').expect(200);
    expect(res.body.users.length).toBeGreaterThanOrEqual(demoPeople.length);
  });

  it('lets an admin grant a role, which the person has at the next request', async () => {
    const admin = await signIn(t.app, person('admin').email);
    const newcomer = await signIn(t.app, 'new.hire@example.test');
    const me = await newcomer.get('/api/me').expect(200);
    await admin.patch(`/api/users/${me.body.user.id}`).send({ role: 'staff' }).expect(200);
    const after = await newcomer.get('/api/me').expect(200);
    expect(after.body.user.role).toBe('staff');
  });

  it('refuses to add a person whose e-mail is already in use, naming the E-mail field, and leaves them as they were', async () => {
    const admin = await signIn(t.app, person('admin').email);
    const owner = person('applicant');
    const res = await admin
      .post('/api/users')
      .send({ email: owner.email.toUpperCase(), name: 'Someone Else', role: 'staff' })
      .expect(409);
    expect(res.body.error.message).toMatch(/^E-mail: /);
    expect(res.body.error.fields).toHaveProperty('email');
    const listed = (await admin.get('/api/users').query({ search: owner.email }).expect(200)).body.users;
    expect(listed).toHaveLength(1);
    expect(listed[0]).toMatchObject({ name: owner.name, role: 'applicant' });
  });

  it('refuses bad input with 400 naming the field', async () => {
    const admin = await signIn(t.app, person('admin').email);
    const res = await admin.patch('/api/users/not-a-uuid').send({ role: 'boss' }).expect(400);
    expect(res.body.error.fields).toHaveProperty('id');
    const me = (await admin.get('/api/me')).body.user;
    const bad = await admin.patch(`/api/users/${me.id}`).send({ role: 'boss' }).expect(400);
    expect(bad.body.error.fields).toHaveProperty('role');
    const malformed = await admin
      .post('/api/users')
      .set('Content-Type', 'application/json')
      .send('{"email":')
      .expect(400);
    expect(malformed.body.error.code).toBe('malformed_json');
    const form = await admin.post('/api/users').type('form').send('email=a@b.test').expect(415);
    expect(form.body.error.code).toBe('unsupported_media_type');
  });

  it('answers /api/health with the database state', async () => {
    const res = await request(t.app).get('/api/health').expect(200);
    expect(res.body).toEqual({ status: 'ok', database: 'ok' });
  });

  it('answers an unknown API route with 404 in the one error shape', async () => {
    const res = await request(t.app).get('/api/no-such-thing').expect(404);
    expect(res.body.error.code).toBe('not_found');
  });
});
