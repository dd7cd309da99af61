import { and, desc, eq } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import { quotes } from '../../db/schema';

/** What the payment side needs of the quote the owner accepted: all money in integer cents. */
export interface AcceptedQuote {
  quoteId: string;
  requestId: string;
  version: number;
  totalCents: number;
  /** The deposit: total x the rate card's deposit share, rounded half up to the cent (shared/money/money.ts). */
  depositCents: number;
  depositRateBp: number;
  /** What is left once the deposit is paid: total - deposit. */
  balanceCents: number;
  acceptedAt: Date;
  acceptedName: string;
  acceptedById: string | null;
}

/**
 * The request's accepted quote, or null when none is. Only one version of a request can be accepted: accepting
 * answers the newest sent version, and no revision can be sent once one is accepted. Pass a transaction to read it
 * with the rest of a change.
 */
export async function getAcceptedQuote(db: DbOrTx, requestId: string): Promise<AcceptedQuote | null> {
  const [row] = await db
    .select()
    .from(quotes)
    .where(and(eq(quotes.requestId, requestId), eq(quotes.status, 'accepted')))
    .orderBy(desc(quotes.version))
    .limit(1);
  if (!row || !row.acceptedAt) return null;
  return {
    quoteId: row.id,
    requestId: row.requestId,
    version: row.version,
    totalCents: row.totalCents,
    depositCents: row.depositCents,
    depositRateBp: row.depositRateBp,
    balanceCents: row.totalCents - row.depositCents,
    acceptedAt: row.acceptedAt,
    acceptedName: row.acceptedName ?? '',
    acceptedById: row.acceptedById,
  };
}
