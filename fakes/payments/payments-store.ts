import { randomBytes } from 'node:crypto';
import { mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

/** The provider's objects, in the shapes its API answers with (only the fields the app and the SDK read). */
export interface CheckoutSession {
  id: string;
  object: 'checkout.session';
  amount_subtotal: number;
  amount_total: number;
  currency: string;
  client_reference_id: string | null;
  customer_email: string | null;
  created: number;
  expires_at: number;
  livemode: false;
  metadata: Record<string, string>;
  mode: 'payment';
  payment_intent: string | null;
  payment_status: 'unpaid' | 'paid';
  status: 'open' | 'complete' | 'expired';
  success_url: string;
  cancel_url: string | null;
  url: string | null;
  /** What the page shows for each line; kept for the page, not part of the answer. */
  line_items_shown: { name: string; amount: number; quantity: number }[];
  payment_intent_metadata: Record<string, string>;
}

export interface PaymentIntent {
  id: string;
  object: 'payment_intent';
  amount: number;
  amount_received: number;
  currency: string;
  created: number;
  latest_charge: string;
  livemode: false;
  metadata: Record<string, string>;
  status: 'succeeded';
  /** Refunded so far, in the smallest unit; the stand-in's own bookkeeping. */
  amount_refunded: number;
}

export interface Refund {
  id: string;
  object: 'refund';
  amount: number;
  charge: string;
  created: number;
  currency: string;
  metadata: Record<string, string>;
  payment_intent: string;
  reason: string | null;
  status: 'succeeded';
}

export interface ProviderEvent {
  id: string;
  object: 'event';
  api_version: string;
  created: number;
  data: { object: unknown };
  livemode: false;
  pending_webhooks: number;
  request: { id: null; idempotency_key: null };
  type: string;
}

/** One webhook delivery record: what the stand-in tried and what the app answered. */
export interface Delivery {
  eventId: string;
  type: string;
  attempts: number;
  lastStatus: number | null;
  lastError: string | null;
  delivered: boolean;
}

interface Remembered {
  bodyKey: string;
  status: number;
  body: unknown;
}

interface State {
  sessions: Record<string, CheckoutSession>;
  paymentIntents: Record<string, PaymentIntent>;
  refunds: Record<string, Refund>;
  events: Record<string, ProviderEvent>;
  deliveries: Record<string, Delivery>;
  idempotency: Record<string, Remembered>;
}

export const newId = (prefix: string) => `${prefix}_test_${randomBytes(12).toString('hex')}`;
export const unixNow = () => Math.floor(Date.now() / 1000);

/** Everything the stand-in knows, in memory and (with a folder) in one JSON file so `npm start` keeps it. */
export class PaymentsStore {
  state: State = { sessions: {}, paymentIntents: {}, refunds: {}, events: {}, deliveries: {}, idempotency: {} };
  private readonly file: string | null;

  constructor(dir: string | undefined) {
    this.file = dir ? join(dir, 'state.json') : null;
    if (dir) mkdirSync(dir, { recursive: true });
    if (this.file) {
      try {
        this.state = { ...this.state, ...(JSON.parse(readFileSync(this.file, 'utf8')) as Partial<State>) };
      } catch {
        // No file yet (or an unreadable one): start empty.
      }
    }
  }

  save(): void {
    if (!this.file) return;
    const temp = `${this.file}.tmp`;
    writeFileSync(temp, JSON.stringify(this.state));
    renameSync(temp, this.file);
  }
}
