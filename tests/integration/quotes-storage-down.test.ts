import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { documents, emails, quotes } from '../../server/db/schema';
import { seedRateCard } from '../../server/dev/seed/demo-rate-card';
import { signInCast, type Cast } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import { freePort } from '../setup/free-port';
import { createTestApp, type TestApp } from '../setup/test-app';
import { currentVersionId, surveyInputs } from './grade-check-survey';

let t: TestApp;
let cast: Cast;
beforeAll(async () => {
  // Storage points at a port nothing listens on: every upload is refused.
  t = await createTestApp({ S3_ENDPOINT: `http://127.0.0.1:${await freePort()}` });
  cast = await signInCast(t);
  await seedRateCard(t.ctx.db);
});
afterAll(() => t.close());

describe('sending a quote while storage is down', () => {
  it('answers 503 in plain words and leaves the draft unsent, with no document and no e-mail', async () => {
    const marrow = await currentVersionId(t.ctx.db, 'marrow-county');
    const request = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'visit_booked' });
    const check = await cast.staff.agent
      .post(`/api/requests/${request.id}/grade-checks`)
      .send({ ruleProfileVersionId: marrow, inputs: surveyInputs() })
      .expect(201);
    const draft = await cast.staff.agent
      .post(`/api/requests/${request.id}/quotes`)
      .send({ gradeCheckId: check.body.check.id })
      .expect(201);
    const res = await cast.staff.agent.post(`/api/quotes/${draft.body.quote.id}/send`).expect(503);
    expect(res.body.error.message).toBe(
      'The quote’s PDF could not be stored just now, so nothing was sent. Try again in a minute.',
    );
    const [row] = await t.ctx.db.select().from(quotes).where(eq(quotes.id, draft.body.quote.id));
    expect(row.status).toBe('draft');
    expect(await t.ctx.db.select().from(documents).where(eq(documents.requestId, request.id))).toEqual([]);
    expect(await t.ctx.db.select().from(emails).where(eq(emails.requestId, request.id))).toEqual([]);
  });
});
