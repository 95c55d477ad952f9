// Set-up shared by `npm start` and `npm test`: plain Node, so it runs before dependencies exist.
import { spawnSync } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

export const root = fileURLToPath(new URL('../../', import.meta.url));

/** Runs a command in the project root with inherited output; returns its exit status. */
export function run(command, args, options = {}) {
  const result = spawnSync(command, args, { cwd: root, stdio: 'inherit', ...options });
  if (result.error) throw result.error;
  return result.status ?? 1;
}

/** Installs dependencies when node_modules is missing or older than the lock file. */
export function ensureDependencies() {
  const installed = `${root}node_modules/.package-lock.json`;
  const lock = `${root}package-lock.json`;
  if (existsSync(installed) && statSync(installed).mtimeMs >= statSync(lock).mtimeMs) return;
  console.log('Installing dependencies (npm ci)...');
  if (run('npm', ['ci', '--no-audit', '--no-fund']) !== 0) {
    throw new Error('npm ci failed: see the messages above');
  }
}

export const chromiumPath = process.env.CHROMIUM_PATH || '/usr/bin/chromium';

/** Makes sure Debian's Chromium is present for browser tests; installs it when running as root. */
export function ensureChromium() {
  if (existsSync(chromiumPath)) return true;
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  if (!isRoot) {
    console.error(`Browser tests need Chromium at ${chromiumPath}. Install it with: sudo apt-get install chromium`);
    return false;
  }
  console.log('Chromium is missing: installing Debian package chromium (apt-get install chromium)...');
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  run('apt-get', ['update'], { env });
  run('apt-get', ['install', '-y', '--no-install-recommends', 'chromium'], { env });
  return existsSync(chromiumPath);
}
