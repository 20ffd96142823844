/**
 * Number formatting for the screen. Results show four significant figures
 * (whole numbers from 1000 up, with grouping); editable fields show up to six
 * significant figures without grouping, so the text can be typed back.
 */
const sig4 = new Intl.NumberFormat('en-US', { maximumSignificantDigits: 4 });
const whole = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });

export function formatValue(x: number): string {
  if (!Number.isFinite(x)) return '—';
  if (Object.is(x, -0)) return '0';
  return Math.abs(x) >= 1000 ? whole.format(x) : sig4.format(x);
}

export function formatForField(x: number): string {
  if (!Number.isFinite(x)) return '';
  if (x === 0) return '0';
  return String(Number(x.toPrecision(6)));
}

/** A fraction as a percentage, e.g. 0.3125 → "31.25 %". */
export function formatPercent(fraction: number): string {
  return `${formatValue(fraction * 100)} %`;
}
