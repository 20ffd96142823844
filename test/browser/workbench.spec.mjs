// The workbench in Debian's chromium, against the built app: drag the loss-rate
// line with the mouse and check every shown number against the core, reload and
// keep the scenario, recover from damaged saved data, work from the keyboard,
// and pass an axe-core check.
import { addAxe, check, loadSource } from './support.mjs';

const text = async (page, label) =>
  ((await page.getByLabel(label, { exact: true }).first().textContent()) ?? '').trim();

/** The demo scenario's storm, as the page holds it (read back from its saved copy after an edit). */
async function savedScenario(page) {
  return page.evaluate(() => JSON.parse(localStorage.getItem('raincut.scenario') ?? 'null'));
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

export const tests = [
  {
    name: 'dragging the loss-rate line shows the core’s numbers for the new rate',
    async run({ baseUrl, newPage }) {
      const { core, format, close } = await loadSource();
      try {
        const page = await newPage();
        await page.goto(baseUrl);
        const line = await dragLine(page, 20);
        const phi = Number(await line.getAttribute('data-value-mmh'));
        check(phi > 0 && phi < 8, `the line should have moved down from 8 mm/h, got ${phi}`);
        check(Number(await line.getAttribute('aria-valuenow')) === phi, 'aria-valuenow is not the rate');
        // The page saves after it settles; its saved storm is the one to compute with.
        await page.waitForFunction(() => localStorage.getItem('raincut.scenario') !== null);
        const scenario = await savedScenario(page);
        check(scenario.method.rateMmH === phi, `saved rate ${scenario.method.rateMmH} is not the shown ${phi}`);
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
        if (!sessionStorage.getItem('seeded')) {
          sessionStorage.setItem('seeded', '1');
          localStorage.setItem('raincut.scenario', '{"version":1,"storm":{"depthsMm":[1,2,');
        }
      });
      const page = await newPage();
      const errors = [];
      page.on('pageerror', (e) => errors.push(e.message));
      await page.goto(baseUrl);
      const alert = page.getByRole('alert');
      const message = (await alert.textContent()) ?? '';
      check(/Saved scenario set aside/.test(message), `no report of the damaged data: "${message}"`);
      const key = /"(raincut\.scenario\.damaged\.[^"]+)"/.exec(message)?.[1];
      check(key, `the report does not name where the data was kept: "${message}"`);
      const kept = await page.evaluate((k) => localStorage.getItem(k), key);
      check(kept === '{"version":1,"storm":{"depthsMm":[1,2,', `the damaged text was not kept under ${key}`);
      check((await text(page, 'Rainfall depth')) === '41.6 mm', 'the demo did not open');
      check(errors.length === 0, errors.join('; '));
    },
  },
  {
    name: 'the keyboard alone moves the line, undoes and redoes',
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
      await page.keyboard.press('Control+z');
      check((await line.getAttribute('aria-valuenow')) === '8', 'Ctrl+Z did not undo the key moves');
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
