// The long-record view in chromium: a small invented gauge record pasted,
// the dry spell changed, the events found checked against values worked by
// hand, and the picked events added to the event set in one step.
import { addAxe, check, checkShown } from './support.mjs';

// Invented record (no real gauge): eleven bars of 60 min,
// 2.45, 0, 0, 0, 3.1, 1.25, 0, 0, 0, 0, 4.05 mm.
// Dry spell 6 h: the spells (bars 1–3, 3 h; bars 6–9, 4 h) are both shorter: one event of
//   2.45 + 3.1 + 1.25 + 4.05 = 10.85 mm.
// Dry spell 3 h: both separate: 0:00 (2.45 mm), 4:00 (3.1 + 1.25 = 4.35 mm), 10:00 (4.05 mm).
const RECORD = '2.45\n0\n0\n0\n3.1\n1.25\n0\n0\n0\n0\n4.05\n';

async function depthCells(page) {
  const table = page.getByRole('table', { name: 'Events found in the record' });
  const rows = await table.locator('tbody tr').all();
  const out = [];
  for (const row of rows) out.push(((await row.locator('td').nth(4).textContent()) ?? '').trim());
  return out;
}

export const tests = [
  {
    name: 'a pasted record is cut into events as the dry spell changes, and the events join the set',
    async run({ baseUrl, newPage }) {
      const page = await newPage();
      await page.goto(baseUrl);
      await page.getByRole('tab', { name: 'Long record' }).click();
      await page.getByRole('button', { name: 'Paste rainfall record…' }).click();
      const dialog = page.getByRole('dialog', { name: 'Paste a long rainfall record' });
      await dialog.getByRole('textbox', { name: 'Rainfall record text' }).fill(RECORD);
      const use = dialog.getByRole('button', { name: 'Use this record' });
      await use.waitFor();
      await page.waitForFunction(
        () => ![...document.querySelectorAll('button')].find((b) => b.textContent === 'Use this record')?.disabled,
      );
      await use.click();

      await page.getByRole('heading', { name: '1 event found, 1 picked' }).waitFor();
      checkShown((await depthCells(page))[0], 10.85, '', 'the one event at 6 h');

      const dry = page.getByRole('textbox', { name: /Dry spell that separates events/ });
      await dry.fill('3');
      await dry.press('Tab');
      await page.getByRole('heading', { name: '3 events found, 3 picked' }).waitFor();
      const depths = await depthCells(page);
      checkShown(depths[0], 2.45, '', 'event 1 at 3 h');
      checkShown(depths[1], 4.35, '', 'event 2 at 3 h (3.1 + 1.25)');
      checkShown(depths[2], 4.05, '', 'event 3 at 3 h');
      // The overview draws the record as one path and the picked events as another.
      const bands = await page.locator('[data-layer="picked"]').getAttribute('d');
      check((bands.match(/M/g) ?? []).length === 3, `three event bands drawn, got "${bands}"`);

      await addAxe(page);
      const violations = await page.evaluate(async () => {
        const result = await window.axe.run(document.getElementById('view-record'));
        return result.violations.map(
          (v) => `${v.id}: ${v.help} (${v.nodes.map((n) => n.target.join(' ')).join(', ')})`,
        );
      });
      check(violations.length === 0, `accessibility: ${violations.join('; ')}`);

      await page.getByRole('button', { name: 'Add 3 picked events to the event set' }).click();
      await page.getByText(/Added 3 events to the event set/).waitFor();
      await page.getByRole('tab', { name: 'Event set' }).click();
      for (const [k, name] of ['Event from 0:00', 'Event from 4:00', 'Event from 10:00'].entries()) {
        const value = await page.getByRole('textbox', { name: `Name of event ${k + 1}` }).inputValue();
        check(value === name, `event ${k + 1} is named "${value}", expected "${name}"`);
      }
      // One step: a single undo takes all three away.
      await page.getByRole('button', { name: /^Undo/ }).first().click();
      await page.getByText('No events yet.').waitFor();
    },
  },
];
