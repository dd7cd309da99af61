import type { Server } from 'node:http';
import { fileURLToPath } from 'node:url';
import { createApp } from '../../server/app';
import { closeContext, createContext } from '../../server/context-factory';
import { createDb } from '../../server/db/client';
import { seedDemo } from '../../server/dev/seed';
import { seedDemoCrewPhotos } from '../../server/dev/seed/demo-inspection';
import { parseEnv } from '../../server/config/env';
import { startWorkers } from '../../server/workers';
import { ensureDatabase } from '../../server/dev/postgres';
import { relaxedRateLimits } from './relaxed-limits';
import type { TestStack } from './stack';

const dist = fileURLToPath(new URL('../../dist', import.meta.url));

/** The app as a browser meets it: the built client, a seeded database, background workers running. */
export async function startE2eApp(stack: TestStack, databaseUrl: string) {
  await ensureDatabase(stack.adminDatabaseUrl, 'gradepass_e2e', stack.templateDatabase);
  const seed = createDb(databaseUrl, { max: 1 });
  await seedDemo(seed.db);
  await seed.pool.end();
  const env = parseEnv({
    ...stack.env,
    ...relaxedRateLimits,
    DATABASE_URL: databaseUrl,
    NODE_ENV: 'test',
    LOG_LEVEL: 'warn',
  });
  const ctx = createContext(env);
  await seedDemoCrewPhotos(ctx);
  const workers = await startWorkers(ctx);
  const app = createApp(ctx, { clientDist: dist });
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(env.PORT, '127.0.0.1', () => resolve(s));
  });
  return {
    stop: async () => {
      server.closeAllConnections();
      await new Promise((resolve) => server.close(resolve));
      await workers.stop();
      await closeContext(ctx);
    },
  };
}
