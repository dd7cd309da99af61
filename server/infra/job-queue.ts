import PgBoss from 'pg-boss';
import type { AppContext } from '../config/context';
import { dbTimeouts } from '../config/env';
import { poolTimeouts } from '../db/client';

/**
 * The pg-boss job queue in PostgreSQL, with the same connection timeouts as the app's pool so a database that
 * stops answering fails its calls fast. Its errors are logged, never thrown at the process.
 */
export async function startJobQueue({ env, logger }: Pick<AppContext, 'env' | 'logger'>): Promise<PgBoss> {
  const boss = new PgBoss({
    connectionString: env.DATABASE_URL,
    schema: 'pgboss',
    max: 3,
    schedule: false,
    application_name: 'gradepass-worker',
    ...poolTimeouts(dbTimeouts(env)),
  });
  boss.on('error', (error) => logger.warn({ err: error }, 'job queue error'));
  await boss.start();
  return boss;
}

/** Every instance calls this at start; two doing it at once must not stop either from starting. */
export async function ensureQueue(boss: PgBoss, options: PgBoss.Queue) {
  if (await boss.getQueue(options.name)) return boss.updateQueue(options.name, options);
  try {
    await boss.createQueue(options.name, options);
  } catch (error) {
    if (!(await boss.getQueue(options.name))) throw error;
  }
}
