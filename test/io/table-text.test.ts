import { describe, expect, it } from 'vitest';
import { detectSeparator, normaliseText, readTable, splitRows } from '../../src/io/table-text';

const plain = { skipLines: 0, hasHeader: false } as const;

describe('readTable', () => {
  it('splits a tab-separated spreadsheet copy into a header and rows with their line numbers', () => {
    const table = readTable('Time\tRain (mm)\n10:10\t0.4\n10:20\t0.8\n', {
      separator: 'tab',
      skipLines: 0,
      hasHeader: true,
    });
    expect(table.header).toEqual({ line: 1, cells: ['Time', 'Rain (mm)'] });
    expect(table.rows).toEqual([
      { line: 2, cells: ['10:10', '0.4'] },
      { line: 3, cells: ['10:20', '0.8'] },
    ]);
    expect(table.columnCount).toBe(2);
    expect(table.problems).toEqual([]);
  });

  it('reads Windows and old Mac line ends and a byte-order mark the same as plain line feeds', () => {
    const unix = readTable('a;b\n1;2\n3;4', { separator: 'semicolon', ...plain });
    expect(readTable('\ufeffa;b\r\n1;2\r\n3;4\r\n', { separator: 'semicolon', ...plain }).rows).toEqual(unix.rows);
    expect(readTable('a;b\r1;2\r3;4', { separator: 'semicolon', ...plain }).rows).toEqual(unix.rows);
  });

  it('trims spaces around cells', () => {
    expect(readTable('10:00 ,  1.5 ', { separator: 'comma', ...plain }).rows[0]?.cells).toEqual(['10:00', '1.5']);
  });

  it('keeps a quoted cell with separators in it as one cell', () => {
    expect(readTable('"Rain, mm",x\n"1,5",2', { separator: 'comma', ...plain }).rows.map((r) => r.cells)).toEqual([
      ['Rain, mm', 'x'],
      ['1,5', '2'],
    ]);
  });

  it('counts the lines of a quoted line break so later rows keep their true line numbers', () => {
    const table = readTable('"Rain\n(mm)";x\n1;2\n3;4', { separator: 'semicolon', skipLines: 0, hasHeader: true });
    expect(table.header?.cells).toEqual(['Rain\n(mm)', 'x']);
    expect(table.rows.map((r) => r.line)).toEqual([3, 4]);
  });

  it('reports a quote that is never closed, at the line where it opens', () => {
    const table = readTable('1;2\n"3;4\n5;6', { separator: 'semicolon', ...plain });
    expect(table.problems).toHaveLength(1);
    expect(table.problems[0]).toMatchObject({ row: 2, column: 0, field: 'line' });
    expect(table.problems[0]?.reason).toMatch(/never closed/);
  });

  it('skips a title block, takes the header below it, and drops empty lines at both ends only', () => {
    const text = 'Invented gauge record\nStation: nowhere\n\nTime,Rain\n\n10:10,1\n\n10:20,2\n\n\n';
    const table = readTable(text, { separator: 'comma', skipLines: 2, hasHeader: true });
    expect(table.header).toEqual({ line: 4, cells: ['Time', 'Rain'] });
    expect(table.rows).toEqual([
      { line: 6, cells: ['10:10', '1'] },
      { line: 7, cells: [] },
      { line: 8, cells: ['10:20', '2'] },
    ]);
  });

  it('reads each line as one cell when there is no separator, taking off surrounding quotes', () => {
    expect(readTable('0,4\n"0,8"\n\n1,2', { separator: 'none', ...plain }).rows).toEqual([
      { line: 1, cells: ['0,4'] },
      { line: 2, cells: ['0,8'] },
      { line: 3, cells: [] },
      { line: 4, cells: ['1,2'] },
    ]);
  });

  it('treats a line of empty cells as an empty line', () => {
    expect(splitRows('1\t2\n\t\n3\t4', 'tab').rows[1]).toEqual({ line: 2, cells: [] });
  });

  it('gives an empty table for empty text or a skip past the end', () => {
    expect(readTable('', { separator: 'tab', ...plain }).rows).toEqual([]);
    expect(readTable('1\n2', { separator: 'none', skipLines: 5, hasHeader: true })).toMatchObject({
      header: null,
      rows: [],
    });
  });
});

describe('normaliseText', () => {
  it('leaves only line feeds', () => {
    expect(normaliseText('\ufeffa\r\nb\rc\n')).toBe('a\nb\nc\n');
  });
});

describe('detectSeparator', () => {
  it('finds tabs in a spreadsheet copy', () => {
    expect(detectSeparator('Time\tRain\n10:00\t1,5\n10:10\t2,5')).toBe('tab');
  });

  it('prefers semicolons over the decimal commas beside them', () => {
    expect(detectSeparator('Zeit;Regen\n10:00;1,5\n10:10;2,5')).toBe('semicolon');
  });

  it('finds commas in an ordinary CSV', () => {
    expect(detectSeparator('time,rain\n10:00,1.5\n10:10,2.5')).toBe('comma');
    expect(detectSeparator('10,2\n20,3\n30,1')).toBe('comma');
  });

  it('ignores separators inside quotes', () => {
    expect(detectSeparator('"a;b",1\n"c;d",2')).toBe('comma');
  });

  it('reads one column of decimal-comma numbers as a single column', () => {
    expect(detectSeparator('0,4\n0,8\n1,2\n1,8\n0,6')).toBe('none');
    expect(detectSeparator('Rain (mm)\n2,05\n3,10\n4,25')).toBe('none');
  });

  it('takes a CSV header of names joined by commas, as many as each line has, for commas between columns', () => {
    // Invented: whole-number durations and two-digit depths. "1440,20" alone could be 1440.20, but the header
    // names two columns with the one comma every line has: 20 mm in 1440 min, not 1440.2 mm.
    expect(detectSeparator('duration_min,depth_mm\n1440,20\n1440,30\n60,1')).toBe('comma');
    expect(detectSeparator('"Duration (min)","Depth (mm)"\n1440,20\n1440,30\n60,1')).toBe('comma');
    // A name with a comma and a space in it is one name ("Rain, mm"), and a header with another count of
    // commas than the lines says nothing: these stay single columns of decimal-comma numbers.
    expect(detectSeparator('Rain, mm\n12,75\n3,5\n8,25')).toBe('none');
    expect(detectSeparator('a,b,c\n12,75\n3,5\n8,25')).toBe('none');
  });

  it('says none for a single column of plain numbers, and for empty text', () => {
    expect(detectSeparator('0.4\n0.8\n1.2')).toBe('none');
    expect(detectSeparator('')).toBe('none');
    expect(detectSeparator('\n \n')).toBe('none');
  });
});
