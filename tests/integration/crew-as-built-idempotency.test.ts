import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { asBuiltSets } from '../../server/db/schema';
import { createReleasedJob } from '../factories/crew-jobs';
import { type Cast, withCastApp } from '../factories/office-cast';
import type { TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
withCastApp((app, signedIn) => {
  t = app;
  cast = signedIn;
});

async function startedJob() {
  const job = await createReleasedJob(t.ctx.db, { applicantId: cast.applicant.id, staffId: cast.staff.id });
  const crew = cast.crew.agent;
  await crew.post(`/api/crew/jobs/${job.id}/accept`).send({ expectedVersion: job.version }).expect(200);
  const started = await crew
    .post(`/api/crew/jobs/${job.id}/start`)
    .send({ expectedVersion: job.version + 1 })
    .expect(200);
  return { id: job.id, version: started.body.request.version as number };
}

const readings = [
  { stationFt: 5, gradePercent: 3.5 },
  { stationFt: 40, gradePercent: 11 },
];
const send = (id: string, key: string | undefined, body: object) => {
  const req = cast.crew.agent.post(`/api/crew/jobs/${id}/as-built`);
  return (key === undefined ? req : req.set('Idempotency-Key', key)).send(body);
};
const storedSets = (id: string) => t.ctx.db.select().from(asBuiltSets).where(eq(asBuiltSets.requestId, id));

describe('as-built readings sent with an Idempotency-Key', () => {
  it('the same key twice stores one set and answers the first answer again', async () => {
    const { id } = await startedJob();
    const key = randomUUID();
    const first = await send(id, key, { readings, note: 'Shot after the rain' });
    expect(first.status, JSON.stringify(first.body)).toBe(201);
    expect(first.headers['idempotent-replayed']).toBeUndefined();
    // Fields in another order are the same readings.
    const again = await send(id, key.toUpperCase(), { note: 'Shot after the rain', readings });
    expect(again.status, JSON.stringify(again.body)).toBe(201);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.body).toEqual(first.body);
    const rows = await storedSets(id);
    expect(rows).toHaveLength(1);
    expect(rows[0].idempotencyKey).toBe(key);
  });

  it('two sends of one key at the same moment still store one set', async () => {
    const { id } = await startedJob();
    const key = randomUUID();
    const answers = await Promise.all([send(id, key, { readings }), send(id, key, { readings })]);
    expect(answers.map((a) => a.status)).toEqual([201, 201]);
    expect(answers[0].body.set.id).toBe(answers[1].body.set.id);
    expect(await storedSets(id)).toHaveLength(1);
  });

  it('the same key with other readings is refused, naming the key, and stores nothing', async () => {
    const { id } = await startedJob();
    const key = randomUUID();
    await send(id, key, { readings }).expect(201);
    const other = await send(id, key, { readings: [{ stationFt: 5, gradePercent: 3.9 }] });
    expect(other.status).toBe(409);
    expect(other.body.error.code).toBe('idempotency_key_reused');
    expect(other.body.error.fields).toHaveProperty('Idempotency-Key');
    expect(other.body.error.message).toContain('Idempotency-Key');
    expect(await storedSets(id)).toHaveLength(1);
  });

  it('a key already used on another job is refused there', async () => {
    const first = await startedJob();
    const second = await startedJob();
    const key = randomUUID();
    await send(first.id, key, { readings }).expect(201);
    const elsewhere = await send(second.id, key, { readings });
    expect(elsewhere.status).toBe(409);
    expect(elsewhere.body.error.fields).toHaveProperty('Idempotency-Key');
    expect(await storedSets(second.id)).toHaveLength(0);
  });

  it('a repeat after the job was marked built still gets the first answer; a new key is refused plainly', async () => {
    const { id, version } = await startedJob();
    const key = randomUUID();
    const first = await send(id, key, { readings }).expect(201);
    await cast.crew.agent.post(`/api/crew/jobs/${id}/mark-built`).send({ expectedVersion: version }).expect(200);
    const repeat = await send(id, key, { readings });
    expect(repeat.status).toBe(201);
    expect(repeat.body).toEqual(first.body);
    const fresh = await send(id, randomUUID(), { readings });
    expect(fresh.status).toBe(409);
    expect(fresh.body.error.message).toMatch(/being built/);
    expect(await storedSets(id)).toHaveLength(1);
  });

  it('a key that is not a UUID is a 400 naming the header; no key keeps the old behaviour', async () => {
    const { id } = await startedJob();
    const bad = await send(id, 'set-1', { readings });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toEqual({ 'Idempotency-Key': expect.stringContaining('UUID') });
    await send(id, undefined, { readings }).expect(201);
    await send(id, undefined, { readings }).expect(201);
    expect(await storedSets(id)).toHaveLength(2);
  });
});
