import { drizzle } from 'drizzle-orm/node-postgres';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import { fileURLToPath } from 'node:url';
import pg from 'pg';
import * as schema from './schema';

/**
 * A pool and its Drizzle handle. An idle connection can be ended from the server side (PostgreSQL restarting, an
 * administrator or `drop database … with (force)` terminating backends); pg-pool then drops that connection and
 * opens a new one at the next query, and emits 'error' on the pool. With no listener that event would throw and end
 * the process, so every pool gets one: `onIdleError` (the app logs it; scripts and tests have nothing to do).
 */
export function createDb(databaseUrl: string, max = 10, onIdleError: (error: Error) => void = () => undefined) {
  const pool = new pg.Pool({ connectionString: databaseUrl, max });
  pool.on('error', onIdleError);
  const db = drizzle({ client: pool, schema, casing: 'snake_case' });
  return { db, pool };
}

export type Db = ReturnType<typeof createDb>['db'];
export type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];
export type DbOrTx = Db | Tx;

export const migrationsFolder = fileURLToPath(new URL('../../drizzle', import.meta.url));

export async function applyMigrations(databaseUrl: string) {
  const { db, pool } = createDb(databaseUrl, 1);
  try {
    await migrate(db, { migrationsFolder });
  } finally {
    await pool.end();
  }
}
