import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { emails, messages, requests } from '../../server/db/schema';
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

describe('what each action needs', () => {
  it('names the missing or wrong fields with 400 and changes nothing', async () => {
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id });
    const cases: [Record<string, unknown>, string[]][] = [
      [{ action: 'decline', expectedVersion: row.version }, ['note']],
      [{ action: 'ask-details', note: '   ', expectedVersion: row.version }, ['note']],
      [{ action: 'book-visit', expectedVersion: row.version }, ['visitAt']],
      [{ action: 'book-visit', visitAt: 'next tuesday', expectedVersion: row.version }, ['visitAt']],
      [{ action: 'book-visit', visitAt: '2001-01-01T09:00:00Z', expectedVersion: row.version }, ['visitAt']],
      [{ action: 'fly', expectedVersion: row.version }, ['action']],
      [{ action: 'decline', note: 'x' }, ['expectedVersion']],
      [{ action: 'decline', note: 'x', expectedVersion: '3' }, ['expectedVersion']],
      [{ action: 'decline', note: 'x', expectedVersion: row.version, colour: 'red' }, ['(body)']],
      [{ action: 'file-permit', expectedVersion: row.version }, ['permitReference']],
      [{ action: 'record-granted', permitDecidedOn: '2026-02-30', expectedVersion: row.version }, ['permitDecidedOn']],
      [
        {
          action: 'record-granted',
          permitDecidedOn: '2026-03-02',
          permitExpiresOn: '2026-03-01',
          expectedVersion: row.version,
        },
        ['permitExpiresOn'],
      ],
    ];
    for (const [body, fields] of cases) {
      const res = await move(cast.staff, row.id, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(Object.keys(res.body.error.fields), JSON.stringify(body)).toEqual(expect.arrayContaining(fields));
    }
    await cast.staff.agent
      .post(`/api/requests/${row.id}/transitions`)
      .set('content-type', 'application/json')
      .send('{"action":')
      .expect(400);
    await move(cast.staff, 'not-a-uuid', { action: 'decline', note: 'x', expectedVersion: 1 }).expect(400);
    const [after] = await t.ctx.db.select().from(requests).where(eq(requests.id, row.id));
    expect(after).toMatchObject({ status: 'submitted', version: row.version });
  });

  it('hides requests from those who may not see them with 404', async () => {
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id });
    await move(cast.otherApplicant, row.id, { action: 'withdraw', expectedVersion: row.version }).expect(404);
    await move(cast.crew, row.id, { action: 'accept-job', expectedVersion: row.version }).expect(404);
    await move(cast.staff, '00000000-0000-4000-8000-000000000000', {
      action: 'decline',
      note: 'x',
      expectedVersion: 1,
    }).expect(404);
  });

  it('moves to "checked" only with an attached grade check, and mails its summary', async () => {
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'visit_booked' });
    const draftCheck = await createGradeCheck(t.ctx.db, {
      requestId: row.id,
      createdById: cast.staff.id,
      attachedAt: null,
    });
    const refused = await move(cast.staff, row.id, { action: 'mark-checked', expectedVersion: row.version }).expect(
      409,
    );
    expect(refused.body.error.message).toMatch(/grade check/i);
    await createGradeCheck(t.ctx.db, {
      requestId: row.id,
      createdById: cast.staff.id,
      ruleProfileVersionId: draftCheck.ruleProfileVersionId,
    });
    await move(cast.staff, row.id, { action: 'mark-checked', expectedVersion: row.version }).expect(200);
    const [mail] = await t.ctx.db.select().from(emails).where(eq(emails.requestId, row.id));
    expect(mail.textBody).toContain('Landing 2.1%');
  });

  it('stores the owner’s answer as a shared message in the same change', async () => {
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'needs_details' });
    const res = await move(cast.applicant, row.id, {
      action: 'answer',
      answer: 'The culvert is 15 in, corrugated.',
      expectedVersion: row.version,
    }).expect(200);
    expect(res.body.request.status).toBe('submitted');
    const stored = await t.ctx.db.select().from(messages).where(eq(messages.requestId, row.id));
    expect(stored).toEqual([
      expect.objectContaining({
        body: 'The culvert is 15 in, corrugated.',
        visibility: 'shared',
        authorId: cast.applicant.id,
      }),
    ]);
  });

  it('records the visit date and the permit details on the request', async () => {
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id });
    const visitAt = new Date(Date.now() + 5 * 86_400_000);
    let v = (
      await move(cast.staff, row.id, {
        action: 'book-visit',
        visitAt: visitAt.toISOString(),
        expectedVersion: row.version,
      }).expect(200)
    ).body.request.version;
    await t.ctx.db.update(requests).set({ status: 'checked' }).where(eq(requests.id, row.id));
    v = (
      await move(cast.admin, row.id, {
        action: 'file-permit',
        permitReference: 'FC-ACC-7731',
        expectedVersion: v,
      }).expect(200)
    ).body.request.version;
    const granted = await move(cast.staff, row.id, {
      action: 'record-granted',
      permitDecidedOn: '2026-04-14',
      permitExpiresOn: '2027-04-14',
      permitConditions: 'Flagger on Quarry Ridge Road during work.',
      expectedVersion: v,
    }).expect(200);
    expect(granted.body.request).toMatchObject({
      status: 'permit_granted',
      permitReference: 'FC-ACC-7731',
      permitDecidedOn: '2026-04-14',
      permitExpiresOn: '2027-04-14',
    });
    expect(new Date(granted.body.request.visitAt).getTime()).toBe(visitAt.getTime());
  });
});
