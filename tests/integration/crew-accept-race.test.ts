import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { and, eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import type { AppContext } from '../../server/config/context';
import { closeContext, createContext } from '../../server/context-factory';
import { emails, jobs, requestEvents, requests } from '../../server/db/schema';
import { seedDemo } from '../../server/dev/seed';
import { demoPeople } from '../../server/dev/seed/demo-people';
import { parseEnv } from '../../server/config/env';
import { createReleasedJob } from '../factories/crew-jobs';
import { ensurePerson } from '../factories/people';
import { createTestApp, type TestApp } from '../setup/test-app';

/** Two instances of the app on two ports, one database: what two servers behind a load balancer look like. */
let t: TestApp;
let second: AppContext;
const servers: Server[] = [];
const urls: string[] = [];

function listen(app: ReturnType<typeof createApp>) {
  return new Promise<string>((resolve) => {
    const server = app.listen(0, '127.0.0.1', () =>
      resolve(`http://127.0.0.1:${(server.address() as AddressInfo).port}`),
    );
    servers.push(server);
  });
}

const sessionCookie = (res: Response, previous: string) =>
  res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .find((c) => c.startsWith('gradepass.sid=')) ?? previous;

/** The real OAuth round trip over HTTP against one instance; returns the session cookie it set. */
async function signInOn(base: string, email: string): Promise<string> {
  const start = await fetch(`${base}/auth/google`, { redirect: 'manual' });
  // The sign-in's own state cookie, which the callback needs.
  const startCookies = start.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
  const authorize = new URL(start.headers.get('location')!);
  authorize.searchParams.set('login_hint', email);
  const provider = await fetch(authorize, { redirect: 'manual' });
  const back = new URL(provider.headers.get('location')!);
  const done = await fetch(`${base}${back.pathname}${back.search}`, {
    redirect: 'manual',
    headers: { cookie: startCookies },
  });
  expect(done.status).toBe(302);
  return sessionCookie(done, '');
}

const crewPeople = demoPeople.filter((p) => p.role === 'crew');

beforeAll(async () => {
  t = await createTestApp();
  second = createContext(parseEnv(t.env));
  urls.push(await listen(t.app), await listen(createApp(second)));
  await seedDemo(t.ctx.db);
});
afterAll(async () => {
  await Promise.all(
    servers.map(
      (s) =>
        new Promise((r) => {
          s.closeAllConnections();
          s.close(r);
        }),
    ),
  );
  await closeContext(second);
  await t.close();
});

describe('two crew leads take the same job at the same moment, on two server instances', () => {
  it('a session made on one instance works on the other', async () => {
    const cookie = await signInOn(urls[0], crewPeople[0].email);
    const me = await request(urls[1]).get('/api/me').set('Cookie', cookie).expect(200);
    expect(me.body.user.email).toBe(crewPeople[0].email);
  });

  // Several rounds, so a pass is not one lucky interleaving.
  it.each([1, 2, 3, 4, 5])(
    'round %i: exactly one wins; the other gets 409 naming who has it; one event, one e-mail to each person told',
    async () => {
      const db = t.ctx.db;
      const applicant = await ensurePerson(
        db,
        demoPeople.find((p) => p.role === 'applicant')!,
      );
      const staff = await ensurePerson(
        db,
        demoPeople.find((p) => p.role === 'staff')!,
      );
      const job = await createReleasedJob(db, { applicantId: applicant.id, staffId: staff.id });
      // Each crew lead signs in on one instance and presses on the other, so no request relies on local state.
      const [a, b] = await Promise.all([
        signInOn(urls[0], crewPeople[0].email),
        signInOn(urls[1], crewPeople[1].email),
      ]);
      const press = (base: string, cookie: string) =>
        request(base)
          .post(`/api/crew/jobs/${job.id}/accept`)
          .set('Cookie', cookie)
          .send({ expectedVersion: job.version });
      const results = await Promise.all([press(urls[1], a), press(urls[0], b)]);

      const statuses = results.map((r) => r.status).sort();
      expect(statuses, JSON.stringify(results.map((r) => r.body))).toEqual([200, 409]);
      const winner = results.find((r) => r.status === 200)!;
      const loser = results.find((r) => r.status === 409)!;
      const [row] = await db.select().from(requests).where(eq(requests.id, job.id));
      // results[0] was pressed by the first crew lead, results[1] by the second.
      const winnerName = crewPeople[results.indexOf(winner)].name;
      expect(loser.body.error.code).toBe('job_taken');
      expect(loser.body.error.message).toContain(winnerName);
      expect(row).toMatchObject({ status: 'crew_assigned', version: job.version + 1 });

      const events = await db
        .select()
        .from(requestEvents)
        .where(and(eq(requestEvents.requestId, job.id), eq(requestEvents.toStatus, 'crew_assigned')));
      expect(events).toHaveLength(1);
      const sent = await db
        .select()
        .from(emails)
        .where(and(eq(emails.requestId, job.id), eq(emails.template, 'transition.accept-job')));
      const addresses = sent.map((e) => e.toAddress);
      expect(addresses.filter((to) => to === applicant.email)).toHaveLength(1);
      expect(new Set(addresses).size).toBe(addresses.length);
      expect(sent.every((e) => e.eventId === events[0].id)).toBe(true);
      const [jobRow] = await db.select().from(jobs).where(eq(jobs.requestId, job.id));
      expect(jobRow.crewId).toBe(row.crewId);
    },
  );
});
