import { validateStorm, validateStormLists, validateStormStart, type Storm } from '../storm';
import { isLossKind, METHODS, methodSpec, validateMethod } from './methods';
import type { BarTotals, LossMethod, LossResult, MethodSpec } from './types';

/** Reusable output buffers, so a drag loop need not allocate every frame. */
export interface LossBuffers {
  lossMm: Float64Array;
  excessMm: Float64Array;
}

/**
 * Applies a loss method to every bar of a storm. Validates both at the edge
 * (throws InputError naming the bar or field, before any result is
 * returned), then runs the method's own compute over plain arrays. Pass
 * `buffers` of at least the storm's length to reuse memory; otherwise fresh
 * arrays are allocated.
 */
export function computeLosses(storm: Storm, method: LossMethod, buffers?: LossBuffers): LossResult {
  // Into fresh arrays only: a refused storm must leave the caller's buffers
  // holding the result they held before.
  const fused = buffers ? undefined : checkedLosses(storm, method);
  if (fused) return fused;
  validateStorm(storm);
  validateMethod(method);
  return computeLossesUnchecked(storm, method, buffers);
}

/**
 * computeLosses in one read of the storm, for a method with a checkedCompute:
 * the bars are checked in the same loop that computes them (validating first
 * cost as much as the constant-rate pass itself). Undefined when the method
 * has no such pass or anything fails a check; computeLosses then validates in
 * validateStorm's order and throws the error that names the first problem,
 * and the arrays written here are dropped unseen.
 */
function checkedLosses(storm: Storm, method: LossMethod): LossResult | undefined {
  const checkedCompute = isLossKind(method?.kind) ? (METHODS[method.kind] as MethodSpec).checkedCompute : undefined;
  if (!checkedCompute) return undefined;
  try {
    validateStormLists(storm);
    validateStormStart(storm);
    validateMethod(method);
  } catch {
    return undefined;
  }
  const n = storm.depthsMm.length;
  const lossMm = new Float64Array(n);
  const excessMm = new Float64Array(n);
  const totals = checkedCompute(storm.durationsH, storm.depthsMm, method as never, lossMm, excessMm);
  return totals ? withTotals(lossMm, excessMm, totals) : undefined;
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
  return totals ? withTotals(lossMm, excessMm, totals) : summarise(storm, lossMm, excessMm);
}

function withTotals(lossMm: Float64Array, excessMm: Float64Array, totals: BarTotals): LossResult {
  const { rainMm, totalExcessMm } = totals;
  return {
    lossMm,
    excessMm,
    rainMm,
    totalLossMm: totals.totalLossMm,
    totalExcessMm,
    runoffFraction: rainMm > 0 ? totalExcessMm / rainMm : 0,
    peakExcessMmH: totals.peakExcessMmH,
  };
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
  return withTotals(lossMm, excessMm, { rainMm: rain, totalLossMm: loss, totalExcessMm: excess, peakExcessMmH: peak });
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
