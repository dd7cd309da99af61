// Runs before anything else on a fresh clone, so it may use nothing but Node itself.
import { execSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../..', import.meta.url));
const lock = `${root}package-lock.json`;
const stamp = `${root}node_modules/.gradepass-lock-hash`;

const [major, minor] = process.versions.node.split('.').map(Number);
if (major < 20 || (major === 20 && minor < 19)) {
  console.error(`Gradepass needs Node.js 20.19 or newer; this is ${process.version}.`);
  process.exit(1);
}

const want = createHash('sha256').update(readFileSync(lock)).digest('hex');
const have = existsSync(stamp) ? readFileSync(stamp, 'utf8').trim() : '';
if (want !== have) {
  console.log('Installing dependencies (package-lock.json changed or node_modules is missing)...');
  execSync('npm ci --no-audit --no-fund', { cwd: root, stdio: 'inherit' });
  writeFileSync(stamp, want);
}
