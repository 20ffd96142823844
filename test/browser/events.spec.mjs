// The event set and design storm path in chromium: three events built on the
// workbench, fitted at once, the median picked and applied to a design storm.
// The fits, the median and the design storm's totals are checked against
// values worked by hand, and against the core loaded from source.
import { check, checkShown, loadSource } from './support.mjs';

const shot = async (page, name) => {
  if (process.env.EVENTS_SHOTS) await page.screenshot({ path: `/tmp/events-${name}.png`, fullPage: true });
};

async function setObserved(page, mm) {
  const field = page.getByLabel('Observed runoff', { exact: false }).first();
  await field.fill(String(mm));
  await field.press('Tab');
}

export const tests = [
  {
    name: 'three events fitted, the median applied to an alternating block storm',
    async run({ baseUrl, newPage }) {
      const { core, format, close } = await loadSource();
      try {
        const page = await newPage();
        await page.goto(baseUrl);
        const observed = [12.5, 8, 20];
        await page.getByRole('tab', { name: 'Event set' }).click();
        const add = page.getByRole('button', { name: 'Add the workbench storm as an event' });
        for (const mm of observed) {
          await add.click();
          await page.getByRole('tab', { name: 'Workbench' }).click();
          await setObserved(page, mm);
          await page.getByRole('tab', { name: 'Event set' }).click();
        }
        await page.getByLabel('Name of event 3').fill('Wet spell (invented)');
        await shot(page, 'set');

        // The demo storm, as the page holds it, with each observed depth: the core's fits and median.
        const storm = {
          durationsH: Array.from({ length: 18 }, () => 10 / 60),
          depthsMm: [0.4, 0.8, 1.2, 1.8, 2.6, 3.8, 5.6, 6.4, 4.8, 3.6, 2.8, 2.2, 1.6, 1.2, 1.0, 0.8, 0.6, 0.4],
        };
        const method = { kind: 'constant', rateMmH: 8 };
        const events = observed.map((mm, k) => ({
          id: `e${k + 1}`,
          name: `Event ${k + 1}`,
          storm,
          observedExcessMm: mm,
        }));
        const fits = core.fitEvents(events, method, 'rateMmH');
        const summary = core.summariseFits(fits);
        const median = core.pickDesignValue(summary, 'median');
        const table = page.getByRole('table', { name: /^Fitted loss rate φ for each event$/i });
        for (const [k, fit] of fits.entries()) {
          const row = table.getByRole('row').nth(k + 1);
          const text = await row.textContent();
          const want = `${format.formatValue(fit.result.value)} mm/h`;
          if (!text.includes(want)) throw new Error(`event ${k + 1} row "${text}" lacks the core's fit ${want}`);
        }
        // By hand, on the demo storm (18 bars of 10 min; sorted, 6.4 5.6 4.8 3.8 3.6 2.8 2.6
        // 2.2 1.8 1.6 1.2 1.2 1.0 … mm): with the n wettest bars above φ/6, runoff R =
        // S_n − n·φ/6, so φ/6 = (S_n − R)/n, which must lie between bar n + 1 and bar n.
        //   R = 12.5 mm: n = 7, S_7 = 29.6, φ/6 = 17.1/7 = 2.4429 (2.2 ≤ · ≤ 2.6), φ = 14.657 mm/h
        //   R = 8 mm:    n = 5, S_5 = 24.2, φ/6 = 16.2/5 = 3.24 (2.8 ≤ · ≤ 3.6),   φ = 19.44 mm/h
        //   R = 20 mm:   n = 10, S_10 = 35.2, φ/6 = 15.2/10 = 1.52 (1.2 ≤ · ≤ 1.6), φ = 9.12 mm/h
        // The median of 19.44, 14.657 and 9.12 is 14.657 mm/h (= 102.6/7).
        const handFits = [102.6 / 7, 19.44, 9.12];
        for (const [k, phi] of handFits.entries()) {
          const cells = await table
            .getByRole('row')
            .nth(k + 1)
            .getByRole('cell')
            .allTextContents();
          const shown = cells.find((c) => / mm\/h$/.test(c.trim()));
          check(shown, `event ${k + 1} row shows no rate: ${JSON.stringify(cells)}`);
          checkShown(shown, phi, 'mm/h', `event ${k + 1}'s fitted φ`);
        }
        const medianText = await page.getByText(/^Design loss rate φ:/).textContent();
        checkShown(medianText.replace(/^Design loss rate φ:\s*/, '').split(' (')[0], 102.6 / 7, 'mm/h', 'the median');
        if (!medianText.includes(`${format.formatValue(median)} mm/h`))
          throw new Error(`design value shown as "${medianText}", core median ${median}`);

        // The design storm from the form's starting values, with the design loss.
        await page.getByRole('tab', { name: 'Design storm' }).click();
        const idf = { kind: 'a/(t+b)^c', durationUnit: 'min', intensityUnit: 'mm/h', a: 1200, b: 10, c: 0.75 };
        const design = core.alternatingBlockStorm({ idf, durationH: 2, stepH: 10 / 60, peakFraction: 0.5 });
        const result = core.computeLosses(design, { kind: 'constant', rateMmH: median });
        const totals = page.getByLabel('Design storm totals');
        // By hand: i = 1200/(t + 10)^0.75 mm/h, t in min (invented relation); the depth for a
        // duration t is i·t/60. Whole storm, 120 min: 130^0.75 = e^(0.75 × 4.86753) = 38.4997,
        // 1200/38.4997 = 31.1691 mm/h × 2 h = 62.3381 mm. The blocks (alternating block
        // method, Chow, Maidment & Mays 1988, §14.4) are the increments of that depth, which
        // fall with duration: 21.147, 10.057, 6.518, 4.823, 3.840, 3.200, 2.751, 2.420, …
        // mm. The median φ takes 14.657/6 = 17.1/7 = 2.4429 mm a block, so the 7 largest
        // blocks run off, and they add up to the 70-min depth: 80^0.75 = 26.7496,
        // 1200/26.7496 = 44.8605 mm/h × 7/6 h = 52.3372 mm. Excess = 52.3372 − 7 × 17.1/7
        // = 35.2372 mm; loss 62.3381 − 35.2372 = 27.1009 mm; volume 35.2372 × 3200 =
        // 112,759 m³; fraction 35.2372/62.3381 = 56.526 %.
        const total = async (label) =>
          (
            (await totals.getByText(label, { exact: true }).locator('xpath=following-sibling::dd').textContent()) ?? ''
          ).trim();
        checkShown(await total('Rainfall depth'), 62.338124, 'mm', 'design storm rainfall');
        checkShown(await total('Excess depth'), 35.237207, 'mm', 'design storm excess');
        checkShown(await total('Loss depth'), 27.100917, 'mm', 'design storm loss');
        checkShown(await total('Runoff volume'), 112759.06, 'm³', 'design storm runoff volume');
        checkShown(await total('Runoff fraction'), 56.525935, '%', 'design storm runoff fraction');
        const excess = await totals.getByText(/mm$/).nth(2).textContent();
        if (excess !== `${format.formatValue(result.totalExcessMm)} mm`)
          throw new Error(`excess shown ${excess}, core ${result.totalExcessMm}`);
        await shot(page, 'design');

        await page.getByRole('button', { name: 'Put the design storm on the workbench' }).click();
        await page.getByRole('tab', { name: 'Workbench' }).click();
        const bench = await page.getByLabel('Excess depth').first().textContent();
        checkShown(bench.trim(), 35.237207, 'mm', 'the design storm’s excess on the workbench');
        if (!bench.includes(format.formatValue(result.totalExcessMm)))
          throw new Error(`workbench excess ${bench}, core ${result.totalExcessMm}`);
        await shot(page, 'bench');
      } finally {
        await close();
      }
    },
  },
];
