import type pg from 'pg';
import { vi } from 'vitest';

/** The statements the app sends through `pool` while `fn` runs, as their SQL text. */
export async function statementsDuring(pool: pg.Pool, fn: () => Promise<unknown>): Promise<string[]> {
  const sent: string[] = [];
  const query = pool.query.bind(pool);
  const spy = vi.spyOn(pool, 'query').mockImplementation(((...args: Parameters<typeof query>) => {
    const [first] = args as unknown[];
    sent.push(typeof first === 'string' ? first : String((first as { text?: string }).text));
    return query(...args);
  }) as typeof pool.query);
  try {
    await fn();
  } finally {
    spy.mockRestore();
  }
  return sent;
}
