import express, { type NextFunction, type Request, type Response } from 'express';
import { checkoutPages } from './checkout-pages.js';
import {
  newId,
  unixNow,
  type CheckoutSession,
  type PaymentIntent,
  type PaymentsStore,
  type Refund,
} from './payments-store.js';
import type { WebhookSender } from './webhook-sender.js';

export interface PaymentsAppOptions {
  secretKey: string;
  store: PaymentsStore;
  webhooks: WebhookSender;
  /** Our public base URL, known once we listen; the session's `url` points at its page here. */
  baseUrl: () => string;
}

/** An answer in the provider's error shape, which the SDK turns into its typed errors. */
class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly type: string,
    message: string,
    readonly param?: string,
    readonly code?: string,
  ) {
    super(message);
  }
}

const missing = (what: string, id: string) =>
  new ApiError(404, 'invalid_request_error', `No such ${what}: '${id}'`, 'id', 'resource_missing');
const invalid = (message: string, param?: string) => new ApiError(400, 'invalid_request_error', message, param);

type Form = Record<string, unknown>;
const text = (value: unknown) => (typeof value === 'string' ? value : undefined);
const record = (value: unknown): Form => (value && typeof value === 'object' ? (value as Form) : {});

function metadataOf(value: unknown, param: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, v] of Object.entries(record(value))) {
    if (typeof v !== 'string') throw invalid(`Invalid metadata value for ${key}.`, `${param}[${key}]`);
    out[key] = v;
  }
  return out;
}

function integerParam(value: unknown, param: string, min: number): number {
  const s = text(value);
  if (s === undefined || !/^\d+$/.test(s) || Number(s) < min || !Number.isSafeInteger(Number(s))) {
    throw invalid(`Invalid integer: ${String(value)}`, param);
  }
  return Number(s);
}

/** The public face of the session: the page's own bookkeeping is left out. */
export function sessionView(session: CheckoutSession, store: PaymentsStore, expand: string[] = []) {
  // eslint-disable-next-line @typescript-eslint/no-unused-vars
  const { line_items_shown, payment_intent_metadata, ...shown } = session;
  const intent = session.payment_intent ? store.state.paymentIntents[session.payment_intent] : undefined;
  return {
    ...shown,
    payment_intent: expand.includes('payment_intent') && intent ? intentView(intent) : session.payment_intent,
  };
}

function intentView(intent: PaymentIntent) {
  // eslint-disable-next-line @typescript-eslint/no-unused-vars
  const { amount_refunded, ...shown } = intent;
  return shown;
}

/** The API calls the SDK makes for checkout sessions, payment intents and refunds, under /v1. */
export function createPaymentsApp(options: PaymentsAppOptions) {
  const { store, webhooks } = options;
  const app = express();
  app.disable('x-powered-by');
  const form = express.urlencoded({ extended: true, limit: '64kb' });

  app.use('/v1', (req, _res, next) => {
    const key = /^Bearer (.+)$/i.exec(req.headers.authorization ?? '')?.[1];
    if (key !== options.secretKey) {
      next(new ApiError(401, 'invalid_request_error', `Invalid API Key provided: ${maskKey(key)}`));
      return;
    }
    next();
  });
  app.use('/v1', form, replayIdempotent(store));

  const expireIfDue = (session: CheckoutSession) => {
    if (session.status === 'open' && session.expires_at <= unixNow()) expire(session);
  };
  const expire = (session: CheckoutSession) => {
    session.status = 'expired';
    session.url = null;
    store.save();
    webhooks.emit('checkout.session.expired', sessionView(session, store));
  };
  const findSession = (id: string) => {
    const session = store.state.sessions[id];
    if (!session) throw missing('checkout.session', id);
    expireIfDue(session);
    return session;
  };
  // The SDK sends `expand[0]=payment_intent`; Express's simple query parser keeps that key as it is.
  const expandOf = (req: Request) =>
    Object.entries(req.query)
      .filter(([key]) => key === 'expand' || key.startsWith('expand['))
      .flatMap(([, value]) => (Array.isArray(value) ? value : [value]))
      .map(String);

  app.post('/v1/checkout/sessions', (req, res) => {
    const body = record(req.body);
    if (body.mode !== 'payment') throw invalid('Only mode "payment" is supported here.', 'mode');
    const successUrl = text(body.success_url);
    if (!successUrl || !URL.canParse(successUrl)) throw invalid('Not a valid URL', 'success_url');
    const cancelUrl = text(body.cancel_url);
    if (cancelUrl !== undefined && !URL.canParse(cancelUrl)) throw invalid('Not a valid URL', 'cancel_url');
    const rawItems = body.line_items;
    const items = Array.isArray(rawItems) ? rawItems : Object.values(record(rawItems));
    if (items.length === 0) throw invalid('line_items is required in payment mode.', 'line_items');
    let currency = '';
    const shown = items.map((raw, i) => {
      const item = record(raw);
      const price = record(item.price_data);
      const c = text(price.currency)?.toLowerCase();
      if (!c || !/^[a-z]{3}$/.test(c)) throw invalid('Invalid currency', `line_items[${i}][price_data][currency]`);
      if (currency && c !== currency) throw invalid('All line items must share one currency.', 'line_items');
      currency = c;
      const name = text(record(price.product_data).name);
      if (!name) throw invalid('Missing required param', `line_items[${i}][price_data][product_data][name]`);
      const amount = integerParam(price.unit_amount, `line_items[${i}][price_data][unit_amount]`, 0);
      const quantity = integerParam(item.quantity ?? '1', `line_items[${i}][quantity]`, 1);
      return { name, amount, quantity };
    });
    const total = shown.reduce((sum, line) => sum + line.amount * line.quantity, 0);
    if (total < 50) throw invalid('The Checkout Session total must be at least 50 cents.', 'line_items');
    const now = unixNow();
    const expiresAt = body.expires_at === undefined ? now + 24 * 3600 : integerParam(body.expires_at, 'expires_at', 0);
    if (expiresAt < now + 30 * 60 - 5 || expiresAt > now + 24 * 3600 + 5) {
      throw invalid('expires_at must be between 30 minutes and 24 hours from now.', 'expires_at');
    }
    const id = newId('cs');
    const session: CheckoutSession = {
      id,
      object: 'checkout.session',
      amount_subtotal: total,
      amount_total: total,
      currency,
      client_reference_id: text(body.client_reference_id) ?? null,
      customer_email: text(body.customer_email) ?? null,
      created: now,
      expires_at: expiresAt,
      livemode: false,
      metadata: metadataOf(body.metadata, 'metadata'),
      mode: 'payment',
      payment_intent: null,
      payment_status: 'unpaid',
      status: 'open',
      success_url: successUrl,
      cancel_url: cancelUrl ?? null,
      url: `${options.baseUrl()}/pay/${id}`,
      line_items_shown: shown,
      payment_intent_metadata: metadataOf(record(body.payment_intent_data).metadata, 'payment_intent_data[metadata]'),
    };
    store.state.sessions[id] = session;
    store.save();
    res.json(sessionView(session, store));
  });

  app.get('/v1/checkout/sessions/:id', (req, res) => {
    res.json(sessionView(findSession(req.params.id), store, expandOf(req)));
  });

  app.post('/v1/checkout/sessions/:id/expire', (req, res) => {
    const session = findSession(req.params.id);
    if (session.status !== 'open') {
      throw invalid(
        `Only Checkout Sessions with a status in ["open"] can be expired. This one is "${session.status}".`,
      );
    }
    expire(session);
    res.json(sessionView(session, store));
  });

  app.get('/v1/payment_intents/:id', (req, res) => {
    const intent = store.state.paymentIntents[req.params.id];
    if (!intent) throw missing('payment_intent', req.params.id);
    res.json(intentView(intent));
  });

  app.post('/v1/refunds', (req, res) => {
    const body = record(req.body);
    const intentId = text(body.payment_intent);
    if (!intentId) throw invalid('Missing required param: payment_intent.', 'payment_intent');
    const intent = store.state.paymentIntents[intentId];
    if (!intent) throw missing('payment_intent', intentId);
    const left = intent.amount_received - intent.amount_refunded;
    if (left <= 0) {
      throw new ApiError(
        400,
        'invalid_request_error',
        `Charge ${intent.latest_charge} has already been refunded.`,
        undefined,
        'charge_already_refunded',
      );
    }
    const amount = body.amount === undefined ? left : integerParam(body.amount, 'amount', 1);
    if (amount > left) {
      throw invalid(`Refund amount (${amount}) is greater than unrefunded amount on charge (${left})`, 'amount');
    }
    const refund: Refund = {
      id: newId('re'),
      object: 'refund',
      amount,
      charge: intent.latest_charge,
      created: unixNow(),
      currency: intent.currency,
      metadata: metadataOf(body.metadata, 'metadata'),
      payment_intent: intent.id,
      reason: text(body.reason) ?? null,
      status: 'succeeded',
    };
    intent.amount_refunded += amount;
    store.state.refunds[refund.id] = refund;
    store.save();
    webhooks.emit('refund.created', refund);
    res.json(refund);
  });

  app.use('/v1', (req, _res, next) => next(invalid(`Unrecognized request URL (${req.method}: ${req.path}).`)));

  /** The outcome of the page: the session is paid, its payment recorded, and the app told by webhook. */
  const pay = (session: CheckoutSession) => {
    const intent: PaymentIntent = {
      id: newId('pi'),
      object: 'payment_intent',
      amount: session.amount_total,
      amount_received: session.amount_total,
      currency: session.currency,
      created: unixNow(),
      latest_charge: newId('ch'),
      livemode: false,
      metadata: session.payment_intent_metadata,
      status: 'succeeded',
      amount_refunded: 0,
    };
    store.state.paymentIntents[intent.id] = intent;
    session.payment_intent = intent.id;
    session.payment_status = 'paid';
    session.status = 'complete';
    session.url = null;
    store.save();
    webhooks.emit('checkout.session.completed', sessionView(session, store));
  };
  app.use(checkoutPages({ store, findSession, pay }));

  app.use((error: unknown, _req: Request, res: Response, next: NextFunction) => {
    if (res.headersSent) return next(error);
    if (error instanceof ApiError) {
      res.status(error.status).json({
        error: { type: error.type, message: error.message, param: error.param, code: error.code },
      });
      return;
    }
    const status = (error as { status?: number }).status ?? 500;
    res.status(status).json({ error: { type: 'api_error', message: (error as Error).message } });
  });
  return app;
}

function maskKey(key: string | undefined) {
  if (!key) return '(none)';
  return `${key.slice(0, 8)}${'*'.repeat(Math.max(0, key.length - 12))}${key.slice(-4)}`;
}

/**
 * The provider's Idempotency-Key: a POST repeated with the same key and the same parameters gets the first answer
 * again (and creates nothing); the same key with other parameters is refused.
 */
function replayIdempotent(store: PaymentsStore) {
  return (req: Request, res: Response, next: NextFunction) => {
    const key = req.headers['idempotency-key'];
    if (req.method !== 'POST' || typeof key !== 'string') return next();
    const bodyKey = `${req.path} ${JSON.stringify(req.body ?? {})}`;
    const remembered = store.state.idempotency[key];
    if (remembered) {
      if (remembered.bodyKey !== bodyKey) {
        next(
          new ApiError(
            400,
            'idempotency_error',
            `Keys for idempotent requests can only be used with the same parameters they were first used with. Try using a key other than '${key}' if you meant to execute a different request.`,
          ),
        );
        return;
      }
      res.setHeader('Idempotent-Replayed', 'true');
      res.status(remembered.status).json(remembered.body);
      return;
    }
    const json = res.json.bind(res);
    res.json = (body: unknown) => {
      if (res.statusCode < 500) {
        store.state.idempotency[key] = { bodyKey, status: res.statusCode, body };
        store.save();
      }
      return json(body);
    };
    next();
  };
}
