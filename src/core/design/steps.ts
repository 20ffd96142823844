import { InputError } from '../errors';
import { checkStepH } from '../time-limits';
import { fmt } from './format';

/**
 * Most bars a design storm may have. Our own guard, so that a mistyped step
 * (seconds entered as hours) is refused rather than allocating millions of
 * bars; a 72-hour storm in 1-minute steps is 4320.
 */
export const MAX_DESIGN_BARS = 100_000;

// Step and duration are usually typed in minutes and converted to hours
// (10 min = 0.1666… h), so "a whole number of steps" is judged to rounding.
const WHOLE_REL_TOL = 1e-9;

/**
 * Checks a design storm's total duration and step (h) and returns the number
 * of equal bars. Throws InputError naming `durationH` or `stepH`.
 */
export function stepCount(durationH: number, stepH: number): number {
  // One second to 500 years each (core/time-limits.ts).
  checkStepH('durationH', 'The storm duration', durationH);
  checkStepH('stepH', 'The time step', stepH);
  if (stepH > durationH * (1 + WHOLE_REL_TOL)) {
    throw new InputError('stepH', `The time step (${fmt(stepH)} h) is longer than the storm (${fmt(durationH)} h).`);
  }
  const n = Math.round(durationH / stepH);
  if (Math.abs(n * stepH - durationH) > WHOLE_REL_TOL * durationH) {
    throw new InputError(
      'stepH',
      `The storm duration (${fmt(durationH)} h) is not a whole number of time steps of ${fmt(stepH)} h; choose a step that divides it.`,
    );
  }
  if (n > MAX_DESIGN_BARS) {
    throw new InputError(
      'stepH',
      `A step of ${fmt(stepH)} h makes ${n} bars for a ${fmt(durationH)} h storm; at most ${MAX_DESIGN_BARS} are allowed. Check the step's unit.`,
    );
  }
  return n;
}
