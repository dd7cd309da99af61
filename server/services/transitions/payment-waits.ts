import { eq } from 'drizzle-orm';
import type { SessionUser } from '../../lib/session-user';
import type { DbOrTx } from '../../db/client';
import { requests } from '../../db/schema';
import { conflict, type AppError } from '../../lib/errors';
import { loadMoneyState, waitsFor } from '../payments/money-state';
import { loadPaymentWaits } from '../payments/payment-waits.service';

type WaitingAction = 'file-permit' | 'close';

/** What the step waits for under the company's setting, in plain words, or null when it may go ahead. */
export async function paymentWait(db: DbOrTx, requestId: string, action: WaitingAction): Promise<string | null> {
  const waits = await loadPaymentWaits(db);
  if (!waits.depositBeforePermit && !waits.balanceBeforeClose) return null;
  const found = waitsFor(await loadMoneyState(db, requestId), waits).find((w) => w.action === action);
  return found?.text ?? null;
}

/** Inside the change: refuse the step while the money it waits for is not in. */
export async function requirePaid(db: DbOrTx, requestId: string, action: WaitingAction): Promise<void> {
  const text = await paymentWait(db, requestId, action);
  if (text) throw conflict(text);
}

/**
 * A refused filing or closing that came from the wait says so in plain words, whatever refused it first (a stale
 * version, a second click): the money is what the office must see to. Only when the request is still where the
 * step starts, so a request that moved on is explained by its new status instead.
 */
export function explainPaymentWait(action: WaitingAction, from: string) {
  return async (db: DbOrTx, requestId: string, actor: SessionUser): Promise<AppError | null> => {
    if (actor.role === 'applicant' || actor.role === 'crew') return null;
    const [row] = await db.select({ status: requests.status }).from(requests).where(eq(requests.id, requestId));
    if (!row || row.status !== from) return null;
    const text = await paymentWait(db, requestId, action);
    return text ? conflict(text) : null;
  };
}
