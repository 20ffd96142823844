// Browser-test harness: serves the built app (dist/) on loopback, launches
// Debian's chromium through playwright-core (never a downloaded browser) and
// runs every test/browser/*.spec.mjs. A spec exports
//   export const tests = [{ name, run: async ({ browser, baseUrl, newPage }) => {} }]
// A test fails by throwing, and also when any page it opened (in the context
// it was given or in one it made) throws an uncaught error or logs a
// console.error: the runner collects those with watchErrors() below, so no
// spec has to. A test that provokes an error on purpose names it in
// `expectErrors: [/pattern/, …]`; each pattern must then be seen at least once.
// Prints one line per test and "N passed, N failed".
import { createServer } from 'node:http';
import { readFile, stat } from 'node:fs/promises';
import { extname, join, normalize, resolve } from 'node:path';
import { chromium } from 'playwright-core';

const ROOT = resolve(import.meta.dirname, '../..');
const DIST = join(ROOT, 'dist');
const TYPES = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.json': 'application/json',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
  '.webmanifest': 'application/manifest+json',
  '.map': 'application/json',
};

export const CHROMIUM_PATH = process.env.RAINCUT_CHROMIUM ?? '/usr/bin/chromium';
export const CHROMIUM_FLAGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** Serves dist/ (or another built copy) on 127.0.0.1 at a free port. */
export async function serveDist(dir = DIST) {
  await stat(join(dir, 'index.html')).catch(() => {
    throw new Error('dist/index.html is missing: run `vite build` first.');
  });
  const server = createServer(async (req, res) => {
    try {
      const url = new URL(req.url ?? '/', 'http://localhost');
      let path = normalize(decodeURIComponent(url.pathname)).replace(/^([/\\])+/, '');
      if (path === '' || path.endsWith('/')) path += 'index.html';
      const file = join(dir, path);
      if (!file.startsWith(dir)) throw new Error('outside');
      const body = await readFile(file);
      res.writeHead(200, { 'content-type': TYPES[extname(file)] ?? 'application/octet-stream' });
      res.end(body);
    } catch {
      res.writeHead(404);
      res.end('not found');
    }
  });
  await new Promise((ok) => server.listen(0, '127.0.0.1', ok));
  const { port } = server.address();
  return { baseUrl: `http://127.0.0.1:${port}/`, close: () => new Promise((ok) => server.close(ok)) };
}

/**
 * Launches chromium. playwright-core's launch() always gives the browser a
 * fresh, empty profile (it creates its own temporary --user-data-dir and
 * refuses one passed in args), which is what these tests need: every
 * launchBrowser() call is a browser that has never seen the app. Specs that
 * need a second, fresh browser (a colleague opening a shared link) call
 * launchBrowser() again, or use browser.newContext() for fresh storage.
 */
export async function launchBrowser() {
  const browser = await chromium.launch({
    executablePath: CHROMIUM_PATH,
    headless: true,
    args: CHROMIUM_FLAGS,
  });
  return { browser, close: () => browser.close() };
}

/**
 * Collects what pages report going wrong: uncaught exceptions ("pageerror")
 * and console.error messages. watchBrowser wraps a browser so every context
 * and page made from it is watched; watchContext watches every page of a
 * context, the ones it has and the ones it opens later.
 */
export function watchErrors() {
  const errors = [];
  const watchPage = (page) => {
    page.on('pageerror', (error) => errors.push(`uncaught page error: ${error.message}`));
    page.on('console', (message) => {
      if (message.type() === 'error') errors.push(`console.error: ${message.text()}`);
    });
    return page;
  };
  const watchContext = (context) => {
    for (const page of context.pages()) watchPage(page);
    context.on('page', watchPage);
    return context;
  };
  const watchBrowser = (browser) =>
    new Proxy(browser, {
      get(target, key) {
        if (key === 'newContext') return async (...args) => watchContext(await target.newContext(...args));
        if (key === 'newPage') return async (...args) => watchPage(await target.newPage(...args));
        const value = Reflect.get(target, key, target);
        return typeof value === 'function' ? value.bind(target) : value;
      },
    });
  return { errors, watchPage, watchContext, watchBrowser };
}

/**
 * The errors a test did not expect, and the expected ones that never came:
 * each pattern in `expected` takes every error it matches and must match one.
 */
export function unexpectedErrors(errors, expected = []) {
  const left = errors.filter((e) => !expected.some((pattern) => pattern.test(e)));
  const missing = expected.filter((pattern) => !errors.some((e) => pattern.test(e)));
  return [...left, ...missing.map((pattern) => `an error the test expects never came: ${pattern}`)];
}
