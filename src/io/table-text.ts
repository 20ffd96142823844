import Papa from 'papaparse';
import { problem, type ImportProblem } from './problems';

/**
 * Pasted text split into lines and cells. Splitting is papaparse's (quotes,
 * quoted separators and quoted line breaks handled as in RFC 4180); this file
 * adds what a paste dialog needs on top: the separator guessed, line numbers
 * kept for every row, leading lines skipped, a header taken off, and empty
 * lines at the ends trimmed.
 */

/** How cells are separated on a line. 'none' reads each line as one cell (a single column). */
export type Separator = 'tab' | 'comma' | 'semicolon' | 'none';

export const SEPARATORS: readonly Separator[] = ['tab', 'comma', 'semicolon', 'none'];

const SEPARATOR_CHAR = { tab: '\t', comma: ',', semicolon: ';' } as const;

/** One line of the table: its 1-based line number in the pasted text and its trimmed cells. */
export interface TextRow {
  readonly line: number;
  /** Trimmed cells; an empty array for an empty line. */
  readonly cells: readonly string[];
}

export interface TableOptions {
  readonly separator: Separator;
  /** Lines at the top of the text to ignore (a title block, station details). */
  readonly skipLines: number;
  /** The first non-empty line after the skipped ones holds column names. */
  readonly hasHeader: boolean;
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

function splitWithPapa(text: string, delimiter: string): { rows: TextRow[]; problems: ImportProblem[] } {
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

/** Splits the whole text into rows, with line numbers, before any header or skipping. */
export function splitRows(text: string, separator: Separator): { rows: TextRow[]; problems: ImportProblem[] } {
  const norm = normaliseText(text);
  if (separator === 'none') return splitSingleColumn(norm);
  return splitWithPapa(norm, SEPARATOR_CHAR[separator]);
}

/** Splits pasted text into a header and data rows, as the options say. */
export function readTable(text: string, options: TableOptions): TextTable {
  const { rows: all, problems } = splitRows(text, options.separator);
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
  const rows = all.slice(start, end);
  let columnCount = 0;
  for (const row of rows) if (row.cells.length > columnCount) columnCount = row.cells.length;
  return { header, rows, columnCount, problems };
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

const SINGLE_DECIMAL_COMMA = /^[+-]?\d+,(\d+)$/;

/**
 * True when comma-bearing lines look like one column of decimal-comma numbers
 * ("0,4", "12,75") rather than two columns. Each such line must be one number
 * with one comma, and either some fraction has a leading zero ("2,05"), which
 * a separate integer column would not, or the parts before the commas do not
 * rise steadily as a time column would.
 */
function looksLikeDecimalCommaColumn(lines: readonly string[]): boolean {
  const lefts: number[] = [];
  let leadingZeroFraction = false;
  for (const raw of lines) {
    const line = raw.trim();
    // Lines that do not start like a number (a header, a title) say nothing about the data.
    if (!line.includes(',') || !/^[+-]?\d/.test(line)) continue;
    const m = SINGLE_DECIMAL_COMMA.exec(line);
    if (!m) return false;
    const fraction = m[1] as string;
    if (fraction.length > 1 && fraction.startsWith('0')) leadingZeroFraction = true;
    lefts.push(Number(line.slice(0, line.indexOf(','))));
  }
  if (lefts.length === 0) return false;
  if (leadingZeroFraction) return true;
  for (let i = 1; i < lefts.length; i++) if (!((lefts[i] as number) > (lefts[i - 1] as number))) return true;
  return false;
}

/** Lines looked at when guessing; enough to see the pattern, bounded for very long records. */
const GUESS_LINES = 2000;

/**
 * The separator most lines use. Priority when several appear: tab (a
 * spreadsheet copy), then semicolon (a CSV written where the comma is the
 * decimal mark), then comma. A separator counts when at least half the
 * non-empty lines have it.
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
  for (const line of lines) {
    const c = countOutsideQuotes(line);
    if (c.tab > 0) tab++;
    if (c.semicolon > 0) semicolon++;
    if (c.comma > 0) comma++;
  }
  const half = lines.length / 2;
  if (tab >= half) return 'tab';
  if (semicolon >= half) return 'semicolon';
  if (comma >= half) return looksLikeDecimalCommaColumn(lines) ? 'none' : 'comma';
  return 'none';
}
