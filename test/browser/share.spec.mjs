// Sharing and exports in Debian's chromium, against the built app: build a
// scenario on screen, copy its link and open it in a fresh browser context
// (no shared storage) where the same results must show; a damaged link keeps
// the saved scenario; the CSV export reads back to the same bars, the SVG is
// valid and carries the page's colours inline, the PNG is drawn at 2×, and the
// printed report is a summary page, then the bar table on a page of its own
// (48 bars fit a Letter and an A4 page).
import { readFile } from 'node:fs/promises';
import Papa from 'papaparse';
import { addAxe, check, loadSourceModules } from './support.mjs';

/** Source modules to check the page against (see support.mjs). */
const loadModules = () => loadSourceModules({ core: '/src/core/index.ts', scenario: '/src/scenario/index.ts' });

const RESULTS = [
  'Rainfall depth',
  'Loss depth',
  'Excess depth',
  'Runoff volume',
  'Runoff fraction',
  'Peak excess intensity',
];

const shown = async (page, label) =>
  ((await page.getByLabel(label, { exact: true }).first().textContent()) ?? '').trim();
const results = async (page) =>
  Object.fromEntries(await Promise.all(RESULTS.map(async (l) => [l, await shown(page, l)])));
const stored = (page) => page.evaluate(() => localStorage.getItem('raincut.scenario'));

/** Waits until the page has saved the scenario with this name (the last edit made), and returns its text. */
async function savedAs(page, name) {
  await page.waitForFunction((n) => JSON.parse(localStorage.getItem('raincut.scenario') ?? 'null')?.name === n, name);
  return stored(page);
}

/** Builds a scenario on screen: three bars typed into the table, another method and its parameters, US units. */
async function buildScenario(page) {
  const grid = page.getByRole('grid', { name: 'Bar table' });
  const cell = (bar, col) => grid.locator(`[role="row"][aria-rowindex="${bar + 1}"] [aria-colindex="${col}"]`);
  for (const [bar, depth] of [
    [3, '2.25'],
    [8, '9.75'],
    [12, '0'],
  ]) {
    await cell(bar, 4).click();
    await page.keyboard.type(depth);
    await page.keyboard.press('Enter');
  }
  await page.getByLabel('Loss method').selectOption('initial-continuing');
  for (const [name, value] of [
    [/^Initial loss/, '7.5'],
    [/^Continuing loss rate/, '3.25'],
  ]) {
    const field = page.getByRole('textbox', { name });
    await field.fill(value);
    await field.press('Enter');
  }
  await page.getByRole('radio', { name: 'US customary' }).check();
  await page.getByLabel('Scenario name').fill('Share check (invented)');
}

/** Copies the link: from the clipboard, or from the box shown when the clipboard is refused. */
async function copyLink(page) {
  await page.getByRole('button', { name: 'Copy link' }).click();
  const message = page.getByLabel('Scenario tools message');
  await message.waitFor();
  const box = message.getByRole('textbox', { name: 'Share link' });
  const link =
    (await box.count()) > 0 ? await box.inputValue() : await page.evaluate(() => navigator.clipboard.readText());
  const said = (await message.textContent()) ?? '';
  check(
    said.includes(`The link is ${link.length} characters long`),
    `the length said is not the link's ${link.length}: "${said}"`,
  );
  return link;
}

async function download(page, button) {
  const [file] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: button }).click()]);
  const path = await file.path();
  check(path, `${button}: the download has no file`);
  return { name: file.suggestedFilename(), bytes: await readFile(path) };
}

/** The pages of the page printed to PDF in a paper format. */
async function pdfPages(page, format) {
  const pdf = await page.pdf({ format, printBackground: true });
  return (pdf.toString('latin1').match(/\/Type\s*\/Page(?![s\w])/g) ?? []).length;
}

export const tests = [
  {
    name: 'a copied link opens in a fresh browser context with every bar, parameter and unit, and the same results',
    async run({ browser, baseUrl, newPage, context }) {
      await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: new URL(baseUrl).origin });
      const page = await newPage();
      await page.goto(baseUrl);
      await buildScenario(page);
      const mine = await savedAs(page, 'Share check (invented)');
      const built = JSON.parse(mine);
      check(
        built.storm.depthsMm[2] === 2.25 && built.storm.depthsMm[7] === 9.75 && built.storm.depthsMm[11] === 0,
        `the typed bars did not land: ${built.storm.depthsMm}`,
      );
      check(
        built.method.kind === 'initial-continuing' && built.method.initialMm === 7.5 && built.method.rateMmH === 3.25,
        `method ${JSON.stringify(built.method)}`,
      );
      const link = await copyLink(page);
      check(link.startsWith(`${baseUrl}#rc1.`), `not a link to this page: ${link.slice(0, 60)}`);
      const want = await results(page);
      check(want['Rainfall depth'].endsWith(' in'), `results should be in inches: ${want['Rainfall depth']}`);

      const fresh = await browser.newContext({ viewport: { width: 1400, height: 900 } });
      try {
        const other = await fresh.newPage();
        await other.goto(link);
        await other.getByRole('region', { name: 'Shared scenario: “Share check (invented)”' }).waitFor();
        const got = await results(other);
        for (const label of RESULTS)
          check(got[label] === want[label], `${label}: the link shows "${got[label]}", the sender "${want[label]}"`);
        check(await other.getByRole('radio', { name: 'US customary' }).isChecked(), 'the unit choice did not travel');
        check(
          (await other.getByLabel('Loss method').inputValue()) === 'initial-continuing',
          'the method did not travel',
        );
        check(
          (await other.getByLabel('Scenario name').inputValue()) === 'Share check (invented)',
          'the name did not travel',
        );
        check((await stored(other)) === null, 'the fresh browser saved the shared scenario before it was kept');

        await other.getByRole('button', { name: 'Keep the shared scenario' }).click();
        const kept = await stored(other);
        check(kept === mine, 'the kept scenario is not exactly the sender’s (bars, parameters or units differ)');
        check(!(await other.evaluate(() => location.hash)), 'the link stayed in the address after keeping it');
      } finally {
        await fresh.close();
      }
    },
  },
  {
    name: 'a link of 300,000 bars opens on the chart with its hand-worked results in my number format, saying it is drawing until then',
    async run({ baseUrl, newPage }) {
      // 300,000 bars of 1 h, every 100th with 10 mm and the rest dry, under a constant loss rate of 6 mm/h
      // (invented). Long enough for the first draw in slices and the staged chart frame (200,000 bars on).
      const { scenario, close } = await loadModules();
      let fragment;
      try {
        const n = 300_000;
        const parsed = scenario.parseScenario({
          ...scenario.DEMO_SCENARIO,
          name: 'Long link (invented)',
          storm: {
            durationsH: new Array(n).fill(1),
            depthsMm: Array.from({ length: n }, (_, k) => (k % 100 === 0 ? 10 : 0)),
          },
          catchment: { name: 'Invented catchment', areaM2: 1e6 },
          units: 'si',
          method: { kind: 'constant', rateMmH: 6 },
          observed: null,
          streamflow: null,
        });
        check(parsed.ok, `the long link's scenario does not read: ${JSON.stringify(parsed.problems)}`);
        fragment = scenario.encodeScenarioLink(parsed.scenario);
      } finally {
        await close();
      }
      const page = await newPage();
      // The reader's own number format, chosen earlier in this browser: the link opens in it.
      await page.addInitScript(() => localStorage.setItem('raincut.numberFormat', '1.234,5'));
      const fetched = [];
      page.on('request', (request) => fetched.push(new URL(request.url()).pathname));
      await page.goto(`${baseUrl}#${fragment.replace(/^#/, '')}`);
      await page.getByRole('region', { name: 'Shared scenario: “Long link (invented)”' }).waitFor({ timeout: 60_000 });
      // Until the chart's frame is ready it says so; never bars of another storm, nor a blank chart.
      const chart = page.getByRole('figure', { name: 'Hyetograph' });
      await page.waitForFunction(
        () =>
          document.querySelector('[data-layer="rain"]') !== null ||
          document.querySelector('.chart__empty[role="status"]')?.textContent === 'Drawing 300.000 bars…',
      );
      await chart.locator('[data-layer="rain"]').waitFor({ state: 'attached', timeout: 60_000 });
      // By hand: 3,000 wet bars of 10 mm = 30,000 mm of rain; each loses 6 mm/h × 1 h = 6 mm (18,000 mm) and
      // runs off 4 mm (12,000 mm); 12 m over 10⁶ m² = 1.2·10⁷ m³; 12,000 / 30,000 = 40 %; peak 4 mm in 1 h;
      // written with point groups, as the reader chose.
      const got = await results(page);
      const want = {
        'Rainfall depth': '30.000 mm',
        'Loss depth': '18.000 mm',
        'Excess depth': '12.000 mm',
        'Runoff fraction': '40 %',
        'Peak excess intensity': '4 mm/h',
      };
      for (const [label, text] of Object.entries(want))
        check(got[label] === text, `${label}: the long link shows "${got[label]}", by hand "${text}"`);
      check(
        got['Runoff volume'] === '12.000.000 m³',
        `Runoff volume: the long link shows "${got['Runoff volume']}", by hand "12.000.000 m³"`,
      );
      check(
        (await page.getByLabel('Scenario name').inputValue()) === 'Long link (invented)',
        'the name did not travel',
      );
      check((await stored(page)) === null, 'the shared scenario was saved before it was kept');
      // Read by the worker: the page's own reader (its decompressor) is not fetched, nor evaluated on the page.
      check(
        fetched.some((path) => /scenario-read\.worker/.test(path)),
        `the link was not read off the page: ${fetched.join(', ')}`,
      );
      check(!fetched.some((path) => /\/link-read-/.test(path)), `the page fetched its own link reader: ${fetched}`);
    },
  },
  {
    name: 'a damaged link, pasted or loaded, says what is wrong and leaves the saved scenario as it was',
    async run({ baseUrl, newPage }) {
      const { scenario, close } = await loadModules();
      try {
        const page = await newPage();
        await page.goto(baseUrl);
        await page.getByLabel('Scenario name').fill('Mine, saved');
        const mine = await savedAs(page, 'Mine, saved');
        const good = scenario.encodeScenarioLink({ ...JSON.parse(mine), name: 'Someone else’s' });
        const cut = good.slice(0, good.length - 9);

        // Pasted into the address of the open page: only the fragment changes.
        await page.goto(`${baseUrl}#${cut}`);
        const alert = page.getByRole('alert').filter({ hasText: 'The shared link could not be opened.' });
        await alert.waitFor();
        check(
          /The link is damaged/.test((await alert.textContent()) ?? ''),
          `no reason given: ${await alert.textContent()}`,
        );
        check(
          (await page.getByLabel('Scenario name').inputValue()) === 'Mine, saved',
          'the damaged link changed the scenario',
        );
        // The refused link is taken out of the address, so a reload does not refuse it again.
        check((await page.evaluate(() => location.hash)) === '', 'the refused link stayed in the address');
        await page.reload();
        await page.getByLabel('Scenario name').waitFor();
        check(
          (await page.getByRole('alert').filter({ hasText: 'The shared link could not be opened.' }).count()) === 0,
          'the refused link was refused again after a reload',
        );
        // Loaded afresh with the damaged link in the address.
        const fresh = await newPage();
        await fresh.goto(`${baseUrl}#${cut}`);
        await fresh.getByRole('alert').filter({ hasText: 'The shared link could not be opened.' }).waitFor();
        check(
          (await fresh.getByLabel('Scenario name').inputValue()) === 'Mine, saved',
          'after loading the damaged link the scenario changed',
        );
        check((await stored(fresh)) === mine, 'the saved scenario was written over');
      } finally {
        await close();
      }
    },
  },
  {
    name: 'exports: the CSV reads back to the same bars, the SVG is valid with inline colours, the PNG is 2×',
    async run({ baseUrl, newPage }) {
      const { core, close } = await loadModules();
      try {
        const page = await newPage();
        await page.goto(baseUrl);
        await buildScenario(page);
        const s = JSON.parse(await savedAs(page, 'Share check (invented)'));

        const csv = await download(page, 'Export CSV');
        check(csv.name === 'share-check-invented-bars.csv', `CSV named ${csv.name}`);
        const text = csv.bytes.toString('utf8');
        check(text.length > 0, 'the CSV is empty');
        check(text.includes('Estimates are for screening'), 'the CSV has no caution');
        const parsed = Papa.parse(text, { header: true, comments: '#', skipEmptyLines: true });
        check(parsed.errors.length === 0, `CSV errors: ${JSON.stringify(parsed.errors.slice(0, 3))}`);
        check(
          parsed.data.length === s.storm.depthsMm.length,
          `${parsed.data.length} rows for ${s.storm.depthsMm.length} bars`,
        );
        parsed.data.forEach((row, k) => {
          // Rows are written to 12 significant figures (the bar table CSV's rule).
          const want = Number(core.convertDepth(s.storm.depthsMm[k], 'mm', 'in').toPrecision(12));
          check(
            Number(row['Rainfall depth (in)']) === want,
            `bar ${k + 1}: CSV ${row['Rainfall depth (in)']}, scenario ${want} in`,
          );
          const minutes = Number((s.storm.durationsH[k] * 60).toPrecision(12));
          check(Number(row['Duration (min)']) === minutes, `bar ${k + 1}: duration ${row['Duration (min)']} min`);
        });
        const r = core.computeLosses(s.storm, s.method);
        parsed.data.forEach((row, k) => {
          check(
            Number(row['Loss (in)']) === Number(core.convertDepth(r.lossMm[k], 'mm', 'in').toPrecision(12)),
            `bar ${k + 1}: loss is not the core’s`,
          );
        });

        const svg = await download(page, 'Export SVG');
        check(svg.name === 'share-check-invented-chart.svg', `SVG named ${svg.name}`);
        const svgText = svg.bytes.toString('utf8');
        // Read on a blank page: the app's policy rightly refuses the file's style attributes in its own page.
        const blank = await newPage();
        const verdict = await blank.evaluate(async (xml) => {
          const doc = new DOMParser().parseFromString(xml, 'image/svg+xml');
          const root = doc.documentElement;
          const fills = Array.from(doc.querySelectorAll('path')).map(
            (p) => /fill:\s*(rgb\([^)]*\))/.exec(p.getAttribute('style') ?? '')?.[1] ?? null,
          );
          const img = new Image();
          const url = URL.createObjectURL(new Blob([xml], { type: 'image/svg+xml' }));
          const loaded = await new Promise((ok) => {
            img.onload = () => ok(img.naturalWidth > 0);
            img.onerror = () => ok(false);
            img.src = url;
          });
          return {
            errors: doc.getElementsByTagName('parsererror').length,
            root: root.localName,
            ns: root.namespaceURI,
            fills,
            loaded,
            classes: doc.querySelectorAll('[class]').length,
            text: root.textContent,
            legend: Array.from(doc.querySelectorAll('rect'))
              .map((r) => /fill:\s*(rgb\([^)]*\))/.exec(r.getAttribute('style') ?? '')?.[1])
              .filter(Boolean),
            width: Number(root.getAttribute('width')),
            height: Number(root.getAttribute('height')),
          };
        }, svgText);
        check(
          verdict.errors === 0 && verdict.root === 'svg' && verdict.ns === 'http://www.w3.org/2000/svg',
          `not a valid SVG: ${JSON.stringify(verdict)}`,
        );
        check(verdict.loaded, 'the SVG does not load as a picture');
        check(verdict.classes === 0, 'the SVG still leans on page classes');
        // The workbench's excess blue and loss tan, written on the shapes.
        check(
          verdict.fills.includes('rgb(45, 95, 139)') && verdict.fills.includes('rgb(216, 201, 166)'),
          `fills: ${verdict.fills}`,
        );
        check(verdict.text.includes('Estimates are for screening'), 'the SVG has no caution');
        check(
          verdict.legend.includes('rgb(45, 95, 139)') && verdict.text.includes('Rainfall excess'),
          `no legend in the page’s colours: ${verdict.legend}`,
        );

        const png = await download(page, 'Export PNG');
        check(
          png.bytes.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])),
          'not a PNG',
        );
        const width = png.bytes.readUInt32BE(16);
        const height = png.bytes.readUInt32BE(20);
        check(
          width === verdict.width * 2 && height === verdict.height * 2,
          `PNG ${width}×${height} for an SVG of ${verdict.width}×${verdict.height}`,
        );
      } finally {
        await close();
      }
    },
  },
  {
    name: 'the printed report is one page with the inputs, chart, results and caution, then a page with the bar table',
    async run({ baseUrl, newPage }) {
      const page = await newPage();
      await page.goto(baseUrl);
      await page.emulateMedia({ media: 'print' });
      const report = page.getByRole('article', { name: 'Printable report' });
      await report.waitFor();
      const words = (await report.textContent()) ?? '';
      for (const part of [
        'Caution.',
        'Inputs',
        'Results',
        'Constant loss rate (φ-index)',
        'Runoff fraction',
        'licensed professional',
      ]) {
        check(words.includes(part), `the report lacks "${part}"`);
      }
      check(await report.getByRole('img', { name: /^Hyetograph of/ }).isVisible(), 'the report has no chart');
      check(
        !(await page.getByRole('button', { name: 'Copy link' }).isVisible()),
        'the workbench prints along with the report',
      );
      // The demo's 18 bars: the summary on page 1, the bar table on page 2 (issue 16).
      check(
        (await report.getByRole('region', { name: 'Bars' }).getByRole('row').count()) === 19,
        'the report’s bar table does not list the 18 bars',
      );
      const pages = await pdfPages(page, 'A4');
      check(pages === 2, `the report prints on ${pages} pages`);
    },
  },
  {
    name: 'the report’s bar table of 48 bars fits one A4 and one Letter page; 49 bars point to the CSV instead',
    async run({ browser, baseUrl }) {
      for (const [n, expected] of [
        [48, 2],
        [49, 1],
      ]) {
        const context = await browser.newContext();
        // A storm with a clock (the longest start cells) and a long name, saved as the page would find it.
        const scenario = {
          version: 1,
          name: `Report page test: ${n} bars of 5 min (invented)`,
          notes: 'Invented for the print layout test.',
          storm: {
            durationsH: new Array(n).fill(1 / 12),
            depthsMm: Array.from({ length: n }, (_, k) => 0.25 + (k % 7) * 0.55),
            startIso: '2026-07-14T23:30',
          },
          catchment: { name: 'Print test (invented)', areaM2: 2.5e6 },
          units: 'si',
          method: { kind: 'constant', rateMmH: 6 },
          methodMemory: {},
          observed: null,
        };
        await context.addInitScript((text) => {
          // Only in the app's own page (an opaque document has no storage to read).
          if (!location.protocol.startsWith('http')) return;
          if (!localStorage.getItem('raincut.scenario')) localStorage.setItem('raincut.scenario', text);
        }, JSON.stringify(scenario));
        const page = await context.newPage();
        await page.goto(baseUrl);
        await page.getByText(`${n} bars of 5 min`).first().waitFor();
        await page.emulateMedia({ media: 'print' });
        const report = page.getByRole('article', { name: 'Printable report' });
        await report.waitFor();
        const bars = report.locator('[data-report="bars"]');
        await bars.waitFor();
        if (n > 48) check((await bars.textContent()).includes('in the CSV export'), `${n} bars: no pointer to the CSV`);
        else check((await bars.getByRole('row').count()) === n + 1, `${n} bars: the table does not list them all`);
        for (const format of ['A4', 'Letter']) {
          const pages = await pdfPages(page, format);
          check(pages === expected, `${n} bars on ${format}: the report prints on ${pages} pages, not ${expected}`);
        }
        await context.close();
      }
    },
  },
  {
    name: 'axe-core finds no accessibility violations in the scenario bar, saved list, messages, link notices and comparison',
    async run({ browser, baseUrl, newPage }) {
      // Checked where this spec's screens are: the scenario bar (with the saved list and messages), the link notice, the comparison.
      const axe = async (page) => {
        await addAxe(page);
        return page.evaluate(async () => {
          const include = ['.scenario-bar', '.link-notice', '.compare']
            .filter((sel) => document.querySelector(sel))
            .map((sel) => [sel]);
          const result = await window.axe.run({ include });
          return result.violations.map(
            (v) => `${v.id}: ${v.help} (${v.nodes.map((n) => n.target.join(' ')).join(', ')})`,
          );
        });
      };
      const page = await newPage();
      await page.goto(baseUrl);
      await page.getByRole('button', { name: 'Pin to compare' }).click();
      await page.getByRole('radio', { name: 'US customary' }).check();
      await page.getByRole('button', { name: 'Pin to compare' }).click();
      await page.getByRole('button', { name: 'Saved scenarios' }).click();
      await page.getByRole('button', { name: 'Save current scenario to list' }).click();
      await page.getByRole('button', { name: 'Duplicate Demo: Fenmoor Brook storm (invented)' }).click();
      await page.getByRole('button', { name: 'Delete Demo: Fenmoor Brook storm (invented) (copy)' }).click();
      await page.getByRole('button', { name: 'Rename Demo: Fenmoor Brook storm (invented)' }).click();
      const first = await axe(page);
      check(first.length === 0, first.join('\n'));

      const fresh = await browser.newContext({ viewport: { width: 1400, height: 900 } });
      try {
        const other = await fresh.newPage();
        await other.goto(`${baseUrl}#rc1.AAAAAAAAAAAA`);
        await other.getByRole('alert').filter({ hasText: 'The shared link could not be opened.' }).waitFor();
        const refused = await axe(other);
        check(refused.length === 0, refused.join('\n'));
        const { scenario, close } = await loadModules();
        try {
          const link = scenario.encodeScenarioLink({
            ...scenario.DEMO_SCENARIO,
            name: 'Sent by a colleague (invented)',
          });
          await other.goto(`${baseUrl}#${link}`);
          await other.getByRole('region', { name: 'Shared scenario: “Sent by a colleague (invented)”' }).waitFor();
          const shared = await axe(other);
          check(shared.length === 0, shared.join('\n'));
        } finally {
          await close();
        }
      } finally {
        await fresh.close();
      }
    },
  },
];
