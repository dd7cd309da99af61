import { eq } from 'drizzle-orm';
import { paymentWaitsSchema, type PaymentWaits } from '@shared/contracts/payments';
import type { DbOrTx } from '../../db/client';
import { settings } from '../../db/schema';

const WAITS_KEY = 'payment-waits';
const noWaits: PaymentWaits = { depositBeforePermit: false, balanceBeforeClose: false };

/** The company's setting; until the admin sets it, nothing waits for money. */
export async function loadPaymentWaits(db: DbOrTx): Promise<PaymentWaits> {
  const [row] = await db.select({ value: settings.value }).from(settings).where(eq(settings.key, WAITS_KEY));
  const parsed = paymentWaitsSchema.safeParse(row?.value);
  return parsed.success ? parsed.data : noWaits;
}

export async function savePaymentWaits(db: DbOrTx, value: PaymentWaits): Promise<PaymentWaits> {
  await db
    .insert(settings)
    .values({ key: WAITS_KEY, value })
    .onConflictDoUpdate({ target: settings.key, set: { value, updatedAt: new Date() } });
  return value;
}
