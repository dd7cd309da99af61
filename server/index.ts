import type { Server } from 'node:http';
import { fileURLToPath } from 'node:url';
import { createApp, type AppOptions } from './app';
import { closeContext, createContext } from './context-factory';
import { parseEnv } from './config/env';
import { closeDesignPool } from './services/design/design-pool';
import { startWorkers } from './workers';

const root = fileURLToPath(new URL('..', import.meta.url));

async function clientOptions(dev: boolean): Promise<{ options: AppOptions; close: () => Promise<void> }> {
  if (!dev) return { options: { clientDist: `${root}dist` }, close: async () => {} };
  const { createServer } = await import('vite');
  const vite = await createServer({ root, server: { middlewareMode: true }, appType: 'spa' });
  return { options: { clientMiddleware: vite.middlewares }, close: () => vite.close() };
}

async function main() {
  const env = parseEnv();
  const ctx = createContext(env);
  const client = await clientOptions(env.NODE_ENV === 'development');
  const app = createApp(ctx, client.options);
  const workers = env.RUN_WORKERS ? await startWorkers(ctx) : null;
  const server: Server = app.listen(env.PORT, env.HOST, () => {
    ctx.logger.info(`Gradepass is listening on http://${env.HOST}:${env.PORT} (${env.APP_ORIGIN})`);
  });

  let stopping = false;
  const shutdown = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    ctx.logger.info({ signal }, 'shutting down');
    const closed = new Promise<void>((resolve) => server.close(() => resolve()));
    server.closeIdleConnections();
    setTimeout(() => server.closeAllConnections(), 5_000).unref();
    await closed;
    await workers?.stop();
    await closeDesignPool();
    await client.close();
    await closeContext(ctx);
    process.exit(0);
  };
  process.on('SIGINT', () => void shutdown('SIGINT'));
  process.on('SIGTERM', () => void shutdown('SIGTERM'));
}

main().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
