import { describe, expect, it } from 'vitest';
import { validateStorm } from '../../src/core';
import {
  applyFlowImport,
  applyRainImport,
  guessFlowImport,
  guessRainImport,
  previewRainImport,
  type ImportProblem,
} from '../../src/io';

// Very long lines. A one-line paste of ~200,000 cells threw "Maximum call
// stack size exceeded" from the layout guess (`push(...cells)`); now every
// importer answers with a preview, a storm or problems. A line of numbers
// only is a spreadsheet row copied, read along the line, one bar per cell.
// All values INVENTED.

const CELLS = 200_000;

/** "0.2\t0.4\t…" with `n` cells on one line. */
function oneLine(n: number, separator: string): string {
  const cells = new Array<string>(n);
  for (let k = 0; k < n; k++) cells[k] = String((k % 7) * 0.2);
  return cells.join(separator);
}

const wellFormed = (problems: readonly ImportProblem[]) =>
  problems.every((p) => Number.isInteger(p.row) && Number.isInteger(p.column) && p.reason.length > 0);

describe('the importers read very long lines without throwing', { timeout: 60_000 }, () => {
  it.each([
    ['tabs', '\t'],
    ['commas', ','],
    ['semicolons', ';'],
  ])(
    'one line of 200,000 cells separated by %s: read along the line as 200,000 bars; refused as a streamflow record',
    (_what, sep) => {
      const text = oneLine(CELLS, sep);
      const rain = guessRainImport(text);
      expect(wellFormed(rain.problems)).toBe(true);
      // A spreadsheet row copied: the values run along the line, one bar per cell, read as a single column.
      expect(rain.settings.valuesAlong).toBe('line');
      expect(rain.columnCount).toBe(1);
      expect(rain.rows.length).toBe(CELLS);
      const storm = applyRainImport(text, rain.settings);
      if (!storm.ok) throw new Error(storm.problems.map((p) => p.reason).join(' '));
      expect(storm.storm.depthsMm.length).toBe(CELLS);
      // Bar k holds the number the line wrote for it, String((k % 7) × 0.2), read back to the same double.
      let misread = 0;
      for (let k = 0; k < CELLS; k++) if (storm.storm.depthsMm[k] !== (k % 7) * 0.2) misread++;
      expect(misread).toBe(0);
      expect(() => validateStorm(storm.storm)).not.toThrow();
      // The streamflow import reads the line's 200,000 columns, and one line is one sample: refused, with the reason.
      const flow = guessFlowImport(text);
      expect(wellFormed(flow.problems)).toBe(true);
      expect(flow.columnCount).toBe(CELLS);
      const record = applyFlowImport(text, flow.settings);
      expect(record.ok).toBe(false);
      expect(!record.ok && wellFormed(record.problems) && record.problems.length > 0).toBe(true);
    },
  );

  it('a column of 200,000 values with a header, as one long paste, becomes 200,000 bars', () => {
    const text = `Rain (mm)\n${oneLine(CELLS, '\n')}\n`;
    const preview = guessRainImport(text);
    const result = applyRainImport(text, preview.settings);
    if (!result.ok) throw new Error(result.problems.map((p) => p.reason).join(' '));
    expect(result.storm.durationsH.length).toBe(CELLS);
    expect(() => validateStorm(result.storm)).not.toThrow();
  });

  it('one cell of 2,000,000 characters is refused with a problem naming its line, not a crash', () => {
    const text = `Time\tRain (mm)\n10:00\t${'9'.repeat(2_000_000)}\n10:05\t1\n`;
    const preview = previewRainImport(text, guessRainImport(text).settings);
    expect(wellFormed(preview.problems)).toBe(true);
    expect(preview.problems.map((p) => [p.row, p.column])).toEqual([[2, 2]]);
  });
});
