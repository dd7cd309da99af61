// The app with its design pool, in a process of its own: on 'propose' it starts ten proposals through the same
// pool the grade-check route uses and reports when they are done, while the bench keeps asking /api/health.
import type { Server } from 'node:http';
import { createApp } from '../../server/app';
import { closeContext, createContext } from '../../server/context-factory';
import { parseEnv } from '../../server/config/env';
import { closeDesignPool, proposeOffThread } from '../../server/services/design/design-pool';
import { commonRuralTemplate } from '@shared/engine';

const env = parseEnv(process.env);
const ctx = createContext(env);
const app = createApp(ctx);
const server: Server = app.listen(env.PORT, '127.0.0.1', () => process.send?.('ready'));

const ground = Array.from({ length: 400 }, (_, i) => ({
  stationFt: i,
  elevationFt: 100 + 0.22 * i + 1.5 * Math.sin(i / 9) + 0.4 * Math.sin(i / 2.3),
}));

process.on('message', (message) => {
  if (message !== 'propose') return;
  const started = performance.now();
  const ten = Array.from({ length: 10 }, () =>
    proposeOffThread({ existing: ground, roadEdgeElevationFt: 100 }, commonRuralTemplate),
  );
  void Promise.all(ten).then((done) =>
    process.send?.({
      proposals: done.length,
      ms: performance.now() - started,
      feasible: done.every((d) => d.feasible),
    }),
  );
});

process.on('SIGTERM', () => {
  server.close(
    () =>
      void closeDesignPool()
        .then(() => closeContext(ctx))
        .finally(() => process.exit(0)),
  );
  server.closeIdleConnections();
});
