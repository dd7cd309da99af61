import { rateCardVersions, quotes } from '../../server/db/schema';
import type { DbOrTx } from '../../server/db/client';
import { emptyPrices } from '../../server/services/rate-cards/rate-cards.service';
import { createGradeCheck } from './grade-checks';

/**
 * A quote sent to the owner (status `sent`), priced from a published rate card, with the totals given in cents:
 * the owner's acceptance and the payments are what the tests then drive.
 */
export async function createSentQuote(
  db: DbOrTx,
  opts: { requestId: string; createdById: string; totalCents: number; depositCents: number; gradeCheckId?: string },
) {
  // Priced from the given check, or from a stand-in check made (and attached) here.
  const checkId =
    opts.gradeCheckId ?? (await createGradeCheck(db, { requestId: opts.requestId, createdById: opts.createdById })).id;
  const [card] = await db
    .insert(rateCardVersions)
    .values({
      // Below every real version, so it never becomes the current card other tests price from.
      version: -1 - Math.floor(Math.random() * 1e9),
      status: 'published',
      prices: emptyPrices,
      publishedAt: new Date(),
    })
    .returning();
  const [quote] = await db
    .insert(quotes)
    .values({
      requestId: opts.requestId,
      version: 1,
      status: 'sent',
      gradeCheckId: checkId,
      rateCardVersionId: card.id,
      lines: [],
      subtotalCents: opts.totalCents,
      taxCents: 0,
      totalCents: opts.totalCents,
      taxRateBp: 0,
      depositRateBp: Math.round((opts.depositCents / opts.totalCents) * 10_000),
      depositCents: opts.depositCents,
      validUntil: '2099-01-01',
      createdById: opts.createdById,
      sentAt: new Date(),
      sentById: opts.createdById,
    })
    .returning();
  return quote;
}
