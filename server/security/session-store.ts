import connectPgSimple from 'connect-pg-simple';
import session, { type SessionData } from 'express-session';
import type pg from 'pg';

const PgStore = connectPgSimple(session);
type Done = (error?: unknown) => void;

// Expiries read by `get` and not yet used by the same request's touch, set or destroy; a bound keeps a crowd of
// abandoned reads from growing it.
const MAX_REMEMBERED = 10_000;

/**
 * connect-pg-simple's store, except that a touch (rolling sessions: every request moves the idle expiry on) writes
 * the row only when the stored expiry lags the new one by `slackMs` or more. A busy person's requests no longer each
 * write their session row, which every one of their requests at once would queue on. The stored expiry may lag the
 * cookie's by up to `slackMs`, so an idle session can end that much early, never late.
 */
export class SessionStore extends PgStore {
  readonly #pool: pg.Pool;
  readonly #slackMs: number;
  readonly #storedExpiry = new Map<string, number>();

  constructor(options: connectPgSimple.PGStoreOptions & { pool: pg.Pool; slackMs: number }) {
    const { slackMs, ...pgOptions } = options;
    super(pgOptions);
    this.#pool = options.pool;
    this.#slackMs = slackMs;
  }

  override get(sid: string, callback: (error: unknown, session?: SessionData | null) => void) {
    this.#pool
      .query<{ sess: SessionData | string; expire: Date }>(
        'select sess, expire from "session" where sid = $1 and expire >= now()',
        [sid],
      )
      .then(({ rows: [row] }) => {
        if (!row) return callback(null, null);
        let data: SessionData;
        try {
          data = typeof row.sess === 'string' ? (JSON.parse(row.sess) as SessionData) : row.sess;
        } catch {
          return this.destroy(sid, (error) => callback(error, null));
        }
        if (this.#storedExpiry.size >= MAX_REMEMBERED) this.#storedExpiry.clear();
        this.#storedExpiry.set(sid, row.expire.getTime());
        callback(null, data);
      }, callback);
  }

  override touch(sid: string, data: SessionData, callback?: () => void) {
    const stored = this.#storedExpiry.get(sid);
    this.#storedExpiry.delete(sid);
    const wanted = data.cookie?.expires ? new Date(data.cookie.expires).getTime() : undefined;
    if (stored !== undefined && wanted !== undefined && wanted - stored < this.#slackMs) return void callback?.();
    super.touch(sid, data, callback);
  }

  override set(sid: string, data: SessionData, callback?: Done) {
    this.#storedExpiry.delete(sid);
    super.set(sid, data, callback);
  }

  override destroy(sid: string, callback?: Done) {
    this.#storedExpiry.delete(sid);
    super.destroy(sid, callback);
  }
}
