// Getting rainfall in, in Debian's chromium against the built app: paste a
// storm into the preview and use it, edit a bar in the table, draw a stroke
// with the mouse, and check every shown number against the project's own core
// computing the same thing (loaded from source); the pasted storm's results
// are also checked against values worked by hand. Also axe-core with the
// dialog, tools and drawing open, and a narrow window.
import { addAxe, check, checkShown, loadSourceModules } from './support.mjs';

/** Source modules to check the page against (see support.mjs). */
const loadModules = () =>
  loadSourceModules({
    core: '/src/core/index.ts',
    format: '/src/ui/format.ts',
    frame: '/src/ui/chart/frame.ts',
    draw: '/src/ui/storm-input/draw/draw-math.ts',
    demo: '/src/scenario/demo.ts',
  });

// Invented gauge record (no real gauge or storm): day-first dates, times of day
// and decimal commas in separate semicolon-separated columns, 10-min steps.
const DEPTHS = [0.2, 0.6, 1.4, 2.8, 4.6, 7.2, 5.4, 3.6, 2.4, 1.6, 1.0, 0.6];
const PASTE =
  'Date;Time;Rain (mm)\n' +
  DEPTHS.map((d, i) => {
    const minutes = 10 * (i + 1);
    const hh = String(6 + Math.floor(minutes / 60)).padStart(2, '0');
    const mm = String(minutes % 60).padStart(2, '0');
    return `03/11/2026;${hh}:${mm};${String(d).replace('.', ',')}`;
  }).join('\n');

const shown = async (page, label) =>
  ((await page.getByLabel(label, { exact: true }).first().textContent()) ?? '').trim();

/** The scenario as the page saved it (it saves shortly after each change). */
async function saved(page, previous) {
  await page.waitForFunction((before) => {
    const now = localStorage.getItem('raincut.scenario');
    return now !== null && now !== before;
  }, previous);
  return page.evaluate(() => localStorage.getItem('raincut.scenario'));
}

/** Every result on screen against the core's numbers for the saved scenario. */
async function checkResults(page, mods, scenario) {
  const { core, format } = mods;
  const r = core.computeLosses(scenario.storm, scenario.method);
  const mm = (v) => `${format.formatValue(v)} mm`;
  const expected = {
    'Rainfall depth': mm(r.rainMm),
    'Loss depth': mm(r.totalLossMm),
    'Excess depth': mm(r.totalExcessMm),
    'Runoff fraction': format.formatPercent(r.runoffFraction),
    'Peak excess intensity': `${format.formatValue(r.peakExcessMmH)} mm/h`,
  };
  for (const [label, want] of Object.entries(expected)) {
    const got = await shown(page, label);
    check(got === want, `${label}: shown "${got}", core gives "${want}"`);
  }
  const bars = await page.locator('.chart__svg g[role="img"]').getAttribute('aria-label');
  const n = scenario.storm.depthsMm.length;
  check(bars.startsWith(`Bars: ${n} bars, ${format.formatValue(r.rainMm)} mm of rain`), `the chart says "${bars}"`);
  return r;
}

async function axeViolations(page) {
  await addAxe(page);
  return page.evaluate(async () => {
    const result = await window.axe.run(document);
    return result.violations.map((v) => `${v.id}: ${v.help} (${v.nodes.map((n) => n.target.join(' ')).join(', ')})`);
  });
}

export const tests = [
  {
    name: 'a pasted storm is previewed, used as one undo step, and its results are the ones worked by hand and the core’s',
    async run({ baseUrl, newPage }) {
      const mods = await loadModules();
      try {
        const page = await newPage();
        await page.goto(baseUrl);
        const before = await page.evaluate(() => localStorage.getItem('raincut.scenario'));
        await page.getByRole('button', { name: 'Paste rainfall…' }).click();
        const dialog = page.getByRole('dialog', { name: 'Paste rainfall' });
        await dialog.getByLabel('Rainfall text').fill(PASTE);
        const summary = dialog.getByRole('status').first();
        await summary.getByText('12 bars of 10 min from 2026-11-03 06:00, depths in mm, total 31.4 mm').waitFor();
        check((await dialog.getByLabel('Decimal mark').inputValue()) === 'comma', 'the decimal comma was not guessed');
        check((await dialog.getByLabel('Date column').inputValue()) === '1', 'the date column was not guessed');
        // Nothing has changed yet behind the dialog.
        check(
          (await page.evaluate(() => localStorage.getItem('raincut.scenario'))) === before,
          'the storm changed before accepting',
        );
        await dialog.getByRole('button', { name: 'Use these bars' }).click();
        check((await page.getByRole('dialog').count()) === 0, 'the dialog did not close');
        const scenario = JSON.parse(await saved(page, before));
        check(scenario.storm.startIso === '2026-11-03T06:00:00', `start ${scenario.storm.startIso}`);
        check(scenario.storm.depthsMm.length === DEPTHS.length, `${scenario.storm.depthsMm.length} bars`);
        scenario.storm.depthsMm.forEach((d, k) => check(Math.abs(d - DEPTHS[k]) < 1e-12, `bar ${k + 1}: ${d} mm`));
        scenario.storm.durationsH.forEach((d, k) => check(Math.abs(d - 1 / 6) < 1e-12, `bar ${k + 1} lasts ${d} h`));
        const r = await checkResults(page, mods, scenario);
        check(Math.abs(r.rainMm - 31.4) < 1e-9, `the core reads ${r.rainMm} mm`);
        // By hand, with the demo's φ = 8 mm/h kept: each 10-min bar loses 8/6 = 1.3333 mm,
        // so the 8 bars of 1.4 mm and more run off: 1.4 + 2.8 + 4.6 + 7.2 + 5.4 + 3.6
        // + 2.4 + 1.6 = 29.0 mm, less 8 × 1.3333 = 10.6667 mm: excess 18.3333 mm; loss
        // 31.4 − 18.3333 = 13.0667 mm; on the demo's 3.2 km², runoff volume
        // 18.3333 mm × 3200 m³/mm = 58,666.7 m³; fraction 18.3333/31.4 = 58.386 %;
        // peak excess 7.2 × 6 − 8 = 35.2 mm/h.
        checkShown(await shown(page, 'Rainfall depth'), 31.4, 'mm', 'Rainfall depth');
        checkShown(await shown(page, 'Excess depth'), 18.3333333, 'mm', 'Excess depth');
        checkShown(await shown(page, 'Loss depth'), 13.0666667, 'mm', 'Loss depth');
        checkShown(await shown(page, 'Runoff volume'), 58666.667, 'm³', 'Runoff volume');
        checkShown(await shown(page, 'Runoff fraction'), 58.386412, '%', 'Runoff fraction');
        checkShown(await shown(page, 'Peak excess intensity'), 35.2, 'mm/h', 'Peak excess intensity');
        const undo = page.getByRole('button', { name: 'Undo' });
        check(
          (await undo.getAttribute('title')) === 'Undo: Paste rainfall (Ctrl+Z)',
          `undo says "${await undo.getAttribute('title')}"`,
        );
        // The chart's clock follows the pasted start.
        check(
          (await page.locator('.axes__title').first().textContent()).includes('3 Nov 2026 06:00'),
          'the time axis is not on the storm’s clock',
        );
        await undo.click();
        check((await shown(page, 'Rainfall depth')) === '41.6 mm', 'undo did not bring the demo storm back');
      } finally {
        await mods.close();
      }
    },
  },
  {
    name: 'a depth typed into the bar table is applied, and a bad one is refused beside the cell',
    async run({ baseUrl, newPage }) {
      const mods = await loadModules();
      try {
        const page = await newPage();
        await page.goto(baseUrl);
        const before = await page.evaluate(() => localStorage.getItem('raincut.scenario'));
        const grid = page.getByRole('grid', { name: 'Bar table' });
        const cell = (bar, col) => grid.locator(`[role="row"][aria-rowindex="${bar + 1}"] [aria-colindex="${col}"]`);
        await cell(6, 4).click();
        // Typed in the browser's number format (1,234.5 for an English browser): a decimal point.
        await page.keyboard.type('9.5');
        await page.keyboard.press('Enter');
        const scenario = JSON.parse(await saved(page, before));
        check(scenario.storm.depthsMm[5] === 9.5, `bar 6 holds ${scenario.storm.depthsMm[5]} mm`);
        check(await cell(7, 4).evaluate((el) => el === document.activeElement), 'Enter did not move to the next bar');
        await checkResults(page, mods, scenario);
        // By hand: bar 6 goes from 3.8 to 9.5 mm, so the demo's 41.6 mm becomes 47.3 mm;
        // at φ = 8 mm/h (8/6 = 1.3333 mm a bar) the demo's excess of 35.2 − 10 × 1.3333 =
        // 21.8667 mm grows by the 5.7 mm added: 27.5667 mm; bar 6 alone: 9.5 − 1.3333 = 8.1667 mm.
        checkShown(await shown(page, 'Rainfall depth'), 47.3, 'mm', 'Rainfall depth');
        checkShown(await shown(page, 'Excess depth'), 27.5666667, 'mm', 'Excess depth');
        checkShown(await cell(6, 7).textContent(), 8.1666667, '', 'Bar 6 excess');
        const r = mods.core.computeLosses(scenario.storm, scenario.method);
        check(
          (await cell(6, 7).textContent()) === mods.format.formatValue(r.excessMm[5]),
          'bar 6 excess is not the core’s',
        );

        await page.keyboard.type('wet');
        await page.keyboard.press('Enter');
        const note = (await cell(7, 8).textContent()) ?? '';
        check(note === 'Bar 7 depth: “wet” is not a number.', `the note says "${note}"`);
        check(
          (await page.getByRole('textbox', { name: 'Bar 7 depth' }).inputValue()) === 'wet',
          'the typed text was not kept',
        );
        const still = JSON.parse(await page.evaluate(() => localStorage.getItem('raincut.scenario')));
        check(still.storm.depthsMm[6] === scenario.storm.depthsMm[6], 'a bad value reached the storm');
        const violations = await axeViolations(page);
        check(violations.length === 0, violations.join('\n'));
      } finally {
        await mods.close();
      }
    },
  },
  {
    name: 'a mouse stroke across the chart sets the bars it crosses, read from the chart’s own scale',
    async run({ baseUrl, newPage }) {
      const mods = await loadModules();
      try {
        const page = await newPage();
        await page.goto(baseUrl);
        const before = await page.evaluate(() => localStorage.getItem('raincut.scenario'));
        // A fresh browser opens on the demo; its storm is what the chart was drawn from at the press.
        const stormBefore = before === null ? mods.demo.DEMO_SCENARIO.storm : JSON.parse(before).storm;
        await page.getByRole('button', { name: 'Draw bars' }).click();
        // The drawing panel loads its code on first use: stroke only once it is on screen.
        await page.getByRole('region', { name: 'Drawing bars' }).waitFor();
        await page.locator('.draw-layer__plot').waitFor();
        const plot = await page.locator('.draw-layer__plot').boundingBox();
        const svg = await page.locator('.chart__svg').boundingBox();
        check(plot && svg, 'the drawing layer is not over the chart');
        const y = plot.y + plot.height * 0.6;
        await page.mouse.move(plot.x + 4, y);
        await page.mouse.down();
        for (let i = 1; i <= 12; i++) await page.mouse.move(plot.x + 4 + ((plot.width - 8) * i) / 12, y);
        await page.mouse.up();
        const scenario = JSON.parse(await saved(page, before));
        const chart = page.locator('.chart__svg');
        const width = Number(await chart.getAttribute('width'));
        const height = Number(await chart.getAttribute('height'));
        const frameBefore = mods.frame.chartFrame(stormBefore, width, height, 'si');
        const rate = mods.draw.rateAtPointer(
          frameBefore.y,
          y - svg.y,
          Math.max(frameBefore.y.invert(0), frameBefore.topMmH),
          frameBefore.topDisplay,
          'si',
        );
        check(rate > 0, `the stroke read ${rate} mm/h`);
        scenario.storm.depthsMm.forEach((d, k) => {
          const want = rate * scenario.storm.durationsH[k];
          check(Math.abs(d - want) < 1e-9, `bar ${k + 1}: ${d} mm, the chart's scale gives ${want}`);
        });
        const undo = page.getByRole('button', { name: 'Undo' });
        check(
          (await undo.getAttribute('title')) === 'Undo: Draw bars (Ctrl+Z)',
          `undo says "${await undo.getAttribute('title')}"`,
        );
        await checkResults(page, mods, scenario);
      } finally {
        await mods.close();
      }
    },
  },
  {
    name: 'axe-core finds no violations with the paste dialog, the storm tools and drawing open',
    async run({ baseUrl, newPage }) {
      const page = await newPage();
      await page.goto(baseUrl);
      await page.getByRole('button', { name: 'Storm tools' }).click();
      await page.getByRole('button', { name: 'Draw bars' }).click();
      await page.getByLabel('Scale factor').fill('lots');
      await page.getByRole('button', { name: 'Scale bars' }).click();
      let violations = await axeViolations(page);
      check(violations.length === 0, violations.join('\n'));
      await page.getByRole('button', { name: 'Paste rainfall…' }).click();
      await page.getByLabel('Rainfall text').fill('Time,Rain mm\n0,0.2\n10,oops\n20,0.4\n');
      await page.getByRole('dialog').getByRole('table', { name: '1 problem to fix' }).waitFor();
      violations = await axeViolations(page);
      check(violations.length === 0, violations.join('\n'));
      await page.keyboard.press('Escape');
      check((await page.getByRole('dialog').count()) === 0, 'Escape did not close the dialog');
      check(
        await page.getByRole('button', { name: 'Paste rainfall…' }).evaluate((el) => el === document.activeElement),
        'focus did not go back to the button',
      );
    },
  },
  {
    name: 'in a narrow window the rainfall tools and the dialog stay inside it',
    async run({ baseUrl, newPage }) {
      const page = await newPage();
      await page.setViewportSize({ width: 420, height: 900 });
      await page.goto(baseUrl);
      await page.getByRole('button', { name: 'Storm tools' }).click();
      await page.getByRole('button', { name: 'Draw bars' }).click();
      const { scroll, inner } = await page.evaluate(() => ({
        scroll: document.documentElement.scrollWidth,
        inner: window.innerWidth,
      }));
      check(scroll <= inner, `the page is ${scroll} px wide in a ${inner} px window`);
      await page.getByRole('button', { name: 'Paste rainfall…' }).click();
      await page.getByLabel('Rainfall text').fill(PASTE);
      const box = await page.getByRole('dialog').boundingBox();
      check(
        box && box.x >= 0 && box.x + box.width <= inner,
        `the dialog runs from ${box?.x} to ${box && box.x + box.width}`,
      );
    },
  },
];
