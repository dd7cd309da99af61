import { sql } from 'drizzle-orm';
import type { DbOrTx } from '../../db/client';
import { referenceCounter } from '../../db/schema';

/** Human reference numbers, GP-2026-00042: gap-free per year, safe under concurrent drafts (one row lock). */
export async function nextReference(tx: DbOrTx, now = new Date()) {
  const year = now.getUTCFullYear();
  const [row] = await tx
    .insert(referenceCounter)
    .values({ year, last: 1 })
    .onConflictDoUpdate({ target: referenceCounter.year, set: { last: sql`${referenceCounter.last} + 1` } })
    .returning({ last: referenceCounter.last });
  return `GP-${year}-${String(row.last).padStart(5, '0')}`;
}
