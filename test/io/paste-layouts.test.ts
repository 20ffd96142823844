// Issue 16, "Pasting and opening rainfall": layouts a person pastes that were
// read wrongly. Each storm below is invented; expected bars are worked by hand.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  applyRainImport,
  guessRainImport,
  guessRainSettings,
  numberFormat,
  previewRainImport,
  type RainImportSettings,
} from '../../src/io';
import { expectAllClose } from '../helpers/tolerance';

const stormOf = (text: string, settings: RainImportSettings) => {
  const r = applyRainImport(text, settings);
  if (!r.ok) throw new Error(r.problems.map((p) => `${p.row}:${p.column} ${p.reason}`).join('\n'));
  return r.storm;
};

describe('a row of values copied from a spreadsheet', () => {
  it.each([
    ['tabs', '1.2\t3.4\t5.6\t0'],
    ['commas', '1.2, 3.4, 5.6, 0'],
    ['spaces', '1.2 3.4 5.6 0'],
    ['semicolons with decimal commas', '1,2;3,4;5,6;0'],
  ])('separated by %s is read as bars across the row, not as one bar', (_name, text) => {
    const settings = guessRainSettings(text, { stepMinutes: 10 });
    expect(settings).toMatchObject({ valuesAlong: 'line', timeColumn: null, timeKind: 'none' });
    const storm = stormOf(text, settings);
    expect(storm.depthsMm).toEqual([1.2, 3.4, 5.6, 0]);
    expectAllClose(storm.durationsH, [1 / 6, 1 / 6, 1 / 6, 1 / 6]);
    // 1.2 + 3.4 + 5.6 + 0 = 10.2 mm.
    expect(guessRainImport(text, { stepMinutes: 10 }).summary).toBe(
      '4 bars of 10 min, depths in mm, total 10.2 mm; values read along each line; no times, so bars are 10 min apart as set.',
    );
  });

  it('names the line and column of a bad value in the row', () => {
    const text = '1.2\t3.4\tx\t0';
    const preview = previewRainImport(text, guessRainSettings(text));
    expect(preview.problems).toEqual([expect.objectContaining({ row: 1, column: 3, value: 'x' })]);
  });
});

describe('space-separated and fixed-width columns', () => {
  it('reads times and values separated by spaces', () => {
    const text = '10:10 0.4\n10:20 1.6\n10:30 3.2\n';
    const settings = guessRainSettings(text);
    expect(settings).toMatchObject({ separator: 'space', timeColumn: 1, timeKind: 'clock', valueColumn: 2 });
    expect(stormOf(text, settings).depthsMm).toEqual([0.4, 1.6, 3.2]);
  });

  it('reads an aligned table with an empty cell as fixed-width columns, the empty cell staying empty', () => {
    const text = [
      'Time    Gauge A  Gauge B',
      '10:10       0.4      1.0',
      '10:20                2.0',
      '10:30       3.2      0.5',
      '',
    ].join('\n');
    const settings = guessRainSettings(text);
    expect(settings.separator).toBe('fixed');
    // Gauge B, column 3: 1.0, 2.0, 0.5 mm.
    expect(stormOf(text, { ...settings, valueColumn: 3 }).depthsMm).toEqual([1, 2, 0.5]);
    // Gauge A has no value on line 3: reported there, not filled by Gauge B's 2.0.
    const a = previewRainImport(text, { ...settings, valueColumn: 2 });
    expect(a.problems).toEqual([expect.objectContaining({ row: 3, column: 2, reason: 'the depth is missing.' })]);
  });
});

describe('blank lines inside the data', () => {
  const text = '1.2\n\n3.4\n\n\n5.6\n';

  it('are reported by line unless skipped', () => {
    const settings = guessRainSettings(text);
    expect(settings.skipBlankLines).toBe(false);
    expect(previewRainImport(text, settings).problems.map((p) => p.row)).toEqual([2, 4, 5]);
  });

  it('may be skipped, and the summary counts them', () => {
    const settings = { ...guessRainSettings(text, { stepMinutes: 5 }), skipBlankLines: true };
    expect(stormOf(text, settings).depthsMm).toEqual([1.2, 3.4, 5.6]);
    expect(previewRainImport(text, settings).summary).toMatch(/; 3 blank lines inside the data skipped\.$/);
  });
});

describe('numbers with thousands separators', () => {
  const text = '1,200\n3,500\n';

  it('"1,200 / 3,500" is a column of grouped numbers, not a time column and a value', () => {
    const settings = guessRainSettings(text, { numberFormat: numberFormat('1,234.5'), stepMinutes: 60 });
    expect(settings).toMatchObject({ separator: 'none', timeColumn: null, grouping: 'comma', decimal: 'point' });
    expect(stormOf(text, settings).depthsMm).toEqual([1200, 3500]);
  });

  it('under a decimal-comma number format the same text is 1.2 and 3.5', () => {
    const settings = guessRainSettings(text, { numberFormat: numberFormat('1 234,5') });
    expect(settings).toMatchObject({ separator: 'none', timeColumn: null, decimal: 'comma' });
    expect(stormOf(text, settings).depthsMm).toEqual([1.2, 3.5]);
  });

  it('grouped values in a tab table are read whole', () => {
    const t = 'Time\tRain (mm)\n10:00\t1,200.5\n11:00\t12\n';
    const settings = guessRainSettings(t);
    expect(settings).toMatchObject({ separator: 'tab', grouping: 'comma', decimal: 'point' });
    expect(stormOf(t, settings).depthsMm).toEqual([1200.5, 12]);
  });
});

describe('the time step guess', () => {
  it('is the storm on screen’s step when neither the times nor a column name give one', () => {
    expect(guessRainSettings('1\n2\n3', { stepMinutes: 5 }).stepMinutesIfNoTime).toBe(5);
    expect(guessRainSettings('1\n2\n3').stepMinutesIfNoTime).toBe(60);
    // A column name still wins: "Rain (mm per 15 min)".
    expect(guessRainSettings('Rain (mm per 15 min)\n1\n2', { stepMinutes: 5 }).stepMinutesIfNoTime).toBe(15);
  });
});

describe('numbers in the summary are written as the screen writes them', () => {
  it('115,031.7 mm reads "115,032 mm" and 50,000 bars "50,000 bars"', () => {
    // 50,000 bars of 2.3006340 mm: the total is 115,031.7 mm, more than any storm but a plausible long record.
    const bar = 2.300634;
    const text = Array.from({ length: 50_000 }, () => String(bar)).join('\n');
    const settings = { ...guessRainSettings(text, { stepMinutes: 60 }), valueKind: 'depth' as const };
    const summary = previewRainImport(text, settings).summary;
    expect(summary).toMatch(/^50,000 bars of 1 h, depths in mm, total 115,032 mm;/);
    expect(previewRainImport(text, settings, numberFormat('1.234,5')).summary).toMatch(
      /^50\.000 bars of 1 h, depths in mm, total 115\.032 mm;/,
    );
  });
});

describe('values beyond what a bar can hold are refused where they were read', () => {
  it('99,999,999 mm in a bar is a problem on its line, and 10³⁰⁰ too', () => {
    const text = 'Rain (mm)\n2\n99999999\n1e300\n';
    const preview = previewRainImport(text, guessRainSettings(text));
    expect(preview.problems).toEqual([
      expect.objectContaining({
        row: 3,
        column: 1,
        value: '99999999',
        reason: expect.stringMatching(
          /^the bar read here holds 99,999,999 mm, which is more than a rainfall or runoff depth can be \(at most 30,000 mm\)/,
        ),
      }),
      expect.objectContaining({ row: 4, column: 1, value: '1e300' }),
    ]);
    expect(preview.summary).not.toMatch(/\d{16}|Infinity|NaN/);
  });

  it('a bar beyond the world-record envelope is flagged in the summary, not refused', () => {
    // 300 mm in 10 min: the envelope gives 422 × (1/6)^0.475 = 180.2 mm (Jennings 1950, from memory).
    const text = '2\n300\n1';
    const result = applyRainImport(text, guessRainSettings(text, { stepMinutes: 10 }));
    expect(result.ok).toBe(true);
    expect(result.summary).toMatch(
      /check the unit and the step: bar 2 holds 300 mm in 10 min, more than the world’s greatest recorded rainfalls \(about 180\.2 mm in that time/,
    );
  });
});

describe('space and fixed-width layouts read back what was written (property)', () => {
  it('a storm written with spaces or aligned columns reads back as the same bars', () => {
    const RUNS = 300;
    let checked = 0;
    const bars = fc.array(fc.integer({ min: 0, max: 99_999 }), { minLength: 2, maxLength: 40 });
    fc.assert(
      fc.property(bars, fc.constantFrom('space', 'fixed' as const), (hundredths, layout) => {
        const depths = hundredths.map((h) => h / 100);
        const lines = depths.map((d, k) => {
          const t = String((k + 1) * 5);
          const v = d.toFixed(2);
          return layout === 'space' ? `${t} ${v}` : `${t.padStart(6)}${v.padStart(10)}`;
        });
        const text = lines.join('\n');
        const guessed = guessRainSettings(text);
        // A complete aligned table splits at spaces as well; read it both ways.
        expect(guessed).toMatchObject({ separator: 'space', timeColumn: 1, timeKind: 'elapsed-min', valueColumn: 2 });
        const storm = stormOf(text, { ...guessed, separator: layout, valueKind: 'depth' });
        checked++;
        expect(storm.depthsMm).toEqual(depths);
      }),
      { numRuns: RUNS, seed: 16 },
    );
    expect(checked).toBeGreaterThanOrEqual(RUNS);
  });
});
