import type { AppContext } from './context';
import { createDb } from './db/client';
import type { Env } from './env';
import { createLogger } from './lib/logger';
import { createMailer } from './services/mailer';
import { createS3Client } from './services/storage';

export function createContext(env: Env): AppContext {
  const logger = createLogger(env.LOG_LEVEL);
  const { db, pool } = createDb(env.DATABASE_URL, 10, (error) => logger.warn({ err: error }, 'an idle database connection was closed by the server'));
  return { env, db, pool, logger, s3: createS3Client(env), mailer: createMailer(env) };
}

export async function closeContext(ctx: AppContext) {
  ctx.mailer.close();
  ctx.s3.destroy();
  await ctx.pool.end();
}
