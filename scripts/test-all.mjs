// `npm test`: every test. Installs what is missing (npm dependencies,
// Debian's chromium), then runs the type check, the lint rules (ESLint, with
// the layer rules and no import cycles) and the format check (Prettier), the
// unit and component tests
// (Vitest), and the browser tests against the built app (chromium). The type
// check, lint and format check are each reported on their own line; the closing line "N passed, N failed"
// counts tests. Exits non-zero on any failure listed above it (the rules are
// in gate.mjs).
import { readdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { spawnSync } from 'node:child_process';
import { ROOT, ensureChromium, ensureNodeModules, run } from './ensure.mjs';
import { verdict } from './gate.mjs';

ensureNodeModules();
ensureChromium();

console.log('\n== type check (tsc --noEmit)');
const typecheck = { status: run('npx', ['tsc', '-p', 'tsconfig.json', '--noEmit']) };

console.log('\n== lint (eslint: the layer rules, no import cycles, hook rules, typescript-eslint)');
// The cache lives in node_modules, so a fresh clone lints everything once.
const lint = {
  status: run('npx', ['eslint', '.', '--cache', '--cache-location', join('node_modules', '.cache', 'eslint')]),
};

console.log('\n== format (prettier --check)');
const format = { status: run('npx', ['prettier', '--check', '.', '--log-level', 'warn']) };

console.log('\n== unit and component tests (vitest)');
const reportPath = join(ROOT, 'node_modules', '.raincut-vitest.json');
rmSync(reportPath, { force: true });
const vitest = {
  status: run('npx', ['vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile=${reportPath}`]),
  report: null,
};
try {
  vitest.report = JSON.parse(readFileSync(reportPath, 'utf8'));
} catch {
  // No report: the verdict lists it.
}

console.log('\n== browser tests (vite build, then chromium)');
const build = { status: run('npx', ['vite', 'build', '--logLevel', 'warn']) };
let browser = null;
if (build.status === 0) {
  const result = spawnSync('node', ['test/browser/run.mjs'], {
    cwd: ROOT,
    encoding: 'utf8',
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  process.stdout.write(result.stdout ?? '');
  browser = { status: result.status, stdout: result.stdout ?? '' };
}
const specFiles = readdirSync(join(ROOT, 'test', 'browser')).filter((f) => f.endsWith('.spec.mjs')).length;

const { lines, exitCode } = verdict({ typecheck, lint, format, vitest, build, browser, specFiles });
console.log(`\n${lines.join('\n')}`);
process.exit(exitCode);
