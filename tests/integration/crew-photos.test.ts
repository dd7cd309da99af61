import { eq } from 'drizzle-orm';
import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { photos } from '../../server/db/schema';
import { createReleasedJob } from '../factories/crew-jobs';
import { type Cast, withCastApp } from '../factories/office-cast';
import { solidPng } from '../factories/photo-images';
import type { TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
withCastApp((app, signedIn) => {
  t = app;
  cast = signedIn;
});
const png = solidPng(20, 12, [90, 90, 60]);

async function startedJob() {
  const job = await createReleasedJob(t.ctx.db, { applicantId: cast.applicant.id, staffId: cast.staff.id });
  const crew = cast.crew.agent;
  await crew.post(`/api/crew/jobs/${job.id}/accept`).send({ expectedVersion: job.version }).expect(200);
  await crew
    .post(`/api/crew/jobs/${job.id}/start`)
    .send({ expectedVersion: job.version + 1 })
    .expect(200);
  return job.id;
}

const file = (key = randomUUID(), extra: Record<string, unknown> = {}) => ({
  idempotencyKey: key,
  kind: 'finished_entrance',
  fileName: 'entrance.png',
  contentType: 'image/png',
  sizeBytes: png.length,
  ...extra,
});
const put = (url: string, body: Buffer) =>
  fetch(url, { method: 'PUT', body: new Uint8Array(body), headers: { 'content-type': 'image/png' } });

describe('crew photos of the finished entrance and the culvert before backfill', () => {
  it('registers, uploads and confirms a photo, shown to the office, the owner and the crew', async () => {
    const id = await startedJob();
    const res = await cast.crew.agent
      .post(`/api/crew/jobs/${id}/photos`)
      .send(file(undefined, { kind: 'culvert_before_backfill', gpsLat: 44.2, gpsLng: -72.5 }));
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.replayed).toBe(false);
    expect((await put(res.body.upload.url, png)).status).toBe(200);
    const confirmed = await cast.crew.agent
      .post(`/api/crew/jobs/${id}/photos/${res.body.photo.id}/confirm`)
      .send({ caption: 'Pipe bedded, ends set' })
      .expect(200);
    expect(confirmed.body.photo).toMatchObject({
      kind: 'culvert_before_backfill',
      gpsLat: 44.2,
      caption: 'Pipe bedded, ends set',
    });
    for (const reader of [cast.crew, cast.staff, cast.applicant]) {
      const list = await reader.agent.get(`/api/requests/${id}/crew-photos`).expect(200);
      expect(list.body.photos).toHaveLength(1);
      expect(list.body.photos[0]).not.toHaveProperty('objectKey');
      expect(list.body.photos[0]).not.toHaveProperty('idempotencyKey');
      expect(list.body.photos[0].takenBy).toBeTruthy();
    }
    // The owner's own photo list stays the owner's.
    const own = await cast.applicant.agent.get(`/api/requests/${id}/photos`).expect(200);
    expect(own.body.photos).toHaveLength(0);
    await cast.otherApplicant.agent.get(`/api/requests/${id}/crew-photos`).expect(404);
  });

  it('a retried registration with the same key is stored once, before and after the upload', async () => {
    const id = await startedJob();
    const key = randomUUID();
    const first = await cast.crew.agent.post(`/api/crew/jobs/${id}/photos`).send(file(key)).expect(201);
    const again = await cast.crew.agent.post(`/api/crew/jobs/${id}/photos`).send(file(key)).expect(200);
    expect(again.body).toMatchObject({ replayed: true, photo: { id: first.body.photo.id } });
    expect(again.body.upload.url).toBeTruthy();
    await put(again.body.upload.url, png);
    await cast.crew.agent.post(`/api/crew/jobs/${id}/photos/${first.body.photo.id}/confirm`).send({}).expect(200);
    await cast.crew.agent.post(`/api/crew/jobs/${id}/photos/${first.body.photo.id}/confirm`).send({}).expect(200);
    const stored = await cast.crew.agent.post(`/api/crew/jobs/${id}/photos`).send(file(key)).expect(200);
    expect(stored.body).toMatchObject({ replayed: true, upload: null, photo: { id: first.body.photo.id } });
    const rows = await t.ctx.db.select().from(photos).where(eq(photos.requestId, id));
    expect(rows).toHaveLength(1);
  });

  it('two sends of one key at the same moment make one photo', async () => {
    const id = await startedJob();
    const key = randomUUID();
    const answers = await Promise.all(
      [0, 1, 2].map(() => cast.crew.agent.post(`/api/crew/jobs/${id}/photos`).send(file(key))),
    );
    expect(answers.map((a) => a.status).sort()).toEqual([200, 200, 201]);
    expect(new Set(answers.map((a) => a.body.photo.id)).size).toBe(1);
  });

  it('refuses a key reused for another photo, and naming no kind, in plain words', async () => {
    const id = await startedJob();
    const key = randomUUID();
    await cast.crew.agent.post(`/api/crew/jobs/${id}/photos`).send(file(key)).expect(201);
    const reused = await cast.crew.agent
      .post(`/api/crew/jobs/${id}/photos`)
      .send(file(key, { sizeBytes: png.length + 1 }))
      .expect(409);
    expect(reused.body.error.fields.idempotencyKey).toMatch(/different photo/);
    const noKind = await cast.crew.agent
      .post(`/api/crew/jobs/${id}/photos`)
      .send(file(undefined, { kind: 'selfie' }))
      .expect(400);
    expect(noKind.body.error.fields.kind).toMatch(/finished entrance/);
  });

  it('only the crew holding the job adds photos, and only while it builds or has built', async () => {
    const job = await createReleasedJob(t.ctx.db, { applicantId: cast.applicant.id, staffId: cast.staff.id });
    // On the board no crew holds it yet: it is not theirs to photograph.
    await cast.crew.agent.post(`/api/crew/jobs/${job.id}/photos`).send(file()).expect(404);
    await cast.crew.agent.post(`/api/crew/jobs/${job.id}/accept`).send({ expectedVersion: job.version }).expect(200);
    const early = await cast.crew.agent.post(`/api/crew/jobs/${job.id}/photos`).send(file()).expect(409);
    expect(early.body.error.message).toMatch(/being built/);
    await cast.staff.agent.post(`/api/crew/jobs/${job.id}/photos`).send(file()).expect(403);
    await cast.applicant.agent.post(`/api/crew/jobs/${job.id}/photos`).send(file()).expect(403);
  });

  it('a file that is not a photo by its first bytes is refused and never listed', async () => {
    const id = await startedJob();
    const text = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"></svg>'.padEnd(png.length, ' '));
    const res = await cast.crew.agent.post(`/api/crew/jobs/${id}/photos`).send(file()).expect(201);
    await put(res.body.upload.url, text);
    await cast.crew.agent.post(`/api/crew/jobs/${id}/photos/${res.body.photo.id}/confirm`).send({}).expect(400);
    const list = await cast.staff.agent.get(`/api/requests/${id}/crew-photos`).expect(200);
    expect(list.body.photos).toHaveLength(0);
  });
});
