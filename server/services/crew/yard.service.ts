import { eq } from 'drizzle-orm';
import { yardInputSchema, type YardInput } from '@shared/crew/crew-inputs';
import type { Yard } from '@shared/crew/crew-views';
import type { DbOrTx } from '../../db/client';
import { settings } from '../../db/schema';

const YARD_KEY = 'yard';

/** The stored yard, or null when the owner has not set one (or a stored value no longer reads as one). */
export async function loadYard(db: DbOrTx): Promise<Yard | null> {
  const [row] = await db.select({ value: settings.value }).from(settings).where(eq(settings.key, YARD_KEY));
  if (!row) return null;
  const parsed = yardInputSchema.safeParse(row.value);
  return parsed.success ? parsed.data : null;
}

export async function saveYard(db: DbOrTx, input: YardInput): Promise<Yard> {
  const value = { label: input.label, lat: input.lat, lng: input.lng };
  await db
    .insert(settings)
    .values({ key: YARD_KEY, value })
    .onConflictDoUpdate({ target: settings.key, set: { value, updatedAt: new Date() } });
  return value;
}
