import { z } from 'zod';
import { hasAtMostTwoDecimals } from '../money/money';
import type { Moment } from './wire';

/** The most any one unit price may be: $100,000.00. */
export const MAX_UNIT_PRICE_CENTS = 10_000_000;

/** The kinds of quote line the rate card prices; `other` is a line the office adds by hand. */
export const quoteLineKinds = [
  'excavation',
  'fill',
  'haul',
  'pipe',
  'end-sections',
  'base-course',
  'paving',
  'mobilisation',
  'traffic-control',
  'permit-fee',
  'other',
] as const;
export type QuoteLineKind = (typeof quoteLineKinds)[number];
export type PricedLineKind = Exclude<QuoteLineKind, 'other'>;

/** Each kind's plain name, as the rate card and the quote show it. */
export const lineKindLabels: Record<QuoteLineKind, string> = {
  excavation: 'Excavation',
  fill: 'Imported fill',
  haul: 'Haul',
  pipe: 'Culvert pipe',
  'end-sections': 'End sections',
  'base-course': 'Base course',
  paving: 'Paving',
  mobilisation: 'Mobilisation',
  'traffic-control': 'Traffic control',
  'permit-fee': 'Permit fee',
  other: 'Other',
};

export const pipeMaterials = ['corrugated-metal', 'plastic', 'concrete'] as const;
export type PipeMaterial = (typeof pipeMaterials)[number];
export const pipeMaterialLabels: Record<PipeMaterial, string> = {
  'corrugated-metal': 'Corrugated metal',
  plastic: 'Smooth plastic (HDPE)',
  concrete: 'Concrete',
};

export const baseCourseBases = ['ton', 'square-foot'] as const;

/** Every rate-card field's on-screen label; the 400's words start with it. */
export const rateCardLabels = {
  excavationPerBankCyCents: 'Excavation, per bank cu yd',
  fillPerCompactedCyCents: 'Imported fill, per compacted cu yd',
  haulPerLoadCents: 'Haul, per truck load',
  pipes: 'Culvert pipe prices',
  diameterIn: 'Pipe diameter (in)',
  material: 'Pipe material',
  perFootCents: 'Pipe, per foot',
  endSectionEachCents: 'End section, each',
  baseCourseBasis: 'Base course priced by',
  baseCoursePriceCents: 'Base course price',
  baseCourseDepthIn: 'Base course depth (in)',
  baseCourseTonsPerCy: 'Base course tons per cu yd',
  pavingPerSqFtCents: 'Paving, per sq ft',
  mobilisationCents: 'Mobilisation',
  trafficControlPerDayCents: 'Traffic control, per day',
  trafficControlDays: 'Traffic control days on a usual job',
  permitFeeCents: 'Permit fee (passed through)',
  salesTaxBp: 'Sales tax rate',
  depositBp: 'Deposit share',
  changeNote: 'What changed',
} as const;

/** An amount of money in whole cents, its errors naming the field by its label. */
export const centsField = (label: string, max = MAX_UNIT_PRICE_CENTS) =>
  z
    .number({ error: `${label} must be an amount of money` })
    .int(`${label} must be in whole cents (no fraction of a cent)`)
    .min(0, `${label} must not be negative`)
    .max(max, `${label} must be at most $${(max / 100).toLocaleString('en-US')}`);

/** A measure with at most two decimals between `min` and `max`. */
export const measureField = (label: string, min: number, max: number, unit: string) => {
  const withUnit = (value: number) => `${value.toLocaleString('en-US')}${unit ? ` ${unit}` : ''}`;
  return z
    .number({ error: `${label} must be a number` })
    .min(min, `${label} must be at least ${withUnit(min)}`)
    .max(max, `${label} must be at most ${withUnit(max)}`)
    .refine(hasAtMostTwoDecimals, `${label} takes at most two decimals`);
};

/** A rate in basis points (1/100 of a percent): 6.25% is 625. */
export const basisPointsField = (label: string, maxPercent: number) =>
  z
    .number({ error: `${label} must be a percentage` })
    .int(`${label} takes at most two decimals of a percent`)
    .min(0, `${label} must not be negative`)
    .max(maxPercent * 100, `${label} must be at most ${maxPercent}%`);

const L = rateCardLabels;

export const pipePriceSchema = z.strictObject({
  diameterIn: z
    .number({ error: `${L.diameterIn} must be a number` })
    .int(`${L.diameterIn} must be a whole number of inches`)
    .min(6, `${L.diameterIn} must be at least 6 in`)
    .max(96, `${L.diameterIn} must be at most 96 in`),
  material: z.enum(pipeMaterials, { error: `${L.material} must be corrugated metal, smooth plastic or concrete` }),
  perFootCents: centsField(L.perFootCents),
  endSectionEachCents: centsField(L.endSectionEachCents),
});
export type PipePrice = z.output<typeof pipePriceSchema>;

/** Which kinds of line carry sales tax (materials usually do, labour often does not: the admin says). */
export const taxableKindsSchema = z.strictObject(
  Object.fromEntries(
    quoteLineKinds
      .filter((k) => k !== 'other')
      .map((k) => [k, z.boolean({ error: `Taxable (${lineKindLabels[k]}) must be yes or no` })]),
  ) as Record<PricedLineKind, z.ZodBoolean>,
);

/** The prices of one rate card version. Money in integer cents, rates in basis points. */
export const rateCardPricesSchema = z
  .strictObject({
    excavationPerBankCyCents: centsField(L.excavationPerBankCyCents),
    fillPerCompactedCyCents: centsField(L.fillPerCompactedCyCents),
    haulPerLoadCents: centsField(L.haulPerLoadCents),
    pipes: z.array(pipePriceSchema, { error: `${L.pipes} must be a list` }).max(60, `${L.pipes}: at most 60 rows`),
    baseCourse: z.strictObject({
      basis: z.enum(baseCourseBases, { error: `${L.baseCourseBasis} must be per ton or per square foot` }),
      priceCents: centsField(L.baseCoursePriceCents),
      depthIn: measureField(L.baseCourseDepthIn, 1, 24, 'in'),
      tonsPerCy: measureField(L.baseCourseTonsPerCy, 0.5, 3, 'tons'),
    }),
    pavingPerSqFtCents: centsField(L.pavingPerSqFtCents).nullable(),
    mobilisationCents: centsField(L.mobilisationCents),
    trafficControlPerDayCents: centsField(L.trafficControlPerDayCents),
    trafficControlDays: z
      .number({ error: `${L.trafficControlDays} must be a number` })
      .int(`${L.trafficControlDays} must be a whole number of days`)
      .min(0, `${L.trafficControlDays} must not be negative`)
      .max(60, `${L.trafficControlDays} must be at most 60`),
    permitFeeCents: centsField(L.permitFeeCents),
    salesTaxBp: basisPointsField(L.salesTaxBp, 25),
    taxable: taxableKindsSchema,
    depositBp: basisPointsField(L.depositBp, 100),
  })
  .superRefine((prices, ctx) => {
    const seen = new Set<string>();
    prices.pipes.forEach((pipe, i) => {
      const key = `${pipe.diameterIn}-${pipe.material}`;
      if (seen.has(key))
        ctx.addIssue({
          code: 'custom',
          path: ['pipes', i, 'diameterIn'],
          message: `${L.diameterIn}: ${pipe.diameterIn} in ${pipeMaterialLabels[pipe.material].toLowerCase()} is listed twice`,
        });
      seen.add(key);
    });
  });
export type RateCardPrices = z.output<typeof rateCardPricesSchema>;

/** PUT /api/rate-cards/:id: the draft's prices and what changed. */
export const updateRateCardInputSchema = z.strictObject({
  prices: rateCardPricesSchema,
  changeNote: z.string().trim().max(1000, `${L.changeNote} must be at most 1,000 characters`).optional(),
});
export type UpdateRateCardInput = z.input<typeof updateRateCardInputSchema>;

/** POST /api/rate-cards: a new draft copied from a version (the current one unless named). */
export const createRateCardInputSchema = z.strictObject({
  fromVersionId: z.uuid('must be a valid rate card version id').optional(),
});

export interface RateCardView<When extends Moment = string> {
  id: string;
  version: number;
  status: 'draft' | 'published';
  prices: RateCardPrices;
  changeNote: string;
  createdAt: When;
  publishedAt: When | null;
  /** The published version new quotes price from. */
  current: boolean;
}

export interface RateCardsAnswer<When extends Moment = string> {
  versions: RateCardView<When>[];
  currentId: string | null;
}
export interface RateCardAnswer<When extends Moment = string> {
  rateCard: RateCardView<When>;
}
