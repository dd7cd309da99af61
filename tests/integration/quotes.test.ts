import { and, eq } from 'drizzle-orm';
import type { Response } from 'superagent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { haulEstimate } from '@shared/charts/cut-fill-table';
import type { QuoteView } from '@shared/contracts/quotes';
import { emails, quotes, requestEvents } from '../../server/db/schema';
import { demoRateCardPrices, seedRateCard } from '../../server/dev/seed/demo-rate-card';
import { signInCast, type Cast } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import { createTestApp, type TestApp } from '../setup/test-app';
import { currentVersionId, pdfText, surveyInputs } from './grade-check-survey';

let t: TestApp;
let cast: Cast;
let marrow: string;
beforeAll(async () => {
  t = await createTestApp();
  cast = await signInCast(t);
  marrow = await currentVersionId(t.ctx.db, 'marrow-county');
  await seedRateCard(t.ctx.db);
});
afterAll(() => t.close());

const futureDay = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

async function requestWithCheck(overrides: Record<string, unknown> = {}) {
  const request = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'visit_booked' });
  const saved = await cast.staff.agent
    .post(`/api/requests/${request.id}/grade-checks`)
    .send({ ruleProfileVersionId: marrow, inputs: surveyInputs(overrides) })
    .expect(201);
  return { request, check: saved.body.check };
}

async function draftFrom(requestId: string, gradeCheckId: string): Promise<QuoteView> {
  const res = await cast.staff.agent.post(`/api/requests/${requestId}/quotes`).send({ gradeCheckId }).expect(201);
  return res.body.quote;
}

/** supertest's parser for a binary answer. */
function binary(res: Response, done: (err: Error | null, body: Buffer) => void) {
  const stream = res as unknown as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (c: Buffer) => chunks.push(c));
  stream.on('end', () => done(null, Buffer.concat(chunks)));
}

const editable = (q: QuoteView) => ({
  lines: q.lines.map(({ amountCents: _a, ...line }) => line),
  terms: q.terms,
  validUntil: q.validUntil,
});

describe('a quote made from a saved grade check', () => {
  it('prices the check’s own quantities and says where each came from', async () => {
    const { request, check } = await requestWithCheck();
    const quote = await draftFrom(request.id, check.id);
    expect(quote).toMatchObject({ version: 1, status: 'draft', gradeCheckNumber: check.number, rateCardVersion: 1 });

    const haul = haulEstimate(check.results.proposal);
    const cut = Math.ceil(haul.cutCuYd);
    const byKind = Object.fromEntries(quote.lines.map((l) => [l.kind, l]));
    expect(byKind.excavation).toMatchObject({
      quantity: cut,
      unit: 'bank cu yd',
      unitPriceCents: demoRateCardPrices.excavationPerBankCyCents,
      source: `cut ${cut} bank cy from check ${check.number}`,
      taxable: false,
    });
    // This survey's design only cuts: a quantity the check puts at nothing is left out, not priced at $0.00.
    expect(cut).toBeGreaterThan(0);
    expect(Math.ceil(haul.fillCuYd)).toBe(0);
    expect(byKind.fill).toBeUndefined();
    expect(byKind.haul.quantity).toBe((haul.cutLoads ?? 0) + (haul.fillLoads ?? 0));
    // The survey's culvert: 18 in, n 0.024 (corrugated metal), 30 ft long.
    expect(byKind.pipe).toMatchObject({ quantity: 30, unit: 'ft', unitPriceCents: 4150, taxable: true });
    expect(byKind.pipe.source).toBe(`18 in corrugated metal, 30 ft from check ${check.number}`);
    expect(byKind['end-sections']).toMatchObject({ quantity: 2, unitPriceCents: 22000 });
    expect(byKind['base-course'].unit).toBe('tons');
    expect(byKind['base-course'].source).toContain(`from check ${check.number}`);
    expect(byKind['base-course'].quantity).toBeGreaterThan(0);
    expect(byKind.mobilisation).toMatchObject({ quantity: 1, unitPriceCents: 65000 });
    expect(byKind['permit-fee']).toMatchObject({ quantity: 1, unitPriceCents: 7500, taxable: false });

    // Every amount is whole cents and the totals add up by the stated rounding rule (half up to the cent).
    for (const line of quote.lines) {
      expect(Number.isInteger(line.amountCents)).toBe(true);
      expect(line.amountCents).toBe(Math.floor((Math.round(line.quantity * 100) * line.unitPriceCents + 50) / 100));
    }
    const subtotal = quote.lines.reduce((s, l) => s + l.amountCents, 0);
    const taxable = quote.lines.filter((l) => l.taxable).reduce((s, l) => s + l.amountCents, 0);
    expect(quote.subtotalCents).toBe(subtotal);
    expect(quote.taxCents).toBe(Math.floor((taxable * 625 * 2 + 10_000) / 20_000));
    expect(quote.totalCents).toBe(subtotal + quote.taxCents);
    expect(quote.depositCents).toBe(Math.floor((quote.totalCents * 3000 * 2 + 10_000) / 20_000));
  });

  it('gives a quantity the check does not hold as 0 with the reason, for the office to fill in', async () => {
    const { request, check } = await requestWithCheck({ design: undefined, culvert: undefined });
    const quote = await draftFrom(request.id, check.id);
    const excavation = quote.lines.find((l) => l.kind === 'excavation')!;
    expect(excavation).toMatchObject({
      quantity: 0,
      source: `check ${check.number} has no least-earth design: enter by hand`,
    });
    expect(quote.lines.some((l) => l.kind === 'pipe')).toBe(false);
  });

  it('rounds half a cent up, on the line and on the deposit', async () => {
    const { request, check } = await requestWithCheck();
    const quote = await draftFrom(request.id, check.id);
    const res = await cast.staff.agent
      .put(`/api/quotes/${quote.id}`)
      .send({
        lines: [
          // 0.5 x 1 cent = half a cent: rounds up to 1.
          { kind: 'other', description: 'Half a cent', quantity: 0.5, unit: 'each', unitPriceCents: 1, taxable: false },
          // 1.25 x $10.01 = $12.5125 -> $12.51.
          { kind: 'other', description: 'Odd', quantity: 1.25, unit: 'each', unitPriceCents: 1001, taxable: false },
        ],
        terms: 'Cash terms',
        validUntil: futureDay(10),
      })
      .expect(200);
    expect(res.body.quote.lines.map((l: { amountCents: number }) => l.amountCents)).toEqual([1, 1251]);
    expect(res.body.quote.totalCents).toBe(1252);
    // 30% of $12.52 = $3.756 -> $3.76.
    expect(res.body.quote.depositCents).toBe(376);
  });
});

describe('revisions', () => {
  it('edits a draft, freezes a sent quote, and a revision from a new check replaces it', async () => {
    const { request, check } = await requestWithCheck();
    const first = await draftFrom(request.id, check.id);
    // A second draft while one is open is refused.
    await cast.staff.agent.post(`/api/requests/${request.id}/quotes`).send({ gradeCheckId: check.id }).expect(409);
    // The owner never sees a draft.
    const ownerBefore = await cast.applicant.agent.get(`/api/requests/${request.id}/quotes`).expect(200);
    expect(ownerBefore.body.quotes).toEqual([]);
    await cast.applicant.agent.get(`/api/quotes/${first.id}/pdf`).expect(404);

    const edited = editable(first);
    edited.lines.push({
      kind: 'other',
      description: 'Remove the old gravel apron',
      quantity: 1,
      unit: 'each',
      unitPriceCents: 38000,
      taxable: false,
      source: 'seen at the visit',
    });
    edited.terms = 'Payment within 14 days of completion.';
    const saved = await cast.staff.agent.put(`/api/quotes/${first.id}`).send(edited).expect(200);
    expect(saved.body.quote.totalCents).toBe(first.totalCents + 38000); // the new line is untaxed
    expect(saved.body.quote.terms).toBe('Payment within 14 days of completion.');

    const preview = await cast.staff.agent.get(`/api/quotes/${first.id}/pdf`).buffer(true).parse(binary).expect(200);
    expect(preview.headers['content-type']).toMatch(/application\/pdf/);
    const previewText = await pdfText(preview.body as Buffer);
    expect(previewText).toContain('PREVIEW');
    expect(previewText).toContain('Remove the old gravel apron');

    const sent = await cast.staff.agent.post(`/api/quotes/${first.id}/send`).expect(200);
    expect(sent.body.quote).toMatchObject({ status: 'sent', current: true });
    expect(sent.body.quote.documentId).toBeTruthy();

    // A sent quote never changes.
    await cast.staff.agent.put(`/api/quotes/${first.id}`).send(edited).expect(409);
    await cast.staff.agent.delete(`/api/quotes/${first.id}`).expect(409);
    await cast.staff.agent.post(`/api/quotes/${first.id}/send`).expect(409);
    const [stored] = await t.ctx.db.select().from(quotes).where(eq(quotes.id, first.id));
    expect(stored.totalCents).toBe(saved.body.quote.totalCents);

    // The owner is e-mailed, and the PDF is shared with them.
    const mail = await t.ctx.db
      .select()
      .from(emails)
      .where(and(eq(emails.requestId, request.id), eq(emails.template, 'quote.sent')));
    expect(mail).toHaveLength(1);
    expect(mail[0].toAddress).toBe(cast.applicant.email);
    expect(mail[0].textBody).toContain('version 1');
    // The quote's PDF travels with the e-mail, the same bytes the request page offers.
    const [pdf] = mail[0].attachments;
    expect(pdf).toMatchObject({ contentType: 'application/pdf', encoding: 'base64' });
    expect(pdf.filename).toMatch(/quote-version-1\.pdf$/);
    expect(Buffer.from(pdf.content, 'base64').subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const docs = await cast.applicant.agent.get(`/api/requests/${request.id}/documents`).expect(200);
    expect(docs.body.documents.map((d: { kind: string }) => d.kind)).toContain('quote');

    // A new check offers a revision; the office sees it is newer than the quote's.
    const newer = await cast.staff.agent
      .post(`/api/requests/${request.id}/grade-checks`)
      .send({
        ruleProfileVersionId: marrow,
        inputs: surveyInputs({ culvert: { ...surveyInputs().culvert, lengthFt: 36 } }),
      })
      .expect(201);
    const officeList = await cast.staff.agent.get(`/api/requests/${request.id}/quotes`).expect(200);
    expect(officeList.body.latestCheck).toEqual({ id: newer.body.check.id, number: newer.body.check.number });
    const second = await draftFrom(request.id, newer.body.check.id);
    expect(second.version).toBe(2);
    expect(second.terms).toBe('Payment within 14 days of completion.');
    expect(second.lines.find((l) => l.kind === 'pipe')!.quantity).toBe(36);
    await cast.staff.agent.post(`/api/quotes/${second.id}/send`).expect(200);

    const ownerAfter = await cast.applicant.agent.get(`/api/requests/${request.id}/quotes`).expect(200);
    expect(ownerAfter.body.quotes.map((q: QuoteView) => [q.version, q.status, q.current])).toEqual([
      [2, 'sent', true],
      [1, 'replaced', false],
    ]);
    // The replaced version cannot be accepted.
    const late = await cast.applicant.agent
      .post(`/api/quotes/${first.id}/accept`)
      .send({ name: 'Ellen Marsh' })
      .expect(409);
    expect(late.body.error.message).toMatch(/replaced by a later version/);
  });

  it('keeps the prices a sent quote used when a new rate card is published', async () => {
    const { request, check } = await requestWithCheck();
    const quote = await draftFrom(request.id, check.id);
    await cast.staff.agent.post(`/api/quotes/${quote.id}/send`).expect(200);
    const draft = await cast.admin.agent.post('/api/rate-cards').send({}).expect(201);
    const prices = { ...draft.body.rateCard.prices, excavationPerBankCyCents: 9999 };
    await cast.admin.agent.put(`/api/rate-cards/${draft.body.rateCard.id}`).send({ prices }).expect(200);
    await cast.admin.agent.post(`/api/rate-cards/${draft.body.rateCard.id}/publish`).expect(200);
    const list = await cast.applicant.agent.get(`/api/requests/${request.id}/quotes`).expect(200);
    expect(list.body.quotes[0]).toMatchObject({ rateCardVersion: 1, totalCents: quote.totalCents });
    expect(list.body.quotes[0].lines.find((l: { kind: string }) => l.kind === 'excavation').unitPriceCents).toBe(
      demoRateCardPrices.excavationPerBankCyCents,
    );
    // The next quote prices from the new card.
    const { request: next, check: nextCheck } = await requestWithCheck();
    const fresh = await draftFrom(next.id, nextCheck.id);
    expect(fresh.rateCardVersion).toBe(draft.body.rateCard.version);
    expect(fresh.lines.find((l) => l.kind === 'excavation')!.unitPriceCents).toBe(9999);
  });
});

describe('the owner’s answer', () => {
  async function sentQuote() {
    const { request, check } = await requestWithCheck();
    const quote = await draftFrom(request.id, check.id);
    await cast.staff.agent.post(`/api/quotes/${quote.id}/send`).expect(200);
    return { request, quote };
  }

  it('only the owner accepts, by typing the name on the request', async () => {
    const { request, quote } = await sentQuote();
    // Another owner cannot even see it; the office and crews cannot answer for the owner.
    await cast.otherApplicant.agent.get(`/api/requests/${request.id}/quotes`).expect(404);
    await cast.otherApplicant.agent.post(`/api/quotes/${quote.id}/accept`).send({ name: 'Ellen Marsh' }).expect(404);
    await cast.staff.agent.post(`/api/quotes/${quote.id}/accept`).send({ name: 'Ellen Marsh' }).expect(403);
    await cast.crew.agent.post(`/api/quotes/${quote.id}/accept`).send({ name: 'Ellen Marsh' }).expect(403);
    await cast.crew.agent.get(`/api/requests/${request.id}/quotes`).expect(403);
    // The office cannot draft through the owner's session.
    await cast.applicant.agent
      .post(`/api/requests/${request.id}/quotes`)
      .send({ gradeCheckId: quote.gradeCheckId })
      .expect(403);

    const empty = await cast.applicant.agent.post(`/api/quotes/${quote.id}/accept`).send({ name: '  ' }).expect(400);
    expect(empty.body.error.fields.name).toBe('Your full name is required: type your full name to accept');
    const wrong = await cast.applicant.agent.post(`/api/quotes/${quote.id}/accept`).send({ name: 'x' }).expect(400);
    expect(wrong.body.error.fields.name).toBe('Your full name must match the name on the request (Ellen Marsh)');

    const accepted = await cast.applicant.agent
      .post(`/api/quotes/${quote.id}/accept`)
      .send({ name: '  ellen   MARSH ' })
      .expect(200);
    expect(accepted.body.quote).toMatchObject({ status: 'accepted', acceptedName: 'ellen   MARSH', version: 1 });
    expect(accepted.body.quote.acceptedAt).toBeTruthy();
    await cast.applicant.agent.post(`/api/quotes/${quote.id}/accept`).send({ name: 'Ellen Marsh' }).expect(409);

    const events = await t.ctx.db.select().from(requestEvents).where(eq(requestEvents.requestId, request.id));
    expect(events.find((e) => e.kind === 'quote-accepted')).toMatchObject({ internal: false });
    const office = await t.ctx.db
      .select()
      .from(emails)
      .where(and(eq(emails.requestId, request.id), eq(emails.template, 'quote.accepted')));
    expect(office.map((m) => m.toAddress)).toEqual([t.ctx.env.OFFICE_EMAIL]);
    // An accepted quote stands: no revision is drafted after it.
    const again = await cast.staff.agent
      .post(`/api/requests/${request.id}/quotes`)
      .send({ gradeCheckId: quote.gradeCheckId })
      .expect(409);
    expect(again.body.error.message).toMatch(/accepted version 1/);
  });

  it('declines with a reason, which the office hears about and the timeline keeps', async () => {
    const { request, quote } = await sentQuote();
    const none = await cast.applicant.agent.post(`/api/quotes/${quote.id}/decline`).send({ reason: '' }).expect(400);
    expect(none.body.error.fields.reason).toBe('Reason is required: say why, so the office can answer');
    await cast.staff.agent.post(`/api/quotes/${quote.id}/decline`).send({ reason: 'no' }).expect(403);
    const declined = await cast.applicant.agent
      .post(`/api/quotes/${quote.id}/decline`)
      .send({ reason: 'Too dear for this year' })
      .expect(200);
    expect(declined.body.quote).toMatchObject({ status: 'declined', declineReason: 'Too dear for this year' });
    const timeline = await cast.applicant.agent.get(`/api/requests/${request.id}/events`).expect(200);
    expect(timeline.body.events.map((e: { kind: string }) => e.kind)).toEqual(
      expect.arrayContaining(['quote-sent', 'quote-declined']),
    );
    expect(timeline.body.events.map((e: { kind: string }) => e.kind)).not.toContain('quote-drafted');
    const [mail] = await t.ctx.db
      .select()
      .from(emails)
      .where(and(eq(emails.requestId, request.id), eq(emails.template, 'quote.declined')));
    expect(mail.textBody).toContain('Too dear for this year');
  });
});

describe('an answer and a revision at the same moment', () => {
  it('never leaves a version accepted while a later one has gone out over it', async () => {
    for (let round = 0; round < 4; round++) {
      const { request, check } = await requestWithCheck();
      const first = await draftFrom(request.id, check.id);
      await cast.staff.agent.post(`/api/quotes/${first.id}/send`).expect(200);
      const second = await draftFrom(request.id, check.id);
      const [accepted, sent] = await Promise.all([
        cast.applicant.agent.post(`/api/quotes/${first.id}/accept`).send({ name: 'Ellen Marsh' }),
        cast.staff.agent.post(`/api/quotes/${second.id}/send`),
      ]);
      // Exactly one of the two wins; the other is told why (409), or, on a machine so busy that waiting for the
      // winner outlasts the statement timeout, to try again (503). Either way nothing half-done is left.
      const statuses = [accepted.status, sent.status];
      expect(statuses.filter((s) => s === 200)).toHaveLength(1);
      expect([409, 503]).toContain(statuses.find((s) => s !== 200));
      const rows = await t.ctx.db.select().from(quotes).where(eq(quotes.requestId, request.id));
      const status = Object.fromEntries(rows.map((r) => [r.version, r.status]));
      expect([
        { 1: 'accepted', 2: 'draft' },
        { 1: 'replaced', 2: 'sent' },
      ]).toContainEqual(status);
    }
  });
});

describe('rate card versions', () => {
  it('only the admin sets prices; a published version is frozen and a new draft copies it', async () => {
    const before = await cast.staff.agent.get('/api/rate-cards').expect(200);
    await cast.staff.agent.post('/api/rate-cards').send({}).expect(403);
    await cast.applicant.agent.get('/api/rate-cards').expect(403);
    const published = before.body.versions.find((v: { status: string }) => v.status === 'published');
    await cast.admin.agent.put(`/api/rate-cards/${published.id}`).send({ prices: demoRateCardPrices }).expect(409);
    const draft = await cast.admin.agent.post('/api/rate-cards').send({}).expect(201);
    expect(draft.body.rateCard.status).toBe('draft');
    expect(draft.body.rateCard.prices).toEqual(
      before.body.versions.find((v: { id: string }) => v.id === before.body.currentId).prices,
    );
    await cast.admin.agent.post('/api/rate-cards').send({}).expect(409);
    await cast.staff.agent
      .put(`/api/rate-cards/${draft.body.rateCard.id}`)
      .send({ prices: demoRateCardPrices })
      .expect(403);
    await cast.staff.agent.post(`/api/rate-cards/${draft.body.rateCard.id}/publish`).expect(403);
    const changed = { ...demoRateCardPrices, depositBp: 2500 };
    await cast.admin.agent
      .put(`/api/rate-cards/${draft.body.rateCard.id}`)
      .send({ prices: changed, changeNote: 'Lower deposit' })
      .expect(200);
    const pub = await cast.admin.agent.post(`/api/rate-cards/${draft.body.rateCard.id}/publish`).expect(200);
    expect(pub.body.rateCard).toMatchObject({ status: 'published', current: true, changeNote: 'Lower deposit' });
    await cast.admin.agent.post(`/api/rate-cards/${draft.body.rateCard.id}/publish`).expect(409);
    const after = await cast.staff.agent.get('/api/rate-cards').expect(200);
    expect(after.body.currentId).toBe(draft.body.rateCard.id);
  });
});
