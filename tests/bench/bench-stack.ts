// The stack a benchmark runs the app on: a throwaway PostgreSQL with the committed migrations, the stand-ins, and
// the app forked from a small bench server module that says when it is ready. Scripts only, never tests.
import { fork, type ChildProcess } from 'node:child_process';
import { chmodSync, mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { startStandIns } from '../../fakes';
import { applyMigrations } from '../../server/db/client';
import { devOAuthClient } from '../../server/dev/dev-config';
import { ensureDatabase, startPostgres } from '../../server/dev/postgres';
import { standInEnv } from '../../server/dev/stand-in-env';
import { freePort } from '../setup/free-port';
import { relaxedRateLimits } from '../setup/relaxed-limits';

export async function prepareBenchStack(identities: { email: string; name: string }[] = []) {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'gradepass-bench-'));
  chmodSync(dir, 0o755); // initdb runs as the postgres user and must reach its folder
  const pg = await startPostgres(path.join(dir, 'postgres'), await freePort(), { throwaway: true });
  const port = await freePort();
  const origin = `http://127.0.0.1:${port}`;
  const standIns = await startStandIns({
    dataDir: path.join(dir, 'fakes'),
    bucket: 'bench',
    allowedOrigins: [origin],
    oauth: { ...devOAuthClient, redirectUris: [`${origin}/auth/google/callback`], identities },
  });
  const databaseUrl = pg.url('bench');
  await ensureDatabase(pg.url('postgres'), 'bench');
  await applyMigrations(databaseUrl);
  let server: ChildProcess | undefined;

  /** Forks `module` (beside this file) as the app and waits for its first message, which says it is listening. */
  const startServer = async (module: string, execArgv: string[] = []) => {
    const env = {
      ...process.env,
      ...relaxedRateLimits,
      ...standInEnv(standIns, { appOrigin: origin, port, databaseUrl }),
      NODE_ENV: 'production',
      LOG_LEVEL: 'silent',
      RUN_WORKERS: 'false',
    };
    const child = fork(fileURLToPath(new URL(module, import.meta.url)), {
      env,
      execArgv: ['--import', 'tsx', ...execArgv],
    });
    server = child;
    await new Promise<void>((resolve, reject) => {
      child.once('message', () => resolve());
      child.once('exit', (code) => reject(new Error(`the app exited (${code}) before it was ready`)));
    });
    return child;
  };

  const stop = async () => {
    if (server && server.exitCode === null) {
      const exited = new Promise((resolve) => server!.once('exit', resolve));
      server.kill('SIGTERM');
      await exited;
    }
    await standIns.stop();
    pg.stop();
    rmSync(dir, { recursive: true, force: true });
  };

  /** CPU time (ms) used so far by PostgreSQL's server and its backends, live or ended, read from /proc (Linux only). */
  const postgresCpuMs = () => {
    const postmaster = Number(
      readFileSync(path.join(dir, 'postgres', 'data', 'postmaster.pid'), 'utf8').split('\n')[0],
    );
    const tick = 1000 / 100; // USER_HZ is 100 on Linux
    let total = 0;
    for (const entry of readdirSync('/proc')) {
      if (!/^\d+$/.test(entry)) continue;
      let stat: string;
      try {
        stat = readFileSync(`/proc/${entry}/stat`, 'utf8');
      } catch {
        continue; // gone meanwhile
      }
      // Fields after the command's closing parenthesis: state, ppid, ..., utime (12th), stime (13th).
      const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
      if (Number(entry) !== postmaster && Number(fields[1]) !== postmaster) continue;
      total += (Number(fields[11]) + Number(fields[12])) * tick;
      // Backends that have ended: the server reaps them, and their time moves to its cutime and cstime.
      if (Number(entry) === postmaster) total += (Number(fields[13]) + Number(fields[14])) * tick;
    }
    return total;
  };

  return { origin, databaseUrl, startServer, stop, postgresCpuMs };
}
