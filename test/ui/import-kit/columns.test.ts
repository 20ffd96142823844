import { describe, expect, it } from 'vitest';
import { guessRainSettings } from '../../../src/io';
import { MAX_COLUMN_CHOICES, columnCapHint, columnNumbers } from '../../../src/ui/import-kit';

// A one-line paste of 200,000 cells gave three column pickers of 200,000
// options each, and the dialog took about a minute to show. The pickers now
// offer the first 1,000 columns (and any column the settings name), and say so.

describe('the column pickers of an import', () => {
  const settings = guessRainSettings('Time\tRain (mm)\n10:00\t1\n');

  it('offer every column of an ordinary table', () => {
    expect(columnNumbers(settings, 3)).toEqual([1, 2, 3]);
    expect(columnCapHint(3)).toBeUndefined();
  });

  it('offer at most 1,000 columns of a very wide paste, plus any the settings name, and say why', () => {
    const columns = columnNumbers({ ...settings, valueColumn: 150_000 }, 200_000);
    expect(columns).toHaveLength(MAX_COLUMN_CHOICES + 1);
    expect(columns.at(-1)).toBe(150_000);
    expect(columnCapHint(200_000)).toBe(
      'The text has 200,000 columns; only the first 1,000 can be chosen here. Raincut reads one value per line: a row of values should be pasted as a column.',
    );
  });
});
