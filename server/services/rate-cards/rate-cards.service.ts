import { and, desc, eq, max } from 'drizzle-orm';
import { rateCardPricesSchema, type RateCardPrices, type RateCardView } from '@shared/contracts/rate-cards';
import type { SessionUser } from '../../lib/session-user';
import type { Db, DbOrTx } from '../../db/client';
import { rateCardVersions } from '../../db/schema';
import { conflict, notFound } from '../../lib/errors';

export type RateCardRow = typeof rateCardVersions.$inferSelect;

/** A first card for a company that has none: every price 0 until the admin types its own. */
export const emptyPrices: RateCardPrices = {
  excavationPerBankCyCents: 0,
  fillPerCompactedCyCents: 0,
  haulPerLoadCents: 0,
  pipes: [],
  baseCourse: { basis: 'ton', priceCents: 0, depthIn: 6, tonsPerCy: 1.4 },
  pavingPerSqFtCents: null,
  mobilisationCents: 0,
  trafficControlPerDayCents: 0,
  trafficControlDays: 1,
  permitFeeCents: 0,
  salesTaxBp: 0,
  taxable: {
    excavation: false,
    fill: true,
    haul: false,
    pipe: true,
    'end-sections': true,
    'base-course': true,
    paving: true,
    mobilisation: false,
    'traffic-control': false,
    'permit-fee': false,
  },
  depositBp: 3000,
};

export const pricesOf = (row: Pick<RateCardRow, 'prices'>): RateCardPrices => rateCardPricesSchema.parse(row.prices);

export function rateCardView(row: RateCardRow, currentId: string | null): RateCardView<Date> {
  return {
    id: row.id,
    version: row.version,
    status: row.status,
    prices: pricesOf(row),
    changeNote: row.changeNote,
    createdAt: row.createdAt,
    publishedAt: row.publishedAt,
    current: row.id === currentId,
  };
}

/** The card new quotes price from: the highest published version, or null before any is published. */
export async function currentRateCard(db: DbOrTx): Promise<RateCardRow | null> {
  const [row] = await db
    .select()
    .from(rateCardVersions)
    .where(eq(rateCardVersions.status, 'published'))
    .orderBy(desc(rateCardVersions.version))
    .limit(1);
  return row ?? null;
}

export async function listRateCards(db: DbOrTx) {
  const rows = await db.select().from(rateCardVersions).orderBy(desc(rateCardVersions.version));
  const currentId = rows.find((r) => r.status === 'published')?.id ?? null;
  return { versions: rows.map((r) => rateCardView(r, currentId)), currentId };
}

export async function loadRateCard(db: DbOrTx, id: string, opts: { forUpdate?: boolean } = {}) {
  const query = db.select().from(rateCardVersions).where(eq(rateCardVersions.id, id));
  const [row] = opts.forUpdate ? await query.for('update') : await query;
  if (!row) throw notFound('Rate card version');
  return row;
}

/** A new draft, copied from a version the admin names (the current one unless told otherwise). One draft at a time. */
export async function createRateCardDraft(db: Db, actor: SessionUser, fromVersionId?: string) {
  return db.transaction(async (tx) => {
    // Serialises drafts: two admins starting one at once get one draft and one 409.
    await tx.execute("select pg_advisory_xact_lock(hashtext('rate_card_versions'))");
    const [openDraft] = await tx
      .select({ version: rateCardVersions.version })
      .from(rateCardVersions)
      .where(eq(rateCardVersions.status, 'draft'));
    if (openDraft) throw conflict(`Rate card version ${openDraft.version} is still a draft: edit or publish it first.`);
    const source = fromVersionId ? await loadRateCard(tx, fromVersionId) : await currentRateCard(tx);
    const [{ last }] = await tx.select({ last: max(rateCardVersions.version) }).from(rateCardVersions);
    const [draft] = await tx
      .insert(rateCardVersions)
      .values({
        version: (last ?? 0) + 1,
        status: 'draft',
        prices: source ? pricesOf(source) : emptyPrices,
        changeNote: source ? `Copied from version ${source.version}` : 'A first rate card',
        createdById: actor.id,
      })
      .returning();
    return draft;
  });
}

export async function updateRateCardDraft(db: Db, id: string, input: { prices: RateCardPrices; changeNote?: string }) {
  return db.transaction(async (tx) => {
    const row = await loadRateCard(tx, id, { forUpdate: true });
    if (row.status !== 'draft')
      throw conflict(`Rate card version ${row.version} is published and can no longer be edited; start a new version.`);
    const [saved] = await tx
      .update(rateCardVersions)
      .set({ prices: input.prices, ...(input.changeNote === undefined ? {} : { changeNote: input.changeNote }) })
      .where(eq(rateCardVersions.id, id))
      .returning();
    return saved;
  });
}

/** Publishing freezes the draft; being the highest published version, it becomes the card new quotes use. */
export async function publishRateCard(db: Db, actor: SessionUser, id: string) {
  return db.transaction(async (tx) => {
    const row = await loadRateCard(tx, id, { forUpdate: true });
    if (row.status !== 'draft') throw conflict(`Rate card version ${row.version} is already published.`);
    const [saved] = await tx
      .update(rateCardVersions)
      .set({ status: 'published', publishedAt: new Date(), publishedById: actor.id })
      .where(and(eq(rateCardVersions.id, id), eq(rateCardVersions.status, 'draft')))
      .returning();
    return saved;
  });
}
