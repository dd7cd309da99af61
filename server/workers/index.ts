import type { AppContext } from '../context';

export interface Workers { stop(): Promise<void> }

/** Background work of this instance. Every instance may run it: the queue lives in PostgreSQL. */
export async function startWorkers(_ctx: AppContext): Promise<Workers> {
  return { stop: async () => {} };
}
