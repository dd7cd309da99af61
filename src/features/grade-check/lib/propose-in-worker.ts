import type { ProposedProfile, ProposeProfileInput, RuleProfileInput } from '@shared/engine';
import { fromReply, type DesignReply } from '@shared/engine/design-refusal';

type Answer = { id: number; reply: DesignReply } | { id: number; failed: string };

let worker: Worker | undefined;
let nextId = 0;
const waiting = new Map<number, { resolve: (p: ProposedProfile) => void; reject: (e: unknown) => void }>();

function designWorker(): Worker {
  if (worker) return worker;
  // Vite bundles the worker and the solver's WebAssembly with the app; nothing is fetched from elsewhere.
  worker = new Worker(new URL('./design-worker.ts', import.meta.url), { type: 'module' });
  worker.onmessage = (event: MessageEvent<Answer>) => {
    const answer = event.data;
    const pending = waiting.get(answer.id);
    waiting.delete(answer.id);
    if (!pending) return;
    if ('failed' in answer) pending.reject(new Error(answer.failed));
    else {
      try {
        pending.resolve(fromReply(answer.reply));
      } catch (error) {
        pending.reject(error);
      }
    }
  };
  return worker;
}

/** proposeProfile on the design Web Worker. */
export function proposeInWorker(input: ProposeProfileInput, rules: RuleProfileInput): Promise<ProposedProfile> {
  const id = nextId++;
  return new Promise((resolve, reject) => {
    waiting.set(id, { resolve, reject });
    designWorker().postMessage({ id, input, rules });
  });
}
