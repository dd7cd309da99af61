import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { emails } from '../../server/db/schema';
import { type Cast, withCastApp } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import type { TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
withCastApp((app, signedIn) => {
  t = app;
  cast = signedIn;
});

const secret = 'INTERNAL: owner was rude on the phone, double-check the survey pins';

describe('internal notes', () => {
  it('never reach the applicant through any API or e-mail', async () => {
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id });
    const base = `/api/requests/${row.id}`;
    await cast.staff.agent.post(`${base}/messages`).send({ body: secret, visibility: 'internal' }).expect(201);
    await cast.staff.agent
      .post(`${base}/messages`)
      .send({ body: 'We will visit on Tuesday morning.', visibility: 'shared' })
      .expect(201);
    await cast.staff.agent.put(`${base}/assignee`).send({ assigneeId: cast.otherStaff.id }).expect(200);
    await cast.staff.agent
      .post(`${base}/transitions`)
      .send({ action: 'ask-details', note: 'Where exactly is the mailbox?', expectedVersion: row.version })
      .expect(200);

    const office = await cast.otherStaff.agent.get(`${base}/messages`).expect(200);
    expect(office.body.messages.map((m: { body: string }) => m.body)).toContain(secret);

    const ownerViews = await Promise.all([
      cast.applicant.agent.get(`${base}/messages`).expect(200),
      cast.applicant.agent.get(`${base}/events`).expect(200),
      cast.applicant.agent.get(base).expect(200),
      cast.applicant.agent.get('/api/requests/mine').expect(200),
    ]);
    for (const view of ownerViews) {
      expect(JSON.stringify(view.body)).not.toContain(secret);
      expect(JSON.stringify(view.body)).not.toContain(cast.otherStaff.id);
    }
    expect(ownerViews[0].body.messages.map((m: { body: string }) => m.body)).toEqual([
      'We will visit on Tuesday morning.',
    ]);
    expect(ownerViews[1].body.events.every((e: { kind: string }) => e.kind !== 'assignment')).toBe(true);

    const mail = await t.ctx.db.select().from(emails).where(eq(emails.requestId, row.id));
    expect(mail.length).toBeGreaterThan(0);
    for (const m of mail) expect(`${m.subject}${m.textBody}${m.htmlBody}`).not.toContain(secret);
    await cast.applicant.agent.get('/api/queue').expect(403);
    await cast.applicant.agent.get('/api/emails').expect(403);
  });

  it('cannot be written by the applicant', async () => {
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id });
    const res = await cast.applicant.agent
      .post(`/api/requests/${row.id}/messages`)
      .send({ body: 'hidden?', visibility: 'internal' })
      .expect(400);
    expect(res.body.error.fields).toHaveProperty('visibility');
  });
});
