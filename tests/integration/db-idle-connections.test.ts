import pg from 'pg';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, inject, it, vi } from 'vitest';
import { createDb } from '../../server/db/client';
import { createTestApp, createTestDatabase, dropTestDatabase, type TestApp } from '../setup/test-app';

/** Ends, from the server side, every connection to a database but the caller's own, as a restart or an admin would. */
async function terminateBackends(databaseUrl: string) {
  const admin = new pg.Client({ connectionString: inject('stack').adminDatabaseUrl });
  await admin.connect();
  const name = new URL(databaseUrl).pathname.slice(1);
  const { rowCount } = await admin.query(
    'select pg_terminate_backend(pid) from pg_stat_activity where datname = $1 and pid <> pg_backend_pid()',
    [name],
  );
  await admin.end();
  return rowCount ?? 0;
}

async function untilRemoved(pool: pg.Pool, count: number) {
  let removed = 0;
  await new Promise<void>((resolve) =>
    pool.on('remove', () => {
      removed += 1;
      if (removed >= count) resolve();
    }),
  );
}

describe('a database connection ended by the server while idle', () => {
  let databaseUrl: string;
  beforeAll(async () => {
    databaseUrl = await createTestDatabase();
  });
  afterAll(() => dropTestDatabase(databaseUrl));

  it('is reported to the pool owner and replaced at the next query, not thrown', async () => {
    const onIdleError = vi.fn();
    const { pool } = createDb(databaseUrl, { max: 4, onConnectionError: onIdleError });
    await Promise.all([1, 2, 3].map(() => pool.query('select pg_sleep(0.02)')));
    expect(pool.idleCount).toBe(3);

    const removed = untilRemoved(pool, 3);
    expect(await terminateBackends(databaseUrl)).toBe(3);
    await removed;

    // 57P01 is PostgreSQL's admin_shutdown: "terminating connection due to administrator command".
    expect(onIdleError).toHaveBeenCalledTimes(3);
    expect(onIdleError.mock.calls.map(([error]) => (error as { code?: string }).code)).toEqual([
      '57P01',
      '57P01',
      '57P01',
    ]);
    const { rows } = await pool.query('select 1 as one');
    expect(rows).toEqual([{ one: 1 }]);
    await pool.end();
  });
});

describe('a database connection ended by the server while checked out', () => {
  let databaseUrl: string;
  beforeAll(async () => {
    databaseUrl = await createTestDatabase();
  });
  afterAll(() => dropTestDatabase(databaseUrl));

  it('is reported, not thrown, when it is inside a transaction waiting on something else', async () => {
    const onError = vi.fn();
    const { pool } = createDb(databaseUrl, { max: 2, onConnectionError: onError });
    const client = await pool.connect();
    await client.query('begin');
    const reported = new Promise<void>((resolve) => client.once('error', () => resolve()));
    expect(await terminateBackends(databaseUrl)).toBe(1);
    await reported;
    // The server's FATAL message first, then the closed socket: both reach the listener, neither is thrown.
    expect(onError).toHaveBeenCalled();
    expect((onError.mock.calls[0][0] as { code?: string }).code).toBe('57P01');
    client.release(true);
    expect((await pool.query('select 1 as one')).rows).toEqual([{ one: 1 }]);
    await pool.end();
  });

  it('is ended by PostgreSQL when a transaction sits idle past the timeout, and the pool carries on', async () => {
    const onError = vi.fn();
    const { pool } = createDb(databaseUrl, {
      max: 2,
      onConnectionError: onError,
      timeouts: { connectMs: 2_000, statementMs: 2_000, idleInTransactionMs: 300 },
    });
    const client = await pool.connect();
    await client.query('begin');
    await new Promise<void>((resolve) => client.once('error', () => resolve()));
    // 25P03: idle_in_transaction_session_timeout.
    expect((onError.mock.calls[0][0] as { code?: string }).code).toBe('25P03');
    client.release(true);
    expect((await pool.query('select 1 as one')).rows).toEqual([{ one: 1 }]);
    await pool.end();
  });
});

describe('the app context', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('logs a warning and keeps serving after its idle connections are ended by the server', async () => {
    const warn = vi.spyOn(t.ctx.logger, 'warn');
    await Promise.all([1, 2].map(() => t.ctx.pool.query('select pg_sleep(0.02)')));
    const removed = untilRemoved(t.ctx.pool, 2);
    expect(await terminateBackends(t.databaseUrl)).toBe(2);
    await removed;
    expect(warn).toHaveBeenCalledTimes(2);
    expect(warn.mock.calls[0][1]).toBe('a database connection was closed by the server');
    await request(t.app).get('/api/health').expect(200);
  });
});
