// The README's sample files (both INVENTED, labelled so in their first line),
// opened in Debian's chromium with every default as it is: the workbench must
// show a baseflow separation and its numbers, not stop (issue 16). The demo's
// catchment (3.2 km²) puts N = A^0.2 = 1.04 days after the peak, past the end
// of the 10-hour record, so the straight line ends at the last sample and the
// screen says so; the numbers are checked against the core on the scenario
// the page saved.
import { resolve } from 'node:path';
import { check, loadSourceModules } from './support.mjs';

const SAMPLES = resolve(import.meta.dirname, '../../public/samples');
const RAIN = resolve(SAMPLES, 'fenmoor-brook-rain-invented.tsv');
const FLOW = resolve(SAMPLES, 'fenmoor-brook-flow-invented.csv');

const loadModules = () => loadSourceModules({ core: '/src/core/index.ts', format: '/src/ui/format.ts' });
const saved = (page) => page.evaluate(() => JSON.parse(localStorage.getItem('raincut.scenario') ?? 'null'));
const shown = async (page, label) =>
  ((await page.getByLabel(label, { exact: true }).first().textContent()) ?? '').trim();

/** Clicks an open-file button, hands the chooser `path`, and accepts the dialog it leads to with `accept`. */
async function openFile(page, button, path, dialogName, accept) {
  const chooser = page.waitForEvent('filechooser');
  await page.getByRole('button', { name: button }).click();
  await (await chooser).setFiles(path);
  const dialog = page.getByRole('dialog', { name: dialogName });
  await dialog.waitFor();
  await dialog.getByRole('button', { name: accept }).click();
  await dialog.waitFor({ state: 'detached' });
}

export const tests = [
  {
    name: 'the README’s sample rain and flow files, opened with every default, give a separation and its numbers',
    async run({ baseUrl, newPage }) {
      const mods = await loadModules();
      const page = await newPage();
      const errors = [];
      page.on('pageerror', (e) => errors.push(e.message));
      await page.goto(baseUrl);
      await openFile(page, 'Open rainfall file…', RAIN, 'Paste rainfall', 'Use these bars');
      await openFile(page, 'Open streamflow file…', FLOW, 'Paste streamflow', 'Use this record');

      await page.waitForFunction(() =>
        Array.isArray(JSON.parse(localStorage.getItem('raincut.scenario') ?? 'null')?.streamflow?.timesH),
      );
      const s = await saved(page);
      check(s.streamflow.timesH.length === 41, `the record saved has ${s.streamflow.timesH.length} samples, not 41`);
      check(s.storm.depthsMm.length === 18, `the storm saved has ${s.storm.depthsMm.length} bars, not 18`);
      check(s.streamflow.baseflow.kind === 'straight-line', `the default separation is ${s.streamflow.baseflow.kind}`);

      check((await page.getByRole('alert').count()) === 0, 'an alert is showing: the path stopped somewhere');
      const r = mods.core.separateBaseflow(s.streamflow, s.streamflow.baseflow, { areaM2: s.catchment.areaM2 });
      const lastH = s.streamflow.timesH[s.streamflow.timesH.length - 1];
      check(r.endTimeH === lastH, `the core ends the line at ${r.endTimeH} h, not at the last sample ${lastH} h`);
      check(r.directVolumeM3 > 0, 'the core finds no direct runoff');
      const notice = page.getByRole('status').filter({ hasText: 'so the line ends at the last sample instead' });
      check((await notice.count()) === 1, 'the screen does not say that the end moved to the last sample');

      const volume = await shown(page, 'Direct runoff volume');
      const want = `${mods.format.formatValue(r.directVolumeM3)} m³`;
      check(volume === want, `the screen shows a direct runoff volume of "${volume}", the core ${want}`);
      const depth = await shown(page, 'Direct runoff depth');
      check(
        depth === `${mods.format.formatValue(r.directDepthMm)} mm`,
        `the screen shows a direct runoff depth of "${depth}", the core ${r.directDepthMm} mm`,
      );
      check(errors.length === 0, `page errors: ${errors.join('; ')}`);
    },
  },
];
