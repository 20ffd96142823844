import type { LossMethod } from '../core';

/**
 * The method without the parameter to fit, as text: equal for two methods
 * that differ only in that value. Derived values that never read the fitted
 * value (a fit, the event fits, the loss interval) are keyed on it, so a drag
 * of the loss line does not compute them again each frame.
 */
export function heldKey(method: LossMethod, parameter: string | null): string {
  return JSON.stringify(method, (key, value: unknown) => (key === parameter ? undefined : value));
}
