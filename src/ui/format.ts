import { writeNumber } from '../io/number-format';
import { currentNumberFormat } from './number-format/preference';

/**
 * Number formatting for the screen, in the reader's number format (see
 * src/ui/number-format). Results show four significant figures (whole
 * numbers from 1000 up); editable fields show up to six. Both group
 * thousands the same way, so whatever the screen shows can be typed back
 * (src/ui/parse-number.ts reads it). Nothing here ever writes "NaN",
 * "Infinity" or a long run of digits: "—" for no number, an exponent for
 * the very large and very small.
 */
const RESULT = { significant: 4, wholeFrom: 1000 } as const;
const FIELD = { significant: 6 } as const;

export function formatValue(x: number): string {
  return writeNumber(x, currentNumberFormat(), RESULT);
}

export function formatForField(x: number): string {
  if (!Number.isFinite(x)) return '';
  return writeNumber(x, currentNumberFormat(), FIELD);
}

/** A whole count as the screen writes it: "50,000 bars". */
export function formatCount(n: number): string {
  return writeNumber(Math.round(n), currentNumberFormat(), { significant: 15 });
}

/** A fraction as a percentage, e.g. 0.3125 → "31.25 %". */
export function formatPercent(fraction: number): string {
  return `${formatValue(fraction * 100)} %`;
}
