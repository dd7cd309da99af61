import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { requests } from '../../server/db/schema';
import { createTestApp, type TestApp } from '../setup/test-app';
import { newApplicant, signInDemo, submitted, type Agent } from './requests-helpers';

let t: TestApp;
let owner: Agent;
let staff: Agent;
let requestId: string;
beforeAll(async () => {
  t = await createTestApp();
  owner = await newApplicant(t);
  staff = await signInDemo(t, 'marcus.bell@gradepass.test');
  requestId = (await submitted(owner)).id;
});
afterAll(() => t.close());

const bodies = (list: { body: string }[]) => list.map((m) => m.body);

describe('messages between the homeowner and the office', () => {
  it('keeps the office’s internal notes away from the applicant', async () => {
    await staff
      .post(`/api/requests/${requestId}/messages`)
      .send({ body: 'Culvert looks undersized, check on site' })
      .expect(201);
    await staff
      .post(`/api/requests/${requestId}/messages`)
      .send({ body: 'We will visit on Tuesday morning.', visibility: 'shared' })
      .expect(201);
    await owner.post(`/api/requests/${requestId}/messages`).send({ body: 'Tuesday suits me.' }).expect(201);
    const own = await owner.get(`/api/requests/${requestId}/messages`).expect(200);
    expect(bodies(own.body.messages)).toEqual(['We will visit on Tuesday morning.', 'Tuesday suits me.']);
    expect(own.body.messages[0]).not.toHaveProperty('internal');
    const office = await staff.get(`/api/requests/${requestId}/messages`).expect(200);
    expect(office.body.messages.map((m: { body: string; internal: boolean }) => [m.body, m.internal])).toEqual([
      ['Culvert looks undersized, check on site', true],
      ['We will visit on Tuesday morning.', false],
      ['Tuesday suits me.', false],
    ]);
  });

  it('puts the answer to "more details needed" among the shared messages and back in the office’s queue', async () => {
    const sent = await submitted(owner);
    const asked = await staff
      .post(`/api/requests/${sent.id}/transitions`)
      .send({ action: 'ask-details', expectedVersion: sent.version, note: 'Which side of the mailbox?' })
      .expect(200);
    const answered = await owner
      .post(`/api/requests/${sent.id}/transitions`)
      .send({ action: 'answer', expectedVersion: asked.body.request.version, answer: 'North side, about 60 ft.' })
      .expect(200);
    expect(answered.body.request.status).toBe('submitted');
    const own = await owner.get(`/api/requests/${sent.id}/messages`).expect(200);
    expect(bodies(own.body.messages)).toContain('North side, about 60 ft.');
  });

  it('lets crew read the shared messages only for a job they hold', async () => {
    const crew = await signInDemo(t, 'jo.haverford@gradepass.test');
    await crew.get(`/api/requests/${requestId}/messages`).expect(404);
    const me = (await crew.get('/api/me')).body.user.id;
    await t.ctx.db.update(requests).set({ status: 'crew_assigned', crewId: me }).where(eq(requests.id, requestId));
    const seen = await crew.get(`/api/requests/${requestId}/messages`).expect(200);
    expect(bodies(seen.body.messages)).not.toContain('Culvert looks undersized, check on site');
    expect(bodies(seen.body.messages)).toContain('Tuesday suits me.');
    await crew.post(`/api/requests/${requestId}/messages`).send({ body: 'x', visibility: 'internal' }).expect(400);
  });

  it('asks the applicant to send the request before writing', async () => {
    const { id } = (await owner.post('/api/requests').send({}).expect(201)).body.request;
    await owner.post(`/api/requests/${id}/messages`).send({ body: 'Hello?' }).expect(409);
  });
});
