import { formatValue } from '../format';

/**
 * How a value differs from the first pinned scenario's, in words and signs
 * as well as colour: "▲ +8.4 mm (+20.19 %)", "▼ −2 mm (−10 %)", "= same".
 * Values are in the units on screen; `unit` is appended to the difference.
 */
export interface Difference {
  readonly direction: 'up' | 'down' | 'same' | 'none';
  readonly text: string;
}

/** Differences smaller than this share of the larger value are shown as "same" (rounding of equal inputs). */
const SAME_REL = 1e-9;

const MINUS = '−';

export function difference(
  first: number | null,
  value: number | null,
  unit: string,
  options: { percentPoints?: boolean } = {},
): Difference {
  if (first === null || value === null || !Number.isFinite(first) || !Number.isFinite(value)) {
    return { direction: 'none', text: 'no difference to show' };
  }
  const d = value - first;
  if (Math.abs(d) <= SAME_REL * Math.max(Math.abs(first), Math.abs(value)))
    return { direction: 'same', text: '= same as 1' };
  const up = d > 0;
  const sign = up ? '+' : MINUS;
  const amount = `${sign}${formatValue(Math.abs(d))}${unit === '' ? '' : ` ${unit}`}`;
  const share = options.percentPoints || first === 0 ? '' : ` (${sign}${formatValue(Math.abs((d / first) * 100))} %)`;
  return { direction: up ? 'up' : 'down', text: `${up ? '▲' : '▼'} ${amount}${share}` };
}
