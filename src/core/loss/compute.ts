import { validateStorm, type Storm } from '../storm';
import { methodSpec, validateMethod } from './methods';
import type { LossMethod, LossResult, MethodSpec } from './types';

/** Reusable output buffers, so a drag loop need not allocate every frame. */
export interface LossBuffers {
  lossMm: Float64Array;
  excessMm: Float64Array;
}

/**
 * Applies a loss method to every bar of a storm. Validates both at the edge
 * (throws InputError naming the bar or field), then runs the method's own
 * compute over plain arrays. Pass `buffers` of at least the storm's length to
 * reuse memory; otherwise fresh arrays are allocated.
 */
export function computeLosses(storm: Storm, method: LossMethod, buffers?: LossBuffers): LossResult {
  validateStorm(storm);
  validateMethod(method);
  return computeLossesUnchecked(storm, method, buffers);
}

/**
 * computeLosses without validation, for callers that validated once and
 * evaluate many times (calibration, event sets). Inputs must be clean.
 */
export function computeLossesUnchecked(storm: Storm, method: LossMethod, buffers?: LossBuffers): LossResult {
  const n = storm.depthsMm.length;
  const lossMm = buffers && buffers.lossMm.length >= n ? buffers.lossMm.subarray(0, n) : new Float64Array(n);
  const excessMm = buffers && buffers.excessMm.length >= n ? buffers.excessMm.subarray(0, n) : new Float64Array(n);
  const totals = (methodSpec(method.kind) as MethodSpec).compute(
    storm.durationsH,
    storm.depthsMm,
    method as never,
    lossMm,
    excessMm,
  );
  if (!totals) return summarise(storm, lossMm, excessMm);
  const { rainMm } = totals;
  return { lossMm, excessMm, ...totals, runoffFraction: rainMm > 0 ? totals.totalExcessMm / rainMm : 0 };
}

function summarise(storm: Storm, lossMm: Float64Array, excessMm: Float64Array): LossResult {
  const { depthsMm, durationsH } = storm;
  let rain = 0;
  let loss = 0;
  let excess = 0;
  let peak = 0;
  for (let k = 0; k < lossMm.length; k++) {
    rain += depthsMm[k] as number;
    loss += lossMm[k] as number;
    const e = excessMm[k] as number;
    excess += e;
    // Compare by multiplication; divide only when the peak moves (rarely).
    const dt = durationsH[k] as number;
    if (e > peak * dt) peak = e / dt;
  }
  return {
    lossMm,
    excessMm,
    rainMm: rain,
    totalLossMm: loss,
    totalExcessMm: excess,
    runoffFraction: rain > 0 ? excess / rain : 0,
    peakExcessMmH: peak,
  };
}

let scratch: LossBuffers = { lossMm: new Float64Array(0), excessMm: new Float64Array(0) };

/**
 * Shared work buffers of at least n bars, for callers that need only totals
 * (calibration evaluates the method many times). The contents are
 * overwritten by the next caller: never hand them out.
 */
export function scratchBuffers(n: number): LossBuffers {
  if (scratch.lossMm.length < n) scratch = { lossMm: new Float64Array(n), excessMm: new Float64Array(n) };
  return scratch;
}

/** Total excess only, mm (validated input): the quantity calibration matches. */
export function totalExcessMm(storm: Storm, method: LossMethod): number {
  const fast = (methodSpec(method.kind) as MethodSpec).totalExcess;
  if (fast) return fast(storm.durationsH, storm.depthsMm, method as never);
  return computeLossesUnchecked(storm, method, scratchBuffers(storm.depthsMm.length)).totalExcessMm;
}
