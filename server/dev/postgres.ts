import { execFileSync, spawnSync } from 'node:child_process';
import { chownSync, existsSync, mkdirSync } from 'node:fs';
import path from 'node:path';
import pg from 'pg';

const binDir = process.env.PG_BIN_DIR ?? '/usr/lib/postgresql/15/bin';
const isRoot = process.getuid?.() === 0;

export interface LocalPostgres {
  url: (database: string) => string;
  port: number;
  stop(): void;
}

function ensureBinaries() {
  if (existsSync(path.join(binDir, 'initdb'))) return;
  if (!isRoot) {
    throw new Error(
      `PostgreSQL 15 is not installed (no ${binDir}/initdb). Install it with: sudo apt-get install -y postgresql-15`,
    );
  }
  console.log('Installing PostgreSQL 15 from Debian packages...');
  execFileSync('apt-get', ['update'], { stdio: 'inherit' });
  execFileSync('apt-get', ['install', '-y', 'postgresql-15'], {
    stdio: 'inherit',
    env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
  });
}

/** initdb and pg_ctl refuse to run as root, so as root they run as the postgres user, which must own the folder. */
function run(binary: string, args: string[], dir: string) {
  const command = path.join(binDir, binary);
  const result = isRoot
    ? spawnSync('runuser', ['-u', 'postgres', '--', command, ...args], { encoding: 'utf8' })
    : spawnSync(command, args, { encoding: 'utf8' });
  if (result.status !== 0) {
    throw new Error(
      `${binary} failed (${result.status}): ${result.stderr || result.stdout}\nSee ${path.join(dir, 'server.log')}`,
    );
  }
}

/** Start (initialising the first time) a PostgreSQL cluster in `dir`, on 127.0.0.1 only. */
export async function startPostgres(
  dir: string,
  port: number,
  opts: { throwaway?: boolean } = {},
): Promise<LocalPostgres> {
  ensureBinaries();
  const data = path.join(dir, 'data');
  mkdirSync(dir, { recursive: true });
  if (isRoot) chownSync(dir, uidOf('postgres'), gidOf('postgres'));
  if (!existsSync(path.join(data, 'PG_VERSION'))) {
    run('initdb', ['-D', data, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8'], dir);
  }
  const status = isRoot
    ? spawnSync('runuser', ['-u', 'postgres', '--', path.join(binDir, 'pg_ctl'), '-D', data, 'status'])
    : spawnSync(path.join(binDir, 'pg_ctl'), ['-D', data, 'status']);
  if (status.status === 0) {
    throw new Error(`PostgreSQL is already running from ${data}: is another Gradepass running? Stop it first.`);
  }
  run(
    'pg_ctl',
    [
      '-D',
      data,
      '-l',
      path.join(dir, 'server.log'),
      '-w',
      '-o',
      `-p ${port} -k ${data} -c listen_addresses=127.0.0.1 -c max_connections=200${opts.throwaway ? ' -c fsync=off -c synchronous_commit=off' : ''}`,
      'start',
    ],
    dir,
  );
  const url = (database: string) => `postgres://postgres@127.0.0.1:${port}/${database}`;
  return {
    url,
    port,
    stop: () => run('pg_ctl', ['-D', data, '-m', 'fast', '-w', 'stop'], dir),
  };
}

export async function ensureDatabase(adminUrl: string, name: string, template?: string) {
  const client = new pg.Client({ connectionString: adminUrl });
  await client.connect();
  try {
    const { rowCount } = await client.query('select 1 from pg_database where datname = $1', [name]);
    if (!rowCount) {
      await client.query(`create database "${name}"${template ? ` template "${template}"` : ''}`);
    }
  } finally {
    await client.end();
  }
}

function uidOf(user: string) {
  return Number(execFileSync('id', ['-u', user], { encoding: 'utf8' }).trim());
}
function gidOf(user: string) {
  return Number(execFileSync('id', ['-g', user], { encoding: 'utf8' }).trim());
}
