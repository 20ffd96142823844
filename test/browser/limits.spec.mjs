// The crashes that came back on every load, in Debian's chromium against the
// built app: a bar of 10¹² min typed into the bar table of a storm with a
// clock, a short link with one bar of 3·10⁹ h, a saved scenario past the
// limits of time, and a one-line paste of 200,000 cells. Each must leave the
// page working (no page error), the saved scenario intact, and a message.
// All data INVENTED.
import { check, loadSourceModules } from './support.mjs';

const loadModules = () => loadSourceModules({ scenario: '/src/scenario/index.ts' });

/** Page errors (uncaught exceptions) of a page, as they happen. */
function pageErrors(page) {
  const errors = [];
  page.on('pageerror', (e) => errors.push(e.message));
  return errors;
}

const saved = (page) => page.evaluate(() => localStorage.getItem('raincut.scenario'));

export const tests = [
  {
    name: 'a bar of 10¹² min typed into the bar table of a storm with a clock is refused, and a reload still works',
    async run({ baseUrl, newPage }) {
      const page = await newPage();
      const errors = pageErrors(page);
      await page.goto(baseUrl);
      // The demo storm is on the clock from 14 Jul 2026 15:00; a name makes the browser save it.
      await page.getByLabel('Scenario name').fill('Clocked (invented)');
      await page.waitForFunction(() => (localStorage.getItem('raincut.scenario') ?? '').includes('Clocked (invented)'));
      await page.getByText(/Clock time, storm from 14 Jul 2026 15:00/).waitFor();
      const before = await saved(page);

      const grid = page.getByRole('grid', { name: 'Bar table' });
      await grid.locator('[aria-rowindex="2"] [aria-colindex="3"]').click();
      await page.keyboard.type('1e12');
      await page.keyboard.press('Enter');
      const editor = page.getByRole('textbox', { name: 'Bar 1 duration' });
      const described = await editor.evaluate((el) =>
        (el.getAttribute('aria-describedby') ?? '')
          .split(' ')
          .map((id) => document.getElementById(id)?.textContent ?? '')
          .join(' '),
      );
      // Refused first by the plausible range of a bar: at most a year of 366 days, 366 × 24 × 60 = 527,040 min.
      check(
        /Bar 1 duration: “1e12” min is more than a bar or time step can be \(at most 527,040 min\)/.test(described),
        `no message beside the cell: "${described}"`,
      );
      await page.waitForTimeout(600);
      check((await saved(page)) === before, 'the refused duration was saved');
      await page.reload();
      await page.getByText(/Clock time, storm from 14 Jul 2026 15:00/).waitFor();
      check(errors.length === 0, `page errors: ${errors.join('; ')}`);
    },
  },
  {
    name: 'a short link holding one bar of 3·10⁹ h is refused, taken out of the address, and a reload shows my own scenario',
    async run({ baseUrl, newPage }) {
      const { scenario, close } = await loadModules();
      try {
        const page = await newPage();
        const errors = pageErrors(page);
        await page.goto(baseUrl);
        await page.getByLabel('Scenario name').fill('Mine (invented)');
        await page.waitForFunction(() => (localStorage.getItem('raincut.scenario') ?? '').includes('Mine (invented)'));
        const mine = await saved(page);
        const doc = {
          ...scenario.DEMO_SCENARIO,
          name: 'Far too long (invented)',
          storm: { durationsH: [3e9], depthsMm: [5], startIso: '2026-07-14T15:00' },
        };
        const link = scenario.encodeScenarioLink(doc);
        const fresh = await newPage();
        const freshErrors = pageErrors(fresh);
        await fresh.goto(`${baseUrl}#${link}`);
        const alert = fresh.getByRole('alert').filter({ hasText: 'The shared link could not be opened.' });
        await alert.waitFor();
        check(/storm\.durationsH\[0\] \(bar 1\)/.test((await alert.textContent()) ?? ''), 'the bar is not named');
        check((await fresh.evaluate(() => location.hash)) === '', 'the refused link stayed in the address');
        await fresh.reload();
        check((await fresh.getByLabel('Scenario name').inputValue()) === 'Mine (invented)', 'my scenario is not shown');
        check((await saved(fresh)) === mine, 'my saved scenario changed');
        check(errors.length + freshErrors.length === 0, `page errors: ${[...errors, ...freshErrors].join('; ')}`);
        console.log(`         (the link is ${link.length} characters)`);
      } finally {
        await close();
      }
    },
  },
  {
    name: 'a saved scenario past the limits is set aside, listed under Saved scenarios, and can be downloaded as it was',
    async run({ baseUrl, newPage, context }) {
      const { scenario, close } = await loadModules();
      try {
        const old = JSON.stringify({
          ...scenario.DEMO_SCENARIO,
          name: 'Written before the limits (invented)',
          storm: { durationsH: [3e9], depthsMm: [5], startIso: '2026-07-14T15:00' },
        });
        // Init scripts run in every document of the context, the blank page a new tab opens on included,
        // whose opaque origin may not touch storage: seed only the app's own pages.
        await context.addInitScript(
          ({ text, origin }) => {
            if (location.origin !== origin) return;
            if (sessionStorage.getItem('seeded') === null) {
              localStorage.setItem('raincut.scenario', text);
              sessionStorage.setItem('seeded', '1');
            }
          },
          { text: old, origin: new URL(baseUrl).origin },
        );
        const page = await newPage();
        const errors = pageErrors(page);
        await page.goto(baseUrl);
        await page.getByRole('alert').filter({ hasText: 'Set-aside copies' }).waitFor();
        await page.getByRole('button', { name: 'Saved scenarios' }).click();
        const copies = page.getByRole('list', { name: 'Set-aside copies' });
        // The saved list's panel loads its code on first use: wait for it before counting.
        await copies.waitFor({ timeout: 10_000 }).catch(() => {});
        check((await copies.getByRole('listitem').count()) === 1, 'the set-aside copy is not listed');
        const [file] = await Promise.all([
          page.waitForEvent('download'),
          copies.getByRole('button', { name: /^Download Saved scenario set aside/ }).click(),
        ]);
        const { readFile } = await import('node:fs/promises');
        check((await readFile(await file.path(), 'utf8')) === old, 'the download is not the text as it was kept');
        check(errors.length === 0, `page errors: ${errors.join('; ')}`);
      } finally {
        await close();
      }
    },
  },
  {
    name: 'a one-line paste of 200,000 cells is previewed without a crash',
    async run({ baseUrl, newPage }) {
      const page = await newPage();
      const errors = pageErrors(page);
      await page.goto(baseUrl);
      await page.getByRole('button', { name: 'Paste rainfall…' }).click();
      const dialog = page.getByRole('dialog', { name: 'Paste rainfall' });
      const text = Array.from({ length: 200_000 }, (_, k) => String((k % 7) * 0.2)).join('\t');
      const started = performance.now();
      await dialog.getByRole('textbox', { name: 'Rainfall text' }).fill(text);
      await dialog.getByRole('button', { name: 'Cancel' }).waitFor();
      // The preview answers: either bars or problems are shown.
      await page.waitForFunction(() => document.querySelector('[role="dialog"] table') !== null, null, {
        timeout: 60_000,
      });
      console.log(`         (preview of 200,000 cells shown after ${Math.round(performance.now() - started)} ms)`);
      check(errors.length === 0, `page errors: ${errors.join('; ')}`);
      await dialog.getByRole('button', { name: 'Cancel' }).click();
    },
  },
];
