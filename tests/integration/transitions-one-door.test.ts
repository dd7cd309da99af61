import { and, eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { emails, jobs, requests } from '../../server/db/schema';
import { createReleasedJob } from '../factories/crew-jobs';
import { createGradeCheck } from '../factories/grade-checks';
import { type Cast, withCastApp } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import type { TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
withCastApp((app, signedIn) => {
  t = app;
  cast = signedIn;
});

const move = (who: Cast[keyof Cast], id: string, body: Record<string, unknown>) =>
  who.agent.post(`/api/requests/${id}/transitions`).send(body);

/** A released job the crew lead has taken through the generic status endpoint. */
async function takenJob() {
  const job = await createReleasedJob(t.ctx.db, { applicantId: cast.applicant.id, staffId: cast.staff.id });
  await move(cast.crew, job.id, { action: 'accept-job', expectedVersion: job.version }).expect(200);
  return { id: job.id, version: job.version + 1 };
}

async function saveReadings(id: string, gradePercent: number, note?: string) {
  await cast.crew.agent
    .post(`/api/crew/jobs/${id}/as-built`)
    .send({ readings: [{ stationFt: 5, gradePercent }], note })
    .expect(201);
}

const myJob = async (id: string) =>
  (await cast.crew.agent.get('/api/crew/my-jobs').expect(200)).body.jobs.find(
    (j: { requestId: string }) => j.requestId === id,
  ) as { startedAt: string | null; builtAt: string | null };

describe('the generic status endpoint does what the crew’s own endpoints do', () => {
  it('records when work started and when the job was built, as "my jobs" shows them', async () => {
    const { id, version } = await takenJob();
    await move(cast.crew, id, { action: 'start-work', expectedVersion: version }).expect(200);
    expect((await myJob(id)).startedAt).not.toBeNull();
    await saveReadings(id, 3.5);
    await move(cast.crew, id, { action: 'mark-built', expectedVersion: version + 1 }).expect(200);
    expect((await myJob(id)).builtAt).not.toBeNull();
    const [job] = await t.ctx.db.select().from(jobs).where(eq(jobs.requestId, id));
    expect(job.builtAt!.getTime()).toBeGreaterThanOrEqual(job.startedAt!.getTime());
  });
});

describe('failing as-built readings stay on the record to the close', () => {
  it('marking built needs the reason, named by its label; closing needs the office’s note', async () => {
    const { id, version } = await takenJob();
    await cast.crew.agent.post(`/api/crew/jobs/${id}/start`).send({ expectedVersion: version }).expect(200);
    await saveReadings(id, 6.5);
    for (const note of [undefined, '', '   ']) {
      const bare = await cast.crew.agent
        .post(`/api/crew/jobs/${id}/mark-built`)
        .send({ expectedVersion: version + 1, note });
      expect(bare.status, JSON.stringify(bare.body)).toBe(400);
      expect(bare.body.error.fields.note).toMatch(/Why the readings fail/);
    }
    await cast.crew.agent
      .post(`/api/crew/jobs/${id}/mark-built`)
      .send({ expectedVersion: version + 1, note: 'Ledge rock under the landing; the township inspector saw it.' })
      .expect(200);

    for (const note of [undefined, '  ']) {
      const silent = await move(cast.staff, id, { action: 'close', expectedVersion: version + 2, note });
      expect(silent.status, JSON.stringify(silent.body)).toBe(400);
      expect(silent.body.error.fields.note).toMatch(/Closing note/);
    }
    const [still] = await t.ctx.db.select({ status: requests.status }).from(requests).where(eq(requests.id, id));
    expect(still.status).toBe('built');
    const closed = await move(cast.staff, id, {
      action: 'close',
      expectedVersion: version + 2,
      note: 'Township accepted the landing as built.',
    });
    expect(closed.status, JSON.stringify(closed.body)).toBe(200);
  });

  it('closing over passing readings needs no note', async () => {
    const { id, version } = await takenJob();
    await cast.crew.agent.post(`/api/crew/jobs/${id}/start`).send({ expectedVersion: version }).expect(200);
    await saveReadings(id, 3.5);
    await cast.crew.agent
      .post(`/api/crew/jobs/${id}/mark-built`)
      .send({ expectedVersion: version + 1 })
      .expect(200);
    await move(cast.staff, id, { action: 'close', expectedVersion: version + 2 }).expect(200);
  });
});

describe('the release note is for the crews', () => {
  it('reaches the crew leads but neither the owner’s e-mail nor the owner’s history', async () => {
    const row = await createRequestRow(t.ctx.db, {
      applicantId: cast.applicant.id,
      status: 'permit_granted',
      permitReference: 'HT-ACC-5120',
    });
    await createGradeCheck(t.ctx.db, { requestId: row.id, createdById: cast.staff.id });
    const note = 'Gate code 4417; the neighbour’s dog is loose in the mornings.';
    await move(cast.staff, row.id, { action: 'release', expectedVersion: row.version, note }).expect(200);

    const owner = await t.ctx.db
      .select()
      .from(emails)
      .where(and(eq(emails.requestId, row.id), eq(emails.toAddress, cast.applicant.email)));
    expect(owner).toHaveLength(1);
    expect(owner[0].textBody).toContain('Ready for a crew');
    expect(owner[0].textBody).not.toContain('Gate code');
    expect(owner[0].htmlBody).not.toContain('Gate code');
    const crew = await t.ctx.db
      .select()
      .from(emails)
      .where(and(eq(emails.requestId, row.id), eq(emails.toAddress, cast.crew.email)));
    expect(crew[0].textBody).toContain(note);

    const ownerEvents = (await cast.applicant.agent.get(`/api/requests/${row.id}/events`).expect(200)).body.events as {
      note: string;
      toStatus: string | null;
    }[];
    expect(ownerEvents.some((e) => e.toStatus === 'released')).toBe(true);
    expect(JSON.stringify(ownerEvents)).not.toContain('Gate code');
    const officeEvents = (await cast.staff.agent.get(`/api/requests/${row.id}/events`).expect(200)).body.events as {
      note: string;
    }[];
    expect(officeEvents.some((e) => e.note === note)).toBe(true);
  });
});
