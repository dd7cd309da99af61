// Times GET /api/queue against 50,000 seeded requests beside a floor endpoint on the same server that runs one
// trivial query behind the same session and sign-in. A script, not a test: figures vary by machine.
import os from 'node:os';
import autocannon from 'autocannon';
import { createDb } from '../../server/db/client';
import { prepareBenchStack } from './bench-stack';
import { seedQueue } from './queue-seed';
import { signInCookie } from './sign-in-cookie';

const connections = 20;
const seconds = Number(process.env.BENCH_SECONDS ?? 10);
const targetP95 = 50;
const targetRatio = 3;

interface Target {
  label: string;
  path: string;
  kind: 'floor' | 'served' | 'afresh';
  /** Started when the measurement starts; returns how to stop it. */
  during?: () => () => void;
}

async function measure(url: string, cookie: string) {
  const times: number[] = [];
  let errors = 0;
  await new Promise<void>((resolve, reject) => {
    const run = autocannon({ url, connections, duration: seconds, headers: { cookie } }, (error) =>
      error ? reject(error) : resolve(),
    );
    run.on('response', (_client: unknown, status: number, _bytes: number, ms: number) => {
      if (status !== 200) errors++;
      times.push(ms);
    });
  });
  times.sort((a, b) => a - b);
  const at = (q: number) => times[Math.min(times.length - 1, Math.floor(q * times.length))] ?? NaN;
  return { p50: at(0.5), p95: at(0.95), rps: times.length / seconds, errors };
}

async function main() {
  const stack = await prepareBenchStack([{ email: 'bench.staff@gradepass.test', name: 'Bench Staff' }]);
  const { origin } = stack;
  const { pool } = createDb(stack.databaseUrl, { max: 2 });
  try {
    const started = Date.now();
    const seeded = await seedQueue(pool);
    console.log(
      `seeded ${seeded.requests} requests and ${seeded.events} events in ${((Date.now() - started) / 1000).toFixed(1)} s`,
    );

    const server = await stack.startServer(
      'queue-bench-server.ts',
      process.env.BENCH_PROFILE ? ['--cpu-prof', `--cpu-prof-dir=${process.env.BENCH_PROFILE}`] : [],
    );
    const cookie = await signInCookie(origin, 'bench.staff@gradepass.test');

    const [place] = (await pool.query("select id from jurisdictions where name = 'Fenwick County'")).rows as {
      id: string;
    }[];
    // The queue as served keeps each page until something it shows changes; "built afresh" is the same route with
    // nothing kept (mounted by queue-bench-server.ts), which is what the first read after a change costs.
    const views: [string, string][] = [
      ['waiting on us, by time in status', '/api/queue?waiting=true&sort=waiting&limit=50'],
      // The screen's default view: everything, longest wait first, ended requests after the open ones.
      ['everything, longest wait first', '/api/queue?sort=waiting&limit=50'],
      [
        'submitted in one authority, by applicant',
        `/api/queue?status=submitted&jurisdiction=${place.id}&sort=applicant&limit=50`,
      ],
      ['search "quarry ridge", newest first', '/api/queue?q=quarry%20ridge&sort=created&dir=desc&limit=50'],
      ['everything, by road, page 3', ''],
    ];
    // A deeper page costs what the first does: follow the cursor twice to get there.
    let cursor = '';
    for (let i = 0; i < 2; i++) {
      const page = (await (
        await fetch(`${origin}/api/queue?sort=road&limit=50${cursor ? `&cursor=${cursor}` : ''}`, {
          headers: { cookie },
        })
      ).json()) as { nextCursor: string };
      cursor = page.nextCursor;
    }
    views[views.length - 1][1] = `/api/queue?sort=road&limit=50&cursor=${cursor}`;
    // A busy office: one request moves on every second while the default view is read (each change is announced,
    // and every kept page is built again on its next read).
    const [moving] = (await pool.query("select id from requests where status = 'submitted' limit 1")).rows as {
      id: string;
    }[];
    const everySecond = () => {
      const timer = setInterval(() => {
        void pool.query('update requests set status_changed_at = now() where id = $1', [moving.id]);
      }, 1000);
      return () => clearInterval(timer);
    };
    const all: Target[] = [
      { label: 'floor (session + select 1)', path: '/bench/floor', kind: 'floor' },
      { label: 'floor + the API rate-limit count', path: '/bench/limited/api/floor', kind: 'floor' },
      ...views.map(([label, path]): Target => ({ label: `queue: ${label}`, path, kind: 'served' })),
      {
        label: 'queue: everything, longest wait first, a change a second',
        path: views[1][1],
        kind: 'served',
        during: everySecond,
      },
      ...views.map(([label, path]): Target => ({
        label: `built afresh: ${label}`,
        path: `/bench/limited${path}`,
        kind: 'afresh',
      })),
    ];
    // BENCH_ONLY=<text> measures the floor and the rows whose label contains the text (for profiling one view).
    const only = process.env.BENCH_ONLY;
    const targets = only ? all.filter((x, i) => i === 0 || x.label.includes(only)) : all;
    for (const { path } of targets) await measureWarm(origin + path, cookie);
    const results = [];
    const cpu = async () =>
      new Promise<number>((resolve) => {
        server.once('message', (m: { cpuMicros: NodeJS.CpuUsage }) => resolve(m.cpuMicros.user + m.cpuMicros.system));
        server.send('cpu');
      });
    for (const target of targets) {
      const before = await cpu();
      const pgBefore = stack.postgresCpuMs();
      const generatorBefore = process.cpuUsage();
      const stop = target.during?.();
      const result = await measure(origin + target.path, cookie).finally(() => stop?.());
      const count = result.rps * seconds;
      const cpuMs = ((await cpu()) - before) / 1000 / count;
      const pgMs = (stack.postgresCpuMs() - pgBefore) / count;
      const generator = process.cpuUsage(generatorBefore);
      const generatorMs = (generator.user + generator.system) / 1000 / count;
      results.push({ ...target, ...result, cpuMs, pgMs, generatorMs });
    }
    const floor = results[0];
    console.log(
      `\n${connections} connections, ${seconds} s each; the app in its own process (on ${os.cpus().length} cores shared with PostgreSQL and the load generator)`,
    );
    console.log(
      'endpoint'.padEnd(60),
      'p50 ms'.padStart(8),
      'p95 ms'.padStart(8),
      'req/s'.padStart(8),
      'p95/floor'.padStart(10),
      'CPU ms/req: app'.padStart(16),
      'PostgreSQL'.padStart(11),
      'load gen.'.padStart(10),
      'non-200'.padStart(8),
    );
    for (const r of results) {
      console.log(
        r.label.padEnd(60),
        r.p50.toFixed(1).padStart(8),
        r.p95.toFixed(1).padStart(8),
        r.rps.toFixed(0).padStart(8),
        (r.p95 / floor.p95).toFixed(2).padStart(10),
        r.cpuMs.toFixed(2).padStart(16),
        r.pgMs.toFixed(2).padStart(11),
        r.generatorMs.toFixed(2).padStart(10),
        String(r.errors).padStart(8),
      );
    }
    console.log(
      `load average while measuring (other work on this machine shows here): ${os
        .loadavg()
        .map((l) => l.toFixed(2))
        .join(' ')}`,
    );
    // Each queue view against the target, compared at the precision printed (0.1 ms, 0.01x): not one headline view.
    console.log(`\ntarget for every queue view: p95 <= ${targetP95} ms and p95 <= ${targetRatio}x the floor's`);
    let failing = 0;
    for (const r of results.filter((x) => x.kind === 'served')) {
      const p95 = Number(r.p95.toFixed(1));
      const ratio = Number((r.p95 / floor.p95).toFixed(2));
      const pass = p95 <= targetP95 && ratio <= targetRatio;
      if (!pass) failing++;
      console.log(
        `${pass ? 'PASS' : 'FAIL'}  ${r.label.padEnd(60)} p95 ${p95.toFixed(1)} ms, ${ratio.toFixed(2)}x the floor`,
      );
    }
    console.log(failing ? `${failing} queue view(s) miss the target` : 'every queue view meets the target');
    console.log(
      'the "built afresh" rows are what a page costs on its first read after a change; they are shown, not judged',
    );
  } finally {
    await pool.end();
    await stack.stop();
  }
}

async function measureWarm(url: string, cookie: string) {
  await new Promise<void>((resolve, reject) =>
    autocannon({ url, connections, duration: 2, headers: { cookie } }, (e) => (e ? reject(e) : resolve())),
  );
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
