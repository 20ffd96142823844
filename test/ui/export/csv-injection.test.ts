import fc from 'fast-check';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { computeLosses } from '../../../src/core';
import type { Scenario } from '../../../src/scenario/types';
import { barTableCsv } from '../../../src/ui/export';
import { csvField, csvNote, csvRow, neutralise } from '../../../src/ui/export/csv';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

// CSV injection: a name such as `x,=1+1` was written into an unquoted note
// line, so a spreadsheet opened a live formula cell, and a stray quote could
// swallow every row after it. Every field now goes through one writer
// (src/ui/export/csv.ts), per OWASP's "CSV Injection" guidance (from memory):
// quote every field, double inner quotes, and put a single quote before text
// that starts with = + - @, a tab or a carriage return.

/** Characters a spreadsheet may read as the start of a formula (OWASP's list, plus our own additions). */
const FORMULA_START = /^[ \u00a0]*[=+\-@\t\r\uff1d\uff0b\uff0d\uff20]/;

function exportOf(scenario: Scenario): string {
  const result = computeLosses(scenario.storm, scenario.method);
  return barTableCsv({ scenario, method: scenario.method, result, volumeM3: null });
}

/** Every row as a spreadsheet reads it (no comment skipping): each is a list of cells. */
function cellsOf(text: string): string[][] {
  const parsed = Papa.parse<string[]>(text.replace(/^\ufeff/, ''), { skipEmptyLines: true });
  expect(parsed.errors).toEqual([]);
  return parsed.data;
}

/** The text a neutralised cell stands for: the leading single quote taken off again. */
const shown = (cell: string): string =>
  cell.startsWith("'") && FORMULA_START.test(cell.slice(1)) ? cell.slice(1) : cell;

function readBack(text: string) {
  const rows = cellsOf(text);
  const notes = rows.filter((r) => r[0] === '#').map((r) => shown(r[1] ?? ''));
  const data = Papa.parse<Record<string, string>>(text, { header: true, comments: '#', skipEmptyLines: true });
  expect(data.errors).toEqual([]);
  return { rows, notes, bars: data.data };
}

describe('the CSV writer', () => {
  it.each([
    ['=1+1', `"'=1+1"`],
    ['+1', `"'+1"`],
    ['-2+3', `"'-2+3"`],
    ['@SUM(A1)', `"'@SUM(A1)"`],
    ['\t=cmd', `"'\t=cmd"`],
    ['\r=cmd', `"'\r=cmd"`],
    ['  =1+1', `"'  =1+1"`],
    ['＝1+1', `"'＝1+1"`],
    ['Pond 3, "east"', '"Pond 3, ""east"""'],
    ['x,=1+1', '"x,=1+1"'],
    ['', '""'],
  ])('quotes %j and neutralises a formula start', (text, field) => {
    expect(csvField(text)).toBe(field);
  });

  it('writes numbers as numbers, negative ones included, and never prefixes them', () => {
    // The rule: a cell given as a number is the shortest text of that double, quoted, never neutralised.
    expect(csvRow([1, -1.5, 0.1 + 0.2, -0, 1e-7])).toBe('"1","-1.5","0.30000000000000004","0","1e-7"');
    // The same characters given as text are neutralised: text is not known to be a number.
    expect(csvField('-1.5')).toBe(`"'-1.5"`);
    expect(() => csvField(Number.NaN)).toThrow(RangeError);
    expect(() => csvField(Infinity)).toThrow(RangeError);
  });

  it('keeps a note on one line, behind a bare "#" that comment-skipping readers see', () => {
    expect(csvNote('Raincut bar table: a\r\nb, "c"')).toBe('#,"Raincut bar table: a b, ""c"""');
    expect(neutralise('plain')).toBe('plain');
  });
});

describe('the bar table CSV against injection', { timeout: 30_000 }, () => {
  const HOSTILE: Scenario = {
    ...FOUR_BARS,
    name: 'x,=1+1',
    catchment: { name: '"=HYPERLINK(""http://example.invalid"")', areaM2: 1e6 },
  };

  it('a name like x,=1+1 is one text cell, and a stray quote swallows nothing', () => {
    const text = exportOf(HOSTILE);
    const { rows, notes, bars } = readBack(text);
    // No cell anywhere starts a formula.
    for (const row of rows) for (const cell of row) expect(cell).not.toMatch(FORMULA_START);
    // Every note line is exactly two cells: the marker and the note.
    for (const row of rows.filter((r) => r[0] === '#')) expect(row).toHaveLength(2);
    expect(notes[0]).toBe('Raincut bar table: x,=1+1');
    expect(notes).toContain('Catchment: "=HYPERLINK(""http://example.invalid""); 100 ha');
    // Every bar is still there, unchanged: 4 bars after 6 notes and the header.
    expect(rows).toHaveLength(6 + 1 + 4);
    expect(bars.map((r) => Number(r['Duration (min)']) / 60)).toEqual(FOUR_BARS.storm.durationsH);
    expect(bars.map((r) => Number(r['Rainfall depth (mm)']))).toEqual(FOUR_BARS.storm.depthsMm);
  });

  it('round-trips the bars and the names for any names, hostile characters included', () => {
    const dangerous = fc.constantFrom('=', '+', '-', '@', '\t', '\r', '\n', '"', ',', ';', "'", ' ', '＝', '#');
    const name = fc
      .array(fc.oneof(dangerous, fc.string({ maxLength: 6 })), { maxLength: 12 })
      .map((parts) => parts.join('').slice(0, 200));
    let tried = 0;
    fc.assert(
      fc.property(name, name, (scenarioName, catchmentName) => {
        tried++;
        const scenario: Scenario = { ...FOUR_BARS, name: scenarioName, catchment: { name: catchmentName, areaM2: 0 } };
        const { rows, notes, bars } = readBack(exportOf(scenario));
        for (const row of rows) for (const cell of row) expect(cell).not.toMatch(FORMULA_START);
        // Line breaks in names become spaces in a note (a note stays on its line).
        const oneLine = (s: string) => s.replace(/[\r\n]+/g, ' ');
        // A name of white space only is titled "Unnamed scenario".
        const title = /^\s*$/.test(scenarioName) ? 'Unnamed scenario' : oneLine(scenarioName);
        expect(notes[0]).toBe(`Raincut bar table: ${title}`);
        if (catchmentName !== '') expect(notes).toContain(`Catchment: ${oneLine(catchmentName)}; area not given`);
        expect(bars.map((r) => Number(r['Rainfall depth (mm)']))).toEqual(FOUR_BARS.storm.depthsMm);
        expect(bars.map((r) => Number(r['Duration (min)']) / 60)).toEqual(FOUR_BARS.storm.durationsH);
      }),
      { numRuns: 500, seed: 404 },
    );
    expect(tried).toBe(500);
  });
});
