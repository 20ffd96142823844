/** Short wording for import summaries: durations, amounts, steps. */

/** A number with at most `decimals` decimals and no trailing zeros: 41.6, 0.125, 12. */
export function formatAmount(value: number, decimals = 2): string {
  if (!Number.isFinite(value)) return String(value);
  const text = Number(value.toFixed(decimals)).toString();
  return text === '-0' ? '0' : text;
}

/** A duration in hours as people say it: "30 s", "10 min", "2.5 min", "1 h", "1 h 30 min". */
export function formatDuration(hours: number): string {
  const minutes = Number((hours * 60).toFixed(6));
  if (minutes < 1) return `${formatAmount(minutes * 60, 3)} s`;
  if (minutes < 60) return `${formatAmount(minutes, 3)} min`;
  const whole = Math.floor(minutes / 60);
  const rest = Number((minutes - whole * 60).toFixed(6));
  return rest === 0 ? `${whole} h` : `${whole} h ${formatAmount(rest, 3)} min`;
}

/** Smallest and largest of a list of durations. */
export function durationRange(durations: readonly number[]): { min: number; max: number } {
  let min = Infinity;
  let max = -Infinity;
  for (const d of durations) {
    if (d < min) min = d;
    if (d > max) max = d;
  }
  return { min, max };
}

/** Whether two durations are the same step, allowing for the rounding of time arithmetic. */
export function sameStep(a: number, b: number): boolean {
  return Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b));
}

/** "10 min", or "5 min to 1 h (irregular steps)" when the steps differ. */
export function describeSteps(durations: readonly number[]): string {
  const { min, max } = durationRange(durations);
  if (durations.length === 0) return '';
  if (sameStep(min, max)) return formatDuration(min);
  const low = formatDuration(min);
  const high = formatDuration(max);
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

export const plural = (n: number, one: string, many = `${one}s`): string => `${n} ${n === 1 ? one : many}`;
