import { describe, expect, it } from 'vitest';
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

describe('input PostgreSQL could not take answers 400 naming the field, never 500', () => {
  it('refuses a NUL character in any text, in the body or the query', async () => {
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id });
    const note = await cast.staff.agent
      .post(`/api/requests/${row.id}/messages`)
      .send({ body: 'gate\u0000code', visibility: 'shared' })
      .expect(400);
    expect(note.body.error.fields).toEqual({ body: 'must not contain a NUL character' });
    const nested = await cast.admin.agent
      .post('/api/jurisdictions')
      .send({ name: 'Ash\u0000Vale', extra: { deeper: ['ok', 'b\u0000d'] } })
      .expect(400);
    expect(nested.body.error.fields).toMatchObject({
      name: 'must not contain a NUL character',
      'extra.deeper.1': 'must not contain a NUL character',
    });
    const broken = await cast.admin.agent
      .put('/api/crew/yard')
      .send({ label: 'Yard \ud800', lat: 44, lng: -72 })
      .expect(400);
    expect(broken.body.error.fields).toEqual({ label: 'holds a broken character (a lone UTF-16 surrogate)' });
    const search = await cast.staff.agent.get('/api/emails').query({ search: 'a\u0000b' }).expect(400);
    expect(search.body.error.fields).toMatchObject({ search: 'must not contain a NUL character' });
    expect((await cast.staff.agent.get(`/api/requests/${row.id}/messages`).expect(200)).body.messages).toEqual([]);
  });

  it('refuses a body nested deeper than any form sends', async () => {
    const nest = (levels: number) => {
      let deep: unknown = 'x';
      for (let i = 0; i < levels; i += 1) deep = [deep];
      return deep;
    };
    const res = await cast.admin.agent
      .post('/api/jurisdictions')
      .send({ name: 'Deep', deep: nest(40) })
      .expect(400);
    expect(res.body.error.fields).toHaveProperty([`deep${'.0'.repeat(31)}`], 'is nested too deeply');
  });

  it('refuses a page position that does not read back as the sort column’s type', async () => {
    for (const [sort, value] of [
      ['waiting', 'not a time'],
      ['created', ''],
      ['created', '-000001-01-01 00:00:00+00'],
      ['reference', 'a\u0000b'],
    ]) {
      const res = await cast.staff.agent
        .get('/api/queue')
        .query({ sort, cursor: cursor([value, someId]) })
        .expect(400);
      expect(res.body.error.fields).toHaveProperty('cursor');
    }
    // The wait sort's position also says whether the last row had ended, since ended requests come after open ones.
    const fine = cursor(['2026-11-30 09:15:00.123456+00', someId, false]);
    await cast.staff.agent.get('/api/queue').query({ sort: 'waiting', cursor: fine }).expect(200);
    const old = Buffer.from(`-000001-01-01T00:00:00.000Z|${someId}`).toString('base64url');
    expect(
      (await cast.staff.agent.get('/api/emails').query({ cursor: old }).expect(400)).body.error.fields,
    ).toHaveProperty('cursor');
  });

  it('asks what to change when a change to a person names nothing', async () => {
    const res = await cast.admin.agent.patch(`/api/users/${cast.crew.id}`).send({}).expect(400);
    expect(res.body.error.fields).toEqual({
      '(body)': 'say what to change: the name, the role or whether they may sign in',
    });
  });

  it('refuses a date in a year PostgreSQL cannot hold, or no permit would carry', async () => {
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id });
    const res = await cast.staff.agent
      .post(`/api/requests/${row.id}/transitions`)
      .send({
        action: 'record-granted',
        expectedVersion: row.version,
        permitReference: 'P-1',
        permitDecidedOn: '0000-01-01',
        permitExpiresOn: '20266-01-01',
      })
      .expect(400);
    expect(res.body.error.fields).toEqual({
      permitDecidedOn: 'must be in a year between 1900 and 2999',
      permitExpiresOn: 'pick a day from the calendar',
    });
    // Each action takes only its own fields, so the visit date is tried on the action that books the visit.
    const visit = await cast.staff.agent
      .post(`/api/requests/${row.id}/transitions`)
      .send({ action: 'book-visit', expectedVersion: row.version, visitAt: '0000-02-29T10:00:00Z' })
      .expect(400);
    expect(visit.body.error.fields).toEqual({ visitAt: 'must be in a year between 1900 and 2999' });
  });

  it('answers the same new thing sent twice at once with one 201 and 409s', async () => {
    const tries = await Promise.all(
      Array.from({ length: 6 }, () =>
        cast.admin.agent
          .post('/api/jurisdictions')
          .send({ name: 'Township of Quillan Ford', authority: 'Quillan Ford Highway Office' }),
      ),
    );
    expect(tries.map((r) => r.status).sort()).toEqual([201, 409, 409, 409, 409, 409]);
    // The service's own check answers most; the database's unique key answers the ones that slipped past it together.
    for (const r of tries.filter((x) => x.status === 409))
      expect(['conflict', 'already_exists']).toContain(r.body.error.code);
    const people = await Promise.all(
      Array.from({ length: 6 }, () =>
        cast.admin.agent
          .post('/api/users')
          .send({ email: 'wren.okafor@example.test', name: 'Wren Okafor', role: 'staff' }),
      ),
    );
    expect(people.every((r) => r.status === 201 || r.status === 409)).toBe(true);
    const listed = (await cast.admin.agent.get('/api/users').query({ search: 'wren.okafor' }).expect(200)).body.users;
    expect(listed).toHaveLength(1);
  });
});
