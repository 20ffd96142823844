// The observed event in Debian's chromium, against the built app: paste a
// streamflow record, send its separated depth to Matching, drag the end point
// with the mouse, and check the direct runoff and the matched loss rate on
// screen against the core computing the same scenario (read back from what
// the page saved); separate a short record whose numbers are worked by hand
// and match the demo storm to it; then open the scenario from a share link in a fresh
// browser context and find the same record, end point and numbers; and pass
// an axe-core check with the record, the paste dialog and its problems showing.
import { addAxe, check, checkShown, loadSourceModules } from './support.mjs';

/** Source modules to check the page against (see support.mjs). */
const loadModules = () =>
  loadSourceModules({ core: '/src/core/index.ts', scenario: '/src/scenario/index.ts', format: '/src/ui/format.ts' });

/**
 * An INVENTED event record for the demo catchment (no real gauge): 15-minute
 * readings from 14:00 on 14 Jul 2026 for 30 h, 0.35 m³/s of baseflow and a
 * flood wave rising at 15:30 to about 5.4 m³/s at 17:00.
 */
function inventedRecord() {
  const pad = (n) => String(n).padStart(2, '0');
  const lines = ['Time\tQ (m3/s)'];
  for (let k = 0; k <= 120; k++) {
    const since = k / 4 - 1.5;
    const wave = since > 0 ? 5 * (since / 1.5) ** 3 * Math.exp(3 * (1 - since / 1.5)) : 0;
    const q = 0.35 + (since > 0 ? 0.08 * Math.min(1, since / 6) : 0) + wave;
    const minutes = 14 * 60 + 15 * k;
    lines.push(
      `2026-07-${14 + Math.floor(minutes / 1440)} ${pad(Math.floor((minutes % 1440) / 60))}:${pad(minutes % 60)}\t${q.toFixed(3)}`,
    );
  }
  return lines.join('\n');
}

const shown = async (page, label) =>
  ((await page.getByLabel(label, { exact: true }).first().textContent()) ?? '').trim();
const saved = (page) => page.evaluate(() => JSON.parse(localStorage.getItem('raincut.scenario') ?? 'null'));

/** Waits until the page has saved an end point equal to the handle's value, and returns the saved scenario. */
async function savedWithEnd(page, endH) {
  await page.waitForFunction(
    (want) => JSON.parse(localStorage.getItem('raincut.scenario') ?? 'null')?.streamflow?.baseflow?.endTimeH === want,
    endH,
  );
  return saved(page);
}

/** What the screen must show for a saved scenario, from the core. */
function expected({ core, format }, s) {
  const flow = s.streamflow;
  const r = core.separateBaseflow(flow, flow.baseflow, { areaM2: s.catchment.areaM2 });
  const fit = core.calibrate(s.storm, s.method, s.observed.parameter, r.directDepthMm);
  check(fit.ok, `the core finds no loss rate for ${r.directDepthMm} mm: ${fit.message}`);
  return {
    volume: `${format.formatValue(r.directVolumeM3)} m³`,
    depth: `${format.formatValue(r.directDepthMm)} mm`,
    observed: format.formatForField(r.directDepthMm),
    rateMmH: fit.method.rateMmH,
    endTimeH: r.endTimeH,
  };
}

async function dragEnd(page, dxPx) {
  const knob = page.locator('.end-handle__knob');
  await knob.scrollIntoViewIfNeeded();
  const box = await knob.boundingBox();
  check(box, 'the end-point handle is not on screen');
  const x = box.x + box.width / 2;
  const y = box.y + box.height / 2;
  await page.mouse.move(x, y);
  await page.mouse.down();
  for (let i = 1; i <= 12; i++) await page.mouse.move(x + (dxPx * i) / 12, y + (i % 3) - 1);
  await page.mouse.up();
}

async function pasteRecord(page) {
  await page.getByRole('button', { name: 'Paste streamflow…' }).click();
  const dialog = page.getByRole('dialog', { name: 'Paste streamflow' });
  await dialog.getByLabel('Streamflow text').fill(inventedRecord());
  await dialog.getByRole('status').filter({ hasText: '121 samples every 15 min' }).waitFor();
  await dialog.getByRole('button', { name: 'Use this record' }).click();
  await dialog.waitFor({ state: 'detached' });
  // The hydrograph and the separation panel load their code once there is a record.
  await page.getByRole('region', { name: 'Baseflow separation' }).waitFor();
}

/**
 * An INVENTED hourly record, small enough to separate by hand: 1 m³/s of
 * baseflow from 12:00 on 14 Jul 2026 for 30 h, with a flood of 5, 9, 6.2 and
 * 3 m³/s at hours 2–5.
 */
function handRecord() {
  const flood = { 2: 5, 3: 9, 4: 6.2, 5: 3 };
  const lines = ['Time\tQ (m3/s)'];
  for (let h = 0; h <= 30; h++) {
    const day = 14 + Math.floor((12 + h) / 24);
    lines.push(`2026-07-${day} ${String((12 + h) % 24).padStart(2, '0')}:00\t${flood[h] ?? 1}`);
  }
  return lines.join('\n');
}

export const tests = [
  {
    name: 'a short record separated as worked by hand: direct runoff volume and depth, and the loss rate matched to it',
    async run({ baseUrl, newPage }) {
      const page = await newPage();
      await page.goto(baseUrl);
      await page.getByRole('button', { name: 'Paste streamflow…' }).click();
      const dialog = page.getByRole('dialog', { name: 'Paste streamflow' });
      await dialog.getByLabel('Streamflow text').fill(handRecord());
      await dialog.getByRole('status').filter({ hasText: '31 samples every 1 h' }).waitFor();
      await dialog.getByRole('button', { name: 'Use this record' }).click();
      await dialog.waitFor({ state: 'detached' });

      // By hand. Peak 9 m³/s at hour 3. The demo's 3.2 km² is 3.2/2.589988 = 1.23553 mi², so
      // the end is N = 1.23553^0.2 = 1.04321 days = 25.037 h after the peak, at 28.037 h
      // (Linsley, Kohler & Paulhus), where Q = 1 m³/s; the line from the start of rise
      // (1 m³/s) to the end is flat at 1 m³/s. Q − 1 at hours 1…6: 0, 4, 8, 5.2, 2, 0; by
      // the trapezoidal rule, (0+4)/2 + (4+8)/2 + (8+5.2)/2 + (5.2+2)/2 + (2+0)/2 =
      // 2 + 6 + 6.6 + 3.6 + 1 = 19.2 m³/s·h = 19.2 × 3600 = 69,120 m³; over 3.2e6 m²,
      // 0.0216 m = 21.6 mm. The record holds 30 h × 1 + 19.2 = 49.2 m³/s·h, so the
      // baseflow index is 30/49.2 = 0.60976.
      const handle = page.getByRole('slider', { name: 'End of direct runoff' });
      const endH = Number(await handle.getAttribute('aria-valuenow'));
      check(Math.abs(endH - 28.03697) < 1e-4, `the end point stands at ${endH} h, by hand 28.037 h`);
      checkShown(await shown(page, 'Direct runoff volume'), 69120, 'm³', 'Direct runoff volume');
      checkShown(await shown(page, 'Direct runoff depth'), 21.6, 'mm', 'Direct runoff depth');
      const bfi = await shown(page, 'Baseflow index');
      checkShown(bfi.split(' (')[0], 0.6097561, '', 'Baseflow index');

      // Matched to the demo storm (18 bars of 10 min, see workbench.spec.mjs): with the 10
      // bars of 1.6 mm and more above φ/6, 35.2 − 10·φ/6 = 21.6 gives φ = 13.6 × 0.6 =
      // 8.16 mm/h; φ/6 = 1.36 mm lies between 1.2 and 1.6 mm, so that set is the right one.
      await page.getByRole('button', { name: 'Use as observed runoff' }).click();
      const phiLine = page.getByRole('slider', { name: 'Loss rate φ' });
      await page.waitForFunction(
        () =>
          Math.abs(Number(document.querySelector('[data-value-mmh]')?.getAttribute('data-value-mmh')) - 8.16) < 1e-6,
      );
      const rate = Number(await phiLine.getAttribute('data-value-mmh'));
      check(Math.abs(rate - 8.16) <= 1e-9 * 8.16, `the matched loss rate is ${rate} mm/h, by hand 8.16 mm/h`);
      checkShown(await shown(page, 'Excess depth'), 21.6, 'mm', 'Excess depth at the matched rate');
      const answer = (await page.locator('#fit-answer').textContent()) ?? '';
      check(/^Matched: loss rate φ is 8\.16 mm\/h/.test(answer), `Matching says "${answer}"`);
    },
  },
  {
    name: 'dragging the end point with the mouse changes the direct runoff and the matched loss rate, as the core computes them',
    async run({ baseUrl, newPage }) {
      const mods = await loadModules();
      try {
        const page = await newPage();
        await page.goto(baseUrl);
        await pasteRecord(page);

        const handle = page.getByRole('slider', { name: 'End of direct runoff' });
        const phiLine = page.getByRole('slider', { name: 'Loss rate φ' });
        // A new record starts with the end N = A^0.2 days after the peak (3.2 km² → 1.04 days).
        const auto = Number(await handle.getAttribute('aria-valuenow'));
        await page.waitForFunction(() =>
          Array.isArray(JSON.parse(localStorage.getItem('raincut.scenario') ?? 'null')?.streamflow?.timesH),
        );
        const first = await saved(page);
        check(first.streamflow.timesH.length === 121, `the record saved has ${first.streamflow.timesH.length} samples`);
        const coreAuto = mods.core.separateBaseflow(
          first.streamflow,
          { kind: 'straight-line' },
          { areaM2: first.catchment.areaM2 },
        );
        check(
          Math.abs(auto - coreAuto.endTimeH) < 1e-9,
          `the handle stands at ${auto} h, the core's N = A^0.2 end at ${coreAuto.endTimeH} h`,
        );

        await page.getByRole('button', { name: 'Use as observed runoff' }).click();
        check(
          (await page.getByRole('button', { name: 'Use as observed runoff' }).getAttribute('aria-pressed')) === 'true',
          'the link is not on',
        );
        check(await page.getByRole('switch', { name: 'Keep matched' }).isChecked(), 'Keep matched is not on');
        const volumeBefore = await shown(page, 'Direct runoff volume');
        const rateBefore = Number(await phiLine.getAttribute('data-value-mmh'));

        await dragEnd(page, -260);
        const endH = Number(await handle.getAttribute('aria-valuenow'));
        check(endH < auto - 1, `the end point did not move left: ${auto} h → ${endH} h`);
        const s = await savedWithEnd(page, endH);
        check(s.streamflow.useAsObserved === true, 'the saved scenario lost the link to the observed runoff');
        const want = expected(mods, s);
        const volume = await shown(page, 'Direct runoff volume');
        check(volume === want.volume, `Direct runoff volume: shown "${volume}", the core gives "${want.volume}"`);
        check(volume !== volumeBefore, `the volume did not change with the end point (${volume})`);
        const depth = await shown(page, 'Direct runoff depth');
        check(depth === want.depth, `Direct runoff depth: shown "${depth}", the core gives "${want.depth}"`);
        const observed = await page.getByRole('textbox', { name: /^Observed runoff/ }).inputValue();
        check(observed === want.observed, `Matching shows ${observed} mm, the core's depth is ${want.observed}`);
        const rate = Number(await phiLine.getAttribute('data-value-mmh'));
        check(rate === want.rateMmH, `the matched loss rate is ${rate} mm/h, the core fits ${want.rateMmH} mm/h`);
        check(rate !== rateBefore, `the matched loss rate did not change (${rate} mm/h)`);
        const answer = (await page.locator('#fit-answer').textContent()) ?? '';
        check(
          answer.startsWith(`Matched: loss rate φ is ${mods.format.formatValue(want.rateMmH)} mm/h`),
          `Matching says "${answer}"`,
        );
        const undo = await page.getByRole('button', { name: 'Undo' }).getAttribute('title');
        check(undo === 'Undo: Drag end of direct runoff (Ctrl+Z)', `the drag is not one undo step: ${undo}`);

        // The keyboard moves it too, and Undo takes the step back.
        await handle.focus();
        await page.keyboard.press('ArrowRight');
        const stepped = Number(await handle.getAttribute('aria-valuenow'));
        check(stepped > endH, `ArrowRight did not move the end later (${endH} → ${stepped})`);
        const after = expected(mods, await savedWithEnd(page, stepped));
        check((await shown(page, 'Direct runoff volume')) === after.volume, 'the volume does not follow the keyboard');
        await page.keyboard.press('Control+z');
        check(Number(await handle.getAttribute('aria-valuenow')) === endH, 'Undo did not take the key step back');
      } finally {
        await mods.close();
      }
    },
  },
  {
    name: 'a share link carries the record: a fresh browser opens the same hydrograph, end point and numbers',
    async run({ browser, baseUrl, newPage }) {
      const mods = await loadModules();
      try {
        const page = await newPage();
        await page.goto(baseUrl);
        await pasteRecord(page);
        await page.getByRole('button', { name: 'Use as observed runoff' }).click();
        await dragEnd(page, -200);
        const endH = Number(
          await page.getByRole('slider', { name: 'End of direct runoff' }).getAttribute('aria-valuenow'),
        );
        const s = await savedWithEnd(page, endH);
        const link = mods.scenario.encodeScenarioLink({ ...s, name: 'Observed event check (invented)' });
        const want = expected(mods, s);

        const fresh = await browser.newContext({ viewport: { width: 1400, height: 900 } });
        try {
          const other = await fresh.newPage();
          await other.goto(`${baseUrl}#${link}`);
          await other.getByRole('region', { name: 'Shared scenario: “Observed event check (invented)”' }).waitFor();
          const handle = other.getByRole('slider', { name: 'End of direct runoff' });
          check(Number(await handle.getAttribute('aria-valuenow')) === endH, 'the end point did not travel');
          check(
            (await shown(other, 'Direct runoff volume')) === want.volume,
            'the direct runoff volume differs in the fresh browser',
          );
          check(
            (await shown(other, 'Direct runoff depth')) === want.depth,
            'the direct runoff depth differs in the fresh browser',
          );
          const rate = Number(await other.getByRole('slider', { name: 'Loss rate φ' }).getAttribute('data-value-mmh'));
          check(
            rate === want.rateMmH,
            `the matched loss rate is ${rate} mm/h in the fresh browser, the core fits ${want.rateMmH}`,
          );
          check(
            (await other.getByRole('button', { name: 'Use as observed runoff' }).getAttribute('aria-pressed')) ===
              'true',
            'the link to the observed runoff did not travel',
          );
        } finally {
          await fresh.close();
        }
      } finally {
        await mods.close();
      }
    },
  },
  {
    name: 'axe-core finds no accessibility violations in the hydrograph, the separation panel and the paste dialog with its problems',
    async run({ baseUrl, newPage }) {
      const page = await newPage();
      await page.goto(baseUrl);
      await addAxe(page);
      // This spec answers for the observed event's own parts (the whole page is workbench.spec's check).
      const run = () =>
        page.evaluate(async () => {
          const parts = ['.hydro', '.separation', '[role="dialog"]'].filter((sel) => document.querySelector(sel));
          const result = await window.axe.run({ include: parts.map((sel) => [sel]) });
          const found = result.violations.map(
            (v) => `${v.id}: ${v.help} (${v.nodes.map((n) => n.target.join(' ')).join(', ')})`,
          );
          // An empty selection would pass everything: say what was looked at.
          return parts.length >= 2 && result.passes.length > 0
            ? found
            : [`nothing checked (${parts.join(', ') || 'no parts on screen'})`];
        });
      await pasteRecord(page);
      const withRecord = await run();
      check(withRecord.length === 0, withRecord.join('\n'));
      // In US units, with a refused value beside a field.
      await page.getByRole('radio', { name: 'US customary' }).check();
      await page.getByRole('textbox', { name: /^End of direct runoff/ }).fill('999');
      const refused = await run();
      check(refused.length === 0, refused.join('\n'));
      await page.getByRole('button', { name: 'Paste streamflow…' }).click();
      const dialog = page.getByRole('dialog', { name: 'Paste streamflow' });
      await dialog.getByLabel('Streamflow text').fill('Time\tQ (L/s)\n14:00\t350\n14:15\tabc\n14:30\t-4');
      await dialog.getByRole('table', { name: '2 problems to fix' }).waitFor();
      const inDialog = await run();
      check(inDialog.length === 0, inDialog.join('\n'));
    },
  },
];
