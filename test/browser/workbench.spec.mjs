// The workbench in Debian's chromium, against the built app: drag the loss-rate
// line with the mouse and move it with the keyboard, and check the shown
// results against values worked by hand for the demo storm (and the drag's
// against the core too); reload and keep the scenario, recover from damaged
// saved data, and pass an axe-core check.
import { addAxe, check, checkShown, loadSource } from './support.mjs';

const text = async (page, label) =>
  ((await page.getByLabel(label, { exact: true }).first().textContent()) ?? '').trim();

/** The demo scenario's storm, as the page holds it (read back from its saved copy after an edit). */
async function savedScenario(page) {
  return page.evaluate(() => JSON.parse(localStorage.getItem('raincut.scenario') ?? 'null'));
}

/** Screen pixels per mm/h on the hyetograph's axis, read from its "0" and "10" tick labels. */
async function pixelsPerMmH(page) {
  const ys = await page.evaluate(() =>
    Object.fromEntries(
      Array.from(document.querySelectorAll('.chart__svg text'))
        .filter((t) => t.textContent === '0' || t.textContent === '10')
        .map((t) => {
          const box = t.getBoundingClientRect();
          return [t.textContent, box.y + box.height / 2];
        }),
    ),
  );
  check(ys['0'] !== undefined && ys['10'] !== undefined, `the rate axis has no 0 and 10 ticks: ${JSON.stringify(ys)}`);
  return (ys['0'] - ys['10']) / 10;
}

async function dragLine(page, dyPx) {
  const line = page.getByRole('slider', { name: 'Loss rate φ' });
  const stroke = page.locator('.loss-line__stroke');
  const box = await stroke.boundingBox();
  check(box, 'the loss-rate line is not on screen');
  const x = box.x + box.width * 0.4;
  const y = box.y + box.height / 2;
  await page.mouse.move(x, y);
  await page.mouse.down();
  for (let i = 1; i <= 10; i++) await page.mouse.move(x, y + (dyPx * i) / 10);
  await page.mouse.up();
  return line;
}

// The demo storm (src/scenario/demo.ts, invented): 18 bars of 10 min (1/6 h),
//   0.4 0.8 1.2 1.8 2.6 3.8 5.6 6.4 4.8 3.6 2.8 2.2 1.6 1.2 1.0 0.8 0.6 0.4 mm,
// 41.6 mm in all, on 3.2 km² (1 mm of runoff = 3.2e6 m² × 0.001 m = 3200 m³).
// With the constant rate φ every bar loses min(P, φ/6) (Chow, Maidment & Mays
// 1988, §5.2), so the excess is the sum of (P − φ/6) over the bars with P > φ/6.
const RAIN_MM = 41.6;
const M3_PER_MM = 3200;

export const tests = [
  {
    name: 'dragging the loss-rate line moves φ and shows the results worked by hand for the new rate',
    async run({ baseUrl, newPage }) {
      const { core, format, close } = await loadSource();
      try {
        const page = await newPage();
        await page.goto(baseUrl);
        // Aim at φ = 6.6 mm/h, 1.4 mm/h below the line at 8, on the axis's own scale.
        const line = await dragLine(page, 1.4 * (await pixelsPerMmH(page)));
        const phi = Number(await line.getAttribute('data-value-mmh'));
        check(Number(await line.getAttribute('aria-valuenow')) === phi, 'aria-valuenow is not the rate');
        // By hand: for 6 ≤ φ ≤ 7.2 mm/h a bar loses φ/6 between 1.0 and 1.2 mm, so the
        // 12 bars of 1.2 mm and more run off: 6.4 + 5.6 + 4.8 + 3.8 + 3.6 + 2.8 + 2.6
        // + 2.2 + 1.8 + 1.6 + 1.2 + 1.2 = 37.6 mm, less 12 × φ/6 = 2φ. Excess = 37.6 − 2φ;
        // the peak bar gives 6.4 mm × 6 /h − φ = 38.4 − φ mm/h.
        check(phi >= 6 && phi <= 7.2, `the line should have moved from 8 to about 6.6 mm/h, got ${phi}`);
        const excess = 37.6 - 2 * phi;
        checkShown(await text(page, 'Rainfall depth'), RAIN_MM, 'mm', 'Rainfall depth');
        checkShown(await text(page, 'Excess depth'), excess, 'mm', 'Excess depth');
        checkShown(await text(page, 'Loss depth'), RAIN_MM - excess, 'mm', 'Loss depth');
        checkShown(await text(page, 'Runoff volume'), excess * M3_PER_MM, 'm³', 'Runoff volume');
        checkShown(await text(page, 'Runoff fraction'), (100 * excess) / RAIN_MM, '%', 'Runoff fraction');
        checkShown(await text(page, 'Peak excess intensity'), 38.4 - phi, 'mm/h', 'Peak excess intensity');

        // The page saves after it settles; its saved storm and rate give the core's numbers too.
        await page.waitForFunction(
          (want) => JSON.parse(localStorage.getItem('raincut.scenario') ?? 'null')?.method?.rateMmH === want,
          phi,
        );
        const scenario = await savedScenario(page);
        const r = core.computeLosses(scenario.storm, { kind: 'constant', rateMmH: phi });
        const mm = (v) => `${format.formatValue(v)} mm`;
        const expected = {
          'Rainfall depth': mm(r.rainMm),
          'Loss depth': mm(r.totalLossMm),
          'Excess depth': mm(r.totalExcessMm),
          'Runoff volume': `${format.formatValue(core.runoffVolumeM3(r.totalExcessMm, scenario.catchment.areaM2))} m³`,
          'Runoff fraction': format.formatPercent(r.runoffFraction),
          'Peak excess intensity': `${format.formatValue(r.peakExcessMmH)} mm/h`,
        };
        for (const [label, want] of Object.entries(expected)) {
          const shown = await text(page, label);
          check(shown === want, `${label}: shown "${shown}", core gives "${want}"`);
        }
        check(
          (await page.getByRole('button', { name: 'Undo' }).getAttribute('title')) ===
            'Undo: Drag loss rate φ (Ctrl+Z)',
          'the drag is not the last undo step',
        );
      } finally {
        await close();
      }
    },
  },
  {
    name: 'a reload opens the scenario as it was left',
    async run({ baseUrl, newPage }) {
      const page = await newPage();
      await page.goto(baseUrl);
      await page.getByLabel('Scenario name').fill('Reload check');
      await page.getByRole('radio', { name: 'US customary' }).check();
      const line = await dragLine(page, -30);
      const phi = await line.getAttribute('data-value-mmh');
      const excess = await text(page, 'Excess depth');
      await page.reload();
      check((await page.getByLabel('Scenario name').inputValue()) === 'Reload check', 'the name was not kept');
      check(await page.getByRole('radio', { name: 'US customary' }).isChecked(), 'the unit system was not kept');
      const after = page.getByRole('slider', { name: 'Loss rate φ' });
      check(
        (await after.getAttribute('data-value-mmh')) === phi,
        `the rate was ${phi}, after reload ${await after.getAttribute('data-value-mmh')}`,
      );
      check((await text(page, 'Excess depth')) === excess, 'the results changed on reload');
      check(excess.endsWith(' in'), `results should stay in inches, got ${excess}`);
    },
  },
  {
    name: 'damaged saved data is set aside and reported, and the screen still works',
    async run({ baseUrl, newPage, context }) {
      await context.addInitScript(() => {
        // The script runs in about:blank too, where storage is off limits (and reading it throws).
        if (location.protocol !== 'http:') return;
        if (!sessionStorage.getItem('seeded')) {
          sessionStorage.setItem('seeded', '1');
          localStorage.setItem('raincut.scenario', '{"version":1,"storm":{"depthsMm":[1,2,');
        }
      });
      const page = await newPage();
      await page.goto(baseUrl);
      const alert = page.getByRole('alert');
      const message = (await alert.textContent()) ?? '';
      check(/Saved scenario set aside/.test(message), `no report of the damaged data: "${message}"`);
      const key = /"(raincut\.scenario\.damaged\.[^"]+)"/.exec(message)?.[1];
      check(key, `the report does not name where the data was kept: "${message}"`);
      const kept = await page.evaluate((k) => localStorage.getItem(k), key);
      check(kept === '{"version":1,"storm":{"depthsMm":[1,2,', `the damaged text was not kept under ${key}`);
      check((await text(page, 'Rainfall depth')) === '41.6 mm', 'the demo did not open');
    },
  },
  {
    name: 'the keyboard alone moves the line, undoes and redoes, and the results are the ones worked by hand',
    async run({ baseUrl, newPage }) {
      const page = await newPage();
      await page.goto(baseUrl);
      const line = page.getByRole('slider', { name: 'Loss rate φ' });
      for (let i = 0; i < 40 && !(await line.evaluate((el) => el === document.activeElement)); i++)
        await page.keyboard.press('Tab');
      check(await line.evaluate((el) => el === document.activeElement), 'Tab never reached the loss-rate line');
      await page.keyboard.press('PageUp');
      await page.keyboard.press('ArrowUp');
      check(
        (await line.getAttribute('aria-valuenow')) === '9.1',
        `PageUp then ArrowUp from 8 gave ${await line.getAttribute('aria-valuenow')}`,
      );
      // By hand at φ = 9.1 mm/h: each 10-min bar loses 9.1/6 = 1.5167 mm, so the 10
      // bars of 1.6 mm and more run off: 6.4 + 5.6 + 4.8 + 3.8 + 3.6 + 2.8 + 2.6 + 2.2
      // + 1.8 + 1.6 = 35.2 mm, less 10 × 9.1/6 = 15.1667 mm: excess 20.0333 mm
      // (shown 20.03 mm), loss 41.6 − 20.0333 = 21.5667 mm, runoff volume
      // 20.0333 × 3200 = 64,106.7 m³, fraction 20.0333/41.6 = 48.157 %, peak excess
      // 6.4 × 6 − 9.1 = 29.3 mm/h.
      checkShown(await text(page, 'Excess depth'), 20.0333333, 'mm', 'Excess depth at φ = 9.1');
      checkShown(await text(page, 'Loss depth'), 21.5666667, 'mm', 'Loss depth at φ = 9.1');
      checkShown(await text(page, 'Runoff volume'), 64106.667, 'm³', 'Runoff volume at φ = 9.1');
      checkShown(await text(page, 'Runoff fraction'), 48.157051, '%', 'Runoff fraction at φ = 9.1');
      checkShown(await text(page, 'Peak excess intensity'), 29.3, 'mm/h', 'Peak excess intensity at φ = 9.1');
      await page.keyboard.press('Control+z');
      check((await line.getAttribute('aria-valuenow')) === '8', 'Ctrl+Z did not undo the key moves');
      // Back at φ = 8: 8/6 = 1.3333 mm a bar, the same 10 bars: 35.2 − 13.3333 = 21.8667 mm.
      checkShown(await text(page, 'Excess depth'), 21.8666667, 'mm', 'Excess depth after undo');
      await page.keyboard.press('Control+Shift+z');
      check((await line.getAttribute('aria-valuenow')) === '9.1', 'Ctrl+Shift+Z did not redo');
      // Focus is visible on the line: its halo shows.
      const halo = await page.locator('.loss-line__halo').evaluate((el) => getComputedStyle(el).strokeOpacity);
      check(Number(halo) > 0, 'no visible focus on the loss-rate line');
    },
  },
  {
    name: 'axe-core finds no accessibility violations',
    async run({ baseUrl, newPage }) {
      const page = await newPage();
      await page.goto(baseUrl);
      await addAxe(page);
      const run = () =>
        page.evaluate(async () => {
          const result = await window.axe.run(document);
          return result.violations.map(
            (v) => `${v.id}: ${v.help} (${v.nodes.map((n) => n.target.join(' ')).join(', ')})`,
          );
        });
      const first = await run();
      check(first.length === 0, first.join('\n'));
      // Also with an error showing next to a field, and in US units.
      await page.getByRole('radio', { name: 'US customary' }).check();
      await page.getByRole('textbox', { name: /^Observed runoff/ }).fill('99');
      const second = await run();
      check(second.length === 0, second.join('\n'));
    },
  },
  {
    name: 'at a narrow width nothing runs off the side',
    async run({ baseUrl, newPage }) {
      const page = await newPage();
      await page.setViewportSize({ width: 420, height: 900 });
      await page.goto(baseUrl);
      const { scroll, inner } = await page.evaluate(() => ({
        scroll: document.documentElement.scrollWidth,
        inner: window.innerWidth,
      }));
      check(scroll <= inner, `the page is ${scroll} px wide in a ${inner} px window`);
      const svgWidth = await page.locator('.chart__svg').evaluate((el) => el.getBoundingClientRect().width);
      check(svgWidth <= inner, `the chart is ${svgWidth} px wide`);
    },
  },
];
