import type { AppContext } from './context';
import { createDb } from './db/client';
import type { Env } from './env';
import { createLogger } from './lib/logger';
import { createMailer } from './services/mailer';
import { createS3Client } from './services/storage';

export function createContext(env: Env): AppContext {
  const { db, pool } = createDb(env.DATABASE_URL);
  return { env, db, pool, logger: createLogger(env.LOG_LEVEL), s3: createS3Client(env), mailer: createMailer(env) };
}

export async function closeContext(ctx: AppContext) {
  ctx.mailer.close();
  ctx.s3.destroy();
  await ctx.pool.end();
}
