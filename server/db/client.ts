import { drizzle } from 'drizzle-orm/node-postgres';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import { fileURLToPath } from 'node:url';
import pg from 'pg';
import * as schema from './schema';

export interface DbTimeouts {
  /** Opening a connection and waiting for a free one in the pool (pg-pool uses one bound for both). */
  connectMs: number;
  statementMs: number;
  idleInTransactionMs: number;
}

/** Timeouts for the pg driver: the server-side ones, plus a client-side read bound for a server that is frozen. */
export function poolTimeouts(t: DbTimeouts) {
  return {
    connectionTimeoutMillis: t.connectMs,
    statement_timeout: t.statementMs,
    idle_in_transaction_session_timeout: t.idleInTransactionMs,
    // PostgreSQL cancels first and the connection stays usable; this fires only when the server does not answer at all.
    query_timeout: t.statementMs + 500,
  };
}

export interface DbOptions {
  max?: number;
  /** Told about a connection the server ended (restart, failover, an administrator); nothing is thrown. */
  onConnectionError?: (error: Error) => void;
  /** Omitted for migrations and scripts, whose statements may rightly run long. */
  timeouts?: DbTimeouts;
}

/**
 * A pool and its Drizzle handle. A connection can be ended from the server side at any time; pg then emits 'error'
 * on the client, and with no listener that would end the process. pg-pool listens only while a client is idle, so
 * every client also gets a listener of its own for the time it is checked out (inside a transaction, say). A client
 * given back with a query still unanswered (the read timeout fired) is closed rather than reused.
 */
export function createDb(databaseUrl: string, options: DbOptions = {}) {
  const onError = options.onConnectionError ?? (() => undefined);
  const pool = new pg.Pool({
    connectionString: databaseUrl,
    max: options.max ?? 10,
    ...(options.timeouts ? poolTimeouts(options.timeouts) : {}),
  });
  const checkedOut = new WeakSet<pg.Client>();
  pool.on('error', onError);
  pool.on('connect', (client) =>
    client.on('error', (error) => {
      if (checkedOut.has(client)) onError(error);
    }),
  );
  pool.on('acquire', (client) => checkedOut.add(client));
  pool.on('release', (_error, client) => {
    checkedOut.delete(client);
    if ((client as unknown as { _activeQuery: unknown })._activeQuery) void client.end().catch(() => undefined);
  });
  const db = drizzle({ client: pool, schema, casing: 'snake_case' });
  return { db, pool };
}

export type Db = ReturnType<typeof createDb>['db'];
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
export type DbOrTx = Db | Tx;

export const migrationsFolder = fileURLToPath(new URL('../../drizzle', import.meta.url));

export async function applyMigrations(databaseUrl: string) {
  const { db, pool } = createDb(databaseUrl, { max: 1 });
  try {
    await migrate(db, { migrationsFolder });
  } finally {
    await pool.end();
  }
}
