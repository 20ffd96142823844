// A long rainfall file, in Debian's chromium against the built app (its
// Content-Security-Policy on: the worker must be allowed by worker-src
// 'self'): the text is held beside the dialog (first lines and the count),
// read in a Web Worker, a gap in it is named and filled, and the bars land
// on the workbench. The record is invented (a seeded pattern).
import { check } from './support.mjs';

/** Readings of a 15-min record from 2024-01-01 00:15, with readings 101–107 missing (a 2-h gap). */
function gappyRecord(n) {
  const lines = ['Time,Rain (mm)'];
  const start = Date.UTC(2024, 0, 1);
  for (let k = 1; k <= n; k++) {
    if (k > 100 && k < 108) continue;
    const stamp = new Date(start + k * 900_000).toISOString().slice(0, 16).replace('T', ' ');
    lines.push(`${stamp},${k % 4 === 0 ? '0.5' : '0.0'}`);
  }
  return lines.join('\n');
}

export const tests = [
  {
    name: 'a long file is held beside the dialog, read in a worker, its gap named and filled, and used',
    async run({ baseUrl, newPage }) {
      const page = await newPage();
      const workers = [];
      page.on('worker', (w) => workers.push(w.url()));
      await page.goto(baseUrl);
      const before = await page.evaluate(() => localStorage.getItem('raincut.scenario'));
      const text = gappyRecord(50_000);
      await page.getByLabel('Rainfall file to open').setInputFiles({
        name: 'long-gauge.csv',
        mimeType: 'text/csv',
        buffer: Buffer.from(text),
      });
      const dialog = page.getByRole('dialog', { name: 'Paste rainfall' });
      // 1 header + 50,000 − 7 readings = 49,994 lines
      await dialog.getByText(/^49,994 lines \(.* from long-gauge\.csv/).waitFor();
      check(
        (await dialog.getByRole('textbox', { name: 'Rainfall text' }).count()) === 0,
        'the text went into the text area',
      );
      const summary = dialog.getByRole('status').first();
      // Readings 100 (line 101) and 108 (line 102) are 8 × 15 min = 2 h apart: 105 min dry in 7 bars, so
      // 49,993 readings + 7 dry bars = 50,000 bars of 15 min from 2024-01-01 00:00.
      await summary.getByText(/^50,000 bars of 15 min from 2024-01-01 00:00/).waitFor({ timeout: 60_000 });
      const said = (await summary.textContent()) ?? '';
      check(
        /1 gap longer than the record’s 15 min step \(the longest 2 h between lines 101 and 102\)/.test(said),
        said,
      );
      check(
        workers.some((url) => /reader\.worker/.test(url)),
        `no reader worker started (${workers.join(', ')})`,
      );
      await dialog.getByRole('button', { name: 'Use these bars' }).click();
      await page.waitForFunction(
        (b) => {
          const now = localStorage.getItem('raincut.scenario');
          return now !== null && now !== b;
        },
        before,
        { timeout: 60_000 },
      );
      const scenario = JSON.parse(await page.evaluate(() => localStorage.getItem('raincut.scenario')));
      check(scenario.storm.depthsMm.length === 50_000, `${scenario.storm.depthsMm.length} bars`);
      // every fourth reading holds 0.5 mm: 12,500 of them, less reading 104 (missing): 12,499 × 0.5 = 6,249.5 mm
      const total = scenario.storm.depthsMm.reduce((a, b) => a + b, 0);
      check(Math.abs(total - 6249.5) < 1e-6, `total ${total}`);
      check(
        scenario.storm.depthsMm.slice(100, 107).every((d) => d === 0),
        'the gap was not dry bars',
      );
    },
  },
];
