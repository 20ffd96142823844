import type { EventFit } from './fit';

/** The spread of fitted values over the events that have one. */
export interface FitSummary {
  /** Events with a fitted value. */
  readonly count: number;
  /** Events without one (their rows say why). */
  readonly withoutAnswer: number;
  /** The statistics below are null when `count` is 0 (no NaN leaves the core). */
  readonly mean: number | null;
  /** Middle value; for an even count the mean of the two middle values. */
  readonly median: number | null;
  readonly min: number | null;
  readonly max: number | null;
}

/** Count, mean, median, min and max of the fitted values, ignoring events without an answer. */
export function summariseFits(fits: readonly EventFit[]): FitSummary {
  const values: number[] = [];
  for (const fit of fits) if (fit.result.ok) values.push(fit.result.value);
  return summariseValues(values, fits.length - values.length);
}

/**
 * Count, mean, median, min and max of a list of fitted values (sorted in
 * place), with `withoutAnswer` the events that gave none. Shared by the loss
 * fits and the transform fits of an event set, so both spreads read alike.
 */
export function summariseValues(values: number[], withoutAnswer: number): FitSummary {
  const count = values.length;
  if (count === 0) {
    return { count, withoutAnswer, mean: null, median: null, min: null, max: null };
  }
  values.sort((x, y) => x - y);
  let sum = 0;
  for (const v of values) sum += v;
  const mid = count >> 1;
  const median =
    count % 2 === 1 ? (values[mid] as number) : ((values[mid - 1] as number) + (values[mid] as number)) / 2;
  return {
    count,
    withoutAnswer,
    mean: sum / count,
    median,
    min: values[0] as number,
    max: values[count - 1] as number,
  };
}
