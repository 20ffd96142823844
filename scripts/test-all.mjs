// `npm test`: every test. Installs what is missing (npm dependencies,
// Debian's chromium), then runs the type check, the unit and component tests
// (Vitest), and the browser tests against the built app (chromium). Prints one
// closing line "N passed, N failed" over all of them; exits non-zero on any
// failure.
import { readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { spawnSync } from 'node:child_process';
import { ROOT, ensureChromium, ensureNodeModules, run } from './ensure.mjs';

ensureNodeModules();
ensureChromium();

let passed = 0;
let failed = 0;
const failures = [];

console.log('\n== type check (tsc --noEmit)');
if (run('npx', ['tsc', '-p', 'tsconfig.json', '--noEmit']) === 0) passed++;
else {
  failed++;
  failures.push('type check');
}

console.log('\n== unit and component tests (vitest)');
const report = join(ROOT, 'node_modules', '.raincut-vitest.json');
rmSync(report, { force: true });
const vitestStatus = run('npx', ['vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile=${report}`]);
try {
  const json = JSON.parse(readFileSync(report, 'utf8'));
  passed += json.numPassedTests;
  failed += json.numFailedTests;
  if (json.numTotalTests === 0) {
    failed++;
    failures.push('vitest ran no test');
  }
} catch {
  failed++;
  failures.push('vitest wrote no report');
}
if (vitestStatus !== 0 && !failures.length) failures.push('vitest');

console.log('\n== browser tests (vite build, then chromium)');
if (run('npx', ['vite', 'build', '--logLevel', 'warn']) !== 0) {
  failed++;
  failures.push('vite build');
} else {
  const browser = spawnSync('node', ['test/browser/run.mjs'], {
    cwd: ROOT,
    encoding: 'utf8',
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  process.stdout.write(browser.stdout ?? '');
  const m = /browser: (\d+) passed, (\d+) failed/.exec(browser.stdout ?? '');
  if (m) {
    passed += Number(m[1]);
    failed += Number(m[2]);
  }
  if (!m || browser.status !== 0) {
    if (!m) failed++;
    failures.push('browser tests');
  }
}

console.log(`\n${failures.length ? `failed: ${failures.join(', ')}\n` : ''}${passed} passed, ${failed} failed`);
process.exit(failed > 0 || vitestStatus !== 0 ? 1 : 0);
