import { sql } from 'drizzle-orm';
import { Router, type Request, type RequestHandler } from 'express';
import { LRUCache } from 'lru-cache';
import { RateLimiterDrizzle, RateLimiterRes } from 'rate-limiter-flexible';
import type { AppContext } from '../config/context';
import type { Db } from '../db/client';
import { rateLimits } from '../db/schema';
import { AppError } from '../lib/errors';
import { addressKey } from './client-address';

const at = (name: 'key' | 'points' | 'now' | 'expire') => sql.placeholder(name);

/**
 * The statement that spends points, as RateLimiterDrizzle writes it (start a new window once the old one has
 * expired, otherwise add to it), prepared once: the API ceiling runs it on every request, and building the same
 * statement anew each time was a visible part of a request's cost.
 */
function countStatement(db: Db) {
  const expired = sql`${rateLimits.expire} <= ${at('now')}::timestamptz`;
  return db
    .insert(rateLimits)
    .values({ key: at('key'), points: sql`${at('points')}::integer`, expire: sql`${at('expire')}::timestamptz` })
    .onConflictDoUpdate({
      target: rateLimits.key,
      set: {
        points: sql`case when ${expired} then ${at('points')}::integer else ${rateLimits.points} + ${at('points')}::integer end`,
        expire: sql`case when ${expired} then ${at('expire')}::timestamptz else ${rateLimits.expire} end`,
      },
    })
    .returning()
    .prepare('rate_limit_count');
}

/** RateLimiterDrizzle with its everyday write (spending points) through the prepared statement above. */
class Counter extends RateLimiterDrizzle {
  readonly #count: ReturnType<typeof countStatement>;

  constructor(options: ConstructorParameters<typeof RateLimiterDrizzle>[0] & { storeClient: Db }) {
    super(options);
    this.#count = countStatement(options.storeClient);
  }

  // The store's own upsert (rate-limiter-flexible 11.4.0, pinned): (key, points, msDuration, forceExpire).
  _upsert(key: string, points: number, msDuration: number, forceExpire = false, ...rest: unknown[]) {
    if (forceExpire)
      return (RateLimiterDrizzle.prototype as unknown as Upsert)._upsert.call(
        this,
        key,
        points,
        msDuration,
        forceExpire,
        ...rest,
      );
    const now = new Date();
    const expire = msDuration > 0 ? new Date(now.getTime() + msDuration) : null;
    return this.#count
      .execute({ key, points, now: now.toISOString(), expire: expire?.toISOString() ?? null })
      .then(([row]) => row);
  }
}
type Upsert = { _upsert: (...args: unknown[]) => Promise<unknown> };

/** Something a request spends one point from, refusing with RateLimiterRes once none are left. */
interface Spend {
  consume(key: string): Promise<unknown>;
}

/**
 * How many points of a ceiling one process takes from the shared count at a time: a twentieth. Processes never let
 * more through than the ceiling; one may refuse a person up to a block early while other processes still hold
 * unspent points of that person's minute.
 */
export const leaseSize = (points: number) => Math.max(1, Math.floor(points / 20));

/**
 * A per-request ceiling that writes the shared count once per block of points instead of once per request. The
 * process takes a block from PostgreSQL (the same count, window and statement as any other limit), spends it here
 * one request at a time until it runs out or the window ends, then takes the next. Requests arriving together wait
 * for one claim rather than each making their own. A claim that finds fewer points left than a block holds only
 * what was left; one that finds none refuses, with the time until the shared window ends.
 */
class LeasedCeiling implements Spend {
  readonly #held = new LRUCache<string, { left: number }>({ max: 10_000, ttl: 60_000 });
  readonly #claims = new Map<string, Promise<void>>();
  readonly #block: number;

  constructor(
    private readonly counter: Counter,
    private readonly points: number,
  ) {
    this.#block = leaseSize(points);
  }

  async consume(key: string) {
    for (;;) {
      const held = this.#held.get(key);
      if (held && held.left > 0) {
        held.left--;
        return;
      }
      let claim = this.#claims.get(key);
      if (!claim) {
        claim = this.#claim(key).finally(() => this.#claims.delete(key));
        this.#claims.set(key, claim);
      }
      await claim;
    }
  }

  async #claim(key: string) {
    let granted: number;
    let result: RateLimiterRes;
    try {
      result = await this.counter.consume(key, this.#block);
      granted = this.#block;
    } catch (error) {
      if (!(error instanceof RateLimiterRes)) throw error;
      // The count went past the ceiling with this claim: what was left before it is all this process may use.
      granted = Math.max(0, this.points - (error.consumedPoints - this.#block));
      if (granted === 0) throw error;
      result = error;
    }
    // Held until the shared window ends, never longer: the next window is claimed afresh.
    if (result.msBeforeNext > 0) this.#held.set(key, { left: granted }, { ttl: result.msBeforeNext });
  }
}

/** Which counters a request spends a point from. */
type Counts = (req: Request) => [Spend, string][];

const HOUR = 3600;

function waitInWords(seconds: number): string {
  return seconds < 90 ? `${Math.max(seconds, 1)} seconds` : `${Math.ceil(seconds / 60)} minutes`;
}

/** Answers 429 with Retry-After and a plain sentence: JSON for the API, text for a page the browser opened. */
function limited(counts: Counts, tooMany: string): RequestHandler {
  return async (req, res, next) => {
    try {
      for (const [counter, key] of counts(req)) await counter.consume(key);
      next();
    } catch (error) {
      if (!(error instanceof RateLimiterRes)) return next(error);
      const seconds = Math.ceil(error.msBeforeNext / 1000);
      res.setHeader('Retry-After', String(seconds));
      const message = `${tooMany} Please wait ${waitInWords(seconds)} and try again.`;
      if (!req.originalUrl.startsWith('/api')) return void res.status(429).type('text/plain').send(message);
      next(new AppError(429, 'rate_limited', message));
    }
  };
}

/**
 * Every rate limit in one list, counted in PostgreSQL so that all instances share the counts. Mounted after the
 * session (to know who is signed in) and before the routes. Limits are per signed-in person, and per address
 * (RATE_LIMIT_ADDRESS_FACTOR times as many, since an office or a household shares one).
 */
export function rateLimitRouter({ env, db }: Pick<AppContext, 'env' | 'db'>) {
  let first = true;
  const counter = (keyPrefix: string, points: number, duration: number) => {
    // One limiter per process is enough to clear the shared table of expired counts.
    const limiter = new Counter({
      storeClient: db,
      schema: rateLimits,
      keyPrefix,
      points,
      duration,
      clearExpiredByTimeout: first,
    });
    first = false;
    return limiter;
  };
  const factor = env.RATE_LIMIT_ADDRESS_FACTOR;
  const personAndAddress = (name: string, perPerson: number, seconds: number): Counts => {
    const person = counter(`${name}-person`, perPerson, seconds);
    const address = counter(`${name}-address`, perPerson * factor, seconds);
    return (req) => [...(req.user ? [[person, req.user.id] as [Spend, string]] : []), [address, addressKey(req.ip)]];
  };

  // The ceiling on all API use spends one point per request, the person's when signed in, otherwise the address's,
  // from blocks this process takes from the shared count (a write per block, not per request).
  const ceilingOf = (prefix: string, points: number) => new LeasedCeiling(counter(prefix, points, 60), points);
  const apiPerson = ceilingOf('api-person', env.RATE_LIMIT_API_PER_MINUTE);
  const apiAddress = ceilingOf('api-address', env.RATE_LIMIT_API_PER_MINUTE * factor);
  const api: Counts = (req) => [req.user ? [apiPerson, req.user.id] : [apiAddress, addressKey(req.ip)]];
  const signInAddress = counter('sign-in-address', env.RATE_LIMIT_SIGN_INS_PER_HOUR, HOUR);

  const router = Router();
  const ceiling = limited(api, 'Too many requests in a short time.');
  // The health check answers load balancers and must not depend on the counters' table.
  router.use('/api', (req, res, next) => (req.path === '/health' ? next() : ceiling(req, res, next)));
  router.get(
    '/auth/google',
    limited((req) => [[signInAddress, addressKey(req.ip)]], 'Too many sign-ins were started from this address.'),
  );
  router.post(
    '/api/requests',
    limited(personAndAddress('drafts', env.RATE_LIMIT_DRAFTS_PER_HOUR, HOUR), 'Too many new requests in a short time.'),
  );
  router.post(
    '/api/requests/:id/messages',
    limited(personAndAddress('messages', env.RATE_LIMIT_MESSAGES_PER_HOUR, HOUR), 'Too many messages in a short time.'),
  );
  router.post(
    '/api/requests/:id/photos',
    limited(
      personAndAddress('uploads', env.RATE_LIMIT_UPLOADS_PER_HOUR, HOUR),
      'Too many photo uploads in a short time.',
    ),
  );
  router.post(
    '/api/crew/jobs/:id/photos',
    limited(
      personAndAddress('crew-uploads', env.RATE_LIMIT_UPLOADS_PER_HOUR, HOUR),
      'Too many photo uploads in a short time.',
    ),
  );
  // The inspector's page needs no account: anyone holding a link, counted by address only.
  const inspectorReads = counter('inspector-address', env.RATE_LIMIT_INSPECTOR_PER_HOUR, HOUR);
  const inspectorOutcomes = counter('inspector-outcome-address', env.RATE_LIMIT_INSPECTOR_OUTCOMES_PER_HOUR, HOUR);
  router.use(
    '/api/inspect',
    limited(
      (req) => [[inspectorReads, addressKey(req.ip)]],
      'Too many requests for inspection pages from this address.',
    ),
  );
  router.post(
    '/api/inspect/:id/outcome',
    limited(
      (req) => [[inspectorOutcomes, addressKey(req.ip)]],
      'Too many inspection outcomes were sent from this address.',
    ),
  );
  return router;
}
