// The installed app with no network, in Debian's chromium against the built
// app: after one visit the service worker keeps the workbench, so with the
// browser offline a reload still opens it, φ still moves the results (checked
// against the core), and the parts loaded on first use and the sample files
// come from what the worker stored. The manifest names Raincut with its own
// icons, and chromium finds it installable; a new version waits for the
// user's reload and the page says so.
import { cp, mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { serveDist } from './harness.mjs';
import { check, loadSourceModules } from './support.mjs';

const DIST = resolve(import.meta.dirname, '../../dist');

const text = async (page, label) =>
  ((await page.getByLabel(label, { exact: true }).first().textContent()) ?? '').trim();

/** Waits until the service worker has stored the app and controls the page. */
async function keptByWorker(page) {
  await page.waitForFunction(() => navigator.serviceWorker?.controller != null, null, { timeout: 30_000 });
}

/** The results panel as the core computes it for a storm and loss rate (the page's own number format). */
function expectedResults(core, format, scenario, rateMmH) {
  const r = core.computeLosses(scenario.storm, { kind: 'constant', rateMmH });
  const mm = (v) => `${format.formatValue(v)} mm`;
  return {
    'Rainfall depth': mm(r.rainMm),
    'Loss depth': mm(r.totalLossMm),
    'Excess depth': mm(r.totalExcessMm),
    'Runoff volume': `${format.formatValue(core.runoffVolumeM3(r.totalExcessMm, scenario.catchment.areaM2))} m³`,
    'Runoff fraction': format.formatPercent(r.runoffFraction),
  };
}

async function checkResults(page, want) {
  for (const [label, value] of Object.entries(want)) {
    const shown = await text(page, label);
    check(shown === value, `${label}: shown "${shown}", the core gives "${value}"`);
  }
}

/** Width and height from a PNG's header. */
function pngSize(bytes) {
  check(bytes.subarray(1, 4).toString('latin1') === 'PNG', 'not a PNG file');
  return [bytes.readUInt32BE(16), bytes.readUInt32BE(20)];
}

export const tests = [
  {
    name: 'after one visit the workbench works offline: reload, results and a φ change as the core computes them, views loaded on first use, samples',
    async run({ context, baseUrl, newPage }) {
      const { core, format, demo, close } = await loadSourceModules({
        core: '/src/core/index.ts',
        format: '/src/ui/format.ts',
        demo: '/src/scenario/demo.ts',
      });
      try {
        const scenario = demo.DEMO_SCENARIO;
        const page = await newPage();
        const errors = [];
        page.on('pageerror', (e) => errors.push(e.message));
        await page.goto(baseUrl);
        await checkResults(page, expectedResults(core, format, scenario, 8));
        await keptByWorker(page);

        await context.setOffline(true);
        const failed = [];
        page.on('requestfailed', (r) => failed.push(`${r.url()} (${r.failure()?.errorText})`));
        await page.reload();
        check(await page.evaluate(() => navigator.onLine === false), 'the browser is not offline');
        await checkResults(page, expectedResults(core, format, scenario, 8));

        // φ from the keyboard: one coarse step up, then the results for the new rate.
        const line = page.getByRole('slider', { name: 'Loss rate φ' });
        await line.focus();
        await page.keyboard.press('PageUp');
        const phi = Number(await line.getAttribute('data-value-mmh'));
        check(phi > 8, `PageUp should raise φ above 8 mm/h, it is ${phi}`);
        await page
          .getByLabel('Excess depth', { exact: true })
          .first()
          .filter({ hasText: expectedResults(core, format, scenario, phi)['Excess depth'] })
          .waitFor();
        await checkResults(page, expectedResults(core, format, scenario, phi));

        // The parts whose code loads on first use come from the stored app too.
        await page.getByRole('tab', { name: 'Event set' }).click();
        await page.getByRole('region', { name: 'Events of this catchment' }).waitFor();
        await page.getByRole('tab', { name: 'Design storm' }).click();
        await page.getByRole('group', { name: 'Storm shape' }).waitFor();
        await page.getByRole('tab', { name: 'Workbench' }).click();
        await page.getByRole('button', { name: 'Paste rainfall…' }).click();
        const dialog = page.getByRole('dialog', { name: 'Paste rainfall' });
        await dialog.getByRole('button', { name: 'Cancel' }).click();
        await dialog.waitFor({ state: 'detached' });
        const download = page.waitForEvent('download');
        await page.getByRole('button', { name: 'Export CSV' }).click();
        check((await download).suggestedFilename().endsWith('-bars.csv'), 'the CSV export did not arrive');
        await page.getByRole('button', { name: 'Pin to compare' }).click();
        await page.getByRole('region', { name: 'Compare pinned scenarios' }).waitFor();

        // The invented samples the README points to are stored as well.
        for (const sample of ['fenmoor-brook-rain-invented.tsv', 'fenmoor-brook-flow-invented.csv']) {
          const body = await page.evaluate(async (url) => {
            const r = await fetch(url);
            return r.ok ? r.text() : `HTTP ${r.status}`;
          }, `./samples/${sample}`);
          check(/invented/i.test(body.split('\n')[0] ?? ''), `${sample} offline: ${body.slice(0, 80)}`);
        }
        check(failed.length === 0, `requests that needed the network:\n${failed.join('\n')}`);
        check(errors.length === 0, errors.join('; '));
      } finally {
        await close();
      }
    },
  },
  {
    name: 'the web app manifest names Raincut, with its own icons and the palette’s colours, and chromium finds the app installable',
    async run({ context, baseUrl, newPage }) {
      const page = await newPage();
      await page.goto(baseUrl);
      await keptByWorker(page);
      // Chromium's own verdict. A test browser is always a private profile ("in-incognito"); nothing else may be missing.
      const cdp = await context.newCDPSession(page);
      const parsed = await cdp.send('Page.getAppManifest');
      check(parsed.errors.length === 0, `manifest errors: ${JSON.stringify(parsed.errors)}`);
      const { installabilityErrors } = await cdp.send('Page.getInstallabilityErrors');
      const missing = installabilityErrors.filter((e) => e.errorId !== 'in-incognito').map((e) => e.errorId);
      check(missing.length === 0, `not installable: ${missing.join(', ')}`);
      const href = await page.locator('link[rel="manifest"]').getAttribute('href');
      check(href, 'index.html links no manifest');
      const manifestUrl = new URL(href, baseUrl);
      const manifest = await (await page.request.get(manifestUrl.href)).json();
      check(manifest.name === 'Raincut · rainfall loss workbench', `name: ${manifest.name}`);
      check(manifest.short_name === 'Raincut', `short_name: ${manifest.short_name}`);
      check(manifest.display === 'standalone' && manifest.start_url === './', 'not a standalone app starting here');
      // The palette of src/styles/app.css: the excess blue and the paper.
      const css = await readFile(resolve(import.meta.dirname, '../../src/styles/app.css'), 'utf8');
      const colour = (name) => new RegExp(`--${name}:\\s*(#[0-9a-f]{6})`, 'i').exec(css)?.[1];
      check(manifest.theme_color === colour('excess'), `theme colour ${manifest.theme_color} is not --excess`);
      check(manifest.background_color === colour('paper'), `background ${manifest.background_color} is not --paper`);
      check(
        (await page.locator('meta[name="theme-color"]').getAttribute('content')) === manifest.theme_color,
        'the page’s theme colour differs from the manifest’s',
      );
      const sizes = new Set();
      for (const icon of manifest.icons) {
        const res = await page.request.get(new URL(icon.src, manifestUrl).href);
        check(res.ok(), `${icon.src}: HTTP ${res.status()}`);
        if (icon.type === 'image/png') {
          const [w, h] = pngSize(await res.body());
          check(`${w}x${h}` === icon.sizes, `${icon.src} is ${w}×${h}, the manifest says ${icon.sizes}`);
        }
        sizes.add(`${icon.sizes} ${icon.purpose ?? 'any'}`);
      }
      for (const need of ['192x192 any', '512x512 any', '512x512 maskable']) {
        check(sizes.has(need), `no ${need} icon`);
      }
    },
  },
  {
    name: 'a new version waits for the user: the page says so, keeps running until “Reload now”, and the reload keeps the scenario',
    async run({ browser }) {
      // A copy of the build this test may change, on a server of its own.
      const copy = await mkdtemp(join(tmpdir(), 'raincut-update-'));
      await cp(DIST, copy, { recursive: true });
      const server = await serveDist(copy);
      const context = await browser.newContext({ viewport: { width: 1400, height: 900 } });
      try {
        const page = await context.newPage();
        const errors = [];
        page.on('pageerror', (e) => errors.push(e.message));
        await page.goto(server.baseUrl);
        await keptByWorker(page);
        await page.getByLabel('Scenario name').fill('Before the update (invented)');
        await page.evaluate(() => {
          window.sameDocument = true;
        });

        // The next version: another service worker script on the server.
        const sw = join(copy, 'sw.js');
        await writeFile(sw, `${await readFile(sw, 'utf8')}\n// next version\n`);
        await page.evaluate(async () => (await navigator.serviceWorker.getRegistration())?.update());
        const notice = page.getByRole('region', { name: 'New version' });
        await notice.filter({ hasText: 'A new version of Raincut is ready.' }).waitFor({ timeout: 30_000 });
        check(
          (await notice.textContent()).includes('Your scenario is saved in this browser'),
          `the notice does not say the scenario is safe: ${await notice.textContent()}`,
        );
        // Nothing happens by itself.
        await page.waitForTimeout(1500);
        check(await page.evaluate(() => window.sameDocument === true), 'the page reloaded without being asked');

        await Promise.all([
          page.waitForEvent('load', { timeout: 30_000 }),
          notice.getByRole('button', { name: 'Reload now' }).click(),
        ]);
        await page.getByLabel('Scenario name').waitFor();
        check(await page.evaluate(() => window.sameDocument === undefined), 'the page did not reload');
        check(
          (await page.getByLabel('Scenario name').inputValue()) === 'Before the update (invented)',
          'the scenario was not kept across the update',
        );
        const worker = await page.evaluate(async () => {
          const r = await navigator.serviceWorker.getRegistration();
          return { waiting: r?.waiting != null, controlled: navigator.serviceWorker.controller != null };
        });
        check(worker.controlled && !worker.waiting, `after the reload: ${JSON.stringify(worker)}`);
        check((await notice.count()) === 0, 'the notice is still shown after the update');
        check(errors.length === 0, errors.join('; '));
      } finally {
        await context.close();
        await server.close();
        await rm(copy, { recursive: true, force: true });
      }
    },
  },
];
