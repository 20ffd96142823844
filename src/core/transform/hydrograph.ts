import { InputError } from '../errors';
import { convolve } from './convolve';
import { excessOnSteps, stepsCovering, totalHours } from './grid';
import { unitResponse } from './response';
import { StepTooShort, samplesTooMany, stormTooLong } from './step-limit';
import type { Excess, RunoffHydrograph, Transform } from './types';
import { validateAreaM2, validateExcess, validateTransform } from './validate';

const S_PER_H = 3600;
/** m³ of water per mm of depth over 1 m². */
const M3_PER_MM_M2 = 1e-3;
/** Longest hydrograph returned, in samples (two 80 MB columns). */
export const MAX_HYDROGRAPH_SAMPLES = 1e7;

/** The gathered excess, kept between calls: fresh memory is slow to touch, and it never leaves this file. */
let gridScratch = new Float64Array(0);

export interface RunoffHydrographOptions {
  /** Output step, h; default the storm's shortest bar. */
  readonly stepH?: number;
}

/**
 * The output step: the one asked for, else the shortest bar (and which bar
 * that is, so a step too short for the hydrograph is refused as that bar's).
 */
function outputStep(
  durationsH: ArrayLike<number>,
  options: RunoffHydrographOptions,
): { readonly stepH: number; readonly bar: number | null } {
  const asked = options.stepH;
  if (asked !== undefined) {
    if (typeof asked !== 'number' || !Number.isFinite(asked) || !(asked > 0)) {
      throw new InputError(
        'options.stepH',
        `The output step must be a finite number of hours above zero (got ${String(asked)}).`,
      );
    }
    return { stepH: asked, bar: null };
  }
  let shortest = Infinity;
  let bar = 0;
  for (let k = 0; k < durationsH.length; k++) {
    const d = durationsH[k] as number;
    if (d < shortest) {
      shortest = d;
      bar = k;
    }
  }
  return { stepH: shortest, bar };
}

/**
 * The direct runoff hydrograph of a catchment: the rainfall excess routed
 * through a unit hydrograph by discrete convolution (Chow, Maidment & Mays
 * 1988, §7.2 and §7.5), q_i = Σ_m E_m·r_(i−m)·A/Δ.
 *
 * What the samples mean: `timesH[i] = i·Δ` is an instant, h from the storm
 * start, and `dischargeM3s[i]` the discharge at that instant when each step's
 * excess falls evenly over the step (the bars' excess gathered onto the step:
 * see `excessOnSteps`); `peakM3s` and `timeOfPeakH` are the highest such
 * sample and its instant. Every transform's response at an instant is the
 * Δ-hour unit hydrograph there, so its ordinates sum to the excess volume, and
 * Σ q_i·Δ equals Σ excess × area (to round-off, 1e-9 relative at worst). The
 * first sample is at the storm start; the last, zero, comes once the recession
 * has returned all the excess; the trapezoidal rule over the samples gives the
 * same volume as the sum.
 *
 * Short storms are convolved directly, long records by FFT (see `convolve`).
 * Throws an InputError naming the field for bad input.
 */
export function runoffHydrograph(
  excess: Excess,
  transform: Transform,
  areaM2: number,
  options: RunoffHydrographOptions = {},
): RunoffHydrograph {
  validateExcess(excess);
  validateTransform(transform);
  validateAreaM2(areaM2);
  const { durationsH, excessMm } = excess;
  const { stepH, bar } = outputStep(durationsH, options ?? {});
  // A step the caller left to the bars is refused as the shortest bar's: the bars are what they can change.
  const refuse = (error: StepTooShort): InputError => (bar === null ? error : error.forShortestBar(bar));
  if (durationsH.length === 0) {
    return { timesH: new Float64Array(1), dischargeM3s: new Float64Array(1), peakM3s: 0, timeOfPeakH: 0, volumeM3: 0 };
  }
  const totalH = totalHours(durationsH);
  const steps = stepsCovering(totalH, stepH);
  if (steps > MAX_HYDROGRAPH_SAMPLES) throw refuse(stormTooLong(totalH, stepH, steps, MAX_HYDROGRAPH_SAMPLES));
  let response: Float64Array;
  try {
    response = unitResponse(transform, stepH);
  } catch (error) {
    throw error instanceof StepTooShort ? refuse(error) : error;
  }
  // One more sample than the convolution: the zero that closes the recession.
  const count = steps + response.length;
  if (count > MAX_HYDROGRAPH_SAMPLES) throw refuse(samplesTooMany(stepH, count, MAX_HYDROGRAPH_SAMPLES));
  if (gridScratch.length < steps) gridScratch = new Float64Array(steps);
  const gridded = excessOnSteps(durationsH, excessMm, stepH, steps, gridScratch);
  // The convolution adds straight into the returned discharge column, then it is scaled in place.
  const dischargeM3s = new Float64Array(count);
  convolve(gridded, response, dischargeM3s);
  const perMm = (areaM2 * M3_PER_MM_M2) / (stepH * S_PER_H); // m³/s from 1 mm per step
  const timesH = new Float64Array(count);
  // No flow before the first step with excess (the convolution is causal): the
  // FFT's round-off there, some 1e-16 of the peak, is cleared, so a dry lead
  // stays exactly dry.
  let firstWet = 0;
  while (firstWet < steps && gridded[firstWet] === 0) firstWet++;
  let peakM3s = 0;
  let peakIndex = 0;
  let sum = 0;
  for (let i = 0; i < count; i++) {
    const v = dischargeM3s[i] as number;
    // The FFT leaves round-off of either sign where the flow is zero.
    const q = v > 0 && i >= firstWet ? v * perMm : 0;
    dischargeM3s[i] = q;
    timesH[i] = i * stepH;
    sum += q;
    if (q > peakM3s) {
      peakM3s = q;
      peakIndex = i;
    }
  }
  return {
    timesH,
    dischargeM3s,
    peakM3s,
    timeOfPeakH: timesH[peakIndex] as number,
    volumeM3: sum * stepH * S_PER_H,
  };
}
