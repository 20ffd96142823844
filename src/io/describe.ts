import { DEFAULT_NUMBER_FORMAT, writeNumber, type NumberFormat } from './number-format';

/**
 * Short wording for import summaries: durations, amounts, steps, counts,
 * with numbers written the way the screen writes them (four significant
 * figures, whole numbers from 1000, grouped in the reader's number format),
 * so a preview and the workbench never disagree on how a number looks.
 */

const RESULT = { significant: 4, wholeFrom: 1000 } as const;

/** An amount as the screen writes a result: 41.6, 0.125, 115,032. */
export function formatAmount(value: number, format: NumberFormat = DEFAULT_NUMBER_FORMAT): string {
  return writeNumber(value, format, RESULT);
}

/** A count, grouped: "50,000". */
export function formatCount(n: number, format: NumberFormat = DEFAULT_NUMBER_FORMAT): string {
  return writeNumber(Math.round(n), format, { significant: 15 });
}

/** A duration in hours as people say it: "30 s", "10 min", "2.5 min", "1 h", "1 h 30 min", "50,000 h". */
export function formatDuration(hours: number, format: NumberFormat = DEFAULT_NUMBER_FORMAT): string {
  const minutes = Number((hours * 60).toFixed(6));
  if (minutes < 1) return `${formatAmount(minutes * 60, format)} s`;
  if (minutes < 60) return `${formatAmount(minutes, format)} min`;
  const whole = Math.floor(minutes / 60);
  const rest = Number((minutes - whole * 60).toFixed(6));
  const h = formatCount(whole, format);
  return rest === 0 ? `${h} h` : `${h} h ${formatAmount(rest, format)} min`;
}

/** Smallest and largest of a list of durations. */
function durationRange(durations: ArrayLike<number>): { min: number; max: number } {
  let min = Infinity;
  let max = -Infinity;
  for (let k = 0; k < durations.length; k++) {
    const d = durations[k] as number;
    if (d < min) min = d;
    if (d > max) max = d;
  }
  return { min, max };
}

/** Whether two durations are the same step, allowing for the rounding of time arithmetic. */
function sameStep(a: number, b: number): boolean {
  return Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b));
}

/** "10 min", or "5 min to 1 h (irregular steps)" when the steps differ. */
export function describeSteps(durations: ArrayLike<number>, format: NumberFormat = DEFAULT_NUMBER_FORMAT): string {
  const { min, max } = durationRange(durations);
  if (durations.length === 0) return '';
  if (sameStep(min, max)) return formatDuration(min, format);
  const low = formatDuration(min, format);
  const high = formatDuration(max, format);
  // "5 to 25 min" rather than "5 min to 25 min".
  const shortLow = low.endsWith(' min') && high.endsWith(' min') && !low.includes('h') ? low.slice(0, -4) : low;
  return `${shortLow} to ${high} (irregular steps)`;
}

/** Whether all durations are one step. */
export function isRegular(durations: readonly number[]): boolean {
  const { min, max } = durationRange(durations);
  return durations.length === 0 || sameStep(min, max);
}

/** An ISO date-time for a sentence: "2024-05-01 10:00" (seconds only when set, zone kept). */
export function formatIsoForPeople(iso: string): string {
  return iso.replace('T', ' ').replace(/(\d{2}:\d{2}):00(?=$|[Z+-])/, '$1');
}

/** "1 bar", "50,000 bars". */
export const plural = (
  n: number,
  one: string,
  many = `${one}s`,
  format: NumberFormat = DEFAULT_NUMBER_FORMAT,
): string => `${formatCount(n, format)} ${n === 1 ? one : many}`;
