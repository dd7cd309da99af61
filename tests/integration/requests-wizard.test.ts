import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { emails, requestEvents } from '../../server/db/schema';
import { completeApplication } from '../factories/request-rows';
import { createTestApp, type TestApp } from '../setup/test-app';
import { completedDraft, newApplicant, signInDemo, submitted } from './requests-helpers';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('the applicant’s request, from draft to the office', () => {
  it('creates a draft with a reference and continues where it stopped', async () => {
    const owner = await newApplicant(t);
    const created = await owner.post('/api/requests').send({}).expect(201);
    expect(created.body.request).toMatchObject({ status: 'draft', version: 1, wizardStep: 0 });
    expect(created.body.request.reference).toMatch(/^GP-\d{4}-\d{5}$/);
    const { site } = completeApplication();
    await owner
      .patch(`/api/requests/${created.body.request.id}/draft`)
      .send({ expectedVersion: 1, wizardStep: 1, site })
      .expect(200);
    const again = await owner.get(`/api/requests/${created.body.request.id}`).expect(200);
    expect(again.body.request).toMatchObject({
      version: 2,
      wizardStep: 1,
      siteAddress: site.address,
      roadName: site.roadName,
    });
    expect(again.body.request.application.site).toEqual(site);
  });

  it('refuses a save made from a stale version and keeps the newer one', async () => {
    const owner = await newApplicant(t);
    const { id } = (await owner.post('/api/requests').send({}).expect(201)).body.request;
    await owner
      .patch(`/api/requests/${id}/draft`)
      .send({ expectedVersion: 1, site: { address: '4 Tern Pond Road' } })
      .expect(200);
    const stale = await owner
      .patch(`/api/requests/${id}/draft`)
      .send({ expectedVersion: 1, site: { address: 'older text' } })
      .expect(409);
    expect(stale.body.error.message).toMatch(/version 2/);
    const kept = await owner.get(`/api/requests/${id}`).expect(200);
    expect(kept.body.request.siteAddress).toBe('4 Tern Pond Road');
  });

  it('will not send an unfinished form, and names what is missing', async () => {
    const owner = await newApplicant(t);
    const { id, version } = (await owner.post('/api/requests').send({}).expect(201)).body.request;
    const res = await owner
      .post(`/api/requests/${id}/transitions`)
      .send({ action: 'submit', expectedVersion: version })
      .expect(400);
    expect(res.body.error.fields).toHaveProperty(['site.address']);
    expect(res.body.error.fields).toHaveProperty(['entrance.vehicles']);
  });

  it('submits, lists it under "my requests", shows the timeline and queues the receipt and the office notice', async () => {
    const owner = await newApplicant(t);
    const sent = await submitted(owner);
    expect(sent.status).toBe('submitted');
    const mine = await owner.get('/api/requests/mine').expect(200);
    expect(mine.body.requests).toEqual([
      expect.objectContaining({ id: sent.id, status: 'submitted', expected: 'Nothing for now' }),
    ]);
    const events = await owner.get(`/api/requests/${sent.id}/events`).expect(200);
    expect(events.body.events.map((e: { toStatus: string }) => e.toStatus)).toEqual(['submitted']);
    const queued = await t.ctx.db.select().from(emails).where(eq(emails.requestId, sent.id));
    expect(queued.map((e) => e.toAddress).sort()).toEqual(
      [t.env.OFFICE_EMAIL, (await owner.get('/api/me')).body.user.email].sort(),
    );
    await owner
      .patch(`/api/requests/${sent.id}/draft`)
      .send({ expectedVersion: sent.version, site: { address: 'changed after sending' } })
      .expect(409);
  });

  it('hides internal events from the applicant but shows them to the office', async () => {
    const owner = await newApplicant(t);
    const sent = await submitted(owner);
    await t.ctx.db
      .insert(requestEvents)
      .values({ requestId: sent.id, kind: 'assigned', note: 'Priya takes it', internal: true });
    const own = await owner.get(`/api/requests/${sent.id}/events`).expect(200);
    expect(own.body.events.some((e: { note: string }) => e.note === 'Priya takes it')).toBe(false);
    expect(own.body.events[0]).not.toHaveProperty('internal');
    const staff = await signInDemo(t, 'priya.lindqvist@gradepass.test');
    const office = await staff.get(`/api/requests/${sent.id}/events`).expect(200);
    expect(office.body.events).toEqual(
      expect.arrayContaining([expect.objectContaining({ note: 'Priya takes it', internal: true })]),
    );
  });

  it('lets the applicant withdraw before a crew has it', async () => {
    const owner = await newApplicant(t);
    const draft = await completedDraft(owner);
    const res = await owner
      .post(`/api/requests/${draft.id}/transitions`)
      .send({ action: 'withdraw', expectedVersion: draft.version })
      .expect(200);
    expect(res.body.request.status).toBe('withdrawn');
  });
});

describe('nobody else sees it', () => {
  it('answers 404 to another applicant on every route and 401 to anonymous callers', async () => {
    const owner = await newApplicant(t);
    const other = await newApplicant(t, 'neighbour');
    const sent = await submitted(owner);
    const base = `/api/requests/${sent.id}`;
    await other.get(base).expect(404);
    await other.get(`${base}/events`).expect(404);
    await other.get(`${base}/messages`).expect(404);
    await other.get(`${base}/photos`).expect(404);
    await other.post(`${base}/messages`).send({ body: 'hello' }).expect(404);
    await other.patch(`${base}/draft`).send({ expectedVersion: sent.version }).expect(404);
    await other
      .post(`${base}/photos`)
      .send({ fileName: 'a.jpg', contentType: 'image/jpeg', sizeBytes: 10 })
      .expect(404);
    expect((await other.get('/api/requests/mine').expect(200)).body.requests).toEqual([]);
    const anon = request(t.app);
    for (const path of [base, `${base}/events`, `${base}/messages`, `${base}/photos`, '/api/requests/mine'])
      await anon.get(path).expect(401);
    await anon.post('/api/requests').send({}).expect(401);
    await anon.patch(`${base}/draft`).send({ expectedVersion: 1 }).expect(401);
  });

  it('gives crew nothing before release and the office everything', async () => {
    const owner = await newApplicant(t);
    const sent = await submitted(owner);
    const crew = await signInDemo(t, 'tomasz.reyes@gradepass.test');
    await crew.get(`/api/requests/${sent.id}`).expect(404);
    const staff = await signInDemo(t, 'marcus.bell@gradepass.test');
    const seen = await staff.get(`/api/requests/${sent.id}`).expect(200);
    expect(seen.body.request).toMatchObject({
      id: sent.id,
      applicantId: expect.any(String),
      application: completeApplication(),
    });
    await staff.post('/api/requests').send({}).expect(403);
  });
});
