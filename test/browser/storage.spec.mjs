// Storage in Debian's chromium against the built app: a 10⁶-bar scenario is
// kept in the browser's large store (IndexedDB) and comes back after a
// reload; two pages of one browser context (two tabs) see each other's pins
// and saved list without a reload. The scenario is invented (a repeating
// pattern of 5-min bars).
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { check, loadSourceModules } from './support.mjs';

const BARS = 1_000_000;
const MARKER = '{"$format":"raincut-large-store"';

const median = (xs) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

export const tests = [
  {
    name: 'a 10⁶-bar scenario is kept in the large store, said so, and opens again after a reload',
    async run({ baseUrl, newPage }) {
      const { scenario, close } = await loadSourceModules({ scenario: '/src/scenario/index.ts' });
      let text;
      try {
        const read = scenario.parseScenario({
          version: 2,
          name: 'A million bars (invented)',
          notes: '',
          storm: {
            durationsH: new Array(BARS).fill(1 / 12),
            depthsMm: Array.from({ length: BARS }, (_, i) => (i % 40) / 10),
          },
          catchment: { name: 'Invented catchment', areaM2: 1e6 },
          units: 'si',
          method: { kind: 'constant', rateMmH: 8 },
          methodMemory: {},
          observed: null,
          streamflow: null,
        });
        check(read.ok, 'the test scenario does not read');
        text = scenario.scenarioToFileText(read.scenario);
      } finally {
        await close();
      }
      const page = await newPage();
      await page.goto(baseUrl);
      // By path: handing chromium 20 MB as a buffer over the debugging protocol is far slower.
      const dir = await mkdtemp(join(tmpdir(), 'raincut-storage-'));
      const file = join(dir, 'million.json');
      await writeFile(file, text);
      // The page reads the file after setInputFiles returns: it is removed only once the scenario is saved.
      try {
        await page.getByLabel('Scenario file to open').setInputFiles(file, { timeout: 120_000 });
        await page.waitForFunction((m) => localStorage.getItem('raincut.scenario')?.startsWith(m), MARKER, {
          timeout: 120_000,
        });
      } catch (error) {
        // What the page says instead (its notices and the slot's start), so a failure here can be read.
        const seen = await page.evaluate(() => ({
          slot: localStorage.getItem('raincut.scenario')?.slice(0, 120) ?? null,
          name: document.querySelector('#scenario-name')?.value ?? null,
          said: [...document.querySelectorAll('[role=status],[role=alert]')].map((e) => e.textContent).join(' | '),
        }));
        throw new Error(`${error.message}\nthe page: ${JSON.stringify(seen)}`, { cause: error });
      } finally {
        await rm(dir, { recursive: true, force: true });
      }
      await page.getByText('Kept in this browser’s larger store.').waitFor();
      // Autosaves of the 10⁶ bars: each edit of the name saves it again (packing, then the IndexedDB write).
      const name = page.getByLabel('Scenario name');
      for (let k = 1; k <= 5; k++) {
        const before = await page.evaluate(() => localStorage.getItem('raincut.scenario'));
        await name.fill(`A million bars, save ${k}`);
        await name.press('Enter');
        await page.waitForFunction((b) => localStorage.getItem('raincut.scenario') !== b, before, { timeout: 60_000 });
      }
      const times = await page.evaluate(() =>
        ['raincut:large-pack', 'raincut:large-save'].map((n) => performance.getEntriesByName(n).map((e) => e.duration)),
      );
      console.log(
        `  autosave of ${BARS} bars (${times[1].length} saves, loaded machine): packing median ${median(times[0]).toFixed(1)} ms, ` +
          `pack + IndexedDB write median ${median(times[1]).toFixed(1)} ms`,
      );
      await page.reload();
      await page.waitForFunction(
        () => document.querySelector('#scenario-name')?.value === 'A million bars, save 5',
        null,
        { timeout: 120_000 },
      );
      check(
        (await page.evaluate(() => localStorage.getItem('raincut.scenario')))?.startsWith(MARKER),
        'the marker is gone after the reload',
      );

      // The saved list takes it too: its numbers as a record in the large store, a pointer in the list.
      await page.getByRole('button', { name: 'Saved scenarios' }).click();
      const panel = page.getByRole('region', { name: 'Saved scenarios' });
      const saves = [];
      for (let k = 1; k <= 3; k++) {
        const t0 = Date.now();
        await panel.getByRole('button', { name: k === 1 ? 'Save current scenario to list' : /^Update / }).click();
        await panel
          .getByRole('status')
          .getByText(k === 1 ? 'Saved “A million bars, save 5” to the list.' : 'Updated “A million bars, save 5”', {
            exact: false,
          })
          .waitFor({ timeout: 120_000 });
        saves.push(Date.now() - t0);
      }
      await panel.getByText('kept in this browser’s larger database (IndexedDB)', { exact: false }).first().waitFor();
      const listText = await page.evaluate(() => localStorage.getItem('raincut.library'));
      check(listText.length < 2000, `the list's own text holds the numbers (${listText.length} characters)`);
      const listSaves = await page.evaluate(() =>
        performance.getEntriesByName('raincut:list-large-save').map((e) => e.duration),
      );
      console.log(
        `  save of ${BARS} bars to the list (3 saves, loaded machine): click to "Saved" median ${median(saves)} ms, ` +
          `pack + IndexedDB write median ${median(listSaves).toFixed(1)} ms`,
      );
      // Renamed on screen (autosaved), then a reload: Open brings back the list's version from the large store.
      const beforeRename = await page.evaluate(() => localStorage.getItem('raincut.scenario'));
      await name.fill('Renamed after saving to the list');
      await name.press('Enter');
      await page.waitForFunction((b) => localStorage.getItem('raincut.scenario') !== b, beforeRename, {
        timeout: 60_000,
      });
      await page.reload();
      await page.waitForFunction(
        () => document.querySelector('#scenario-name')?.value === 'Renamed after saving to the list',
        null,
        { timeout: 120_000 },
      );
      await page.getByRole('button', { name: 'Saved scenarios' }).click();
      const t1 = Date.now();
      await page
        .getByRole('region', { name: 'Saved scenarios' })
        .getByRole('button', { name: 'Open A million bars, save 5' })
        .click();
      await page.waitForFunction(
        () => document.querySelector('#scenario-name')?.value === 'A million bars, save 5',
        null,
        {
          timeout: 120_000,
        },
      );
      console.log(`  open of the ${BARS}-bar entry from the list: ${Date.now() - t1} ms (loaded machine)`);
      const bars = await page.evaluate(() => localStorage.getItem('raincut.library'));
      check(JSON.parse(bars).entries[0].large.bars === BARS, 'the entry does not hold 10⁶ bars');
    },
  },
  {
    name: 'two tabs: a pin and a saved scenario made in one show in the other without a reload',
    async run({ baseUrl, newPage }) {
      const a = await newPage();
      const b = await newPage();
      await a.goto(baseUrl);
      await b.goto(baseUrl);
      await a.getByRole('button', { name: 'Pin to compare' }).click();
      await b.getByText('1 of 4 pinned').first().waitFor();
      await b.getByRole('button', { name: 'Saved scenarios' }).click();
      const listB = b.getByRole('region', { name: 'Saved scenarios' });
      await listB.getByText('Nothing is saved in the list yet.').waitFor();
      await a.getByRole('button', { name: 'Saved scenarios' }).click();
      await a.getByRole('button', { name: 'Save current scenario to list' }).click();
      await listB.getByRole('list', { name: 'Scenarios saved in this browser' }).waitFor();
      const names = await listB.getByRole('listitem').count();
      check(names === 1, `tab B lists ${names} saved scenarios, not 1`);
    },
  },
];
