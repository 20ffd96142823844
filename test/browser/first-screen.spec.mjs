// The first screen's JavaScript stays under its budget (issue 14): measured on
// the build the browser tests run against, by scripts/check-first-screen.mjs.
import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { FIRST_SCREEN_BUDGET_BYTES, firstScreenLine, measureFirstScreen } from '../../scripts/check-first-screen.mjs';
import { check } from './support.mjs';

const DIST = resolve(import.meta.dirname, '../../dist');

export const tests = [
  {
    name: `the first screen's JavaScript (entry chunk and what it preloads) is at most ${FIRST_SCREEN_BUDGET_BYTES / 1000} kB gzip`,
    async run() {
      const measured = measureFirstScreen(DIST);
      const sizes = measured.files.map((f) => `${(f.gzipBytes / 1000).toFixed(2)} kB ${f.file}`).join('\n');
      console.log(`       ${firstScreenLine(measured)}`);
      check(!measured.over, `${firstScreenLine(measured)}\n${sizes}`);
      // The views the first screen does not show are chunks of their own, loaded on first use, not counted.
      const manifest = JSON.parse(readFileSync(join(DIST, '.vite', 'manifest.json'), 'utf8'));
      const lazy = Object.entries(manifest)
        .filter(([, chunk]) => chunk.isDynamicEntry)
        .map(([key]) => key);
      for (const view of ['src/ui/events/index.ts', 'src/ui/design-storm/index.ts', 'src/ui/compare/index.ts']) {
        check(lazy.includes(view), `${view} is not loaded on first use (dynamic entries: ${lazy.join(', ')})`);
      }
      const counted = new Set(measured.files.map((f) => f.file));
      for (const view of lazy) {
        check(!counted.has(manifest[view].file), `${view} is counted in the first screen`);
      }
    },
  },
];
