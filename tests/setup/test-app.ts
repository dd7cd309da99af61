import { randomUUID } from 'node:crypto';
import pg from 'pg';
import request from 'supertest';
import { inject } from 'vitest';
import { createApp } from '../../server/app';
import type { AppContext } from '../../server/config/context';
import { closeContext, createContext } from '../../server/context-factory';
import { closeDesignPool } from '../../server/services/design/design-pool';
import { parseEnv } from '../../server/config/env';
import { ensureDatabase } from '../../server/dev/postgres';
import { relaxedRateLimits } from './relaxed-limits';

export interface TestApp {
  ctx: AppContext;
  app: ReturnType<typeof createApp>;
  databaseUrl: string;
  env: Record<string, string>;
  close(): Promise<void>;
}

/** A fresh database copied from the migrated template, and an app instance on it; one per test file. */
export async function createTestDatabase(): Promise<string> {
  const stack = inject('stack');
  const name = `t_${randomUUID().replaceAll('-', '').slice(0, 16)}`;
  await ensureDatabase(stack.adminDatabaseUrl, name, stack.templateDatabase);
  return stack.adminDatabaseUrl.replace(/\/postgres$/, `/${name}`);
}

export async function dropTestDatabase(databaseUrl: string) {
  const stack = inject('stack');
  const name = new URL(databaseUrl).pathname.slice(1);
  const client = new pg.Client({ connectionString: stack.adminDatabaseUrl });
  await client.connect();
  await client.query(`drop database if exists "${name}" with (force)`);
  await client.end();
}

export function testEnv(databaseUrl: string, overrides: Record<string, string> = {}) {
  const stack = inject('stack');
  return {
    ...stack.env,
    ...relaxedRateLimits,
    DATABASE_URL: databaseUrl,
    NODE_ENV: 'test',
    LOG_LEVEL: process.env.TEST_LOG_LEVEL ?? 'silent',
    RUN_WORKERS: 'false',
    ...overrides,
  };
}

export async function createTestApp(overrides: Record<string, string> = {}): Promise<TestApp> {
  const databaseUrl = await createTestDatabase();
  const env = testEnv(databaseUrl, overrides);
  const ctx = createContext(parseEnv(env));
  const app = createApp(ctx);
  return {
    ctx,
    app,
    databaseUrl,
    env,
    close: async () => {
      await closeContext(ctx);
      await closeDesignPool();
      await dropTestDatabase(databaseUrl);
    },
  };
}

/**
 * Signs in through the real OAuth round trip: the app redirects to the provider, the provider (told who to be
 * through login_hint, skipping its picker page) redirects back with a code, and the app's callback makes a session.
 */
export async function signIn(app: TestApp['app'] | string, email: string) {
  const agent = request.agent(app);
  const start = await agent.get('/auth/google').expect(302);
  const authorize = new URL(start.headers.location);
  authorize.searchParams.set('login_hint', email);
  const provider = await fetch(authorize, { redirect: 'manual' });
  const back = provider.headers.get('location');
  if (provider.status !== 302 || !back) throw new Error(`provider did not redirect back (${provider.status})`);
  const callback = new URL(back);
  const done = await agent.get(callback.pathname + callback.search);
  if (done.status !== 302 || done.headers.location !== '/sign-in') {
    throw new Error(`sign-in callback failed: ${done.status} ${done.headers.location ?? JSON.stringify(done.body)}`);
  }
  return agent;
}
