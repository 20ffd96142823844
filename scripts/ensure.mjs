// Set-up steps shared by `npm start` and `npm test` on a fresh machine:
// install the locked npm dependencies when they are missing, and (for the
// browser tests) Debian's chromium when it is missing. Nothing here downloads
// a browser of its own.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';

export const ROOT = resolve(import.meta.dirname, '..');
export const CHROMIUM = process.env.RAINCUT_CHROMIUM ?? '/usr/bin/chromium';

export function run(cmd, args, options = {}) {
  const result = spawnSync(cmd, args, { stdio: 'inherit', cwd: ROOT, ...options });
  if (result.error) throw result.error;
  return result.status ?? 1;
}

/** npm ci when node_modules is missing or older than the lock file's install. */
export function ensureNodeModules() {
  const marker = join(ROOT, 'node_modules', '.package-lock.json');
  if (existsSync(marker)) return;
  console.log('raincut: installing dependencies (npm ci) …');
  if (run('npm', ['ci', '--no-audit', '--no-fund']) !== 0) {
    throw new Error('npm ci failed; see the messages above.');
  }
}

/** Debian's chromium for the browser tests, installed with apt-get when missing. */
export function ensureChromium() {
  if (existsSync(CHROMIUM)) return;
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  if (!isRoot || !existsSync('/usr/bin/apt-get')) {
    throw new Error(
      `The browser tests need Debian's chromium at ${CHROMIUM}. Install it with ` +
        '`sudo apt-get install chromium`, or point RAINCUT_CHROMIUM at a chromium binary.',
    );
  }
  console.log("raincut: installing Debian's chromium for the browser tests …");
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (
    run('apt-get', ['update', '-q'], { env }) !== 0 ||
    run('apt-get', ['install', '-y', '-q', 'chromium'], { env }) !== 0
  ) {
    throw new Error('apt-get could not install chromium; see the messages above.');
  }
}
