import { createServer } from 'node:http';
import { close, defaultHost, listen, urlFor } from '../lib/listen.js';
import { createPaymentsApp } from './payments-api.js';
import { PaymentsStore, type Delivery } from './payments-store.js';
import { WebhookSender } from './webhook-sender.js';

export { testCards } from './checkout-pages.js';
export { signatureHeader } from './webhook-sender.js';

export interface PaymentsStandInOptions {
  /** This service's own folder (its objects survive a restart); omitted, it keeps them in memory only. */
  dir?: string;
  host?: string;
  port?: number;
  /** The API key the app must send, as the provider's secret key. */
  secretKey: string;
  /** The webhook endpoint's signing secret, shared with the app. */
  webhookSecret: string;
  /** The app's webhook endpoint; may be set later with setWebhookUrl. */
  webhookUrl?: string;
  /** Wait before the second delivery attempt (doubling after); 1 s unless told. */
  firstRetryMs?: number;
  /** Attempts per event before the stand-in gives up; 8 unless told. */
  maxAttempts?: number;
}

export interface PaymentsStandIn {
  /** What the SDK is given: `new Stripe(secretKey, { host, port, protocol })`. */
  host: string;
  port: number;
  protocol: 'http';
  url: string;
  secretKey: string;
  webhookSecret: string;
  setWebhookUrl(url: string): void;
  /** Off: events are recorded but never sent, as when a delivery is lost. */
  setWebhooksEnabled(enabled: boolean): void;
  /** Sends one recorded event again (a duplicate delivery). */
  resendEvent(eventId: string): Promise<void>;
  /** Every event recorded so far with its delivery, oldest first. */
  deliveries(): Delivery[];
  /** Waits until no delivery is under way. */
  settle(): Promise<void>;
  stop(): Promise<void>;
}

export async function startPaymentsStandIn(options: PaymentsStandInOptions): Promise<PaymentsStandIn> {
  const host = options.host ?? defaultHost;
  const store = new PaymentsStore(options.dir);
  const webhooks = new WebhookSender(store, {
    secret: options.webhookSecret,
    url: options.webhookUrl ?? null,
    firstRetryMs: options.firstRetryMs ?? 1000,
    maxAttempts: options.maxAttempts ?? 8,
  });
  let baseUrl = '';
  const server = createServer(
    createPaymentsApp({ secretKey: options.secretKey, store, webhooks, baseUrl: () => baseUrl }),
  );
  const port = await listen(server, options.port ?? 0, host);
  baseUrl = urlFor(host, port);
  return {
    host,
    port,
    protocol: 'http',
    url: baseUrl,
    secretKey: options.secretKey,
    webhookSecret: options.webhookSecret,
    setWebhookUrl: (url) => {
      webhooks.options.url = url;
    },
    setWebhooksEnabled: (enabled) => {
      webhooks.enabled = enabled;
    },
    resendEvent: (eventId) => webhooks.resend(eventId),
    deliveries: () => Object.values(store.state.deliveries),
    settle: () => webhooks.settle(),
    async stop() {
      await webhooks.stop();
      await close(server);
    },
  };
}
