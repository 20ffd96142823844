import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { validateHydrograph, validateStorm } from '../../src/core';
import {
  applyFlowImport,
  applyRainImport,
  guessFlowImport,
  guessFlowSettings,
  guessRainImport,
  guessRainSettings,
  type FlowImportSettings,
  type ImportProblem,
  type RainImportSettings,
} from '../../src/io';

/** Pieces that make text look like data, so random pastes reach the deep paths and not only "not a number". */
const TOKENS = [
  '0',
  '1',
  '12',
  '0.5',
  '0,5',
  '-1',
  '1e3',
  '1e999',
  '.',
  ',',
  ';',
  '\t',
  '\n',
  '\r\n',
  '\r',
  ' ',
  '"',
  '""',
  ':',
  '10:00',
  '23:59',
  '24:00',
  '00:10',
  '12:00 PM',
  '2024-05-01',
  '2024-05-01T10:00',
  'T',
  'Z',
  '+10:00',
  '01/05/2024',
  '13/13/2024',
  '2023-02-29',
  '31.12.1999',
  'NA',
  '-',
  'Time',
  'Rain (mm)',
  'in/h',
  'cumulative',
  'Q (L/s)',
  'cfs',
  '\ufeff',
  '\u2212',
  '\u00a0',
  '#',
  'é',
  '💧',
  // Extreme times (core/time-limits.ts): a span of 10¹² min, 3·10⁹ h, start clocks at and past the years allowed.
  '1e12',
  '3000000000',
  '0.001',
  '0999-12-31T23:59',
  '1000-01-01T00:00',
  '2999-12-31 23:59:59',
  '3000-01-01T00:00',
  '10:00:00.5',
];

const tokenText = fc.array(fc.constantFrom(...TOKENS), { maxLength: 80 }).map((parts) => parts.join(''));
const anyText = fc.oneof(fc.string({ maxLength: 300 }), fc.string({ unit: 'grapheme', maxLength: 120 }), tokenText);

/** Lines of cells, each a token run, joined by one separator: a ragged, noisy table. */
const noisyTable = fc
  .record({
    sep: fc.constantFrom('\t', ',', ';'),
    rows: fc.array(
      fc.array(fc.array(fc.constantFrom(...TOKENS.filter((t) => !/[\n\r\t,;]/.test(t))), { maxLength: 3 }), {
        maxLength: 5,
      }),
      { maxLength: 30 },
    ),
  })
  .map(({ sep, rows }) => rows.map((cells) => cells.map((c) => c.join('')).join(sep)).join('\n'));

function lineCount(text: string): number {
  return text.replace(/\r\n?/g, '\n').split('\n').length;
}

/** What every answer must look like: a sentence, and problems that point inside the text. */
function expectWellFormed(text: string, summary: string, problems: readonly ImportProblem[]): void {
  expect(typeof summary).toBe('string');
  expect(summary.length).toBeGreaterThan(0);
  const lines = typeof text === 'string' ? lineCount(text) : 0;
  for (const p of problems) {
    expect(Number.isInteger(p.row) && p.row >= 0 && p.row <= lines, JSON.stringify(p)).toBe(true);
    expect(Number.isInteger(p.column) && p.column >= 0, JSON.stringify(p)).toBe(true);
    expect(p.field.length).toBeGreaterThan(0);
    expect(typeof p.value).toBe('string');
    expect(p.reason.length).toBeGreaterThan(0);
  }
}

function checkRain(text: string): void {
  const preview = guessRainImport(text);
  expectWellFormed(text, preview.summary, preview.problems);
  const result = applyRainImport(text, preview.settings);
  expectWellFormed(text, result.summary, result.problems);
  if (result.ok) {
    expect(() => validateStorm(result.storm)).not.toThrow();
    // Each bar comes from one cell: a line holds at most one cell more than it has separators
    // (values may run along a line, a spreadsheet row copied).
    expect(result.storm.durationsH.length).toBeLessThanOrEqual(lineCount(text) + (text.match(/[\t,; ]/g) ?? []).length);
  } else {
    expect(result.problems.length).toBeGreaterThan(0);
  }
}

function checkFlow(text: string): void {
  const preview = guessFlowImport(text);
  expectWellFormed(text, preview.summary, preview.problems);
  const result = applyFlowImport(text, preview.settings);
  expectWellFormed(text, result.summary, result.problems);
  if (result.ok) {
    const { timesH, dischargeM3s } = result.record;
    expect(timesH.length).toBe(dischargeM3s.length);
    expect(timesH[0]).toBe(0);
    for (let k = 1; k < timesH.length; k++) expect(timesH[k]!).toBeGreaterThan(timesH[k - 1]!);
    for (const q of dischargeM3s) expect(q >= 0 && Number.isFinite(q)).toBe(true);
    // Every record an importer gives is one the core (and so the schema) takes, limits of time included.
    expect(() => validateHydrograph(result.record)).not.toThrow();
  } else {
    expect(result.problems.length).toBeGreaterThan(0);
  }
}

describe('the importers never throw, whatever the text', () => {
  it('on thousands of random strings', () => {
    fc.assert(
      fc.property(anyText, (text) => {
        checkRain(text);
        checkFlow(text);
      }),
      { numRuns: 4000 },
    );
  }, 120_000);

  it('on thousands of noisy tables', () => {
    fc.assert(
      fc.property(noisyTable, (text) => {
        checkRain(text);
        checkFlow(text);
      }),
      { numRuns: 2000 },
    );
  }, 120_000);
});

/** Settings as a careless caller might pass them: right keys, any values. */
const wildValue = fc.oneof(
  fc.constant(null),
  fc.constant(undefined),
  fc.boolean(),
  fc.integer({ min: -3, max: 8 }),
  fc.double(),
  fc.constantFrom(
    'tab',
    'comma',
    'semicolon',
    'none',
    'point',
    'clock',
    'elapsed-min',
    'elapsed-h',
    'depth',
    'intensity',
    'cumulative',
    'mm',
    'in',
    'end',
    'start',
    'zero',
    'first-value',
    'day-month',
    'month-day',
    '2024-05-01',
    'm3/s',
    'L/s',
    'ft3/s',
    '',
  ),
);

function scramble<T extends object>(base: T, changes: Record<string, unknown>): T {
  return { ...base, ...changes } as T;
}

describe('the importers never throw, whatever the settings', () => {
  const keys = [
    'separator',
    'decimal',
    'skipLines',
    'hasHeader',
    'dateColumn',
    'timeColumn',
    'valueColumn',
    'timeKind',
    'dateOrder',
    'dateForTimesOfDay',
    'stepMinutesIfNoTime',
    'valueKind',
    'unit',
    'timeMarks',
    'cumulativeFrom',
  ];
  const changes = fc.dictionary(fc.constantFrom(...keys), wildValue, { maxKeys: 4 });

  it('for rainfall', () => {
    fc.assert(
      fc.property(fc.oneof(tokenText, noisyTable), changes, (text, change) => {
        const settings = scramble<RainImportSettings>(guessRainSettings(text), change);
        const result = applyRainImport(text, settings);
        expectWellFormed(text, result.summary, result.problems);
        if (result.ok) expect(() => validateStorm(result.storm)).not.toThrow();
      }),
      { numRuns: 3000 },
    );
  }, 120_000);

  it('for streamflow', () => {
    fc.assert(
      fc.property(fc.oneof(tokenText, noisyTable), changes, (text, change) => {
        const settings = scramble<FlowImportSettings>(guessFlowSettings(text), change);
        const result = applyFlowImport(text, settings);
        expectWellFormed(text, result.summary, result.problems);
      }),
      { numRuns: 3000 },
    );
  }, 120_000);
});
