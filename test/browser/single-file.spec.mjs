// The single-file build (npm run build:single → dist-single/raincut.html),
// made afresh by this spec and opened from disk by a file:// URL in chromium:
// everything is inside the one file (the views loaded on first use too), no
// service worker, its own Content-Security-Policy allows exactly its inline
// script and style, the workbench shows the core's results, and share links
// made and opened in a file:// page work.
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { readdir, readFile } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { check, loadSourceModules } from './support.mjs';

const ROOT = resolve(import.meta.dirname, '../..');
const OUT = join(ROOT, 'dist-single');
const FILE = join(OUT, 'raincut.html');

/** Builds the single file as `npm run build:single` does (once per run). */
let built = null;
function buildSingleFile() {
  built ??= (() => {
    // A production build whatever this process carries: a Vite dev server started by an earlier spec
    // (loadSourceModules) sets NODE_ENV=development, which would give React's development build.
    const run = spawnSync('npx', ['vite', 'build', '-c', 'vite.single.config.ts', '--logLevel', 'warn'], {
      cwd: ROOT,
      encoding: 'utf8',
      env: { ...process.env, NODE_ENV: 'production' },
    });
    if (run.status !== 0) throw new Error(`npm run build:single failed:\n${run.stdout}${run.stderr}`);
    return true;
  })();
}

const text = async (page, label) =>
  ((await page.getByLabel(label, { exact: true }).first().textContent()) ?? '').trim();

/** Opens the file in a fresh page that records every console error, page error and request. */
async function openFile(newPage, fragment = '') {
  const page = await newPage();
  const seen = { errors: [], requests: [] };
  page.on('console', (m) => {
    if (m.type() === 'error') seen.errors.push(m.text());
  });
  page.on('pageerror', (e) => seen.errors.push(e.message));
  page.on('request', (r) => {
    if (!/^(data|blob):/.test(r.url())) seen.requests.push(r.url());
  });
  await page.goto(`${pathToFileURL(FILE).href}${fragment}`);
  return { page, seen };
}

export const tests = [
  {
    name: 'npm run build:single writes one HTML file with every chunk inside, no service worker, and a policy that allows exactly its inline code',
    async run() {
      buildSingleFile();
      check(
        JSON.stringify(await readdir(OUT)) === JSON.stringify(['raincut.html']),
        `dist-single holds ${await readdir(OUT)}`,
      );
      const html = await readFile(FILE, 'utf8');
      // The page's own tags, without the text of the inlined script and style (whose strings may hold anything).
      const tags = html.replace(/(<(script|style)\b[^>]*>)[\s\S]*?(<\/\2>)/gi, '$1$3');
      // Nothing fetched: no script or style files, no chunk imported at run time, no worker, no manifest.
      check(!/<script[^>]*\ssrc=/i.test(tags), 'a script is still loaded from a file');
      check(!/<link[^>]*rel="(stylesheet|modulepreload|manifest)"/i.test(tags), 'a file is still linked');
      check(!/\bimport\(\s*["'`][./]/.test(html), 'a chunk is still imported at run time');
      check(!html.includes('Download the React DevTools'), 'React’s development build is in the file');
      check(!/serviceWorker\.register|workbox/i.test(html), 'the single file carries a service worker');
      // The views loaded on first use in the served app are inside the file.
      for (const words of ['Events of this catchment', 'Storm shape', 'Compare pinned scenarios', 'Use these bars']) {
        check(html.includes(words), `“${words}” is not in the file`);
      }
      // The policy: hashes of the one inline script and the one style, worked out here afresh.
      const policy = /<meta http-equiv="Content-Security-Policy" content="([^"]*)"/.exec(html)?.[1];
      check(policy, 'the file has no Content-Security-Policy');
      const hash = (body) => `'sha256-${createHash('sha256').update(body, 'utf8').digest('base64')}'`;
      const scripts = [...html.matchAll(/<script\b[^>]*>([\s\S]*?)<\/script>/g)].map((m) => m[1]);
      const styles = [...html.matchAll(/<style\b[^>]*>([\s\S]*?)<\/style>/g)].map((m) => m[1]);
      check(scripts.length === 1 && styles.length === 1, `${scripts.length} scripts, ${styles.length} styles`);
      const directives = Object.fromEntries(
        policy.split(';').map((d) => {
          const [name, ...values] = d.trim().split(/\s+/);
          return [name, values.join(' ')];
        }),
      );
      check(directives['default-src'] === "'none'", `default-src ${directives['default-src']}`);
      check(directives['script-src'] === hash(scripts[0]), `script-src ${directives['script-src']}`);
      check(directives['style-src'] === hash(styles[0]), `style-src ${directives['style-src']}`);
      check(!/unsafe-inline/.test(directives['script-src']), 'inline script allowed wholesale');
    },
  },
  {
    name: 'opened from disk, the workbench shows the core’s results, follows φ, opens every view, and breaks no policy',
    async run({ newPage }) {
      buildSingleFile();
      const { core, format, demo, close } = await loadSourceModules({
        core: '/src/core/index.ts',
        format: '/src/ui/format.ts',
        demo: '/src/scenario/demo.ts',
      });
      try {
        const { page, seen } = await openFile(newPage);
        const scenario = demo.DEMO_SCENARIO;
        const results = (rateMmH) => {
          const r = core.computeLosses(scenario.storm, { kind: 'constant', rateMmH });
          return { rain: `${format.formatValue(r.rainMm)} mm`, excess: `${format.formatValue(r.totalExcessMm)} mm` };
        };
        check((await text(page, 'Rainfall depth')) === results(8).rain, 'rainfall depth is not the core’s');
        check((await text(page, 'Excess depth')) === results(8).excess, 'excess depth is not the core’s');
        const line = page.getByRole('slider', { name: 'Loss rate φ' });
        await line.focus();
        await page.keyboard.press('PageDown');
        const phi = Number(await line.getAttribute('data-value-mmh'));
        check(phi < 8, `PageDown should lower φ below 8 mm/h, it is ${phi}`);
        await page
          .getByLabel('Excess depth', { exact: true })
          .first()
          .filter({ hasText: results(phi).excess })
          .waitFor();

        await page.getByRole('tab', { name: 'Event set' }).click();
        await page.getByRole('region', { name: 'Events of this catchment' }).waitFor();
        await page.getByRole('tab', { name: 'Design storm' }).click();
        await page.getByRole('group', { name: 'Storm shape' }).waitFor();
        await page.getByRole('tab', { name: 'Workbench' }).click();
        await page.getByRole('button', { name: 'Pin to compare' }).click();
        await page.getByRole('region', { name: 'Compare pinned scenarios' }).waitFor();
        // The chart export writes computed styles into its copy: the policy must allow it.
        const download = page.waitForEvent('download');
        await page.getByRole('button', { name: 'Export SVG' }).click();
        check((await download).suggestedFilename().endsWith('-chart.svg'), 'the SVG export did not arrive');

        // (A file:// page cannot have a service worker at all; the first test checks the file carries none.)
        check(
          seen.requests.length === 1 && seen.requests[0] === pathToFileURL(FILE).href,
          `requests besides the file itself: ${seen.requests.join(', ')}`,
        );
        check(seen.errors.length === 0, `errors (a blocked script or style shows here):\n${seen.errors.join('\n')}`);
      } finally {
        await close();
      }
    },
  },
  {
    name: 'share links work in a file:// page: a link opens its scenario, and Copy link gives the file’s address and says where it opens',
    async run({ browser, newPage }) {
      buildSingleFile();
      const { scenario, demo, close } = await loadSourceModules({
        scenario: '/src/scenario/index.ts',
        demo: '/src/scenario/demo.ts',
      });
      try {
        const sent = { ...demo.DEMO_SCENARIO, name: 'Sent as a file link (invented)' };
        const made = scenario.makeShareLink(sent);
        check(made.ok, 'the test scenario makes no link');
        const { page, seen } = await openFile(newPage, `#${made.fragment}`);
        await page.getByRole('region', { name: 'Shared scenario: “Sent as a file link (invented)”' }).waitFor();
        check(
          (await page.getByLabel('Scenario name').inputValue()) === sent.name,
          'the shared scenario is not on screen',
        );
        await page.getByRole('button', { name: 'Keep the shared scenario' }).click();
        await page.waitForFunction(() => window.location.hash === '');

        // Copy link: the clipboard is watched by an init script (the page's own policy does not apply to it).
        await page.addInitScript(() => {
          window.copiedLinks = [];
          Object.defineProperty(navigator, 'clipboard', {
            value: { writeText: async (t) => void window.copiedLinks.push(t) },
          });
        });
        await page.reload();
        await page.getByLabel('Scenario name').fill('Copied from a file page (invented)');
        await page.getByRole('button', { name: 'Copy link' }).click();
        const message = page.getByRole('status', { name: 'Scenario tools message' });
        await message.filter({ hasText: 'Link copied.' }).waitFor();
        check(
          (await message.textContent()).includes('This page was opened from a file'),
          'the message does not say where a file page’s link opens',
        );
        const [link] = await page.evaluate(() => window.copiedLinks);
        check(link?.startsWith(`${pathToFileURL(FILE).href}#`), `the link is ${link?.slice(0, 80)}`);
        // The link reader's decompressor is fetched on first use (src/scenario/link.ts), here as on the page.
        await scenario.loadLinkReader();
        const decoded = scenario.decodeScenarioLink(link.slice(link.indexOf('#') + 1));
        check(decoded.ok && decoded.scenario.name === 'Copied from a file page (invented)', 'the link does not decode');

        // A colleague's browser (fresh storage) opening the copied link.
        const colleague = await browser.newContext();
        try {
          const other = await openFile(() => colleague.newPage(), link.slice(link.indexOf('#')));
          await other.page
            .getByRole('region', { name: 'Shared scenario: “Copied from a file page (invented)”' })
            .waitFor();
          const errors = [...seen.errors, ...other.seen.errors];
          check(errors.length === 0, errors.join('\n'));
        } finally {
          await colleague.close();
        }
      } finally {
        await close();
      }
    },
  },
];
