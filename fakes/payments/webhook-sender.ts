import { createHmac } from 'node:crypto';
import { newId, unixNow, type PaymentsStore, type ProviderEvent } from './payments-store.js';

export const apiVersion = '2025-01-01.stand-in';

export interface WebhookOptions {
  secret: string;
  /** Where events go; unknown until the app listens, so it may be set later. */
  url: string | null;
  /** Delay before the second try; each further try waits twice as long. */
  firstRetryMs: number;
  maxAttempts: number;
}

/** The provider's signature: HMAC-SHA256 of `timestamp.payload` with the endpoint's secret, sent as `t=…,v1=…`. */
export function signatureHeader(payload: string, secret: string, timestamp = unixNow()): string {
  const signature = createHmac('sha256', secret).update(`${timestamp}.${payload}`, 'utf8').digest('hex');
  return `t=${timestamp},v1=${signature}`;
}

/** Records events and delivers them to the app, signed, retrying with a doubling delay until it answers 2xx. */
export class WebhookSender {
  /** Off: events are recorded but not sent, as when a delivery is lost on the way. */
  enabled = true;
  private readonly timers = new Set<NodeJS.Timeout>();
  private readonly inFlight = new Set<Promise<void>>();
  private stopped = false;

  constructor(
    private readonly store: PaymentsStore,
    readonly options: WebhookOptions,
  ) {}

  emit(type: string, object: unknown): ProviderEvent {
    const event: ProviderEvent = {
      id: newId('evt'),
      object: 'event',
      api_version: apiVersion,
      created: unixNow(),
      data: { object },
      livemode: false,
      pending_webhooks: 1,
      request: { id: null, idempotency_key: null },
      type,
    };
    this.store.state.events[event.id] = event;
    this.store.state.deliveries[event.id] = {
      eventId: event.id,
      type,
      attempts: 0,
      lastStatus: null,
      lastError: null,
      delivered: false,
    };
    this.store.save();
    if (this.enabled && !this.stopped) void this.track(this.attempt(event.id, 1, true));
    return event;
  }

  /** Sends an event again, as the provider does when it is unsure the first delivery arrived. */
  resend(eventId: string): Promise<void> {
    if (!this.store.state.events[eventId]) return Promise.reject(new Error(`No event ${eventId}`));
    return this.track(this.attempt(eventId, 1, false));
  }

  private schedule(eventId: string, delayMs: number, attempt: number) {
    if (this.stopped) return;
    const timer = setTimeout(() => {
      this.timers.delete(timer);
      void this.track(this.attempt(eventId, attempt, true));
    }, delayMs);
    this.timers.add(timer);
  }

  private track(work: Promise<void>): Promise<void> {
    this.inFlight.add(work);
    return work.finally(() => this.inFlight.delete(work));
  }

  private async attempt(eventId: string, attempt: number, retry: boolean): Promise<void> {
    const event = this.store.state.events[eventId];
    const delivery = this.store.state.deliveries[eventId];
    if (!event || !delivery || !this.options.url) return;
    const payload = JSON.stringify(event, null, 2);
    delivery.attempts += 1;
    try {
      const response = await fetch(this.options.url, {
        method: 'POST',
        headers: {
          'content-type': 'application/json; charset=utf-8',
          'stripe-signature': signatureHeader(payload, this.options.secret),
          'user-agent': 'Gradepass-payments-stand-in/1.0',
        },
        body: payload,
        signal: AbortSignal.timeout(10_000),
      });
      await response.arrayBuffer();
      delivery.lastStatus = response.status;
      delivery.lastError = response.ok ? null : `answered ${response.status}`;
      if (response.ok) delivery.delivered = true;
    } catch (error) {
      delivery.lastStatus = null;
      delivery.lastError = error instanceof Error ? error.message : String(error);
    }
    this.store.save();
    if (!delivery.delivered && retry && attempt < this.options.maxAttempts) {
      this.schedule(eventId, this.options.firstRetryMs * 2 ** (attempt - 1), attempt + 1);
    }
  }

  /** Waits for every send under way (tests use it before reading what the app recorded). */
  async settle(): Promise<void> {
    while (this.inFlight.size > 0) await Promise.allSettled([...this.inFlight]);
  }

  get pendingRetries(): number {
    return this.timers.size;
  }

  async stop(): Promise<void> {
    this.stopped = true;
    for (const timer of this.timers) clearTimeout(timer);
    this.timers.clear();
    await Promise.allSettled([...this.inFlight]);
  }
}
