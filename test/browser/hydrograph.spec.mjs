// The runoff hydrograph (issue 13) in Debian's chromium, against the built
// app: pick a unit hydrograph on the demo, check the peak worked by hand, and
// see the computed hydrograph follow the loss line.
import { readFile } from 'node:fs/promises';
import { addAxe, check, checkShown } from './support.mjs';

const result = async (page, id) => ((await page.locator(`[data-result="${id}"]`).textContent()) ?? '').trim();

async function typeInto(page, name, value) {
  const field = page.getByRole('textbox', { name, exact: true });
  await field.fill(value);
  await field.blur();
}

export const tests = [
  {
    name: 'the hydrograph CSV, opened as a colleague would, names the loss method and the area, and its peak matches the screen; with no excess there is no time to peak',
    async run({ baseUrl, newPage }) {
      const page = await newPage();
      await page.goto(baseUrl);
      await page.getByRole('combobox', { name: 'Unit hydrograph' }).selectOption('triangular');
      await page.locator('[data-result="peak-discharge"]').waitFor();
      const csvText = async () => {
        const [file] = await Promise.all([
          page.waitForEvent('download'),
          page.getByRole('button', { name: 'Export Hydrograph CSV' }).click(),
        ]);
        return readFile(await file.path(), 'utf8');
      };
      const text = await csvText();
      // The demo (src/scenario/demo.ts, invented): φ = 8 mm/h on 3.2 km² = 320 ha shown in ha.
      check(
        text.includes('#,"Loss method: Constant loss rate (φ-index); Loss rate φ = 8 mm/h"'),
        'no loss method note',
      );
      check(text.includes('#,"Catchment: Fenmoor Brook above the mill weir (invented); 320 ha"'), 'no catchment note');
      check(text.includes('#,"Caution: '), 'no caution');
      // The screen and the CSV agree on the peak (11.02 m³/s at 2:20 = 2.333 h; the peak itself is worked by
      // hand in the next test, at φ = 36 mm/h).
      checkShown(await result(page, 'peak-discharge'), 11.02, 'm³/s', 'Peak discharge');
      check(
        /#,"Peak discharge 11\.02 m³\/s at 2\.333 h after the storm start/.test(text),
        'the CSV peak differs from the screen',
      );
      // φ = 50 mm/h is above every bar's intensity (the demo's highest, 6.4 mm in 10 min, is 38.4 mm/h): no excess.
      await typeInto(page, 'Loss rate φ (mm/h)', '50');
      await page.waitForFunction(
        () => document.querySelector('[data-result="time-to-peak"]')?.textContent === 'none: no direct runoff',
      );
      check((await result(page, 'peak-discharge')) === '0 m³/s', 'a dry run should peak at 0 m³/s');
      check(
        (await csvText()).includes('#,"Peak discharge 0 m³/s (no direct runoff); direct runoff volume 0 m³"'),
        'the dry CSV gives a peak time',
      );
    },
  },
  {
    name: 'a triangular unit hydrograph on the demo gives the peak worked by hand, and follows the loss line',
    async run({ baseUrl, newPage }) {
      const page = await newPage();
      await page.goto(baseUrl);
      // The demo storm (src/scenario/demo.ts, invented): 18 bars of 10 min, the 8th of 6.4 mm, every
      // other bar 5.6 mm or less, on 3.2 km². At φ = 36 mm/h each bar loses up to 36/6 = 6 mm, so only
      // the 8th bar runs off: 0.4 mm of excess, 0.4 mm × 3.2e6 m² = 1280 m³, between 70 and 80 min.
      await typeInto(page, 'Loss rate φ (mm/h)', '36');
      await page.getByRole('combobox', { name: 'Unit hydrograph' }).selectOption('triangular');
      // Lag 5/12 h: with the 10-min step Δ, Tp = Δ/2 + lag = 1/12 + 5/12 = 0.5 h = 3Δ and the base 8/3·Tp = 8Δ,
      // so the triangle sampled every Δ is 0, 1/3, 2/3, 1, 0.8, 0.6, 0.4, 0.2 of its peak, summing to 4:
      // the peak weight is 1/4. Peak = ¼ × 1280 m³ / 600 s = 0.5333 m³/s (the textbook
      // qp = 0.2083·A·Q/Tp = 0.2083 × 3.2 km² × 0.4 mm / 0.5 h = 0.5333 m³/s, NEH-630 ch. 16, from memory),
      // Tp after the start of the 8th bar: 70 + 30 = 100 min = 1:40 after the storm start.
      await typeInto(page, 'Lag (h)', '0.416667');
      await page.waitForSelector('[data-layer="computed-direct"]');
      checkShown(await result(page, 'peak-discharge'), 0.5333, 'm³/s', 'Peak discharge');
      const tp = await result(page, 'time-to-peak');
      check(tp === '1:40 after the storm start', `Time to peak: shown "${tp}", worked by hand 1:40`);

      // The loss line drawn lower (arrow keys on its slider) lets more bars run off: the computed
      // hydrograph moves with it, and its peak rises.
      const before = await page.locator('[data-layer="computed-direct"]').getAttribute('d');
      const slider = page.getByRole('slider', { name: 'Loss rate φ' });
      await slider.focus();
      await page.keyboard.press('PageDown');
      await page.waitForFunction(
        (d) => document.querySelector('[data-layer="computed-direct"]')?.getAttribute('d') !== d,
        before,
      );
      const raised = Number.parseFloat((await result(page, 'peak-discharge')).replace(/[^\d.]/g, ''));
      check(raised > 0.5333, `the peak should rise as the loss falls, got ${raised}`);
    },
  },
  {
    name: 'rain over runoff: the demo storm hangs over its hydrograph on one time axis, with no accessibility problem',
    async run({ baseUrl, newPage }) {
      const page = await newPage();
      await page.goto(baseUrl);
      // As above: φ = 36 mm/h leaves only the 8th bar's 6.4 − 6 = 0.4 mm of excess, of the demo's 41.6 mm.
      await typeInto(page, 'Loss rate φ (mm/h)', '36');
      await page.getByRole('combobox', { name: 'Unit hydrograph' }).selectOption('triangular');
      await page.getByRole('tab', { name: 'Rain over runoff' }).click();
      const view = page.getByRole('region', { name: 'Rain over runoff' });
      const hanging = view.getByRole('img', { name: /^Hanging hyetograph/ });
      await hanging.waitFor();
      const label = (await hanging.getAttribute('aria-label')) ?? '';
      const [, rain, excess] = /: ([\d.]+ mm) of rain, ([\d.]+ mm) of it excess/.exec(label) ?? [];
      checkShown(rain ?? '', 41.6, 'mm', 'Rain of the hanging hyetograph');
      // 0.4 mm exactly: the formatter drops trailing zeros, so it reads as one digit.
      check(excess === '0.4 mm', `Excess of the hanging hyetograph: shown "${excess}", worked by hand 0.4 mm`);
      await view.locator('[data-layer="computed-direct"]').waitFor({ state: 'attached' });
      // One time axis: the hanging chart and the hydrograph under it are as wide and start at the same x.
      const boxes = await view.locator('.rain-over-runoff__figure svg').evaluateAll((svgs) =>
        svgs.map((svg) => {
          const r = svg.getBoundingClientRect();
          return [Math.round(r.left), Math.round(r.width)];
        }),
      );
      check(boxes.length === 2, `two charts expected, found ${boxes.length}`);
      check(
        JSON.stringify(boxes[0]) === JSON.stringify(boxes[1]),
        `the two charts should line up: ${JSON.stringify(boxes)}`,
      );
      await addAxe(page);
      const violations = await page.evaluate(async () => {
        const result = await window.axe.run(document.getElementById('view-rain-over-runoff'));
        return result.violations.map(
          (v) => `${v.id}: ${v.help} (${v.nodes.map((n) => n.target.join(' ')).join(', ')})`,
        );
      });
      check(violations.length === 0, violations.join('\n'));
    },
  },
];
