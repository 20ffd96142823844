import { InputError } from '../errors';
import type { FitSummary } from './summary';

/** How the user picks the design value: a statistic of the fits, or a number of their own. */
export type DesignPick = 'median' | 'mean' | 'min' | 'max' | { readonly value: number };

/**
 * The design value for a pick, median by default. Throws
 * InputError('designValue') for a number that is not finite, or a statistic
 * when no event has a fitted value. Bounds of the parameter are checked where
 * the value is applied.
 */
export function pickDesignValue(summary: FitSummary, pick: DesignPick = 'median'): number {
  if (typeof pick === 'object') {
    if (typeof pick.value !== 'number' || !Number.isFinite(pick.value)) {
      throw new InputError('designValue', `The design value must be a finite number (got ${String(pick.value)}).`);
    }
    return pick.value;
  }
  if (pick !== 'median' && pick !== 'mean' && pick !== 'min' && pick !== 'max') {
    throw new InputError(
      'designValue',
      `Unknown choice of design value "${String(pick)}"; use median, mean, min, max or a number.`,
    );
  }
  const value = summary[pick];
  if (summary.count === 0 || value === null) {
    throw new InputError(
      'designValue',
      `No event has a fitted value, so there is no ${pick} to use; enter a value instead.`,
    );
  }
  return value;
}
