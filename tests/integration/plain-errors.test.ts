import { describe, expect, it } from 'vitest';
import { commonRuralTemplate } from '@shared/engine';
import { jurisdictions } from '../../server/db/schema';
import { seedJurisdictions } from '../../server/dev/seed/jurisdictions';
import { type Cast, withCastApp } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import type { TestApp } from '../setup/test-app';

let t: TestApp;
let cast: Cast;
withCastApp((app, signedIn) => {
  t = app;
  cast = signedIn;
});

// Keys as the code spells them, which a person must never read in a message.
const codeWords = /\b[a-z]+[A-Z][A-Za-z]*\b|\b\w+\.\w+\b|Too big|Too small|Invalid input|<=|>=/;

describe('a 400 a person reads', () => {
  it('names a status change field by its label and says what is allowed', async () => {
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'permit_filed' });
    const res = await cast.staff.agent
      .post(`/api/requests/${row.id}/transitions`)
      .send({
        action: 'record-granted',
        permitDecidedOn: '2026-03-02',
        permitExpiresOn: '2026-03-01',
        expectedVersion: row.version,
      })
      .expect(400);
    expect(res.body.error.message).toBe('Permit expires on: must be after the decision date.');
    expect(res.body.error.fields).toEqual({ permitExpiresOn: 'must be after the decision date' });
    expect(res.body.error.labels).toEqual({ permitExpiresOn: 'Permit expires on' });

    const refused = await cast.staff.agent
      .post(`/api/requests/${row.id}/transitions`)
      .send({ action: 'record-refused', permitDecidedOn: 'soon', expectedVersion: row.version })
      .expect(400);
    expect(refused.body.error.labels).toMatchObject({ note: 'Reason', permitDecidedOn: 'Decided on' });
    expect(refused.body.error.message).toMatch(/^Please check 2 fields: /);
    expect(refused.body.error.message).not.toMatch(codeWords);
  });

  it('says an empty photo in plain words, not by its key', async () => {
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'draft' });
    const res = await cast.applicant.agent
      .post(`/api/requests/${row.id}/photos`)
      .send({ fileName: 'empty.jpg', contentType: 'image/jpeg', sizeBytes: 0 })
      .expect(400);
    expect(res.body.error.message).toBe('File size: The file is empty.');
    expect(res.body.error.labels).toEqual({ sizeBytes: 'File size' });
  });

  it("words a rule profile's limits by the profile form's labels, with no stock zod text", async () => {
    await seedJurisdictions(t.ctx.db);
    const [j] = await t.ctx.db.select().from(jurisdictions).limit(1);
    const draft = await cast.admin.agent.post(`/api/jurisdictions/${j.id}/versions`).send({}).expect(201);
    const profile = { ...commonRuralTemplate, landing: { ...commonRuralTemplate.landing, maxGradePercent: 80 } };
    const res = await cast.admin.agent
      .put(`/api/rule-profile-versions/${draft.body.version.id}`)
      .send({ profile })
      .expect(400);
    expect(res.body.error.fields['profile.landing.maxGradePercent']).toBe('must be 50 or less');
    expect(res.body.error.labels['profile.landing.maxGradePercent']).toBe('Landing: steepest rise away from the road');
    expect(res.body.error.message).toBe('Landing: steepest rise away from the road: must be 50 or less.');
  });

  it('names the crew work day by its label', async () => {
    const bad = await cast.crew.agent
      .post(`/api/crew/jobs/00000000-0000-4000-8000-000000000000/schedule`)
      .send({ date: '2026-02-30' })
      .expect(400);
    expect(bad.body.error.labels).toEqual({ date: 'Work day' });
    expect(bad.body.error.message).toBe('Work day: pick a day from the calendar.');
  });
});

describe('a refused status change', () => {
  it('names the status and the action by their labels, never by their keys', async () => {
    const row = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'permit_refused' });
    const res = await cast.staff.agent
      .post(`/api/requests/${row.id}/transitions`)
      .send({ action: 'file-permit', permitReference: 'RA-1', expectedVersion: row.version })
      .expect(409);
    expect(res.body.error.message).toContain('"Permit refused"');
    expect(res.body.error.message).not.toMatch(/permit_refused|file-permit/);
  });
});
