import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { chmodSync, createWriteStream, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { startStandIns, type StandIns } from '../../fakes';
import { applyMigrations, createDb } from '../../server/db/client';
import { devOAuthClient } from '../../server/dev/dev-config';
import { ensureDatabase, startPostgres, type LocalPostgres } from '../../server/dev/postgres';
import { standInEnv } from '../../server/dev/stand-in-env';
import { signInCookie } from '../bench/sign-in-cookie';
import { ensurePerson } from '../factories/people';
import { freePort } from './free-port';

const serverEntry = fileURLToPath(new URL('../../server/index.ts', import.meta.url));
const officeEmail = 'fault.office@gradepass.test';

export interface Instance {
  origin: string;
  child: ChildProcess;
  log: string;
  cookie: string;
  killed: boolean;
}

/**
 * A PostgreSQL, the stand-ins and app instances (each a process of its own running `server/index.ts` with workers
 * on), all private to one test file or fault run, so the database can be restarted or frozen without disturbing
 * anything else. Everything it starts it stops, by PID.
 */
export async function startRig(options: { instances: number; env?: Record<string, string> }) {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'gradepass-faults-'));
  chmodSync(dir, 0o755); // initdb runs as the postgres user and must reach its folder
  const pgDir = path.join(dir, 'postgres');
  const pgPort = await freePort();
  let pg: LocalPostgres = await startPostgres(pgDir, pgPort, { throwaway: true });
  const databaseUrl = pg.url('gradepass');
  await ensureDatabase(pg.url('postgres'), 'gradepass');
  await applyMigrations(databaseUrl);
  // The rig's own pool writes mail and reads outcomes; it must ride out the faults it causes, like the app.
  const { db, pool } = createDb(databaseUrl, {
    max: 2,
    timeouts: { connectMs: 1_000, statementMs: 2_000, idleInTransactionMs: 5_000 },
  });
  await ensurePerson(db, { email: officeEmail, name: 'Fault Office', role: 'staff' });

  const ports = await Promise.all(Array.from({ length: options.instances }, () => freePort()));
  const origins = ports.map((p) => `http://127.0.0.1:${p}`);
  const standIns: StandIns = await startStandIns({
    dataDir: path.join(dir, 'fakes'),
    bucket: 'faults',
    allowedOrigins: origins,
    oauth: {
      ...devOAuthClient,
      redirectUris: origins.map((o) => `${o}/auth/google/callback`),
      identities: [{ email: officeEmail, name: 'Fault Office' }],
    },
  });

  const instances: Instance[] = [];
  const startInstance = async (index: number) => {
    const origin = origins[index];
    const log = path.join(dir, `instance-${index}.log`);
    const env = {
      ...process.env,
      ...standInEnv(standIns, { appOrigin: origin, port: ports[index], databaseUrl }),
      NODE_ENV: 'production',
      LOG_LEVEL: 'warn',
      RUN_WORKERS: 'true',
      AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true',
      ...options.env,
    };
    const child = spawn(process.execPath, ['--import', 'tsx', serverEntry], { env, stdio: ['ignore', 'pipe', 'pipe'] });
    const out = createWriteStream(log);
    child.stdout!.pipe(out);
    child.stderr!.pipe(out);
    await until(`instance ${index} to answer`, async () => (await answer(`${origin}/api/health`)) === 200, 60_000);
    const instance: Instance = { origin, child, log, cookie: await signInCookie(origin, officeEmail), killed: false };
    instances[index] = instance;
    return instance;
  };
  for (let i = 0; i < options.instances; i += 1) await startInstance(i);

  const postgresPids = () => {
    const main = Number(readFileSync(path.join(pgDir, 'data', 'postmaster.pid'), 'utf8').split('\n')[0]);
    const children = spawnSync('ps', ['-o', 'pid=', '--ppid', String(main)], { encoding: 'utf8' })
      .stdout.split('\n')
      .map((l) => Number(l.trim()))
      .filter((n) => n > 0);
    return [main, ...children];
  };

  return {
    dir,
    databaseUrl,
    db,
    pool,
    standIns,
    instances,
    startInstance,
    /** Stops PostgreSQL (fast shutdown: every connection is ended with 57P01), waits, starts it again. */
    async restartPostgres(downMs: number) {
      pg.stop();
      await sleep(downMs);
      pg = await startPostgres(pgDir, pgPort, { throwaway: true });
    },
    /** Freezes every PostgreSQL process (SIGSTOP), as a hung host or a network partition looks to the app. */
    async freezePostgres(forMs: number) {
      const pids = postgresPids();
      for (const pid of pids) process.kill(pid, 'SIGSTOP');
      try {
        await sleep(forMs);
      } finally {
        for (const pid of pids) process.kill(pid, 'SIGCONT');
      }
    },
    /** Instances that ended without being asked to. */
    died: () => instances.filter((i) => !i.killed && (i.child.exitCode !== null || i.child.signalCode !== null)),
    async stop() {
      for (const instance of instances) {
        if (instance.child.exitCode !== null || instance.child.signalCode !== null) continue;
        const exited = new Promise((resolve) => instance.child.once('exit', resolve));
        instance.child.kill('SIGTERM');
        await exited;
      }
      await pool.end();
      await standIns.stop();
      pg.stop();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}
export type Rig = Awaited<ReturnType<typeof startRig>>;

/** The HTTP status a URL answers with, or 0 when nothing answers (refused, reset, or no answer in 20 s). */
export async function answer(url: string, cookie?: string): Promise<number> {
  try {
    const res = await fetch(url, { headers: cookie ? { cookie } : {}, signal: AbortSignal.timeout(20_000) });
    await res.arrayBuffer();
    return res.status;
  } catch {
    return 0;
  }
}

export const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

export async function until<T>(
  what: string,
  probe: () => Promise<T | undefined | false>,
  timeoutMs = 30_000,
): Promise<T> {
  const end = Date.now() + timeoutMs;
  for (;;) {
    const value = await probe().catch(() => undefined);
    if (value) return value;
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await sleep(150);
  }
}
