import { spawnSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';

const SCRIPT = resolve(import.meta.dirname, '../../scripts/check-first-screen.mjs');
let dirs: string[] = [];
afterEach(() => {
  for (const dir of dirs) rmSync(dir, { recursive: true, force: true });
  dirs = [];
});

/**
 * A made-up dist/: chunks of random bytes (which gzip cannot shrink, so each
 * counts at about its own size), a Vite manifest and an index.html.
 */
function fakeDist(chunks: Record<string, number>, manifest: object, html: string): string {
  const dir = mkdtempSync(join(tmpdir(), 'raincut-first-screen-'));
  dirs.push(dir);
  mkdirSync(join(dir, '.vite'));
  mkdirSync(join(dir, 'assets'));
  for (const [file, bytes] of Object.entries(chunks)) writeFileSync(join(dir, file), randomBytes(bytes));
  writeFileSync(join(dir, '.vite', 'manifest.json'), JSON.stringify(manifest));
  writeFileSync(join(dir, 'index.html'), html);
  return dir;
}

function check(dir: string) {
  const run = spawnSync(process.execPath, [SCRIPT, dir], { encoding: 'utf8' });
  return { status: run.status, out: run.stdout + run.stderr };
}

const MANIFEST = {
  'index.html': { file: 'assets/index.js', isEntry: true, imports: ['_shared.js'], dynamicImports: ['src/lazy.tsx'] },
  '_shared.js': { file: 'assets/shared.js' },
  'src/lazy.tsx': { file: 'assets/lazy.js', isDynamicEntry: true, imports: ['_shared.js'] },
};
const HTML =
  '<script type="module" crossorigin src="./assets/index.js"></script>' +
  '<link rel="modulepreload" crossorigin href="./assets/shared.js">';

describe('the first-screen budget check', () => {
  it('counts the entry and what it imports statically, never a chunk loaded on first use', () => {
    // 60 kB + 60 kB of first screen; the 200 kB lazy chunk alone would be over the 150 kB budget.
    const dir = fakeDist(
      { 'assets/index.js': 60_000, 'assets/shared.js': 60_000, 'assets/lazy.js': 200_000 },
      MANIFEST,
      HTML,
    );
    const { status, out } = check(dir);
    expect(out).toContain('assets/index.js');
    expect(out).toContain('assets/shared.js');
    expect(out).not.toContain('assets/lazy.js');
    expect(out).toMatch(/first screen: 120\.\d\d kB gzip of 150 kB/);
    expect(status).toBe(0);
  });

  it('fails when the first screen is over budget', () => {
    // 60 kB + 100 kB > 150 kB.
    const dir = fakeDist(
      { 'assets/index.js': 60_000, 'assets/shared.js': 100_000, 'assets/lazy.js': 1_000 },
      MANIFEST,
      HTML,
    );
    const { status, out } = check(dir);
    expect(out).toContain('OVER BUDGET');
    expect(status).toBe(1);
  });

  it('also counts a script that index.html loads but the manifest walk would miss', () => {
    const html = `${HTML}<link rel="modulepreload" href="./assets/extra.js">`;
    const dir = fakeDist(
      { 'assets/index.js': 60_000, 'assets/shared.js': 60_000, 'assets/lazy.js': 1_000, 'assets/extra.js': 40_000 },
      MANIFEST,
      html,
    );
    const { status, out } = check(dir);
    expect(out).toContain('assets/extra.js');
    expect(status).toBe(1);
  });

  it('says what is missing when there is no build', () => {
    const dir = mkdtempSync(join(tmpdir(), 'raincut-first-screen-'));
    dirs.push(dir);
    const { status, out } = check(dir);
    expect(out).toContain('run vite build first');
    expect(status).toBe(1);
  });
});
