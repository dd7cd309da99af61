// The server's /api/health latency alone and while ten design proposals run in its worker pool. A script, not
// a test: figures vary by machine and are never asserted.
import { prepareBenchStack } from './bench-stack';

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
  const stack = await prepareBenchStack();
  try {
    const server = await stack.startServer('design-bench-server.ts');
    const health = `${stack.origin}/api/health`;
    const idle = await healthWhile(health, new Promise((r) => setTimeout(r, 3_000)));
    const proposals = new Promise<{ proposals: number; ms: number; feasible: boolean }>((resolve) =>
      server.once('message', (m) => resolve(m as never)),
    );
    server.send('propose');
    const busy = await healthWhile(health, proposals);
    const done = await proposals;
    console.log(`/api/health alone: p95 ${p95(idle).toFixed(1)} ms over ${idle.length} requests`);
    console.log(
      `/api/health while ${done.proposals} proposals (400 stations, 22% bank) ran in the design pool: p95 ${p95(busy).toFixed(1)} ms ` +
        `over ${busy.length} requests; the proposals took ${(done.ms / 1000).toFixed(1)} s (all feasible: ${done.feasible})`,
    );
  } finally {
    await stack.stop();
  }
}

await main();
