import { and, eq } from 'drizzle-orm';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { emails, inspectorLinks, requestEvents, ruleProfileVersions } from '../../server/db/schema';
import { createReleasedJob, harlowRules } from '../factories/crew-jobs';
import { type Cast, withCastApp } from '../factories/office-cast';
import { solidPng } from '../factories/photo-images';
import type { TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
withCastApp((app, signedIn) => {
  t = app;
  cast = signedIn;
});
const png = solidPng(16, 10, [120, 110, 90]);
const header = 'x-inspector-token';

/** A job the crew has built, with passing readings, a crew note and one photo of the finished entrance. */
async function builtJob(rules = harlowRules) {
  const job = await createReleasedJob(t.ctx.db, { applicantId: cast.applicant.id, staffId: cast.staff.id, rules });
  const crew = cast.crew.agent;
  let version = job.version;
  await crew.post(`/api/crew/jobs/${job.id}/accept`).send({ expectedVersion: version++ }).expect(200);
  await crew.post(`/api/crew/jobs/${job.id}/start`).send({ expectedVersion: version++ }).expect(200);
  await crew
    .post(`/api/crew/jobs/${job.id}/as-built`)
    .send({
      readings: [
        { stationFt: 5, gradePercent: 3.9 },
        { stationFt: 40, gradePercent: 12 },
      ],
      note: 'Apron paved to the road edge; ditch reshaped both sides.',
    })
    .expect(201);
  const ticket = await crew
    .post(`/api/crew/jobs/${job.id}/photos`)
    .send({
      idempotencyKey: crypto.randomUUID(),
      kind: 'finished_entrance',
      fileName: 'done.png',
      contentType: 'image/png',
      sizeBytes: png.length,
      gpsLat: 44.3,
      gpsLng: -72.1,
    })
    .expect(201);
  await fetch(ticket.body.upload.url, {
    method: 'PUT',
    body: new Uint8Array(png),
    headers: { 'content-type': 'image/png' },
  });
  await crew.post(`/api/crew/jobs/${job.id}/photos/${ticket.body.photo.id}/confirm`).send({}).expect(200);
  await crew.post(`/api/crew/jobs/${job.id}/mark-built`).send({ expectedVersion: version++ }).expect(200);
  return { id: job.id, version };
}

async function sendLink(id: string, extra: Record<string, unknown> = {}) {
  const res = await cast.staff.agent
    .post(`/api/requests/${id}/inspector-links`)
    .send({ inspectorName: 'Imani Voss', inspectorEmail: 'i.voss@harlow-township.test', ...extra });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  const url = new URL(res.body.url as string);
  return { linkId: res.body.link.id as string, token: url.hash.replace('#t=', ''), url };
}

const open = (id: string, token: string) => request(t.app).get(`/api/inspect/${id}`).set(header, token);
const outcome = (id: string, token: string, body: Record<string, unknown>) =>
  request(t.app).post(`/api/inspect/${id}/outcome`).set(header, token).send(body);

async function mailsFor(requestId: string, template: string) {
  return t.ctx.db
    .select({ to: emails.toAddress, subject: emails.subject, text: emails.textBody })
    .from(emails)
    .where(and(eq(emails.requestId, requestId), eq(emails.template, template)));
}

describe('the inspector’s link: signed, time-limited, withdrawable, one request only', () => {
  it('opens the one request with the permit, readings, photos and the crew’s note, and nothing internal', async () => {
    const { id } = await builtJob();
    await cast.staff.agent
      .post(`/api/requests/${id}/messages`)
      .send({ body: 'Internal: owner slow to pay the deposit, call 555-0142.', visibility: 'internal' })
      .expect(201);
    const { token, url } = await sendLink(id);
    expect(url.pathname).toBe(`/inspect/${id}`);
    const [stored] = await t.ctx.db.select().from(inspectorLinks).where(eq(inspectorLinks.requestId, id));
    expect(stored.tokenHash).not.toContain(token);
    const page = await open(id, token).expect(200);
    expect(page.body.request.id).toBe(id);
    expect(page.body.permit.conditions).toMatch(/inspection before paving/);
    expect(page.body.asBuilt).toMatchObject({ passed: true });
    expect(page.body.asBuilt.readings.length).toBeGreaterThan(0);
    expect(page.body.crewPhotos).toHaveLength(1);
    expect(page.body.crewPhotos[0]).toMatchObject({ kind: 'finished_entrance', gpsLat: 44.3 });
    expect(page.body.crewNote).toMatch(/Apron paved/);
    expect(page.body.gradeCheck).toMatchObject({ number: 1 });
    expect(page.body.link).toMatchObject({ inspectorName: 'Imani Voss', canRecord: true });
    const text = JSON.stringify(page.body);
    for (const secret of ['555-0142', 'deposit', 'Gate code', cast.applicant.email, cast.crew.email, 'objectKey'])
      expect(text).not.toContain(secret);
    const linkMail = await mailsFor(id, 'inspection.link');
    expect(linkMail).toHaveLength(1);
    expect(linkMail[0].to).toBe('i.voss@harlow-township.test');
    expect(linkMail[0].text).toContain(url.toString());
    // The owner's history does not show the link (its address is the office's business).
    const ownerEvents = await cast.applicant.agent.get(`/api/requests/${id}/events`).expect(200);
    expect(JSON.stringify(ownerEvents.body)).not.toContain('voss');
  });

  it('refuses another request’s id, a tampered token, no token, an expired and a withdrawn link, all alike', async () => {
    const first = await builtJob();
    const second = await builtJob();
    const { token, linkId } = await sendLink(first.id);
    const refusals = [
      await open(second.id, token),
      await open('not-an-id', token),
      await open(first.id, `${token.slice(0, -1)}${token.endsWith('A') ? 'B' : 'A'}`),
      await open(first.id, ''),
      await request(t.app).get(`/api/inspect/${first.id}`),
      await outcome(second.id, token, { outcome: 'passed', inspectorName: 'X' }),
    ];
    for (const res of refusals) {
      expect(res.status).toBe(404);
      expect(res.body).toEqual({ error: { code: 'not_found', message: 'Inspection page was not found.' } });
    }
    await open(first.id, token).expect(200);

    await t.ctx.db
      .update(inspectorLinks)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(inspectorLinks.id, linkId));
    const expired = await open(first.id, token);
    expect(expired.status).toBe(404);
    expect(expired.body.error.message).toBe('Inspection page was not found.');
    await outcome(first.id, token, { outcome: 'passed', inspectorName: 'Imani Voss' }).expect(404);

    const fresh = await sendLink(first.id);
    await open(first.id, fresh.token).expect(200);
    const revoked = await cast.staff.agent
      .post(`/api/requests/${first.id}/inspector-links/${fresh.linkId}/revoke`)
      .send({})
      .expect(200);
    expect(revoked.body.link.state).toBe('withdrawn');
    await open(first.id, fresh.token).expect(404);
    await outcome(first.id, fresh.token, { outcome: 'passed', inspectorName: 'Imani Voss' }).expect(404);
    // Nothing was recorded through the refused links.
    const listed = await cast.staff.agent.get(`/api/requests/${first.id}/inspections`).expect(200);
    expect(listed.body.inspections).toEqual([]);
    expect(listed.body.links.map((l: { state: string }) => l.state).sort()).toEqual(['expired', 'withdrawn']);
  });

  it('only the office sends or withdraws links, and only for a built job', async () => {
    const job = await createReleasedJob(t.ctx.db, { applicantId: cast.applicant.id, staffId: cast.staff.id });
    const early = await cast.staff.agent
      .post(`/api/requests/${job.id}/inspector-links`)
      .send({ inspectorName: 'Imani Voss', inspectorEmail: 'i.voss@harlow-township.test' })
      .expect(409);
    expect(early.body.error.message).toMatch(/marked the job built/);
    const { id } = await builtJob();
    await cast.applicant.agent
      .post(`/api/requests/${id}/inspector-links`)
      .send({ inspectorName: 'Me', inspectorEmail: 'me@example.test' })
      .expect(403);
    await cast.crew.agent
      .post(`/api/requests/${id}/inspector-links`)
      .send({ inspectorName: 'Me', inspectorEmail: 'me@example.test' })
      .expect(403);
    const bad = await cast.staff.agent
      .post(`/api/requests/${id}/inspector-links`)
      .send({ inspectorName: ' ', inspectorEmail: 'nope', daysValid: 400 })
      .expect(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['daysValid', 'inspectorEmail', 'inspectorName']);
  });
});

describe('the inspector records the outcome on the page', () => {
  it('passed: a history entry, e-mails to the office and the owner, and the link records no second outcome', async () => {
    const { id } = await builtJob();
    const { token } = await sendLink(id);
    const res = await outcome(id, token, {
      outcome: 'passed',
      inspectorName: 'Imani Voss',
      note: 'Good apron.',
    }).expect(200);
    expect(res.body.inspections[0]).toMatchObject({ passed: true, inspectorName: 'Imani Voss' });
    expect(res.body.link.canRecord).toBe(false);
    const events = await t.ctx.db
      .select()
      .from(requestEvents)
      .where(and(eq(requestEvents.requestId, id), eq(requestEvents.kind, 'inspection-passed')));
    expect(events).toHaveLength(1);
    expect(events[0]).toMatchObject({ internal: false });
    const mails = await mailsFor(id, 'inspection.passed');
    expect(mails.map((m) => m.to).sort()).toEqual([cast.applicant.email, t.env.OFFICE_EMAIL].sort());
    const owner = await cast.applicant.agent.get(`/api/requests/${id}/events`).expect(200);
    expect(JSON.stringify(owner.body)).toContain('Imani Voss');
    const again = await outcome(id, token, { outcome: 'failed', inspectorName: 'Imani Voss', items: 'x' });
    expect(again.status).toBe(409);
  });

  it('failed: the job goes back to the crew with the items, through the one door, and everyone is told', async () => {
    const { id } = await builtJob();
    const { token } = await sendLink(id);
    const missing = await outcome(id, token, { outcome: 'failed', inspectorName: 'Imani Voss' }).expect(400);
    expect(missing.body.error.fields.items).toMatch(/one item per line/);
    const res = await outcome(id, token, {
      outcome: 'failed',
      inspectorName: 'Imani Voss',
      items: '- Culvert end not mitred\n\n2. Apron short of the road edge by 1 ft',
    });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.request.status).toBe('under_construction');
    expect(res.body.inspections[0]).toMatchObject({
      passed: false,
      items: ['Culvert end not mitred', 'Apron short of the road edge by 1 ft'],
    });
    const [moved] = await t.ctx.db
      .select()
      .from(requestEvents)
      .where(and(eq(requestEvents.requestId, id), eq(requestEvents.toStatus, 'under_construction')))
      .orderBy(requestEvents.id);
    expect(moved).toBeDefined();
    const transitions = await t.ctx.db
      .select({ note: requestEvents.note, from: requestEvents.fromStatus })
      .from(requestEvents)
      .where(and(eq(requestEvents.requestId, id), eq(requestEvents.fromStatus, 'built')));
    expect(transitions).toHaveLength(1);
    expect(transitions[0].note).toContain('Culvert end not mitred');
    const mails = await t.ctx.db
      .select({ to: emails.toAddress, text: emails.textBody })
      .from(emails)
      .where(and(eq(emails.requestId, id), eq(emails.template, 'transition.fail-inspection')));
    const addressees = mails.map((m) => m.to);
    expect(addressees).toEqual(expect.arrayContaining([cast.applicant.email, t.env.OFFICE_EMAIL, cast.crew.email]));
    for (const mail of mails) expect(mail.text).toContain('Apron short of the road edge by 1 ft');
    // The crew sees the items on its job; the owner sees them too.
    const crewSees = await cast.crew.agent.get(`/api/requests/${id}/inspections`).expect(200);
    expect(crewSees.body.inspections[0].items).toHaveLength(2);
    expect(crewSees.body).not.toHaveProperty('links');
  });

  it('the office can record a failed inspection it was told of, with the same form fields', async () => {
    const { id, version } = await builtJob();
    const res = await cast.staff.agent.post(`/api/requests/${id}/transitions`).send({
      action: 'fail-inspection',
      expectedVersion: version,
      inspectorName: 'Imani Voss',
      items: 'Cover over the pipe under 12 in at the left end',
    });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.request.status).toBe('under_construction');
  });
});

describe('odd input on the public page', () => {
  it('answers 400 naming the field, or 404 for a bad token, never 500', async () => {
    const { id } = await builtJob();
    const { token } = await sendLink(id);
    const odd = [
      { outcome: 'maybe', inspectorName: 'Imani' },
      { outcome: 'passed', inspectorName: '' },
      { outcome: 'passed', inspectorName: 'Imani\u0000' },
      { outcome: 'passed', inspectorName: 'x'.repeat(500) },
      { outcome: 'failed', inspectorName: 'Imani', items: ['not', 'text'] },
      { outcome: 'passed', inspectorName: 'Imani', extra: true },
    ];
    for (const body of odd) {
      const res = await outcome(id, token, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(Object.keys(res.body.error.fields).length).toBeGreaterThan(0);
    }
    for (const bad of ['x'.repeat(5000), '%00', '../../etc']) {
      const res = await open(id, bad);
      expect(res.status).toBe(404);
    }
    // None of it recorded anything: the link still takes its one outcome.
    await outcome(id, token, { outcome: 'passed', inspectorName: 'Imani Voss' }).expect(200);
  });
});

describe('closing waits for a passed inspection where the rule profile asks for one', () => {
  const inspected = { ...harlowRules, inspection: 'required' as const };

  it('refuses to close before an inspection and after a failed one, then closes once one passes', async () => {
    const { id, version } = await builtJob(inspected);
    const before = await cast.staff.agent
      .post(`/api/requests/${id}/transitions`)
      .send({ action: 'close', expectedVersion: version });
    expect(before.status).toBe(409);
    expect(before.body.error.message).toMatch(/passed inspection before closing/);

    const { token } = await sendLink(id);
    await outcome(id, token, { outcome: 'failed', inspectorName: 'Imani Voss', items: 'Reseed the ditch' }).expect(200);
    // The crew fixes it, takes fresh readings and marks it built again.
    const crew = cast.crew.agent;
    await crew
      .post(`/api/crew/jobs/${id}/as-built`)
      .send({ readings: [{ stationFt: 5, gradePercent: 3.5 }] })
      .expect(201);
    await crew
      .post(`/api/crew/jobs/${id}/mark-built`)
      .send({ expectedVersion: version + 1 })
      .expect(200);
    const afterFail = await cast.staff.agent
      .post(`/api/requests/${id}/transitions`)
      .send({ action: 'close', expectedVersion: version + 2 });
    expect(afterFail.status).toBe(409);
    expect(afterFail.body.error.message).toMatch(/last inspection failed/);

    const second = await sendLink(id);
    await outcome(id, second.token, { outcome: 'passed', inspectorName: 'Imani Voss' }).expect(200);
    const closed = await cast.staff.agent
      .post(`/api/requests/${id}/transitions`)
      .send({ action: 'close', expectedVersion: version + 2 });
    expect(closed.status, JSON.stringify(closed.body)).toBe(200);
    expect(closed.body.request.status).toBe('closed');
  });

  it('a rule profile saved before the setting existed reads as not required, and closes as before', async () => {
    const { id, version } = await builtJob();
    const [job] = await t.ctx.db.select().from(ruleProfileVersions).limit(1);
    expect(job.profile).not.toHaveProperty('inspection');
    const listed = await cast.staff.agent.get(`/api/requests/${id}/inspections`).expect(200);
    expect(listed.body.inspectionRequired).toBe(false);
    await cast.staff.agent
      .post(`/api/requests/${id}/transitions`)
      .send({ action: 'close', expectedVersion: version })
      .expect(200);
  });
});
