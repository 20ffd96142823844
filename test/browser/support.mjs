// Shared pieces of the browser specs.
//
// loadSourceModules loads the project's own TypeScript modules (the core, the
// scenario layer, the screen's number format, …) into Node through Vite, so a
// spec checks what the page shows against the core computing the same thing —
// never against copied numbers.
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { createServer } from 'vite';

const ROOT = resolve(import.meta.dirname, '../..');

/** axe-core's browser build. */
export const AXE = resolve(ROOT, 'node_modules/axe-core/axe.min.js');

/**
 * Loads axe-core into the page. Evaluated through the browser's debugging
 * protocol rather than added as a <script> tag, which the app's
 * Content-Security-Policy (no inline script) rightly refuses.
 */
export async function addAxe(page) {
  if (await page.evaluate(() => 'axe' in window)) return;
  await page.evaluate(readFileSync(AXE, 'utf8'));
}

/** Throws `message` unless `condition` holds (specs fail by throwing). */
export function check(condition, message) {
  if (!condition) throw new Error(message);
}

/** Loads { name: '/src/…' } source modules; returns them by name plus close(). */
export async function loadSourceModules(paths) {
  const server = await createServer({
    root: ROOT,
    configFile: false,
    logLevel: 'error',
    appType: 'custom',
    server: { middlewareMode: true, hmr: false, ws: false },
    optimizeDeps: { noDiscovery: true, include: [] },
  });
  const modules = {};
  for (const [name, path] of Object.entries(paths)) modules[name] = await server.ssrLoadModule(path);
  return { ...modules, close: () => server.close() };
}

/** The core and the screen's number format. */
export function loadSource() {
  return loadSourceModules({ core: '/src/core/index.ts', format: '/src/ui/format.ts' });
}

/**
 * Checks a number on screen against a value worked by hand (never one the
 * app's own core or formatter computed): the text must read as `exact`
 * rounded to the digits it shows (within half a unit of its last digit),
 * with at least three significant digits, followed by `unit`. Group
 * separators are ignored, so the check holds the number, not the layout.
 */
export function checkShown(text, exact, unit, what) {
  const m = /^([-−]?)([\d,\u00a0\u2009\u202f]+)(?:\.(\d+))?[\s\u00a0\u2009\u202f]*(.*)$/.exec(String(text).trim());
  check(m, `${what}: "${text}" is not a number`);
  const [, sign, whole, fraction = '', shownUnit] = m;
  const digits = whole.replace(/[^\d]/g, '') + fraction;
  const value = Number(`${sign ? '-' : ''}${digits.slice(0, digits.length - fraction.length)}.${fraction || '0'}`);
  const half = 0.5 * 10 ** -fraction.length;
  check(Math.abs(value - exact) <= half * (1 + 1e-9), `${what}: shown "${text}", worked by hand ${exact} ${unit}`);
  check(digits.replace(/^0+/, '').length >= 3 || value === 0, `${what}: "${text}" shows too few digits`);
  check(shownUnit === unit, `${what}: shown in "${shownUnit}", expected "${unit}"`);
}
