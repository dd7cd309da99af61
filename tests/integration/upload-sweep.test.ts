import { HeadObjectCommand } from '@aws-sdk/client-s3';
import { eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeContext, createContext } from '../../server/context-factory';
import type { AppContext } from '../../server/config/context';
import { photos } from '../../server/db/schema';
import { parseEnv } from '../../server/config/env';
import { sweepUnconfirmedUploads } from '../../server/workers/upload-sweep';
import { solidPng } from '../factories/photo-images';
import { createTestApp, type TestApp } from '../setup/test-app';
import { newApplicant, type Agent } from './requests-helpers';

let t: TestApp;
let other: AppContext;
let owner: Agent;
let requestId: string;
const png = solidPng(8, 8, [40, 80, 120]);
beforeAll(async () => {
  t = await createTestApp({ UNCONFIRMED_UPLOAD_HOURS: '24' });
  other = createContext(parseEnv(t.env));
  owner = await newApplicant(t);
  requestId = (await owner.post('/api/requests').send({}).expect(201)).body.request.id;
});
afterAll(async () => {
  await closeContext(other);
  await t.close();
});

async function uploaded(confirm: boolean, hoursAgo: number, put = true) {
  const announced = await owner
    .post(`/api/requests/${requestId}/photos`)
    .send({ fileName: 'yard.png', contentType: 'image/png', sizeBytes: png.length })
    .expect(201);
  if (put)
    await fetch(announced.body.upload.url, {
      method: 'PUT',
      body: new Uint8Array(png),
      headers: { 'content-type': 'image/png' },
    });
  const id = announced.body.photo.id as string;
  if (confirm) await owner.post(`/api/requests/${requestId}/photos/${id}/confirm`).send({}).expect(200);
  await t.ctx.db
    .update(photos)
    .set({ createdAt: sql`now() - make_interval(hours => ${hoursAgo})` })
    .where(eq(photos.id, id));
  const [row] = await t.ctx.db.select().from(photos).where(eq(photos.id, id));
  return row;
}

const inStorage = (key: string) =>
  t.ctx.s3.send(new HeadObjectCommand({ Bucket: t.env.S3_BUCKET, Key: key })).then(
    () => true,
    () => false,
  );
const rowOf = async (id: string) => (await t.ctx.db.select().from(photos).where(eq(photos.id, id)))[0];

describe('the clean-up of uploads that were never confirmed', () => {
  it('deletes old unconfirmed objects and their rows, once, with two instances sweeping at the same time', async () => {
    const abandoned = await uploaded(false, 25);
    const neverUploaded = await uploaded(false, 30, false);
    const recent = await uploaded(false, 1);
    const confirmedLongAgo = await uploaded(true, 72);
    expect(await inStorage(abandoned.objectKey)).toBe(true);

    const [a, b] = await Promise.all([sweepUnconfirmedUploads(t.ctx), sweepUnconfirmedUploads(other)]);
    expect(a + b).toBe(2);

    for (const gone of [abandoned, neverUploaded]) {
      expect(await rowOf(gone.id)).toBeUndefined();
      expect(await inStorage(gone.objectKey)).toBe(false);
    }
    expect((await rowOf(recent.id)).status).toBe('pending');
    expect(await inStorage(recent.objectKey)).toBe(true);
    expect((await rowOf(confirmedLongAgo.id)).status).toBe('stored');
    expect(await inStorage(confirmedLongAgo.objectKey)).toBe(true);
    expect(await sweepUnconfirmedUploads(t.ctx)).toBe(0);
  });

  it('a confirmation that comes after the sweep finds the photo gone', async () => {
    const late = await uploaded(false, 25);
    await sweepUnconfirmedUploads(t.ctx);
    await owner.post(`/api/requests/${requestId}/photos/${late.id}/confirm`).send({}).expect(404);
  });
});
