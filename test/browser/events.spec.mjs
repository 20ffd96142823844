// The event set and design storm path in chromium: three events built on the
// workbench, fitted at once, the median picked and applied to a design storm.
// Every number is checked against the core loaded from source, never copied.
import { loadSource } from './support.mjs';

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
        const medianText = await page.getByText(/^Design loss rate φ:/).textContent();
        if (!medianText.includes(`${format.formatValue(median)} mm/h`))
          throw new Error(`design value shown as "${medianText}", core median ${median}`);

        // The design storm from the form's starting values, with the design loss.
        await page.getByRole('tab', { name: 'Design storm' }).click();
        const idf = { kind: 'a/(t+b)^c', durationUnit: 'min', intensityUnit: 'mm/h', a: 1200, b: 10, c: 0.75 };
        const design = core.alternatingBlockStorm({ idf, durationH: 2, stepH: 10 / 60, peakFraction: 0.5 });
        const result = core.computeLosses(design, { kind: 'constant', rateMmH: median });
        const totals = page.getByLabel('Design storm totals');
        const excess = await totals.getByText(/mm$/).nth(2).textContent();
        if (excess !== `${format.formatValue(result.totalExcessMm)} mm`)
          throw new Error(`excess shown ${excess}, core ${result.totalExcessMm}`);
        await shot(page, 'design');

        await page.getByRole('button', { name: 'Put the design storm on the workbench' }).click();
        await page.getByRole('tab', { name: 'Workbench' }).click();
        const bench = await page.getByLabel('Excess depth').first().textContent();
        if (!bench.includes(format.formatValue(result.totalExcessMm)))
          throw new Error(`workbench excess ${bench}, core ${result.totalExcessMm}`);
        await shot(page, 'bench');
      } finally {
        await close();
      }
    },
  },
];
