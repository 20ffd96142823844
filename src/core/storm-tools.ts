import { InputError } from './errors';
import { barEdgesH, totalDurationH, validateStorm, type Storm } from './storm';
import { MAX_RECORD_H, MAX_RECORD_YEARS, checkStepH, describeHours, isBelowMinStep } from './time-limits';

/**
 * Whole-storm edits behind the workbench's storm tools: resampling to another
 * time step, scaling by a factor, an empty storm to draw on, and moving the
 * boundary between two bars. Each validates its input, leaves it unchanged and
 * returns a new storm (durations h, depths mm, start kept). Setting a total
 * depth is the design core's `scaleStormToDepth`.
 */

/**
 * Most bars a tool may make. Our own guard, so that a step typed in the wrong
 * unit (seconds as minutes) is refused instead of allocating millions of bars.
 */
export const MAX_TOOL_BARS = 1_000_000;

/** Steps are typed in minutes (10 min = 0.1666… h), so "a whole number of steps" is judged to rounding. */
const STEP_REL_TOL = 1e-9;

function keepStart(storm: Storm): { startIso?: string } {
  return storm.startIso === undefined ? {} : { startIso: storm.startIso };
}

/** A step from one second to 500 years (core/time-limits.ts). */
function checkStep(stepH: number): void {
  checkStepH('stepH', 'The time step', stepH);
}

/**
 * The storm redistributed onto bars of `stepH` hours from its start, with the
 * total depth kept. The last bar is shorter when the storm's duration is not a
 * whole number of steps (the storm keeps its length; no dry time is added); a
 * remainder shorter than a second joins the last whole step instead, since
 * no bar lasts less than a second.
 *
 * Derivation: a hyetograph bar stands for rain falling at a constant
 * intensity over the bar (intensity = depth / duration; that is what the bar
 * draws). The rain falling in a new bar [s, s′) is then the integral of that
 * piecewise-constant intensity over [s, s′):
 *
 *     P′_j = Σ_k P_k · |[t_k, t_k+1) ∩ [s_j, s_j+1)| / Δt_k
 *
 * Each old bar's depth is shared between the new bars it overlaps in
 * proportion to the overlap, so the total is conserved whatever the steps;
 * when the new step is a multiple of the old one (the steps nest) this is a
 * plain sum of whole bars, and when the old step is a multiple of the new one
 * each bar is split evenly. It is the unique redistribution that conserves
 * every old bar's depth and adds no shape inside a bar. In floating point the
 * last share of each old bar is what remains of its depth, so the shares of
 * every old bar add back to its depth to rounding.
 */
export function resampleStorm(storm: Storm, stepH: number): Storm {
  validateStorm(storm);
  checkStep(stepH);
  const n = storm.depthsMm.length;
  if (n === 0) return { durationsH: new Float64Array(0), depthsMm: new Float64Array(0), ...keepStart(storm) };
  const totalH = totalDurationH(storm);
  const steps = totalH / stepH;
  if (!(steps <= MAX_TOOL_BARS * (1 + STEP_REL_TOL))) {
    throw new InputError(
      'stepH',
      `A step of ${String(stepH)} h makes more than ${MAX_TOOL_BARS} bars of this ${String(totalH)} h storm; check the step's unit.`,
    );
  }
  // A step that divides the storm to rounding gives bars of exactly that step
  // (3 h in steps of 10/60 h is 18 bars of 10 min, not 17 and a sliver).
  const nearest = Math.round(steps);
  const divides = nearest >= 1 && Math.abs(steps - nearest) <= STEP_REL_TOL * steps;
  let m = divides ? nearest : Math.floor(steps) + 1;
  // A remainder under a second joins the bar before it: no bar lasts less than a second (core/time-limits.ts).
  if (!divides && m > 1 && isBelowMinStep(totalH - (m - 1) * stepH)) m--;

  const durationsH = new Float64Array(m).fill(stepH);
  if (!divides) durationsH[m - 1] = m === 1 ? totalH : totalH - (m - 1) * stepH;
  // New bar j ends at (j + 1)·stepH; the last ends with the storm.
  const endOf = (j: number): number => (j === m - 1 ? Infinity : (j + 1) * stepH);

  const t = barEdgesH(storm);
  const p = storm.depthsMm;
  const d = storm.durationsH;
  const depthsMm = new Float64Array(m);
  let j = 0;
  let shared = 0; // depth of old bar k given to new bars so far
  for (let k = 0; k < n;) {
    const oldEnd = t[k + 1] as number;
    const newEnd = endOf(j);
    const depth = p[k] as number;
    if (oldEnd <= newEnd) {
      // Old bar k ends inside new bar j: j takes what is left of it.
      const rest = depth - shared;
      depthsMm[j] = (depthsMm[j] as number) + (rest > 0 ? rest : 0);
      shared = 0;
      k++;
      if (oldEnd === newEnd) j++;
    } else {
      // Old bar k runs past the end of new bar j: j takes the overlapping share.
      const from = Math.max(t[k] as number, j * stepH);
      const overlap = newEnd - from;
      let share = overlap > 0 ? (depth * overlap) / (d[k] as number) : 0;
      if (share > depth - shared) share = depth - shared;
      depthsMm[j] = (depthsMm[j] as number) + share;
      shared += share;
      j++;
    }
  }
  return { durationsH, depthsMm, ...keepStart(storm) };
}

/** Every bar's depth multiplied by `factor` (≥ 0). */
export function scaleStormByFactor(storm: Storm, factor: number): Storm {
  validateStorm(storm);
  if (typeof factor !== 'number' || !Number.isFinite(factor) || !(factor >= 0)) {
    throw new InputError('factor', `The scale factor must be a finite number, zero or more (got ${String(factor)}).`);
  }
  const n = storm.depthsMm.length;
  const depthsMm = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const v = (storm.depthsMm[k] as number) * factor;
    if (!Number.isFinite(v)) {
      throw new InputError(
        'factor',
        `Bar ${k + 1} would hold more rain than can be stored after scaling by ${String(factor)}.`,
        k,
      );
    }
    depthsMm[k] = v;
  }
  return { durationsH: Float64Array.from(storm.durationsH), depthsMm, ...keepStart(storm) };
}

/** 2^-1022, the smallest double held to its full 53 bits; below it a depth loses digits, and at 0 all of them. */
const SMALLEST_FULL_DEPTH_MM = 2.2250738585072014e-308;

/**
 * The index of the first bar that had rain in `before` and has none, or
 * less than a double holds in full, in `after` (the same bars rescaled), or
 * −1. Such a bar's share of the pattern is gone for good: no later scaling
 * brings it back, so a tool that rescales a storm refuses to.
 */
export function firstRainLost(before: Storm, after: Storm): number {
  const n = Math.min(before.depthsMm.length, after.depthsMm.length);
  for (let k = 0; k < n; k++) {
    const was = before.depthsMm[k] as number;
    const now = after.depthsMm[k] as number;
    // A bar already below full precision is lost only by shrinking further.
    if (was > 0 && now < SMALLEST_FULL_DEPTH_MM && now < was) return k;
  }
  return -1;
}

/** `count` dry bars of `stepH` hours each: a storm to draw on. */
export function emptyStorm(stepH: number, count: number, startIso?: string): Storm {
  checkStep(stepH);
  if (typeof count !== 'number' || !Number.isInteger(count) || count < 1 || count > MAX_TOOL_BARS) {
    throw new InputError(
      'count',
      `The number of bars must be a whole number from 1 to ${MAX_TOOL_BARS} (got ${String(count)}).`,
    );
  }
  if (stepH * count > MAX_RECORD_H) {
    throw new InputError(
      'count',
      `${count} bars of ${describeHours(stepH)} would last ${describeHours(stepH * count)}; a storm spans at most ${MAX_RECORD_YEARS} years.`,
    );
  }
  const storm: Storm = {
    durationsH: new Float64Array(count).fill(stepH),
    depthsMm: new Float64Array(count),
    ...(startIso === undefined ? {} : { startIso }),
  };
  validateStorm(storm);
  return storm;
}

/**
 * Moves the boundary between bar k − 1 and bar k (0-based k ≥ 1) to `startH`
 * hours after the storm's start: bar k − 1 ends and bar k starts there, every
 * other bar keeps its times, and each bar keeps its depth (so the two bars'
 * intensities change). The new start must fall strictly inside the span of
 * the two bars.
 */
export function withBarStartH(storm: Storm, k: number, startH: number): Storm {
  validateStorm(storm);
  const n = storm.depthsMm.length;
  if (!Number.isInteger(k) || k < 1 || k >= n) {
    throw new InputError(
      'durationsH',
      n < 2
        ? 'The storm has no boundary between bars to move.'
        : `Only bars 2 to ${n} have a start that can move (got bar ${String(k + 1)}).`,
      Number.isInteger(k) ? k : undefined,
    );
  }
  const edges = barEdgesH(storm);
  const lo = edges[k - 1] as number;
  const hi = edges[k + 1] as number;
  if (typeof startH !== 'number' || !(startH > lo) || !(startH < hi)) {
    throw new InputError(
      'durationsH',
      `Bar ${k + 1} must start after bar ${k} starts (${String(lo)} h) and before it itself ends (${String(hi)} h); got ${String(startH)} h.`,
      k,
    );
  }
  if (isBelowMinStep(startH - lo) || isBelowMinStep(hi - startH)) {
    throw new InputError(
      'durationsH',
      `Bar ${isBelowMinStep(startH - lo) ? k : k + 1} would last less than a second with bar ${k + 1} starting at ${String(startH)} h; a bar lasts at least 1 second.`,
      k,
    );
  }
  const durationsH = Float64Array.from(storm.durationsH);
  durationsH[k - 1] = startH - lo;
  durationsH[k] = hi - startH;
  return { durationsH, depthsMm: Float64Array.from(storm.depthsMm), ...keepStart(storm) };
}
