/**
 * The one CSV writer of every export. A spreadsheet opens a CSV file by
 * reading each cell as it would a typed entry, so text that starts like a
 * formula runs as one ("CSV injection", or formula injection), and a stray
 * quote or separator in a name can shift or swallow every cell after it.
 *
 * Rules, after OWASP's "CSV Injection" page (from memory, not re-read):
 * - every field is wrapped in double quotes, and a double quote inside is
 *   written twice (RFC 4180 §2), so no separator, quote or line break in a
 *   name can end its cell early;
 * - a text cell that starts with `=`, `+`, `-`, `@`, a tab or a carriage
 *   return gets a single quote in front, which spreadsheets read as "this is
 *   text" and do not show. Our own additions, for the same reason: the same
 *   check after leading spaces (some readers trim them), and the full-width
 *   forms ＝ ＋ － ＠ that some spreadsheets also take as formula starts.
 *
 * Numbers are the one kind of cell never prefixed: a cell given as a number
 * is written as the shortest text that reads back as the same double
 * (`String(x)`), so a negative number such as -1.5 stays a number (bar tables
 * hold none today: durations, depths, losses and excess are never negative).
 * The same characters given as text ("-1.5" typed into a name) are
 * neutralised, since text is not known to be a number.
 */
export type CsvCell = string | number;

/** A first character (after any spaces) that spreadsheets may take as the start of a formula. */
const FORMULA_START = /^[ \u00a0]*[=+\-@\t\r\uff1d\uff0b\uff0d\uff20]/;

/** Text as a spreadsheet will show it, never as a formula: a leading single quote when it could start one. */
export function neutralise(text: string): string {
  return FORMULA_START.test(text) ? `'${text}` : text;
}

/** One quoted field. Numbers must be finite: an export never writes NaN or Infinity as data. */
export function csvField(cell: CsvCell): string {
  if (typeof cell === 'number') {
    if (!Number.isFinite(cell)) throw new RangeError(`A CSV number cell must be finite (got ${String(cell)}).`);
    return `"${String(Object.is(cell, -0) ? 0 : cell)}"`;
  }
  return `"${neutralise(cell).replace(/"/g, '""')}"`;
}

/** One line of fields, separated by commas. */
export function csvRow(cells: readonly CsvCell[]): string {
  let line = '';
  for (let k = 0; k < cells.length; k++) line += (k === 0 ? '' : ',') + csvField(cells[k] as CsvCell);
  return line;
}

/**
 * A note line: a bare "#" cell, then the note as one quoted text field. CSV
 * readers told to skip comment lines (papaparse `comments: '#'`, pandas
 * `comment='#'`) skip it; a spreadsheet shows "#" and the note beside it. The
 * "#" is our own constant, the only cell written without quotes: quoted, it
 * would not open a comment. Line breaks in the note become spaces, so the
 * note stays on its one line.
 */
export function csvNote(text: string): string {
  return `#,${csvField(text.replace(/[\r\n]+/g, ' '))}`;
}

/** The whole file: CRLF line ends (RFC 4180) and a byte-order mark so spreadsheets read it as UTF-8. */
export function csvFile(lines: readonly string[]): string {
  return `\ufeff${lines.join('\r\n')}\r\n`;
}

/**
 * Numbers in notes: four significant figures like the screen, whole numbers
 * from 1000 like the screen's results, but never a thousands comma, which a
 * spreadsheet would read as a cell boundary.
 */
const sig4 = new Intl.NumberFormat('en-US', { maximumSignificantDigits: 4, useGrouping: false });
const whole = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0, useGrouping: false });
export function noteNumber(x: number): string {
  if (!Number.isFinite(x)) return '—';
  if (Object.is(x, -0)) return '0';
  return Math.abs(x) >= 1000 ? whole.format(x) : sig4.format(x);
}
