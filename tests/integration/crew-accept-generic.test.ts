import { describe, expect, it } from 'vitest';
import { createReleasedJob } from '../factories/crew-jobs';
import { type Cast, withCastApp } from '../factories/office-cast';
import { signIn, type TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
withCastApp((app, signedIn) => {
  t = app;
  cast = signedIn;
});

describe('taking a job through the generic status endpoint', () => {
  it('works like the crew endpoint: the loser of the race is told who has the job (409)', async () => {
    const job = await createReleasedJob(t.ctx.db, { applicantId: cast.applicant.id, staffId: cast.staff.id });
    const first = await signIn(t.app, 'tomasz.reyes@gradepass.test');
    const second = await signIn(t.app, 'jo.haverford@gradepass.test');
    const body = { action: 'accept-job', expectedVersion: job.version };
    const [a, b] = await Promise.all([
      first.post(`/api/requests/${job.id}/transitions`).send(body),
      second.post(`/api/requests/${job.id}/transitions`).send(body),
    ]);
    const statuses = [a.status, b.status].sort();
    expect(statuses).toEqual([200, 409]);
    const loser = a.status === 409 ? a : b;
    const winner = a.status === 200 ? a : b;
    expect(loser.body.error.code).toBe('job_taken');
    expect(winner.body.request.status).toBe('crew_assigned');
  });
});
