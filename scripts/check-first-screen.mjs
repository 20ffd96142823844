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
// Usage, after `vite build`: node scripts/check-first-screen.mjs [distDir]
// Prints one line per chunk and a closing "first screen: N kB gzip of B kB".
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

function main() {
  const dist = resolve(process.argv[2] ?? 'dist');
  let manifest;
  try {
    manifest = JSON.parse(readFileSync(join(dist, '.vite', 'manifest.json'), 'utf8'));
  } catch (error) {
    console.error(
      `first screen: cannot read ${join(dist, '.vite', 'manifest.json')} (${error.message}); run vite build first.`,
    );
    process.exit(1);
  }
  const files = new Set(firstScreenChunks(manifest));
  // Anything index.html loads that the manifest walk missed counts too.
  for (const name of scriptsNamedIn(readFileSync(join(dist, 'index.html'), 'utf8'))) files.add(name);

  let total = 0;
  for (const file of [...files].sort()) {
    const raw = readFileSync(join(dist, file));
    const gz = gzipSync(raw, { level: 9 }).length;
    total += gz;
    console.log(
      `  ${(gz / 1000).toFixed(2).padStart(8)} kB gzip  ${(raw.length / 1000).toFixed(2).padStart(8)} kB  ${file}`,
    );
  }
  const over = total > FIRST_SCREEN_BUDGET_BYTES;
  console.log(
    `first screen: ${(total / 1000).toFixed(2)} kB gzip of ${FIRST_SCREEN_BUDGET_BYTES / 1000} kB` +
      (over ? ' — OVER BUDGET: load more of the screen on first use (src/ui/layout/LazyPart.tsx)' : ''),
  );
  process.exit(over ? 1 : 0);
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) main();
