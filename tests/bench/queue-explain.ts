// Prints PostgreSQL's plan and timing for each queue view the bench measures, on the same 50,000 seeded requests.
// A diagnostic script (node --import tsx tests/bench/queue-explain.ts), not part of npm run bench.
import { fillPlaceholders } from 'drizzle-orm';
import { createDb } from '../../server/db/client';
import { listQueue } from '../../server/services/queue/queue.service';
import { queueQuerySchema } from '@shared/contracts/queue';
import { prepareBenchStack } from './bench-stack';
import { seedQueue } from './queue-seed';

async function main() {
  const stack = await prepareBenchStack();
  const { db, pool } = createDb(stack.databaseUrl, { max: 1 });
  try {
    await seedQueue(pool);
    const [place] = (await pool.query("select id from jurisdictions where name = 'Fenwick County'")).rows as {
      id: string;
    }[];
    const [user] = (
      await pool.query("select id, email, name, role from users where email = 'bench.staff@gradepass.test'")
    ).rows;
    const views: [string, Record<string, string>][] = [
      ['waiting on us, by time in status', { waiting: 'true', sort: 'waiting' }],
      ['everything, oldest wait first', { sort: 'waiting' }],
      ['everything, newest in status first', { sort: 'waiting', dir: 'desc' }],
      ['submitted in one authority, by applicant', { status: 'submitted', jurisdiction: place.id, sort: 'applicant' }],
      ['search "quarry ridge", newest first', { q: 'quarry ridge', sort: 'created', dir: 'desc' }],
      ['everything, by road', { sort: 'road' }],
    ];
    // Every statement the queue sends passes through here; EXPLAIN ANALYZE the last one sent for each view.
    const sent: { text: string; values: unknown[] }[] = [];
    const query = pool.query.bind(pool) as (...args: unknown[]) => Promise<unknown>;
    (pool as unknown as { query: unknown }).query = (
      config: { text?: string; values?: unknown[] } | string,
      values?: unknown[],
    ) => {
      if (typeof config === 'object' && config.text?.includes('"requests"'))
        sent.push({ text: config.text, values: values ?? config.values ?? [] });
      return query(config, values);
    };
    for (const [label, params] of views) {
      await listQueue(db, user, queueQuerySchema.parse({ ...params, limit: '50' }));
      const last = sent.at(-1)!;
      const values = fillPlaceholders(last.values, {});
      const plan = (await query(`explain (analyze, buffers) ${last.text}`, values)) as {
        rows: { 'QUERY PLAN': string }[];
      };
      console.log(`\n=== ${label} ===\n${plan.rows.map((r) => r['QUERY PLAN']).join('\n')}`);
      // A named statement may settle on PostgreSQL's generic plan after five runs: show that plan too.
      await query('set plan_cache_mode = force_generic_plan');
      const generic = (await query(`explain (analyze, buffers) ${last.text}`, values)) as {
        rows: { 'QUERY PLAN': string }[];
      };
      await query('reset plan_cache_mode');
      console.log(`--- the same, generic plan ---\n${generic.rows.map((r) => r['QUERY PLAN']).join('\n')}`);
    }
    // Which plan each view's named statement settled on after a dozen runs on one connection.
    for (const [, params] of views)
      for (let i = 0; i < 12; i++) await listQueue(db, user, queueQuerySchema.parse({ ...params, limit: '50' }));
    const settled = (await query(
      "select name, generic_plans, custom_plans from pg_prepared_statements where name like 'queue%' order by name",
    )) as { rows: { name: string; generic_plans: number; custom_plans: number }[] };
    console.log('\n=== plans used by each named statement (generic / custom) ===');
    for (const r of settled.rows) console.log(`${r.name.padEnd(60)} ${r.generic_plans} / ${r.custom_plans}`);
  } finally {
    await pool.end();
    await stack.stop();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
