// The app under load, in a process of its own so the load generator never shares its event loop.
import type { Server } from 'node:http';
import { createApp } from '../../server/app';
import { closeContext, createContext } from '../../server/context-factory';
import { parseEnv } from '../../server/config/env';
import { handle } from '../../server/lib/handle';
import { queueRouter } from '../../server/routes/queue/queue.routes';
import { rateLimitRouter } from '../../server/security/rate-limits';

const env = parseEnv(process.env);
const ctx = createContext(env);
const app = createApp(ctx);
// The floor: the same middleware, session and sign-in as the queue, then one trivial query. Mounted only here.
app.get(
  '/bench/floor',
  handle({}, async () => (await ctx.pool.query('select 1 as one')).rows[0]),
);
// The same floor behind the API's rate-limit ceiling (its own counters, mounted so that their "/api" matches
// here): the difference between the two floors is what the per-request counter write costs.
app.use('/bench/limited', rateLimitRouter(ctx));
app.get(
  '/bench/limited/api/floor',
  handle({}, async () => (await ctx.pool.query('select 1 as one')).rows[0]),
);
// The queue with no page kept, behind the same ceiling: what every read would cost if each followed a change.
app.use('/bench/limited', queueRouter(ctx, { keepPages: false }));

const server: Server = app.listen(env.PORT, '127.0.0.1', () => process.send?.('ready'));
// CPU time spent by this process, asked for around each measurement: unlike latency it hardly moves with other load.
process.on('message', (message) => {
  if (message === 'cpu') process.send?.({ cpuMicros: process.cpuUsage() });
});

process.on('SIGTERM', () => {
  server.close(() => {
    // Session touches run just after each response; let the last ones land before the pool goes.
    setTimeout(() => void closeContext(ctx).finally(() => process.exit(0)), 300);
  });
  server.closeIdleConnections();
});
