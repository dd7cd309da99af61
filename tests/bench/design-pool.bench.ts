// The server's /api/health latency alone and while ten design proposals run in its worker pool. A script, not
// a test: figures vary by machine and are never asserted.
import { fork, type ChildProcess } from 'node:child_process';
import { chmodSync, mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { startStandIns } from '../../fakes';
import { applyMigrations } from '../../server/db/client';
import { devOAuthClient } from '../../server/dev/dev-config';
import { ensureDatabase, startPostgres } from '../../server/dev/postgres';
import { standInEnv } from '../../server/dev/stand-in-env';
import { freePort } from '../setup/free-port';

/** One health request every 20 ms until `until` settles; the latencies, sorted. */
async function healthWhile(url: string, until: Promise<unknown>): Promise<number[]> {
  let done = false;
  void until.finally(() => (done = true));
  const times: number[] = [];
  while (!done) {
    const t = performance.now();
    const res = await fetch(url);
    await res.arrayBuffer();
    times.push(performance.now() - t);
    await new Promise((r) => setTimeout(r, 20));
  }
  return times.sort((a, b) => a - b);
}

const p95 = (sorted: number[]) => sorted[Math.min(sorted.length - 1, Math.ceil(0.95 * sorted.length) - 1)];

async function main() {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'gradepass-bench-'));
  chmodSync(dir, 0o755); // initdb runs as the postgres user and must reach its folder
  const pg = await startPostgres(path.join(dir, 'postgres'), await freePort(), { throwaway: true });
  const port = await freePort();
  const origin = `http://127.0.0.1:${port}`;
  const standIns = await startStandIns({
    dataDir: path.join(dir, 'fakes'), bucket: 'bench', allowedOrigins: [origin],
    oauth: { ...devOAuthClient, redirectUris: [`${origin}/auth/google/callback`], identities: [] },
  });
  let server: ChildProcess | undefined;
  try {
    await ensureDatabase(pg.url('postgres'), 'bench');
    await applyMigrations(pg.url('bench'));
    const env = { ...process.env, ...standInEnv(standIns, { appOrigin: origin, port, databaseUrl: pg.url('bench') }), NODE_ENV: 'production', LOG_LEVEL: 'silent', RUN_WORKERS: 'false' };
    server = fork(fileURLToPath(new URL('design-bench-server.ts', import.meta.url)), { env, execArgv: ['--import', 'tsx'] });
    await new Promise<void>((resolve, reject) => {
      server!.once('message', () => resolve());
      server!.once('exit', (code) => reject(new Error(`the app exited (${code}) before it was ready`)));
    });
    const health = `${origin}/api/health`;
    const idle = await healthWhile(health, new Promise((r) => setTimeout(r, 3_000)));
    const proposals = new Promise<{ proposals: number; ms: number; feasible: boolean }>((resolve) => server!.once('message', (m) => resolve(m as never)));
    server.send('propose');
    const busy = await healthWhile(health, proposals);
    const done = await proposals;
    console.log(`/api/health alone: p95 ${p95(idle).toFixed(1)} ms over ${idle.length} requests`);
    console.log(
      `/api/health while ${done.proposals} proposals (400 stations, 22% bank) ran in the design pool: p95 ${p95(busy).toFixed(1)} ms ` +
        `over ${busy.length} requests; the proposals took ${(done.ms / 1000).toFixed(1)} s (all feasible: ${done.feasible})`,
    );
  } finally {
    server?.kill('SIGTERM');
    await new Promise((r) => server?.once('exit', r) ?? r(null));
    await standIns.stop();
    pg.stop();
    rmSync(dir, { recursive: true, force: true });
  }
}

await main();
