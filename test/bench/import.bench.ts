// Long imports (issue 11): what the reader in the Web Worker does with a
// gauge record of 10⁶ lines (about 21 MB), through the public readers the
// dialog uses (src/io/readers.ts: guess from the head, then one read of the
// whole text with every check). The page's side (file to bars on the
// workbench in chromium) is timed by `npm run bench:ui`. Target for the
// whole path from file to bars: < 3 s; this part must leave room for it.
// The record is invented (a seeded pattern), not a real gauge.
import { afterAll, test } from 'vitest';
import { DEFAULT_NUMBER_FORMAT, RAIN_READER } from '../../src/io';
import { measure, printTable } from './measure';

/** n readings of a 15-min record from 2024-01-01 00:15, with dry and wet spells, one decimal. */
export function gaugeText(n: number): string {
  const lines: string[] = ['Time,Rain (mm)'];
  const start = Date.UTC(2024, 0, 1);
  for (let k = 1; k <= n; k++) {
    const stamp = new Date(start + k * 900_000).toISOString().slice(0, 16).replace('T', ' ');
    const wet = Math.floor(k / 200) % 3 === 0;
    lines.push(`${stamp},${wet ? (((k * 7919) % 13) * 0.1).toFixed(1) : '0.0'}`);
  }
  return lines.join('\n');
}

test('reading a long record', () => {
  const context = { numberFormat: DEFAULT_NUMBER_FORMAT, units: 'si' as const };
  for (const n of [1e5, 1e6]) {
    const text = gaugeText(n);
    const read = (): unknown => {
      const outcome = RAIN_READER.read(text, RAIN_READER.guess(text, context), context);
      if (outcome.imported === null) throw new Error(outcome.summary);
      return outcome;
    };
    measure('import', `guess + read ${(text.length / 1e6).toFixed(1)} MB`, read, {
      bars: n,
      samples: n === 1e6 ? 5 : 9,
      budgetMs: 1,
      ...(n === 1e6 ? { targetMs: 3000 } : {}),
    });
  }
});

afterAll(() => printTable('Raincut import benchmark (medians of repeated runs)'));
