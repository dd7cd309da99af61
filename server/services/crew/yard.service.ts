import { eq } from 'drizzle-orm';
import { yardInputSchema, type YardInput } from '@shared/crew/crew-inputs';
import type { Yard } from '@shared/crew/crew-views';
import type { Db, DbOrTx } from '../../db/client';
import type { SessionUser } from '../../lib/session-user';
import { recordAdminChange } from '../audit/audit.service';
import { settings } from '../../db/schema';

const YARD_KEY = 'yard';

/** The stored yard, or null when the owner has not set one (or a stored value no longer reads as one). */
export async function loadYard(db: DbOrTx): Promise<Yard | null> {
  const [row] = await db.select({ value: settings.value }).from(settings).where(eq(settings.key, YARD_KEY));
  if (!row) return null;
  const parsed = yardInputSchema.safeParse(row.value);
  return parsed.success ? parsed.data : null;
}

/** Sets the yard; an administrator's change (`actor`) goes in the administrators' log with it. */
export async function saveYard(db: Db, input: YardInput, actor?: SessionUser): Promise<Yard> {
  const value = { label: input.label, lat: input.lat, lng: input.lng };
  await db.transaction(async (tx) => {
    await tx
      .insert(settings)
      .values({ key: YARD_KEY, value })
      .onConflictDoUpdate({ target: settings.key, set: { value, updatedAt: new Date() } });
    if (actor)
      await recordAdminChange(tx, actor, {
        kind: 'yard-moved',
        summary: `Set the crew yard to ${value.label} (${value.lat.toFixed(5)}, ${value.lng.toFixed(5)}).`,
        detail: value,
      });
  });
  return value;
}
