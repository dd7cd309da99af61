import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { Piscina } from 'piscina';
import type { ProposedProfile, ProposeProfileInput, RuleProfileInput } from '@shared/engine';
import { fromReply, type DesignReply } from '@shared/engine/design-refusal';

const thread = fileURLToPath(new URL('./design-thread.ts', import.meta.url));

let pool: Piscina | undefined;

/**
 * Design proposals solve a mixed-integer programme that can take a second or more on a long survey, so they run
 * in a small pool of worker threads and the event loop keeps answering. The threads load TypeScript through tsx,
 * as the server itself does. One thread is left for the event loop; threads stop when idle.
 */
function designPool(): Piscina {
  pool ??= new Piscina({
    filename: thread,
    execArgv: ['--import', 'tsx'],
    minThreads: 0,
    maxThreads: Math.max(1, availableParallelism() - 1),
    idleTimeout: 30_000,
  });
  return pool;
}

export async function proposeOffThread(input: ProposeProfileInput, rules: RuleProfileInput): Promise<ProposedProfile> {
  return fromReply((await designPool().run({ input, rules })) as DesignReply);
}

/** Stops the pool's threads (server shutdown and tests). */
export async function closeDesignPool(): Promise<void> {
  const p = pool;
  pool = undefined;
  await p?.destroy();
}
