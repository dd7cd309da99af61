import { eq } from 'drizzle-orm';
import type { RateCardPrices } from '@shared/contracts/rate-cards';
import type { DbOrTx } from '../../db/client';
import { rateCardVersions } from '../../db/schema';
import { emptyPrices } from '../../services/rate-cards/rate-cards.service';

/** The demo company's prices: invented for the demo, in whole cents. */
export const demoRateCardPrices: RateCardPrices = {
  excavationPerBankCyCents: 1850,
  fillPerCompactedCyCents: 3275,
  haulPerLoadCents: 14500,
  pipes: [
    { diameterIn: 15, material: 'corrugated-metal', perFootCents: 3400, endSectionEachCents: 18500 },
    { diameterIn: 18, material: 'corrugated-metal', perFootCents: 4150, endSectionEachCents: 22000 },
    { diameterIn: 24, material: 'corrugated-metal', perFootCents: 5600, endSectionEachCents: 29500 },
    { diameterIn: 15, material: 'plastic', perFootCents: 2900, endSectionEachCents: 16500 },
    { diameterIn: 18, material: 'plastic', perFootCents: 3650, endSectionEachCents: 19500 },
    { diameterIn: 18, material: 'concrete', perFootCents: 6200, endSectionEachCents: 34000 },
  ],
  baseCourse: { basis: 'ton', priceCents: 3890, depthIn: 6, tonsPerCy: 1.4 },
  pavingPerSqFtCents: 625,
  mobilisationCents: 65000,
  trafficControlPerDayCents: 42500,
  trafficControlDays: 1,
  permitFeeCents: 7500,
  salesTaxBp: 625,
  // Which lines are taxed: the same as a new company's card.
  taxable: emptyPrices.taxable,
  depositBp: 3000,
};

/** Publishes the demo rate card as version 1 once; returns the current version's row. */
export async function seedRateCard(db: DbOrTx) {
  const [existing] = await db.select().from(rateCardVersions).where(eq(rateCardVersions.version, 1));
  if (existing) return existing;
  const [row] = await db
    .insert(rateCardVersions)
    .values({
      version: 1,
      status: 'published',
      prices: demoRateCardPrices,
      changeNote: 'The demo company’s first prices',
      publishedAt: new Date(),
    })
    .returning();
  return row;
}
