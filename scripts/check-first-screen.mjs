// Fails when the first screen's JavaScript is over its budget.
//
// The first screen's JavaScript is what a browser fetches before the
// workbench can show: the entry chunk of index.html and every chunk it
// imports statically (Vite preloads those with <link rel="modulepreload">).
// Chunks loaded by dynamic import (the event set, the design storm view, the
// comparison, exports, dialogs …) are not counted. Read from Vite's manifest
// (build.manifest: true), cross-checked against the scripts dist/index.html
// actually names. Sizes are gzip at level 9 (the usual "gzip size" of
// bundle-size tools; Vite's own build report may differ by about 1 %).
//
// npm test runs it through test/browser/first-screen.spec.mjs, after the build
// the browser tests use. By hand, after `vite build`:
//   node scripts/check-first-screen.mjs [distDir]
// prints one line per chunk and a closing "first screen: N kB gzip of B kB".
import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { gzipSync } from 'node:zlib';

/** Budget for the first screen's JavaScript, bytes of gzip (150 kB; issue 14). */
export const FIRST_SCREEN_BUDGET_BYTES = 150_000;

/** The entry chunk and every chunk it reaches through static imports, by file name. */
export function firstScreenChunks(manifest) {
  const entry = Object.entries(manifest).find(([key, chunk]) => chunk.isEntry && key.endsWith('index.html'));
  if (!entry) throw new Error('the manifest has no entry for index.html');
  const files = new Set();
  const visit = (key) => {
    const chunk = manifest[key];
    if (!chunk) throw new Error(`the manifest names ${key} but holds no chunk for it`);
    if (files.has(chunk.file)) return;
    files.add(chunk.file);
    for (const next of chunk.imports ?? []) visit(next);
  };
  visit(entry[0]);
  return [...files];
}

/** The scripts index.html loads or preloads itself (src of module scripts, href of modulepreload links). */
export function scriptsNamedIn(html) {
  const names = new Set();
  for (const tag of html.match(/<(?:script|link)\b[^>]*>/gi) ?? []) {
    const isScript = /^<script/i.test(tag);
    if (!isScript && !/\brel=["']?modulepreload/i.test(tag)) continue;
    const ref = /\b(?:src|href)=["']([^"']+)["']/i.exec(tag)?.[1];
    if (ref && ref.endsWith('.js')) names.add(ref.replace(/^\.?\//, ''));
  }
  return [...names];
}

/**
 * The first screen's chunks in a built dist/ with their sizes (bytes, raw and
 * gzip), their total gzip, and whether it is over the budget.
 */
export function measureFirstScreen(dist) {
  const manifest = JSON.parse(readFileSync(join(dist, '.vite', 'manifest.json'), 'utf8'));
  const names = new Set(firstScreenChunks(manifest));
  // Anything index.html loads that the manifest walk missed counts too.
  for (const name of scriptsNamedIn(readFileSync(join(dist, 'index.html'), 'utf8'))) names.add(name);
  const files = [...names].sort().map((file) => {
    const raw = readFileSync(join(dist, file));
    return { file, rawBytes: raw.length, gzipBytes: gzipSync(raw, { level: 9 }).length };
  });
  const totalGzipBytes = files.reduce((sum, f) => sum + f.gzipBytes, 0);
  return { files, totalGzipBytes, over: totalGzipBytes > FIRST_SCREEN_BUDGET_BYTES };
}

/** The closing line: "first screen: N kB gzip of 150 kB", and what to do when over. */
export function firstScreenLine({ totalGzipBytes, over }) {
  return (
    `first screen: ${(totalGzipBytes / 1000).toFixed(2)} kB gzip of ${FIRST_SCREEN_BUDGET_BYTES / 1000} kB` +
    (over ? ' — OVER BUDGET: load more of the screen on first use (src/ui/layout/LazyPart.tsx)' : '')
  );
}

function main() {
  const dist = resolve(process.argv[2] ?? 'dist');
  let measured;
  try {
    measured = measureFirstScreen(dist);
  } catch (error) {
    console.error(`first screen: cannot read the build in ${dist} (${error.message}); run vite build first.`);
    process.exit(1);
  }
  for (const f of measured.files) {
    console.log(
      `  ${(f.gzipBytes / 1000).toFixed(2).padStart(8)} kB gzip  ${(f.rawBytes / 1000).toFixed(2).padStart(8)} kB  ${f.file}`,
    );
  }
  console.log(firstScreenLine(measured));
  process.exit(measured.over ? 1 : 0);
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) main();
