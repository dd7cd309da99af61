import pg from 'pg';
import type { ChangeStamps } from '../config/context';
import type { Logger } from '../lib/logger';

/** How the listening connection names itself in pg_stat_activity. */
export const changeNoticesApplication = 'gradepass change notices';

export interface ChangeNoticesOptions {
  /** First wait before listening again after the connection was lost; doubles up to `retryMaxMs`. */
  retryMs?: number;
  retryMaxMs?: number;
  /** How often the idle listening connection is asked a trivial question, so a silently dead one is noticed. */
  checkMs?: number;
}

/**
 * Whether anything announced on one PostgreSQL channel may have changed since a given moment, for caches kept in
 * this process. PostgreSQL delivers a NOTIFY only once its transaction has committed, to every process listening.
 *
 * `stamp()` is a number that moves on every notice, on every write this process answers (`changed()`, so a person
 * reads what they just wrote without waiting for the notice), and on every gap in listening. It is null while not
 * listening: nothing may be cached or served from a cache then. A cached value is good while the stamp read before
 * building it is still the stamp now.
 *
 * Listening starts on the first `stamp()`. A lost connection (a database restart, an administrator ending it, a
 * dead network found by the periodic check) is retried with backoff and never throws.
 */
export class ChangeNotices implements ChangeStamps {
  #generation = 0;
  #listening = false;
  #started = false;
  #closed = false;
  #client: pg.Client | null = null;
  #retryTimer: NodeJS.Timeout | null = null;
  #checkTimer: NodeJS.Timeout | null = null;
  #failures = 0;
  readonly #retryMs: number;
  readonly #retryMaxMs: number;
  readonly #checkMs: number;

  constructor(
    private readonly databaseUrl: string,
    private readonly channel: string,
    private readonly logger: Logger,
    options: ChangeNoticesOptions = {},
  ) {
    if (!/^[a-z_][a-z0-9_]*$/.test(channel)) throw new Error(`not a plain channel name: ${channel}`);
    this.#retryMs = options.retryMs ?? 250;
    this.#retryMaxMs = options.retryMaxMs ?? 5_000;
    this.#checkMs = options.checkMs ?? 30_000;
  }

  /** The current stamp, or null while this process is not listening. */
  stamp(): number | null {
    if (!this.#started) {
      this.#started = true;
      this.#connect();
    }
    return this.#listening ? this.#generation : null;
  }

  /** Something changed here; whatever was built before now is out of date. */
  changed() {
    this.#generation++;
  }

  /** Whether notices are arriving now (for tests and the health of caches). */
  get listening() {
    return this.#listening;
  }

  async close() {
    this.#closed = true;
    this.#stopTimers();
    const client = this.#client;
    this.#client = null;
    this.#listening = false;
    await client?.end().catch(() => undefined);
  }

  #connect() {
    if (this.#closed) return;
    const client = new pg.Client({
      connectionString: this.databaseUrl,
      application_name: changeNoticesApplication,
      keepAlive: true,
      connectionTimeoutMillis: 5_000,
    });
    this.#client = client;
    let lost = false;
    const lose = (error?: Error) => {
      if (lost) return;
      lost = true;
      this.#lost(client, error);
    };
    client.on('error', lose);
    client.on('end', () => lose());
    client.on('notification', (message) => {
      if (message.channel === this.channel) this.#generation++;
    });
    client
      .connect()
      .then(() => client.query(`listen ${this.channel}`))
      .then(() => {
        if (lost || this.#closed) return;
        // Changes made while nobody listened were never announced to us: start from a new stamp.
        this.#generation++;
        this.#listening = true;
        if (this.#failures > 0) this.logger.info({ channel: this.channel }, 'listening for change notices again');
        this.#failures = 0;
        this.#checkTimer = setInterval(() => {
          client.query({ text: 'select 1', query_timeout: 5_000 } as pg.QueryConfig).catch((error: Error) => {
            void client.end().catch(() => undefined);
            lose(error);
          });
        }, this.#checkMs);
        this.#checkTimer.unref();
      })
      .catch((error: Error) => {
        void client.end().catch(() => undefined);
        lose(error);
      });
  }

  #lost(client: pg.Client, error?: Error) {
    if (this.#client !== client) return;
    this.#client = null;
    this.#listening = false;
    this.#generation++;
    this.#stopTimers();
    if (this.#closed) return;
    const wait = Math.min(this.#retryMaxMs, this.#retryMs * 2 ** this.#failures);
    if (this.#failures === 0)
      this.logger.warn({ err: error, channel: this.channel }, 'stopped hearing change notices; caches are off');
    this.#failures++;
    this.#retryTimer = setTimeout(() => this.#connect(), wait);
    this.#retryTimer.unref();
  }

  #stopTimers() {
    if (this.#retryTimer) clearTimeout(this.#retryTimer);
    if (this.#checkTimer) clearInterval(this.#checkTimer);
    this.#retryTimer = this.#checkTimer = null;
  }
}
