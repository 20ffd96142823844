// The first screen on a laptop (issue 16): at 1366×768 and 1280×720 the loss
// line and the live results (excess depth, runoff volume, runoff fraction) are
// in view together without scrolling, and stay in view while the line is
// dragged; the scenario tools and the rainfall tools do not wrap.
import { addAxe, check } from './support.mjs';

const SIZES = [
  { width: 1366, height: 768 },
  { width: 1280, height: 720 },
];

/** The element's box, and whether it lies wholly inside the viewport. */
async function inView(page, locator, what) {
  const box = await locator.boundingBox();
  check(box, `${what} is not on screen`);
  const { width, height } = page.viewportSize();
  const inside = box.y >= 0 && box.x >= 0 && box.y + box.height <= height && box.x + box.width <= width;
  return { box, inside, text: `${what} at y ${Math.round(box.y)}–${Math.round(box.y + box.height)} in ${height} px` };
}

/** Is the top of another element drawn over the centre of this one (a strip hiding the line)? */
async function uncovered(page, selector) {
  return page.evaluate((sel) => {
    const el = document.querySelector(sel);
    if (!el) return false;
    const b = el.getBoundingClientRect();
    const hit = document.elementFromPoint(b.x + b.width * 0.3, b.y + b.height / 2);
    return hit !== null && (el.contains(hit) || hit.closest('.loss-line') !== null);
  }, selector);
}

async function checkTogether(page, when) {
  const results = ['excess', 'volume', 'fraction'];
  for (const id of results) {
    const r = await inView(page, page.locator(`[data-result="${id}"]`), `the ${id} result`);
    check(r.inside, `${when}: ${r.text}`);
  }
  const line = await inView(page, page.locator('.loss-line__stroke'), 'the loss line');
  check(line.inside, `${when}: ${line.text}`);
  check(await uncovered(page, '.loss-line__tag'), `${when}: the loss line's tag is covered by something`);
  return line;
}

export const tests = SIZES.map(({ width, height }) => ({
  name: `at ${width}×${height} the loss line and the excess, volume and fraction are in view together, before and while dragging`,
  async run({ browser, baseUrl }) {
    const context = await browser.newContext({ viewport: { width, height } });
    const page = await context.newPage();
    await page.goto(baseUrl);
    await page.locator('.loss-line__stroke').waitFor({ state: 'attached' });
    check((await page.evaluate(() => window.scrollY)) === 0, 'the page opened scrolled');
    const { box } = await checkTogether(page, 'on opening');

    // The scenario tools are one row: every group's top within a few px of the first's.
    const tops = await page
      .locator('.scenario-bar__group')
      .evaluateAll((els) => els.map((e) => Math.round(e.getBoundingClientRect().top)));
    check(Math.max(...tops) - Math.min(...tops) <= 4, `the scenario tools wrap at ${width} px: group tops ${tops}`);

    // Drag the line to the top of the chart, looking at every step: nothing moves it or the results out of view.
    const x = box.x + box.width * 0.4;
    const y = box.y + box.height / 2;
    await page.mouse.move(x, y);
    await page.mouse.down();
    for (let i = 1; i <= 8; i++) {
      await page.mouse.move(x, y - 30 * i);
      await checkTogether(page, `dragging, step ${i}`);
    }
    await page.mouse.up();
    await checkTogether(page, 'after the drag');

    // Scrolled down to the panels under the chart, the results strip stays at the window's foot.
    await page.evaluate(() => window.scrollBy(0, 400));
    for (const id of ['excess', 'volume', 'fraction']) {
      const r = await inView(page, page.locator(`[data-result="${id}"]`), `the ${id} result`);
      check(r.inside, `scrolled down 400 px: ${r.text}`);
    }

    // With a unit hydrograph chosen the export group gains "Export hydrograph CSV": the tools still stay one row.
    await page.getByLabel('Unit hydrograph').selectOption({ label: 'NRCS triangular unit hydrograph' });
    await page.getByRole('button', { name: 'Export hydrograph CSV' }).waitFor();
    const withHydrograph = await page
      .locator('.scenario-bar__group')
      .evaluateAll((els) => els.map((e) => Math.round(e.getBoundingClientRect().top)));
    check(
      Math.max(...withHydrograph) - Math.min(...withHydrograph) <= 4,
      `with a hydrograph's CSV the scenario tools wrap at ${width} px: group tops ${withHydrograph}`,
    );
    await context.close();
  },
}));

tests.push({
  name: 'the hidden file inputs are not in the accessibility tree as extra buttons',
  async run({ baseUrl, newPage }) {
    const page = await newPage();
    await page.goto(baseUrl);
    await page.locator('.loss-line__stroke').waitFor({ state: 'attached' });
    const tree = await page.locator('body').ariaSnapshot();
    for (const name of ['Scenario file to open', 'Rainfall file to open', 'Streamflow file to open']) {
      check(!tree.includes(name), `the screen reader's tree holds "${name}":\n${tree.slice(0, 2000)}`);
    }
    // The buttons that open them are there, once each.
    check(tree.includes('button "Open scenario file…"'), 'no "Open scenario file…" button in the tree');
  },
});

tests.push({
  name: 'at 1280×720 the paste dialog’s "Time column" choice shows its whole text',
  async run({ browser, baseUrl }) {
    const context = await browser.newContext({ viewport: { width: 1280, height: 720 } });
    const page = await context.newPage();
    await page.goto(baseUrl);
    await page.getByRole('button', { name: 'Paste rainfall…' }).click();
    const dialog = page.getByRole('dialog', { name: 'Paste rainfall' });
    await dialog.waitFor();
    await page
      .getByRole('textbox', { name: 'Rainfall text' })
      .fill('Time (local, end)\tRain (mm)\n10:10\t0.4\n10:20\t1.6\n10:30\t3.2\n');
    const select = dialog.getByRole('combobox', { name: 'Time column' });
    await select.waitFor();
    // The selected option's text, in the select's own font, against the room inside the select (less its arrow).
    const fit = await select.evaluate((el) => {
      const style = getComputedStyle(el);
      const ctx = document.createElement('canvas').getContext('2d');
      ctx.font = `${style.fontSize} ${style.fontFamily}`;
      const text = el.options[el.selectedIndex].text;
      const room = el.clientWidth - parseFloat(style.paddingLeft) - parseFloat(style.paddingRight) - 20;
      return { text, need: Math.ceil(ctx.measureText(text).width), room: Math.floor(room) };
    });
    check(fit.need <= fit.room, `"${fit.text}" needs ${fit.need} px; the Time column select has ${fit.room}`);
    await context.close();
  },
});

tests.push({
  name: 'the pressed "Saved scenarios" button keeps its text contrast, under the pointer too (axe)',
  async run({ baseUrl, newPage }) {
    const page = await newPage();
    await page.goto(baseUrl);
    const button = page.getByRole('button', { name: 'Saved scenarios' });
    await button.click();
    await page.locator('#saved-scenarios').waitFor();
    await button.hover();
    await addAxe(page);
    const bad = await page.evaluate(async () => {
      const r = await window.axe.run(document.querySelector('.scenario-bar__groups'), {
        runOnly: ['color-contrast'],
      });
      return r.violations.flatMap((v) => v.nodes.map((n) => `${n.target.join(' ')}: ${n.failureSummary}`));
    });
    check(bad.length === 0, `contrast problems in the scenario tools:\n${bad.join('\n')}`);
  },
});

tests.push({
  name: 'at 1280×720 the "Pinned" and "Link copied" banners float over the page: the chart and the results do not move',
  async run({ browser, baseUrl }) {
    const context = await browser.newContext({ viewport: { width: 1280, height: 720 } });
    await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: new URL(baseUrl).origin });
    const page = await context.newPage();
    await page.goto(baseUrl);
    await page.locator('.loss-line__stroke').waitFor({ state: 'attached' });
    const where = () =>
      page.evaluate(() => {
        const top = (sel) => Math.round(document.querySelector(sel).getBoundingClientRect().top * 10) / 10;
        return { chart: top('svg.chart__svg'), results: top('[data-result="excess"]'), tabs: top('[role="tablist"]') };
      });
    const before = await where();
    const banner = page.getByRole('status', { name: 'Scenario tools message' });
    for (const [button, words] of [
      ['Pin to compare', /^Pinned/],
      ['Copy link', /^Link copied/],
    ]) {
      await page.getByRole('button', { name: button }).click();
      await banner.waitFor();
      const text = (await banner.textContent()) ?? '';
      check(words.test(text), `after "${button}" the banner reads "${text.slice(0, 80)}"`);
      check(
        (await banner.getAttribute('aria-live')) === 'polite',
        `the "${button}" banner is not a polite live region`,
      );
      const position = await banner.evaluate((el) => getComputedStyle(el).position);
      check(position === 'absolute' || position === 'fixed', `the banner is laid out in the page (${position})`);
      const after = await where();
      check(
        JSON.stringify(after) === JSON.stringify(before),
        `the banner after "${button}" moved the page: before ${JSON.stringify(before)}, after ${JSON.stringify(after)}`,
      );
      // The tools stay one row with the banner showing.
      const tops = await page
        .locator('.scenario-bar__group')
        .evaluateAll((els) => els.map((e) => Math.round(e.getBoundingClientRect().top)));
      check(
        Math.max(...tops) - Math.min(...tops) <= 4,
        `the scenario tools wrap with the banner up: group tops ${tops}`,
      );
      await page.getByRole('button', { name: 'Dismiss message' }).click();
      check(JSON.stringify(await where()) === JSON.stringify(before), 'dismissing the banner moved the page');
    }
    await context.close();
  },
});

for (const { width, height } of SIZES) {
  tests.push({
    name: `at ${width}×${height} with the mass curve on, the loss line is still dragged through it and the results stay in view`,
    async run({ browser, baseUrl }) {
      const context = await browser.newContext({ viewport: { width, height } });
      const page = await context.newPage();
      await page.goto(baseUrl);
      await page.locator('.loss-line__stroke').waitFor({ state: 'attached' });
      await page.getByRole('button', { name: 'Mass curve' }).click();
      const curve = page.getByRole('img', { name: /^Mass curve/ });
      await curve.waitFor();
      // The invented demo holds 41.6 mm of rain (README); the curve's words end there.
      const words = (await curve.getAttribute('aria-label')) ?? '';
      check(words.includes('by the end 41.6 mm of rainfall'), `the mass curve says "${words}"`);
      const { box } = await checkTogether(page, 'mass curve on');
      const slider = page.getByRole('slider', { name: /^Loss rate φ/ });
      const before = await slider.getAttribute('aria-valuenow');
      const x = box.x + box.width * 0.4;
      const y = box.y + box.height / 2;
      await page.mouse.move(x, y);
      await page.mouse.down();
      await page.mouse.move(x, y - 60, { steps: 4 });
      await page.mouse.up();
      const after = await slider.getAttribute('aria-valuenow');
      check(
        Number(after) > Number(before),
        `dragging the line up through the mass curve left φ at ${after} (was ${before})`,
      );
      await checkTogether(page, 'after dragging with the mass curve on');
      const again = (await curve.getAttribute('aria-label')) ?? '';
      check(again !== words, 'the mass curve did not follow the new loss rate');
      await context.close();
    },
  });
}
