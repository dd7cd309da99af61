import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

/** `npm run bench`: each benchmark in its own process, so one's heap and JIT state cannot colour the next. */
const benches = ['engine.bench.ts', 'design-pool.bench.ts', 'queue.bench.ts'];
let failed = false;
for (const bench of benches) {
  const file = fileURLToPath(new URL(bench, import.meta.url));
  if (!existsSync(file)) {
    console.error(`missing benchmark ${bench}`);
    failed = true;
    continue;
  }
  console.log(`\n=== ${bench} ===`);
  const result = spawnSync(process.execPath, ['--import', 'tsx', file], {
    stdio: 'inherit',
    env: { ...process.env, AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED: 'true' },
  });
  if (result.status !== 0) failed = true;
}
process.exit(failed ? 1 : 0);
