import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../setup/test-app';
import { newApplicant, submitted, type Agent } from './requests-helpers';

let t: TestApp;
let owner: Agent;
let draftId: string;
let sentId: string;
beforeAll(async () => {
  t = await createTestApp();
  owner = await newApplicant(t);
  draftId = (await owner.post('/api/requests').send({}).expect(201)).body.request.id;
  sentId = (await submitted(owner)).id;
});
afterAll(() => t.close());

const currentVersion = async (id: string) =>
  (await owner.get(`/api/requests/${id}`).expect(200)).body.request.version as number;

describe('every write names the bad field with a 400 and changes nothing', () => {
  it('rejects malformed JSON', async () => {
    for (const [method, path] of [
      ['patch', `/api/requests/${draftId}/draft`],
      ['post', `/api/requests/${sentId}/messages`],
      ['post', `/api/requests/${draftId}/photos`],
    ] as const) {
      const res = await owner[method](path)
        .set('Content-Type', 'application/json')
        .send('{"expectedVersion": 1,')
        .expect(400);
      expect(res.body.error.fields).toHaveProperty(['(body)']);
    }
  });

  it('answers a broken %-escape in the address with a 400, not a failure of ours', async () => {
    for (const path of ['/api/requests/%E0%A4%A', '/api/requests/%/messages', '/api/requests/%zz/photos']) {
      const res = await owner.get(path).expect(400);
      expect(res.body.error).toMatchObject({ code: 'bad_path', fields: { '(path)': 'not a valid address' } });
    }
  });

  it.each([
    ['a version sent as text', { expectedVersion: '1' }, 'expectedVersion'],
    ['a step out of range', { expectedVersion: 1, wizardStep: 9 }, 'wizardStep'],
    ['an address that is too long', { expectedVersion: 1, site: { address: 'x'.repeat(201) } }, 'site.address'],
    ['a road owner we do not know', { expectedVersion: 1, site: { roadOwner: 'federal' } }, 'site.roadOwner'],
    ['a speed that is not a number', { expectedVersion: 1, site: { postedSpeedMph: 'fast' } }, 'site.postedSpeedMph'],
    ['a latitude off the globe', { expectedVersion: 1, site: { siteLat: 123 } }, 'site.siteLat'],
    ['an unknown vehicle', { expectedVersion: 1, entrance: { vehicles: ['tractor-trailer'] } }, 'entrance.vehicles.0'],
    ['notes that are too long', { expectedVersion: 1, entrance: { notes: 'n'.repeat(2001) } }, 'entrance.notes'],
    ['a step that is not an object', { expectedVersion: 1, entrance: 'all of it' }, 'entrance'],
  ])('draft: %s', async (_what, body, field) => {
    const before = await currentVersion(draftId);
    const res = await owner.patch(`/api/requests/${draftId}/draft`).send(body).expect(400);
    expect(res.body.error.fields).toHaveProperty([field]);
    expect(await currentVersion(draftId)).toBe(before);
  });

  it('answers 400 for an id that is not an id', async () => {
    const res = await owner.get('/api/requests/not-an-id').expect(400);
    expect(res.body.error.fields).toHaveProperty(['id']);
  });

  it.each([
    ['an empty message', { body: '   ' }, 'body'],
    ['a message that is too long', { body: 'm'.repeat(4001) }, 'body'],
    ['a visibility we do not know', { body: 'hi', visibility: 'public' }, 'visibility'],
    ['an internal note from the applicant', { body: 'hi', visibility: 'internal' }, 'visibility'],
  ])('messages: %s', async (_what, body, field) => {
    const res = await owner.post(`/api/requests/${sentId}/messages`).send(body).expect(400);
    expect(res.body.error.fields).toHaveProperty([field]);
  });

  it.each([
    ['a GIF', { fileName: 'a.gif', contentType: 'image/gif', sizeBytes: 100 }, 'contentType'],
    ['a 16 MB photo', { fileName: 'big.jpg', contentType: 'image/jpeg', sizeBytes: 16 * 1024 * 1024 }, 'sizeBytes'],
    [
      'a size that is not a whole number',
      { fileName: 'a.jpg', contentType: 'image/jpeg', sizeBytes: 10.5 },
      'sizeBytes',
    ],
    ['a missing file name', { contentType: 'image/jpeg', sizeBytes: 100 }, 'fileName'],
    [
      'a file name that is too long',
      { fileName: `${'f'.repeat(200)}.jpg`, contentType: 'image/jpeg', sizeBytes: 100 },
      'fileName',
    ],
    ['a size sent as text', { fileName: 'a.jpg', contentType: 'image/jpeg', sizeBytes: '100' }, 'sizeBytes'],
  ])('photo upload: %s', async (_what, body, field) => {
    const res = await owner.post(`/api/requests/${draftId}/photos`).send(body).expect(400);
    expect(res.body.error.fields).toHaveProperty([field]);
  });

  it('photo confirm and caption: wrong types and over-long captions', async () => {
    const ticket = await owner
      .post(`/api/requests/${draftId}/photos`)
      .send({ fileName: 'a.png', contentType: 'image/png', sizeBytes: 10 })
      .expect(201);
    const photo = `/api/requests/${draftId}/photos/${ticket.body.photo.id}`;
    const badGps = await owner.post(`${photo}/confirm`).send({ gpsLat: 'north' }).expect(400);
    expect(badGps.body.error.fields).toHaveProperty(['gpsLat']);
    const longCaption = await owner
      .post(`${photo}/confirm`)
      .send({ caption: 'c'.repeat(201) })
      .expect(400);
    expect(longCaption.body.error.fields).toHaveProperty(['caption']);
    const captionType = await owner.patch(photo).send({ caption: 12 }).expect(400);
    expect(captionType.body.error.fields).toHaveProperty(['caption']);
    const badPhotoId = await owner
      .patch(`/api/requests/${draftId}/photos/not-a-photo`)
      .send({ caption: 'x' })
      .expect(400);
    expect(badPhotoId.body.error.fields).toHaveProperty(['photoId']);
  });

  it('never answers 500 to whatever JSON arrives at the draft, message and photo routes', async () => {
    await fc.assert(
      fc.asyncProperty(fc.jsonValue(), fc.constantFrom('draft', 'messages', 'photos'), async (body, route) => {
        const call =
          route === 'draft'
            ? owner.patch(`/api/requests/${draftId}/draft`)
            : owner.post(`/api/requests/${route === 'messages' ? sentId : draftId}/${route}`);
        const res = await call.set('Content-Type', 'application/json').send(JSON.stringify(body));
        expect(res.status, JSON.stringify(res.body)).toBeLessThan(500);
      }),
      { numRuns: 60 },
    );
  });
});
