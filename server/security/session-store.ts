import connectPgSimple from 'connect-pg-simple';
import type { Request } from 'express';
import session, { type SessionData } from 'express-session';
import type pg from 'pg';
import type { Role } from '@shared/workflow/statuses';
import type { SessionUser } from '../lib/session-user';

const PgStore = connectPgSimple(session);
type Done = (error?: unknown) => void;

/**
 * The person a session names, read in the same statement as the session itself (null: nobody, or a person whose
 * sign-in is turned off), kept per request for the sign-in's deserializer. A request whose session was not read
 * through `get` (just signed in, regenerated) has no entry, and the deserializer reads the person itself.
 */
export const personReadWithSession = new WeakMap<Request, SessionUser | null>();
const person = Symbol('person read with the session');
type ReadSession = SessionData & { [person]?: SessionUser | null };

// The id as passport stores it; anything else (a row written by hand, an older format) names nobody.
const sessionPersonSql = `
  select s.sess, s.expire, u.id, u.email, u.name, u.role
  from "session" s
  left join users u
    on u.id = case when s.sess #>> '{passport,user}' ~ '^[0-9a-fA-F]{8}-([0-9a-fA-F]{4}-){3}[0-9a-fA-F]{12}$'
                   then (s.sess #>> '{passport,user}')::uuid end
   and not u.disabled
  where s.sid = $1 and s.expire >= now()`;

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

  /** The session and the person it names in one round trip: every signed-in request needs both. */
  override get(sid: string, callback: (error: unknown, session?: SessionData | null) => void) {
    this.#pool
      .query<{ sess: SessionData | string; expire: Date; id: string | null; email: string; name: string; role: Role }>({
        name: 'session_with_person',
        text: sessionPersonSql,
        values: [sid],
      })
      .then(({ rows: [row] }) => {
        if (!row) return callback(null, null);
        let data: ReadSession;
        try {
          data = typeof row.sess === 'string' ? (JSON.parse(row.sess) as SessionData) : row.sess;
        } catch {
          return this.destroy(sid, (error) => callback(error, null));
        }
        data[person] = row.id ? { id: row.id, email: row.email, name: row.name, role: row.role } : null;
        if (this.#storedExpiry.size >= MAX_REMEMBERED) this.#storedExpiry.clear();
        this.#storedExpiry.set(sid, row.expire.getTime());
        callback(null, data);
      }, callback);
  }

  /** Hands the person read with the session to this request (see `personReadWithSession`), never into the session. */
  override createSession(req: Request, data: SessionData) {
    const read = data as ReadSession;
    if (person in read) {
      personReadWithSession.set(req, read[person] ?? null);
      delete read[person];
    }
    return super.createSession(req, data);
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
