/**
 * Numbers as people paste them: a decimal point or a decimal comma, an
 * optional sign and exponent, nothing else. Anything looser (thousands
 * separators, units stuck to the number, words) is refused with a reason
 * rather than half-read.
 */

/** The decimal mark of the numbers in a paste. */
export type DecimalMark = 'point' | 'comma';

const POINT_NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;
const COMMA_NUMBER = /^[+-]?(?:\d+(?:,\d*)?|,\d+)(?:[eE][+-]?\d+)?$/;
/** Cells that gauges and spreadsheets write for "no value". */
const MISSING_MARKERS = /^(?:|-+|–|—|na|n\/a|nan|null|none|missing|\?+|#n\/a)$/i;

/** The cell with its unicode minus (U+2212, from some spreadsheets) written as '-'. */
function clean(cell: string): string {
  return cell.trim().replace(/\u2212/g, '-');
}

/** The number in a cell, or NaN when the cell is not a plain finite number. */
export function parseNumber(cell: string, decimal: DecimalMark): number {
  const text = clean(cell);
  if (decimal === 'point') {
    if (!POINT_NUMBER.test(text)) return NaN;
    const v = Number(text);
    return Number.isFinite(v) ? v : NaN;
  }
  if (!COMMA_NUMBER.test(text)) return NaN;
  const v = Number(text.replace(',', '.'));
  return Number.isFinite(v) ? v : NaN;
}

/** True when a cell holds nothing or a usual "no value" marker (-, NA, n/a, …). */
export function isMissingCell(cell: string): boolean {
  return MISSING_MARKERS.test(cell.trim());
}

/** True when the cell is a number under either decimal mark. */
export function looksNumeric(cell: string): boolean {
  const text = clean(cell);
  return POINT_NUMBER.test(text) || COMMA_NUMBER.test(text);
}

/**
 * Why a cell is not a number under the given decimal mark, in words that
 * point at the fix. Call only when parseNumber gave NaN.
 */
export function notANumberReason(cell: string, decimal: DecimalMark): string {
  const text = clean(cell);
  if (isMissingCell(text)) return 'the value is missing.';
  if (decimal === 'point' && text.includes(',') && COMMA_NUMBER.test(text)) {
    return /^[+-]?\d{1,3},\d{3}$/.test(text)
      ? 'this number has a comma: if it is a decimal comma, set the decimal mark to comma; if it separates thousands, remove it.'
      : 'this number has a decimal comma but the decimal mark is set to a point.';
  }
  if (decimal === 'comma' && text.includes('.') && POINT_NUMBER.test(text)) {
    return 'this number has a decimal point but the decimal mark is set to a comma.';
  }
  if (/^[+-]?\d{1,3}(?:[,. '\u00a0]\d{3})+(?:[.,]\d+)?$/.test(text)) {
    return 'this looks like a number with thousands separators; remove them.';
  }
  if (POINT_NUMBER.test(text) || COMMA_NUMBER.test(text)) return 'the number is too large.';
  if (/^[+-]?[\d.,]+\s*\S+$/.test(text)) return 'not a plain number; remove any unit or text after the number.';
  return 'not a number.';
}

/**
 * The decimal mark most cells use. Cells with exactly one mark and digits
 * after it vote; with comma-separated columns the decimal mark is a point.
 */
export function detectDecimal(cells: Iterable<string>, separatorIsComma: boolean): DecimalMark {
  if (separatorIsComma) return 'point';
  let points = 0;
  let commas = 0;
  for (const cell of cells) {
    const text = clean(cell);
    if (/^[+-]?\d*\.\d+(?:[eE][+-]?\d+)?$/.test(text)) points++;
    else if (/^[+-]?\d*,\d+(?:[eE][+-]?\d+)?$/.test(text)) commas++;
  }
  return commas > points ? 'comma' : 'point';
}
