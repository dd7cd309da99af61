import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';

export const chromiumPath = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

/** Browser tests need Debian's Chromium (never a downloaded one) and poppler's pdftoppm; install them as root. */
export function ensureBrowserTools() {
  const missing = [!existsSync(chromiumPath) && 'chromium', !existsSync('/usr/bin/pdftoppm') && 'poppler-utils'].filter(
    Boolean,
  ) as string[];
  if (missing.length === 0) return;
  if (process.getuid?.() !== 0) {
    throw new Error(`Browser tests need: sudo apt-get install -y ${missing.join(' ')}`);
  }
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  execFileSync('apt-get', ['update'], { stdio: 'inherit', env });
  execFileSync('apt-get', ['install', '-y', ...missing], { stdio: 'inherit', env });
}
