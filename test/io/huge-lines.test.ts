import { describe, expect, it } from 'vitest';
import { validateHydrograph, validateStorm } from '../../src/core';
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
// importer answers with a preview, a storm or problems. All values INVENTED.

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
    'one line of 200,000 cells separated by %s: guessed, previewed and imported or refused with problems',
    (_what, sep) => {
      const text = oneLine(CELLS, sep);
      const rain = guessRainImport(text);
      expect(wellFormed(rain.problems)).toBe(true);
      expect(rain.columnCount).toBe(CELLS);
      const storm = applyRainImport(text, rain.settings);
      if (storm.ok) expect(() => validateStorm(storm.storm)).not.toThrow();
      else expect(storm.problems.length).toBeGreaterThan(0);
      const flow = guessFlowImport(text);
      expect(wellFormed(flow.problems)).toBe(true);
      const record = applyFlowImport(text, flow.settings);
      if (record.ok) expect(() => validateHydrograph(record.record)).not.toThrow();
      else expect(record.problems.length).toBeGreaterThan(0);
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
