import type { AppContext } from './config/context';
import { createDb } from './db/client';
import { dbTimeouts, type Env } from './config/env';
import { createLogger } from './lib/logger';
import { ChangeNotices } from './infra/change-notices';
import { createMailer } from './infra/mailer';
import { createPaymentsClient } from './infra/payments';
import { createS3Client } from './infra/storage';

export function createContext(env: Env): AppContext {
  const logger = createLogger(env.LOG_LEVEL);
  const { db, pool } = createDb(env.DATABASE_URL, {
    max: 10,
    timeouts: dbTimeouts(env),
    onConnectionError: (error) => logger.warn({ err: error }, 'a database connection was closed by the server'),
  });
  return {
    env,
    db,
    pool,
    logger,
    s3: createS3Client(env),
    mailer: createMailer(env),
    payments: createPaymentsClient(env),
    queueChanges: new ChangeNotices(env.DATABASE_URL, 'queue_changed', logger),
  };
}

export async function closeContext(ctx: AppContext) {
  ctx.mailer.close();
  ctx.s3.destroy();
  await Promise.all([ctx.queueChanges.close(), ctx.pool.end()]);
}
