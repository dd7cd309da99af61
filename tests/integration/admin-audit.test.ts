import request from 'supertest';
import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { jurisdictions } from '../../server/db/schema';
import { seedJurisdictions } from '../../server/dev/seed/jurisdictions';
import { type Cast, withCastApp } from '../factories/office-cast';
import type { TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
withCastApp((app, signedIn) => {
  t = app;
  cast = signedIn;
});

interface Entry {
  kind: string;
  actorName: string;
  summary: string;
  createdAt: string;
}
const log = async (kind?: string): Promise<Entry[]> =>
  (
    await cast.admin.agent
      .get('/api/audit')
      .query(kind ? { kind } : {})
      .expect(200)
  ).body.entries;
const adminName = async () => (await cast.admin.agent.get('/api/me').expect(200)).body.user.name as string;

/** The sign-in round trip up to the provider's answer, returning where the app sends the browser. */
async function signInLandsOn(email: string): Promise<string> {
  const agent = request.agent(t.app);
  const start = await agent.get('/auth/google').expect(302);
  const authorize = new URL(start.headers.location);
  authorize.searchParams.set('login_hint', email);
  const provider = await fetch(authorize, { redirect: 'manual' });
  const back = new URL(provider.headers.get('location')!);
  const done = await agent.get(back.pathname + back.search).expect(302);
  return done.headers.location;
}

describe("an administrator's changes", () => {
  it("edits a person's name, and the log says who renamed whom", async () => {
    const res = await cast.admin.agent
      .patch(`/api/users/${cast.otherApplicant.id}`)
      .send({ name: '  Wren Abernathy  ' })
      .expect(200);
    expect(res.body.user.name).toBe('Wren Abernathy');
    const listed = (await cast.admin.agent.get('/api/users').query({ search: 'Abernathy' }).expect(200)).body.users;
    expect(listed.map((u: { id: string }) => u.id)).toEqual([cast.otherApplicant.id]);
    const [entry] = await log('name-changed');
    expect(entry.actorName).toBe(await adminName());
    expect(entry.summary).toMatch(/^Renamed .+ to Wren Abernathy\.$/);

    const empty = await cast.admin.agent.patch(`/api/users/${cast.otherApplicant.id}`).send({ name: '  ' }).expect(400);
    expect(empty.body.error.message).toBe('Name: must be filled in.');
  });

  it('logs a role change and a turned-off sign-in, and tells the turned-off person so plainly', async () => {
    await cast.admin.agent.patch(`/api/users/${cast.otherStaff.id}`).send({ role: 'crew' }).expect(200);
    await cast.admin.agent.patch(`/api/users/${cast.otherStaff.id}`).send({ disabled: true }).expect(200);
    const entries = await log();
    expect(entries[0]).toMatchObject({ kind: 'sign-in-turned-off' });
    expect(entries[0].summary).toContain(cast.otherStaff.email);
    expect(entries[1]).toMatchObject({ kind: 'role-changed' });
    expect(entries[1].summary).toMatch(/role from Office staff to Crew lead\.$/);

    const landing = new URL(await signInLandsOn(cast.otherStaff.email), 'http://app.test');
    expect(landing.pathname).toBe('/sign-in');
    const said = landing.searchParams.get('error');
    expect(said).toBe(
      'Your sign-in has been turned off by Tamarack Ridge Excavating. If you think this is a mistake, ask the office to turn it back on.',
    );
    expect(said).not.toMatch(/provider/i);
  });

  it('logs a published rule profile version and a moved crew yard', async () => {
    await seedJurisdictions(t.ctx.db);
    const [j] = await t.ctx.db.select().from(jurisdictions).where(eq(jurisdictions.slug, 'marrow-county'));
    const draft = (await cast.admin.agent.post(`/api/jurisdictions/${j.id}/versions`).send({}).expect(201)).body
      .version;
    await cast.admin.agent.post(`/api/rule-profile-versions/${draft.id}/publish`).expect(200);
    await cast.admin.agent.put('/api/crew/yard').send({ label: 'North yard', lat: 44.5, lng: -72.1 }).expect(200);
    const [yard, published] = await log();
    expect(published).toMatchObject({ kind: 'version-published', actorName: await adminName() });
    expect(published.summary).toContain(`Published version ${draft.version} of the ${j.name} rule profile`);
    expect(yard.kind).toBe('yard-moved');
    expect(yard.summary).toContain('North yard');
  });

  it('shows the log to administrators only', async () => {
    await cast.staff.agent.get('/api/audit').expect(403);
    await cast.crew.agent.get('/api/audit').expect(403);
    await cast.admin.agent.get('/api/audit').query({ kind: 'nonsense' }).expect(400);
  });
});
