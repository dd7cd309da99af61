import { HeadObjectCommand } from '@aws-sdk/client-s3';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { photos } from '../../server/db/schema';
import { heicWithPosition, solidPng } from '../factories/photo-images';
import { createTestApp, type TestApp } from '../setup/test-app';
import { newApplicant, type Agent } from './requests-helpers';

let t: TestApp;
let owner: Agent;
let requestId: string;
beforeAll(async () => {
  t = await createTestApp();
  owner = await newApplicant(t);
  requestId = (await owner.post('/api/requests').send({}).expect(201)).body.request.id;
});
afterAll(() => t.close());

/** Announces, uploads through the presigned URL and confirms one file, as the browser does. */
async function upload(fileName: string, contentType: string, body: Buffer) {
  const announced = await owner
    .post(`/api/requests/${requestId}/photos`)
    .send({ fileName, contentType, sizeBytes: body.length })
    .expect(201);
  const put = await fetch(announced.body.upload.url, {
    method: 'PUT',
    body: new Uint8Array(body),
    headers: { 'content-type': contentType },
  });
  expect(put.status).toBe(200);
  const confirm = await owner.post(`/api/requests/${requestId}/photos/${announced.body.photo.id}/confirm`).send({});
  return { id: announced.body.photo.id as string, confirm };
}

async function stored(id: string) {
  const [row] = await t.ctx.db.select().from(photos).where(eq(photos.id, id));
  const head = await t.ctx.s3.send(new HeadObjectCommand({ Bucket: t.env.S3_BUCKET, Key: row.objectKey })).then(
    () => true,
    () => false,
  );
  return { status: row.status, inStorage: head };
}

const svg = Buffer.from(
  '<svg xmlns="http://www.w3.org/2000/svg" onload="alert(document.cookie)"><rect width="9" height="9"/></svg>',
);
const html = Buffer.from('<!doctype html><html><body><script>fetch("/api/me")</script></body></html>');

describe('confirming an upload reads its first bytes', () => {
  it.each([
    ['an SVG sent as a PNG', 'road.png', 'image/png', svg],
    ['a web page sent as a JPEG', 'ditch.jpg', 'image/jpeg', html],
    ['a PNG sent as a JPEG', 'culvert.jpg', 'image/jpeg', solidPng(8, 8, [10, 20, 30])],
  ])(
    'refuses %s, names the photo, deletes the object and never lists it',
    async (_what, fileName, contentType, body) => {
      const { id, confirm } = await upload(fileName, contentType, body);
      expect(confirm.status).toBe(400);
      expect(confirm.body.error.message).toContain(`"${fileName}" is not a JPEG, PNG, WebP or HEIC photo`);
      expect(confirm.body.error.fields).toHaveProperty('fileName');
      expect(await stored(id)).toEqual({ status: 'removed', inStorage: false });
      const list = await owner.get(`/api/requests/${requestId}/photos`).expect(200);
      expect(list.body.photos.map((p: { id: string }) => p.id)).not.toContain(id);
    },
  );

  it('accepts real PNG and HEIC photos', async () => {
    for (const [name, type, body] of [
      ['left.png', 'image/png', solidPng(8, 8, [90, 90, 90])],
      ['right.heic', 'image/heic', heicWithPosition(44, -72).file],
    ] as const) {
      const { id, confirm } = await upload(name, type, body);
      expect(confirm.status, JSON.stringify(confirm.body)).toBe(200);
      expect(await stored(id)).toEqual({ status: 'stored', inStorage: true });
    }
  });
});

describe('a stored photo is served', () => {
  it('as its checked image type, inline, under a safe file name', async () => {
    await upload('Road "left" <1>.png', 'image/png', solidPng(8, 8, [1, 2, 3]));
    const list = await owner.get(`/api/requests/${requestId}/photos`).expect(200);
    const listed = list.body.photos.find((p: { fileName: string }) => p.fileName === 'Road "left" <1>.png');
    const image = await fetch(listed.url);
    expect(image.status).toBe(200);
    expect(image.headers.get('content-type')).toBe('image/png');
    expect(image.headers.get('content-disposition')).toBe('inline; filename="Road-left-1-.png"');
  });
});
