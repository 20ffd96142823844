import { NUMBER_FORMATS, matchedValue, numberPattern, type NumberFormat } from './number-format';

/**
 * Numbers as people paste them: a decimal point or a decimal comma, digits
 * grouped in thousands when the paste says so, an optional sign and
 * exponent, nothing else. Anything looser (units stuck to the number, words,
 * a separator the settings do not name) is refused with a reason rather
 * than half-read. The patterns are the typed fields' own (number-format.ts).
 */

/** The decimal mark of the numbers in a paste. */
export type DecimalMark = 'point' | 'comma';
/** What stands between groups of three digits in a paste ('none': digits are not grouped). */
export type Grouping = 'none' | 'comma' | 'point' | 'space';

export const GROUPINGS: readonly Grouping[] = ['none', 'comma', 'point', 'space'];

const MARK = { point: '.', comma: ',' } as const;
const GROUP = { none: null, comma: ',', point: '.', space: ' ' } as const;

const PATTERNS = new Map<string, RegExp>();
function pattern(decimal: DecimalMark, grouping: Grouping): RegExp {
  // A group mark that is also the decimal mark cannot be told apart: read such numbers ungrouped.
  const group = GROUP[grouping] === MARK[decimal] ? null : GROUP[grouping];
  const key = `${decimal}|${group ?? ''}`;
  let p = PATTERNS.get(key);
  if (!p) PATTERNS.set(key, (p = numberPattern(MARK[decimal], group)));
  return p;
}

/** Cells that gauges and spreadsheets write for "no value". */
const MISSING_MARKERS = /^(?:|-+|–|—|na|n\/a|nan|null|none|missing|\?+|#n\/a)$/i;

/** The cell with its unicode minus (U+2212, from some spreadsheets) written as '-'. */
function clean(cell: string): string {
  return cell.trim().replace(/\u2212/g, '-');
}

/**
 * A cell of digits with at most one decimal mark and a leading minus or
 * plus ("0.2", "-12", "3,75"), read without the general pattern: most cells
 * of a long record are such, and a regular expression with captures per cell
 * costs more than the rest of reading it. Undefined for any other cell
 * (grouped, exponent, spaces), which takes the general path.
 */
function plainDecimal(cell: string, mark: number): number | undefined {
  const n = cell.length;
  const i = cell.charCodeAt(0) === 45 || cell.charCodeAt(0) === 43 ? 1 : 0;
  let digits = 0;
  let marks = 0;
  let markAt = -1;
  for (let k = i; k < n; k++) {
    const c = cell.charCodeAt(k);
    if (c >= 48 && c <= 57) digits++;
    else if (c === mark && marks === 0) {
      marks = 1;
      markAt = k;
    } else return undefined;
  }
  // "5." and ".5" are numbers (as Number reads them); "." and "-" are not.
  if (digits === 0) return undefined;
  const value = Number(mark === 46 || markAt === -1 ? cell : `${cell.slice(0, markAt)}.${cell.slice(markAt + 1)}`);
  return Object.is(value, -0) ? 0 : value;
}

/** The number in a cell, or NaN when the cell is not a plain finite number under the decimal mark and grouping. */
export function parseNumber(cell: string, decimal: DecimalMark, grouping: Grouping = 'none'): number {
  if (cell.length > 0 && cell.length < 24) {
    const quick = plainDecimal(cell, decimal === 'point' ? 46 : 44);
    if (quick !== undefined) return Number.isFinite(quick) ? quick : NaN;
  }
  const m = pattern(decimal, grouping).exec(clean(cell));
  if (!m) return NaN;
  const v = matchedValue(m);
  return Number.isFinite(v) ? v : NaN;
}

/** True when a cell holds nothing or a usual "no value" marker (-, NA, n/a, …). */
export function isMissingCell(cell: string): boolean {
  return MISSING_MARKERS.test(cell.trim());
}

const PLAIN = [pattern('point', 'none'), pattern('comma', 'none')];
const GROUPED = NUMBER_FORMATS.map((f) => numberPattern(f.decimal, f.group));

/** True when the cell is a number under either decimal mark, grouped in any offered way or not. */
export function looksNumeric(cell: string): boolean {
  const text = clean(cell);
  return PLAIN.some((p) => p.test(text)) || GROUPED.some((p) => p.test(text));
}

const GROUP_WORDS: Record<Exclude<Grouping, 'none'>, string> = { comma: 'comma', point: 'point', space: 'space' };

/**
 * Why a cell is not a number under the given decimal mark and grouping, in
 * words that point at the fix. Call only when parseNumber gave NaN.
 */
export function notANumberReason(cell: string, decimal: DecimalMark, grouping: Grouping = 'none'): string {
  const text = clean(cell);
  if (isMissingCell(text)) return 'the value is missing.';
  const plain = (d: DecimalMark) => pattern(d, 'none').test(text);
  if (decimal === 'point' && text.includes(',') && plain('comma') && grouping !== 'comma') {
    return /^[+-]?\d{1,3},\d{3}$/.test(text)
      ? 'this number has a comma: if it is a decimal comma, set the decimal mark to comma; if it separates thousands, set the thousands separator to comma.'
      : 'this number has a decimal comma but the decimal mark is set to a point.';
  }
  if (decimal === 'comma' && text.includes('.') && plain('point') && grouping !== 'point') {
    return /^[+-]?\d{1,3}\.\d{3}$/.test(text)
      ? 'this number has a point: if it is a decimal point, set the decimal mark to point; if it separates thousands, set the thousands separator to point.'
      : 'this number has a decimal point but the decimal mark is set to a comma.';
  }
  if (/^[+-]?\d{1,3}(?:[,. '\u00a0\u202f\u2009]\d{3})+(?:[.,]\d+)?$/.test(text)) {
    return grouping === 'none'
      ? 'this looks like a number with thousands separators; set the thousands separator, or remove them.'
      : `this number's groups do not match the settings (thousands separated by a ${GROUP_WORDS[grouping]}, decimal ${decimal}).`;
  }
  if (plain('point') || plain('comma')) return 'the number is too large.';
  if (/^[+-]?[\d.,]+\s*\S+$/.test(text)) return 'not a plain number; remove any unit or text after the number.';
  return 'not a number.';
}

/** How the numbers of a paste are written: their decimal mark and digit grouping. */
export interface NumberStyle {
  readonly decimal: DecimalMark;
  readonly grouping: Grouping;
}

const COMMA_GROUPED = /^[+-]?[1-9]\d{0,2}(?:,\d{3})+(?:\.\d+)?$/;
const POINT_GROUPED = /^[+-]?[1-9]\d{0,2}(?:\.\d{3})+(?:,\d+)?$/;
const SPACE_GROUPED = /^[+-]?[1-9]\d{0,2}(?:[ \u00a0\u202f\u2009]\d{3})+(?:[.,]\d+)?$/;

/**
 * The decimal mark and grouping of a paste's numbers. Cells with one mark
 * and a fraction that cannot be a group of three ("0,4", "12.25") vote for
 * their mark; cells that can only be grouped ("1,234.5", "1,234,567") vote
 * for the other mark and name the grouping. "1,200" alone could be either:
 * the reader's own number format (`preferred`) settles it, so under 1,234.5 it
 * is twelve hundred, and under 1 234,5 it is 1.2. In comma-separated text the
 * decimal mark is a point.
 */
export function detectNumberStyle(
  cells: Iterable<string>,
  separatorIsComma: boolean,
  preferred: NumberStyle = { decimal: 'point', grouping: 'comma' },
): NumberStyle {
  let points = 0;
  let commas = 0;
  let commaGroups = 0;
  let pointGroups = 0;
  let spaceGroups = 0;
  // One mark and three digits ("1,200", "1.200"): a group, or a decimal mark with three decimals.
  let eitherComma = 0;
  let eitherPoint = 0;
  for (const cell of cells) {
    const text = clean(cell);
    if (COMMA_GROUPED.test(text)) {
      if (/^[+-]?\d{1,3},\d{3}$/.test(text)) eitherComma++;
      else {
        commaGroups++;
        if (text.includes('.')) points++;
      }
    } else if (POINT_GROUPED.test(text)) {
      if (/^[+-]?\d{1,3}\.\d{3}$/.test(text)) eitherPoint++;
      else {
        pointGroups++;
        if (text.includes(',')) commas++;
      }
    } else if (SPACE_GROUPED.test(text)) spaceGroups++;
    else if (/^[+-]?\d*\.\d+(?:[eE][+-]?\d+)?$/.test(text)) points++;
    else if (/^[+-]?\d*,\d+(?:[eE][+-]?\d+)?$/.test(text)) commas++;
  }
  let decimal: DecimalMark;
  if (separatorIsComma || points > commas) decimal = 'point';
  else if (commas > points) decimal = 'comma';
  else if (commaGroups !== pointGroups) decimal = commaGroups > pointGroups ? 'point' : 'comma';
  else decimal = eitherComma + eitherPoint > 0 ? preferred.decimal : 'point';
  let grouping: Grouping = 'none';
  if (decimal === 'point' && commaGroups + eitherComma > 0) grouping = 'comma';
  else if (decimal === 'comma' && pointGroups + eitherPoint > 0) grouping = 'point';
  else if (spaceGroups > 0) grouping = 'space';
  return { decimal, grouping };
}

/** The decimal mark and grouping a number format stands for. */
export function numberStyleOf(format: NumberFormat): NumberStyle {
  return {
    decimal: format.decimal === ',' ? 'comma' : 'point',
    grouping: format.group === ',' ? 'comma' : format.group === '.' ? 'point' : 'space',
  };
}

/** The decimal mark most cells use (detectNumberStyle's, for callers that want the mark alone). */
export function detectDecimal(cells: Iterable<string>, separatorIsComma: boolean): DecimalMark {
  return detectNumberStyle(cells, separatorIsComma).decimal;
}
