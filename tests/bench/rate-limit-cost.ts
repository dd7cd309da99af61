// What the API's rate-limit count costs a request, beside a trivial query on the same pool: sequentially, and with
// twenty requests at once from one person (all on one counter row). A diagnostic script, not part of npm run bench.
import { mkdtempSync, chmodSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { RateLimiterDrizzle } from 'rate-limiter-flexible';
import { applyMigrations, createDb } from '../../server/db/client';
import { rateLimits } from '../../server/db/schema';
import { ensureDatabase, startPostgres } from '../../server/dev/postgres';
import { freePort } from '../setup/free-port';

async function timeEach(label: string, total: number, concurrency: number, run: () => Promise<unknown>) {
  const times: number[] = [];
  let left = total;
  await Promise.all(
    Array.from({ length: concurrency }, async () => {
      while (left-- > 0) {
        const start = performance.now();
        await run();
        times.push(performance.now() - start);
      }
    }),
  );
  times.sort((a, b) => a - b);
  const at = (q: number) => times[Math.floor(q * (times.length - 1))].toFixed(2);
  console.log(`${label.padEnd(48)} p50 ${at(0.5).padStart(7)} ms  p95 ${at(0.95).padStart(7)} ms`);
}

async function main() {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'gradepass-limit-'));
  chmodSync(dir, 0o755);
  const pg = await startPostgres(path.join(dir, 'postgres'), await freePort(), { throwaway: true });
  try {
    await ensureDatabase(pg.url('postgres'), 'bench');
    await applyMigrations(pg.url('bench'));
    const { db, pool } = createDb(pg.url('bench'), { max: 10 });
    const limiter = new RateLimiterDrizzle({
      storeClient: db,
      schema: rateLimits,
      keyPrefix: 'api-person',
      points: 1e9,
      duration: 60,
    });
    // Warm up both paths first so that the first figures do not carry the JIT's start.
    for (let i = 0; i < 500; i++) await Promise.all([pool.query('select 1'), limiter.consume('warm-up')]);
    for (const concurrency of [1, 20]) {
      await timeEach(`select 1, ${concurrency} at once`, 4000, concurrency, () => pool.query('select 1'));
      await timeEach(`rate-limit count, ${concurrency} at once, one person`, 4000, concurrency, () =>
        limiter.consume('one-person'),
      );
    }
    await pool.end();
  } finally {
    pg.stop();
    rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
