import Papa from 'papaparse';
import { problem, type ImportProblem } from './problems';

/**
 * Pasted text split into lines and cells. Splitting is papaparse's (quotes,
 * quoted separators and quoted line breaks handled as in RFC 4180); this file
 * adds what a paste dialog needs on top: the separator guessed, line numbers
 * kept for every row, leading lines skipped, a header taken off, and empty
 * lines at the ends trimmed.
 */

/**
 * How cells are separated on a line. 'space' splits at runs of spaces (and
 * tabs); 'fixed' cuts every line at the same character positions, found
 * from where the data lines all have blanks, so an empty cell in an aligned
 * table stays empty instead of moving the next value left. 'none' reads
 * each line as one cell (a single column).
 */
export type Separator = 'tab' | 'comma' | 'semicolon' | 'space' | 'fixed' | 'none';

export const SEPARATORS: readonly Separator[] = ['tab', 'comma', 'semicolon', 'space', 'fixed', 'none'];

const SEPARATOR_CHAR = { tab: '\t', comma: ',', semicolon: ';' } as const;

/** One line of the table: its 1-based line number in the pasted text and its trimmed cells. */
export interface TextRow {
  readonly line: number;
  /** Trimmed cells; an empty array for an empty line. */
  readonly cells: readonly string[];
  /** For a value read along a line: the column its one cell came from (problems name it). */
  readonly column?: number;
}

export interface TableOptions {
  readonly separator: Separator;
  /** Lines at the top of the text to ignore (a title block, station details). */
  readonly skipLines: number;
  /** The first non-empty line after the skipped ones holds column names. */
  readonly hasHeader: boolean;
  /** Leave out empty lines between data lines (they are counted, not read as missing values). */
  readonly skipBlankLines?: boolean | undefined;
}

export interface TextTable {
  /** The header line, or null. */
  readonly header: TextRow | null;
  /**
   * Data rows in order. Empty lines at the start and end are left out (they
   * hold nothing); empty lines between data rows are kept, with no cells, so
   * the importer can report them as missing values.
   */
  readonly rows: readonly TextRow[];
  /** Largest number of cells on any data row. */
  readonly columnCount: number;
  /** Empty lines between data lines that were left out (skipBlankLines). */
  readonly blankLinesSkipped: number;
  /** Broken quoting, by line. */
  readonly problems: readonly ImportProblem[];
}

/** Removes a byte-order mark and turns CRLF and lone CR line ends into LF. */
export function normaliseText(text: string): string {
  const noBom = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  return noBom.replace(/\r\n?/g, '\n');
}

function isBlank(cells: readonly string[]): boolean {
  return cells.every((c) => c === '');
}

function countNewlines(cells: readonly string[]): number {
  let n = 0;
  for (const cell of cells) {
    for (let i = cell.indexOf('\n'); i !== -1; i = cell.indexOf('\n', i + 1)) n++;
  }
  return n;
}

/** Each line is one cell; surrounding quotes (as a spreadsheet may add) are taken off. */
function splitSingleColumn(text: string): { rows: TextRow[]; problems: ImportProblem[] } {
  const lines = text.split('\n');
  const rows: TextRow[] = [];
  for (let i = 0; i < lines.length; i++) {
    let cell = (lines[i] as string).trim();
    if (cell.length >= 2 && cell.startsWith('"') && cell.endsWith('"'))
      cell = cell.slice(1, -1).replace(/""/g, '"').trim();
    rows.push({ line: i + 1, cells: cell === '' ? [] : [cell] });
  }
  return { rows, problems: [] };
}

/**
 * Text without a quote splits exactly as papaparse would split it (no cell
 * can hold a separator or a line break), so it is cut directly: a record of
 * 10⁶ lines splits several times faster this way, with no array of arrays
 * in between.
 */
function splitUnquoted(text: string, delimiter: string): { rows: TextRow[]; problems: ImportProblem[] } {
  const rows: TextRow[] = [];
  if (text === '') return { rows, problems: [] };
  let line = 1;
  let from = 0;
  // The next separator at or after the read position, kept across lines so a line without one costs no search to the end.
  let cut = text.indexOf(delimiter);
  for (;;) {
    const nl = text.indexOf('\n', from);
    const end = nl === -1 ? text.length : nl;
    const cells: string[] = [];
    let blank = true;
    let at = from;
    for (;;) {
      if (cut !== -1 && cut < at) cut = text.indexOf(delimiter, at);
      const stop = cut === -1 || cut > end ? end : cut;
      const cell = text.slice(at, stop).trim();
      if (cell !== '') blank = false;
      cells.push(cell);
      if (stop === end) break;
      at = stop + 1;
    }
    rows.push({ line, cells: blank ? [] : cells });
    if (nl === -1) break;
    from = nl + 1;
    line++;
  }
  return { rows, problems: [] };
}

function splitWithPapa(text: string, delimiter: string): { rows: TextRow[]; problems: ImportProblem[] } {
  if (!text.includes('"')) return splitUnquoted(text, delimiter);
  const parsed = Papa.parse<string[]>(text, {
    delimiter,
    newline: '\n',
    quoteChar: '"',
    escapeChar: '"',
    skipEmptyLines: false,
    header: false,
    dynamicTyping: false,
  });
  const rows: TextRow[] = [];
  const startLines: number[] = [];
  let line = 1;
  for (const raw of parsed.data) {
    const cells = raw.map((c) => c.trim());
    startLines.push(line);
    rows.push({ line, cells: isBlank(cells) ? [] : cells });
    // A quoted cell may hold line breaks; the next row starts below them.
    line += 1 + countNewlines(raw);
  }
  const problems: ImportProblem[] = [];
  for (const error of parsed.errors) {
    const at = typeof error.row === 'number' ? (startLines[error.row] ?? line) : 0;
    const reason =
      error.code === 'MissingQuotes'
        ? 'a quote (") opens a cell here and is never closed, so the rest of the text is read as one cell; close or remove the quote.'
        : error.code === 'InvalidQuotes'
          ? 'a quoted cell is followed by other text before the next separator; remove the stray quote.'
          : `the line could not be split into cells (${error.message}).`;
    problems.push(problem(at, 0, 'line', '', reason));
  }
  return { rows, problems };
}

/** Each line split at runs of spaces and tabs. */
function splitSpaces(text: string): { rows: TextRow[]; problems: ImportProblem[] } {
  const lines = text.split('\n');
  const rows: TextRow[] = [];
  for (let i = 0; i < lines.length; i++) {
    const t = (lines[i] as string).trim();
    rows.push({ line: i + 1, cells: t === '' ? [] : t.split(/[ \t]+/) });
  }
  return { rows, problems: [] };
}

/** A token a data line holds: a number, a time or date, or a missing marker. */
const DATA_TOKEN = /^(?:[+-]?[\d.,:/T+-]*\d[\d.,:/T+-]*|-+|na|n\/a|nan)$/i;

/**
 * Where the columns of an aligned table are: the runs of characters that
 * are not blank on every data line (lines below `skipLines` whose tokens are
 * all numbers, times or missing markers; every non-empty line when there
 * are none). Each column also takes the blanks to its left, since numbers
 * in such tables stand right-aligned under their names.
 */
function fixedColumns(lines: readonly string[], skipLines = 0): { start: number; end: number }[] {
  const body = lines.slice(skipLines).filter((l) => l.trim() !== '');
  const data = body.filter((l) =>
    l
      .trim()
      .split(/\s+/)
      .every((t) => DATA_TOKEN.test(t)),
  );
  const use = data.length > 0 ? data : body;
  let width = 0;
  for (const l of use) if (l.length > width) width = l.length;
  const filled = new Uint8Array(width);
  for (const l of use) for (let i = 0; i < l.length; i++) if (l[i] !== ' ' && l[i] !== '\t') filled[i] = 1;
  const columns: { start: number; end: number }[] = [];
  let start = 0;
  for (let i = 0; i < width; i++) {
    if (filled[i] && (i + 1 === width || !filled[i + 1])) {
      columns.push({ start, end: i + 1 });
      start = i + 1;
    }
  }
  return columns;
}

/** Each line cut at the columns of the aligned table; the last column runs to the end of the line. */
function splitFixed(text: string, skipLines: number): { rows: TextRow[]; problems: ImportProblem[] } {
  const lines = text.split('\n');
  const columns = fixedColumns(lines, skipLines);
  const rows: TextRow[] = [];
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i] as string;
    if (line.trim() === '' || columns.length === 0) {
      rows.push({ line: i + 1, cells: line.trim() === '' ? [] : [line.trim()] });
      continue;
    }
    const cells = columns.map((c, k) => line.slice(c.start, k === columns.length - 1 ? undefined : c.end).trim());
    while (cells.length > 0 && cells[cells.length - 1] === '') cells.pop();
    rows.push({ line: i + 1, cells });
  }
  return { rows, problems: [] };
}

/** Splits the whole text into rows, with line numbers, before any header or skipping. */
export function splitRows(
  text: string,
  separator: Separator,
  skipLines = 0,
): { rows: TextRow[]; problems: ImportProblem[] } {
  const norm = normaliseText(text);
  if (separator === 'none') return splitSingleColumn(norm);
  if (separator === 'space') return splitSpaces(norm);
  if (separator === 'fixed') return splitFixed(norm, skipLines);
  return splitWithPapa(norm, SEPARATOR_CHAR[separator]);
}

/** Splits pasted text into a header and data rows, as the options say. */
export function readTable(text: string, options: TableOptions): TextTable {
  const { rows: all, problems } = splitRows(text, options.separator, options.skipLines);
  let start = 0;
  while (start < all.length && (all[start] as TextRow).line <= options.skipLines) start++;
  while (start < all.length && (all[start] as TextRow).cells.length === 0) start++;
  let header: TextRow | null = null;
  if (options.hasHeader && start < all.length) {
    header = all[start] as TextRow;
    start++;
    while (start < all.length && (all[start] as TextRow).cells.length === 0) start++;
  }
  let end = all.length;
  while (end > start && (all[end - 1] as TextRow).cells.length === 0) end--;
  let rows = all.slice(start, end);
  let blankLinesSkipped = 0;
  if (options.skipBlankLines === true) {
    const kept = rows.filter((r) => r.cells.length > 0);
    blankLinesSkipped = rows.length - kept.length;
    rows = kept;
  }
  let columnCount = 0;
  for (const row of rows) if (row.cells.length > columnCount) columnCount = row.cells.length;
  return { header, rows, columnCount, blankLinesSkipped, problems };
}

/** Counts of each separator character on a line, outside quoted cells. */
function countOutsideQuotes(line: string): { tab: number; semicolon: number; comma: number } {
  let tab = 0;
  let semicolon = 0;
  let comma = 0;
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i];
    if (ch === '"') quoted = !quoted;
    else if (!quoted) {
      if (ch === '\t') tab++;
      else if (ch === ';') semicolon++;
      else if (ch === ',') comma++;
    }
  }
  return { tab, semicolon, comma };
}

/**
 * Whether the first line is a CSV header, names joined by bare commas
 * ("duration_min,depth_mm", "\"Time\",\"Rain\""), with as many commas as
 * every data line below it: then the commas part columns, and "1440,20" is
 * two numbers, not 1440.2. A name written with a comma and a space
 * ("Rain, mm") is one name, and says nothing.
 */
function commaHeaderLikeLines(lines: readonly string[]): boolean {
  const head = (lines[0] ?? '').trim();
  if (/^[+-]?\d/.test(head)) return false;
  const names = head.split(',');
  if (names.length < 2 || names.some((n) => !/[A-Za-z]/.test(n) || /^\s/.test(n))) return false;
  const commas = countOutsideQuotes(head).comma;
  if (commas !== names.length - 1) return false;
  const data = lines.slice(1).filter((l) => /^[+-]?\d/.test(l.trim()));
  return data.length > 0 && data.every((l) => countOutsideQuotes(l).comma === commas);
}

const SINGLE_DECIMAL_COMMA = /^[+-]?\d+,(\d+)$/;
/** A number with commas between groups of three digits: "1,200", "12,345.6", "1,234,567". */
const COMMA_GROUPED = /^[+-]?[1-9]\d{0,2}(?:,\d{3})+(?:\.\d+)?$/;

/**
 * True when the commas on comma-bearing lines stand inside numbers rather
 * than between columns: every token (split at spaces) that holds a comma is
 * a number grouped in thousands ("1,200", "3,500": never a time column and
 * a value), or one decimal-comma number ("0,4", "12,75"). For lines of one
 * decimal-comma number each, either some fraction has a leading zero
 * ("2,05"), which a separate integer column would not, or the parts before
 * the commas do not rise steadily as a time column would.
 */
function commasInsideNumbers(lines: readonly string[]): boolean {
  const lefts: number[] = [];
  let leadingZeroFraction = false;
  let grouped = false;
  let decimalTokens = 0;
  for (const raw of lines) {
    const line = raw.trim();
    // Lines that do not start like a number (a header, a title) say nothing about the data.
    if (!line.includes(',') || !/^[+-]?\d/.test(line)) continue;
    const tokens = line.split(/\s+/);
    for (const token of tokens) {
      if (!token.includes(',')) continue;
      if (COMMA_GROUPED.test(token)) {
        grouped = true;
        continue;
      }
      const m = SINGLE_DECIMAL_COMMA.exec(token);
      if (!m) return false;
      decimalTokens++;
      const fraction = m[1] as string;
      if (fraction.length > 1 && fraction.startsWith('0')) leadingZeroFraction = true;
      if (tokens.length === 1) lefts.push(Number(token.slice(0, token.indexOf(','))));
    }
  }
  if (decimalTokens === 0) return grouped;
  // Two columns need at least two lines to show a rising first column; one number alone is one number.
  if (leadingZeroFraction || lefts.length < decimalTokens || lefts.length < 2) return true;
  for (let i = 1; i < lefts.length; i++) if (!((lefts[i] as number) > (lefts[i - 1] as number))) return true;
  return false;
}

/** Lines looked at when guessing; enough to see the pattern, bounded for very long records. */
const GUESS_LINES = 2000;

/** True when a line holds two or more tokens separated by spaces. */
const SPACED = /\S[ \t]+\S/;

/**
 * Spaces or an aligned table: 'fixed' when the data lines split at spaces
 * into different numbers of cells (an empty cell in an aligned table) but
 * share blank columns; 'space' otherwise.
 */
function spaceOrFixed(lines: readonly string[]): Separator {
  const data = lines.filter((l) =>
    l
      .trim()
      .split(/\s+/)
      .every((t) => /\d/.test(t) || /^(?:-+|na|n\/a)$/i.test(t)),
  );
  let fewest = Infinity;
  let most = 0;
  for (const l of data) {
    const n = l.trim().split(/\s+/).length;
    if (n < fewest) fewest = n;
    if (n > most) most = n;
  }
  return most > fewest && fixedColumns(data).length >= most ? 'fixed' : 'space';
}

/**
 * The separator most lines use. Priority when several appear: tab (a
 * spreadsheet copy), then semicolon (a CSV written where the comma is the
 * decimal mark), then comma, then spaces (a text table or a row copied as
 * text). A separator counts when at least half the non-empty lines have it.
 * Commas that stand inside numbers ("1,200", "0,4") do not count as one.
 */
export function detectSeparator(text: string): Separator {
  const lines = normaliseText(text)
    .split('\n')
    .filter((l) => l.trim() !== '')
    .slice(0, GUESS_LINES);
  if (lines.length === 0) return 'none';
  let tab = 0;
  let semicolon = 0;
  let comma = 0;
  let spaced = 0;
  for (const line of lines) {
    const c = countOutsideQuotes(line);
    if (c.tab > 0) tab++;
    if (c.semicolon > 0) semicolon++;
    if (c.comma > 0) comma++;
    if (SPACED.test(line.trim())) spaced++;
  }
  const half = lines.length / 2;
  if (tab >= half) return 'tab';
  if (semicolon >= half) return 'semicolon';
  if (comma >= half && (commaHeaderLikeLines(lines) || !commasInsideNumbers(lines))) return 'comma';
  if (spaced >= half) return spaceOrFixed(lines);
  return 'none';
}
