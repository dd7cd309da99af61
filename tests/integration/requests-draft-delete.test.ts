import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { photos, requests } from '../../server/db/schema';
import { signInCast, type Cast } from '../factories/office-cast';
import { createTestApp, type TestApp } from '../setup/test-app';
import { newApplicant, submitted } from './requests-helpers';

let t: TestApp;
let cast: Cast;
beforeAll(async () => {
  t = await createTestApp();
  cast = await signInCast(t);
});
afterAll(() => t.close());

describe('deleting a request never sent', () => {
  it('lets its owner delete a draft, with its photos, and it is gone from their list', async () => {
    const owner = await newApplicant(t);
    const keep = (await owner.post('/api/requests').send({}).expect(201)).body.request;
    const { id } = (await owner.post('/api/requests').send({}).expect(201)).body.request;
    const [me] = await t.ctx.db.select({ applicantId: requests.applicantId }).from(requests).where(eq(requests.id, id));
    await t.ctx.db.insert(photos).values({
      requestId: id,
      uploaderId: me.applicantId,
      objectKey: `requests/${id}/gone.jpg`,
      fileName: 'gone.jpg',
      contentType: 'image/jpeg',
      sizeBytes: 10,
      status: 'stored',
    });

    await owner.delete(`/api/requests/${id}`).expect(200);
    await owner.get(`/api/requests/${id}`).expect(404);
    expect(await t.ctx.db.select().from(photos).where(eq(photos.requestId, id))).toEqual([]);
    const mine = await owner.get('/api/requests/mine').expect(200);
    expect(mine.body.requests.map((r: { id: string }) => r.id)).toEqual([keep.id]);
    // Deleting twice is the same as deleting something that is not there.
    await owner.delete(`/api/requests/${id}`).expect(404);
  });

  it('refuses anyone else, and a request already sent to the office', async () => {
    const owner = await newApplicant(t);
    const { id } = (await owner.post('/api/requests').send({}).expect(201)).body.request;
    await cast.otherApplicant.agent.delete(`/api/requests/${id}`).expect(404);
    await cast.staff.agent.delete(`/api/requests/${id}`).expect(403);
    await cast.crew.agent.delete(`/api/requests/${id}`).expect(403);
    await owner.get(`/api/requests/${id}`).expect(200);

    const sent = await submitted(owner);
    const refused = await owner.delete(`/api/requests/${sent.id}`).expect(409);
    expect(refused.body.error.message).toMatch(/sent to the office.*withdraw it instead/);
    await owner.get(`/api/requests/${sent.id}`).expect(200);
  });
});
