import { PutObjectCommand } from '@aws-sdk/client-s3';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { photos } from '../../server/db/schema';
import { createTestApp, type TestApp } from '../setup/test-app';
import { solidPng } from '../factories/photo-images';
import { newApplicant, signInDemo, submitted, type Agent } from './requests-helpers';

let t: TestApp;
let owner: Agent;
let requestId: string;
const png = solidPng(24, 16, [60, 120, 80]);
beforeAll(async () => {
  t = await createTestApp();
  owner = await newApplicant(t);
  requestId = (await owner.post('/api/requests').send({}).expect(201)).body.request.id;
});
afterAll(() => t.close());

async function announce(
  agent: Agent = owner,
  id = requestId,
  file = { fileName: 'road-left.png', contentType: 'image/png', sizeBytes: png.length },
) {
  const res = await agent.post(`/api/requests/${id}/photos`).send(file).expect(201);
  return res.body as { photo: { id: string }; upload: { url: string; method: 'PUT'; headers: Record<string, string> } };
}

const put = (url: string, body: Buffer, contentType = 'image/png') =>
  fetch(url, { method: 'PUT', body: new Uint8Array(body), headers: { 'content-type': contentType } });

describe('photos go straight to storage and are listed once confirmed', () => {
  it('uploads, confirms with a caption, and lists it with a working short-lived link', async () => {
    const { photo, upload } = await announce();
    expect(upload.url).toContain('X-Amz-Expires=300');
    expect((await put(upload.url, png)).status).toBe(200);
    const confirmed = await owner
      .post(`/api/requests/${requestId}/photos/${photo.id}/confirm`)
      .send({ caption: 'Looking along the road to the left', gpsLat: 44.1, gpsLng: -72.3 })
      .expect(200);
    expect(confirmed.body.photo).toMatchObject({ caption: 'Looking along the road to the left', gpsLat: 44.1 });
    const list = await owner.get(`/api/requests/${requestId}/photos`).expect(200);
    const listed = list.body.photos.find((p: { id: string }) => p.id === photo.id);
    expect(listed).not.toHaveProperty('objectKey');
    const image = await fetch(listed.url);
    expect(image.status).toBe(200);
    expect(Buffer.from(await image.arrayBuffer()).equals(png)).toBe(true);
  });

  it('does not list a photo that never reached storage', async () => {
    const { photo } = await announce();
    await owner.post(`/api/requests/${requestId}/photos/${photo.id}/confirm`).send({}).expect(409);
    const list = await owner.get(`/api/requests/${requestId}/photos`).expect(200);
    expect(list.body.photos.map((p: { id: string }) => p.id)).not.toContain(photo.id);
  });

  it('does not list a stored object that differs from what was announced', async () => {
    const { photo } = await announce();
    const [row] = await t.ctx.db.select().from(photos).where(eq(photos.id, photo.id));
    await t.ctx.s3.send(
      new PutObjectCommand({
        Bucket: t.env.S3_BUCKET,
        Key: row.objectKey,
        Body: Buffer.concat([png, png]),
        ContentType: 'image/png',
      }),
    );
    await owner.post(`/api/requests/${requestId}/photos/${photo.id}/confirm`).send({}).expect(409);
  });

  it('changes a caption and removes a photo while the request is editable', async () => {
    const { photo, upload } = await announce();
    await put(upload.url, png);
    await owner.post(`/api/requests/${requestId}/photos/${photo.id}/confirm`).send({}).expect(200);
    await owner.patch(`/api/requests/${requestId}/photos/${photo.id}`).send({ caption: 'The ditch' }).expect(200);
    await owner.delete(`/api/requests/${requestId}/photos/${photo.id}`).expect(204);
    const list = await owner.get(`/api/requests/${requestId}/photos`).expect(200);
    expect(list.body.photos.map((p: { id: string }) => p.id)).not.toContain(photo.id);
    await owner.delete(`/api/requests/${requestId}/photos/${photo.id}`).expect(404);
  });

  it('stops at 20 photos per request', async () => {
    const fresh = (await owner.post('/api/requests').send({}).expect(201)).body.request.id;
    const me = (await owner.get('/api/me')).body.user.id;
    await t.ctx.db.insert(photos).values(
      Array.from({ length: 20 }, (_, i) => ({
        requestId: fresh,
        uploaderId: me,
        objectKey: `requests/${fresh}/photos/seeded-${i}.png`,
        fileName: `${i}.png`,
        contentType: 'image/png',
        sizeBytes: 10,
        status: 'stored' as const,
      })),
    );
    const res = await owner
      .post(`/api/requests/${fresh}/photos`)
      .send({ fileName: 'one-more.png', contentType: 'image/png', sizeBytes: 10 })
      .expect(400);
    expect(res.body.error.fields).toHaveProperty(['fileName']);
  });
});

describe('storage refuses anything but the announced upload', () => {
  it('refuses a replayed URL', async () => {
    const { upload } = await announce();
    expect((await put(upload.url, png)).status).toBe(200);
    expect((await put(upload.url, png)).status).toBe(403);
  });

  it('refuses an altered URL', async () => {
    const { upload } = await announce();
    const other = upload.url.replace(/photos\/([0-9a-f-]+)\.png/, 'photos/00000000-0000-4000-8000-000000000000.png');
    expect(other).not.toBe(upload.url);
    expect((await put(other, png)).status).toBe(403);
    const resigned = upload.url.replace(/X-Amz-Expires=300/, 'X-Amz-Expires=3000');
    expect((await put(resigned, png)).status).toBe(403);
  });

  it('refuses a different content type and a body of another size', async () => {
    const { upload } = await announce();
    expect((await put(upload.url, png, 'image/jpeg')).status).toBe(403);
    expect((await put(upload.url, Buffer.concat([png, Buffer.alloc(1024)]))).status).toBe(403);
    expect((await put(upload.url, png)).status).toBe(200);
  });

  it('refuses an expired URL', async () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(Date.now() - 10 * 60 * 1000);
    let url: string;
    try {
      url = (await announce()).upload.url;
    } finally {
      vi.useRealTimers();
    }
    const res = await put(url, png);
    expect(res.status).toBe(403);
    expect(await res.text()).toMatch(/expired/i);
  });
});

describe('only the owner touches the photos; only those who may see the request see them', () => {
  it('hides them from another applicant and lets the office look but not upload', async () => {
    const sent = await submitted(owner);
    const { photo, upload } = await announce(owner, sent.id);
    await put(upload.url, png);
    await owner.post(`/api/requests/${sent.id}/photos/${photo.id}/confirm`).send({}).expect(200);
    const other = await newApplicant(t, 'neighbour');
    await other.get(`/api/requests/${sent.id}/photos`).expect(404);
    await other.get(`/api/requests/${sent.id}/photos/${photo.id}/url`).expect(404);
    await other
      .post(`/api/requests/${sent.id}/photos`)
      .send({ fileName: 'x.png', contentType: 'image/png', sizeBytes: 10 })
      .expect(404);
    await other.post(`/api/requests/${sent.id}/photos/${photo.id}/confirm`).send({}).expect(404);
    await other.delete(`/api/requests/${sent.id}/photos/${photo.id}`).expect(404);
    const staff = await signInDemo(t, 'priya.lindqvist@gradepass.test');
    const link = await staff.get(`/api/requests/${sent.id}/photos/${photo.id}/url`).expect(200);
    expect((await fetch(link.body.url)).status).toBe(200);
    await staff
      .post(`/api/requests/${sent.id}/photos`)
      .send({ fileName: 'x.png', contentType: 'image/png', sizeBytes: 10 })
      .expect(403);
  });
});
