import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { QuoteView } from '@shared/contracts/quotes';
import { demoRateCardPrices, seedRateCard } from '../../server/dev/seed/demo-rate-card';
import { signInCast, type Cast } from '../factories/office-cast';
import { createRequestRow } from '../factories/request-rows';
import { createTestApp, type TestApp } from '../setup/test-app';
import { currentVersionId, surveyInputs } from './grade-check-survey';

let t: TestApp;
let cast: Cast;
let draft: QuoteView;
let cardDraftId: string;
beforeAll(async () => {
  t = await createTestApp();
  cast = await signInCast(t);
  const marrow = await currentVersionId(t.ctx.db, 'marrow-county');
  await seedRateCard(t.ctx.db);
  const request = await createRequestRow(t.ctx.db, { applicantId: cast.applicant.id, status: 'visit_booked' });
  const check = await cast.staff.agent
    .post(`/api/requests/${request.id}/grade-checks`)
    .send({ ruleProfileVersionId: marrow, inputs: surveyInputs() })
    .expect(201);
  draft = (
    await cast.staff.agent
      .post(`/api/requests/${request.id}/quotes`)
      .send({ gradeCheckId: check.body.check.id })
      .expect(201)
  ).body.quote;
  cardDraftId = (await cast.admin.agent.post('/api/rate-cards').send({}).expect(201)).body.rateCard.id;
});
afterAll(() => t.close());

const future = new Date(Date.now() + 20 * 86_400_000).toISOString().slice(0, 10);
const goodLine = {
  kind: 'other',
  description: 'Sawcut the road edge',
  quantity: 16,
  unit: 'ft',
  unitPriceCents: 1200,
  taxable: false,
};

async function quoteFields(body: object) {
  const res = await cast.staff.agent.put(`/api/quotes/${draft.id}`).send(body).expect(400);
  return res.body.error.fields as Record<string, string>;
}
const withLine = (line: Record<string, unknown>) => ({
  lines: [{ ...goodLine, ...line }],
  terms: '',
  validUntil: future,
});

describe('bad quote input is named by its label', () => {
  it.each([
    ['a negative unit price', { unitPriceCents: -100 }, 'lines.0.unitPriceCents', 'Unit price must not be negative'],
    [
      'a fraction of a cent',
      { unitPriceCents: 12.5 },
      'lines.0.unitPriceCents',
      'Unit price must be in whole cents (no fraction of a cent)',
    ],
    [
      'an absurd price',
      { unitPriceCents: 10_000_001 },
      'lines.0.unitPriceCents',
      'Unit price must be at most $100,000',
    ],
    ['a price as text', { unitPriceCents: '12.00' }, 'lines.0.unitPriceCents', 'Unit price must be an amount of money'],
    ['a negative quantity', { quantity: -1 }, 'lines.0.quantity', 'Quantity must be at least 0'],
    ['an absurd quantity', { quantity: 5_000_000 }, 'lines.0.quantity', 'Quantity must be at most 100,000'],
    ['a quantity past two decimals', { quantity: 1.234 }, 'lines.0.quantity', 'Quantity takes at most two decimals'],
    ['an empty description', { description: '  ' }, 'lines.0.description', 'Description is required'],
    ['an empty unit', { unit: '' }, 'lines.0.unit', 'Unit is required (for example "cu yd", "ft", "each")'],
    ['an unknown kind', { kind: 'bribe' }, 'lines.0.kind', `Kind must be one of the rate card's kinds or "other"`],
    ['taxable as text', { taxable: 'yes' }, 'lines.0.taxable', 'Taxable must be yes or no'],
  ])('%s', async (_what, line, field, message) => {
    const fields = await quoteFields(withLine(line));
    expect(fields[field]).toBe(message);
  });

  it('a validity date in the past, or not a date', async () => {
    expect((await quoteFields({ ...withLine({}), validUntil: '2020-01-01' })).validUntil).toBe(
      'Valid until must be today or later',
    );
    expect((await quoteFields({ ...withLine({}), validUntil: 'soon' })).validUntil).toBe('Valid until must be a date');
  });

  it('no lines, too-long terms, unknown fields', async () => {
    expect((await quoteFields({ lines: [], terms: '', validUntil: future })).lines).toBe(
      'Lines: a quote needs at least one line',
    );
    expect((await quoteFields({ ...withLine({}), terms: 'x'.repeat(4001) })).terms).toBe(
      'Terms must be at most 4,000 characters',
    );
    const extra = await quoteFields({ ...withLine({}), totalCents: 1 });
    expect(Object.keys(extra)).toEqual(['(body)']);
  });

  it('a grade check that is not this request’s', async () => {
    const res = await cast.staff.agent
      .post(`/api/requests/${draft.requestId}/quotes`)
      .send({ gradeCheckId: 'not-an-id' })
      .expect(400);
    expect(res.body.error.fields.gradeCheckId).toBe("Grade check must be one of this request's saved checks");
  });

  it('the stored draft is untouched by every refused edit', async () => {
    const list = await cast.staff.agent.get(`/api/requests/${draft.requestId}/quotes`).expect(200);
    expect(list.body.quotes[0].totalCents).toBe(draft.totalCents);
  });
});

describe('bad rate card input is named by its label', () => {
  async function cardFields(prices: Record<string, unknown>) {
    const res = await cast.admin.agent
      .put(`/api/rate-cards/${cardDraftId}`)
      .send({ prices: { ...demoRateCardPrices, ...prices } })
      .expect(400);
    return res.body.error.fields as Record<string, string>;
  }

  it.each([
    [
      { excavationPerBankCyCents: -1 },
      'prices.excavationPerBankCyCents',
      'Excavation, per bank cu yd must not be negative',
    ],
    [
      { haulPerLoadCents: 145.5 },
      'prices.haulPerLoadCents',
      'Haul, per truck load must be in whole cents (no fraction of a cent)',
    ],
    [{ mobilisationCents: 1e12 }, 'prices.mobilisationCents', 'Mobilisation must be at most $100,000'],
    [{ salesTaxBp: 9000 }, 'prices.salesTaxBp', 'Sales tax rate must be at most 25%'],
    [{ salesTaxBp: 6.255 }, 'prices.salesTaxBp', 'Sales tax rate takes at most two decimals of a percent'],
    [{ depositBp: -5 }, 'prices.depositBp', 'Deposit share must not be negative'],
    [{ depositBp: 10_001 }, 'prices.depositBp', 'Deposit share must be at most 100%'],
    [
      { trafficControlDays: 1.5 },
      'prices.trafficControlDays',
      'Traffic control days on a usual job must be a whole number of days',
    ],
    [{ pavingPerSqFtCents: -625 }, 'prices.pavingPerSqFtCents', 'Paving, per sq ft must not be negative'],
    [
      { baseCourse: { basis: 'ton', priceCents: 3890, depthIn: 0, tonsPerCy: 1.4 } },
      'prices.baseCourse.depthIn',
      'Base course depth (in) must be at least 1 in',
    ],
    [
      { baseCourse: { basis: 'bucket', priceCents: 3890, depthIn: 6, tonsPerCy: 1.4 } },
      'prices.baseCourse.basis',
      'Base course priced by must be per ton or per square foot',
    ],
    [
      { pipes: [{ diameterIn: 2, material: 'plastic', perFootCents: 100, endSectionEachCents: 100 }] },
      'prices.pipes.0.diameterIn',
      'Pipe diameter (in) must be at least 6 in',
    ],
    [
      { pipes: [{ diameterIn: 18, material: 'wood', perFootCents: 100, endSectionEachCents: 100 }] },
      'prices.pipes.0.material',
      'Pipe material must be corrugated metal, smooth plastic or concrete',
    ],
    [
      {
        pipes: [
          { diameterIn: 18, material: 'plastic', perFootCents: 100, endSectionEachCents: 100 },
          { diameterIn: 18, material: 'plastic', perFootCents: 200, endSectionEachCents: 100 },
        ],
      },
      'prices.pipes.1.diameterIn',
      'Pipe diameter (in): 18 in smooth plastic (hdpe) is listed twice',
    ],
  ])('%j', async (prices, field, message) => {
    expect((await cardFields(prices))[field]).toBe(message);
  });
});
