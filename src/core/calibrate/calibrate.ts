import { attempt } from '../errors';
import { totalExcessMm } from '../loss/compute';
import { describeRange, methodSpec, numericParam, validateMethod } from '../loss/methods';
import type { LossMethod, NumericParam } from '../loss/types';
import { totalDepthMm, validateStormDepthMm, validateStormLists, validateStormStart, type Storm } from '../storm';
import { CHECKED_EXACT_CALIBRATORS, EXACT_CALIBRATORS } from './exact';
import { PARAMETER_REL_TOL, solveMonotone } from './monotone';
import { SCAN_POINTS, solveByScan } from './scan';

export type CalibrationFailure =
  'invalid-input' | 'unknown-parameter' | 'invalid-target' | 'negative-target' | 'exceeds-rainfall' | 'bound-reached';

export type CalibrationResult =
  | {
      readonly ok: true;
      /** The fitted parameter value. */
      readonly value: number;
      /** The method with the fitted value set. */
      readonly method: LossMethod;
      /** The excess the fitted method gives, mm (equals the target to solver tolerance). */
      readonly excessMm: number;
    }
  | {
      readonly ok: false;
      readonly reason: CalibrationFailure;
      /** One plain sentence for the user. */
      readonly message: string;
      /** For 'bound-reached': which end of the parameter range comes closest… */
      readonly bound?: 'min' | 'max';
      /** …its value… */
      readonly boundValue?: number;
      /** …and the excess it gives, mm. */
      readonly boundExcessMm?: number;
    };

const fmt = (x: number): string => (Number.isInteger(x) ? String(x) : x.toPrecision(4).replace(/\.?0+$/, ''));
const unitText = (param: NumericParam): string => (param.unit === '-' ? '' : ` ${param.unit}`);
// Only the first letter: symbols in labels (K, CN, Δθ) keep their case.
const lowerFirst = (label: string): string => label.charAt(0).toLowerCase() + label.slice(1);

/**
 * Finds the value of one parameter of a loss method (the others held fixed)
 * that makes the storm's total rainfall excess equal `targetExcessMm`.
 * φ-index and runoff coefficient are solved exactly; every other parameter by
 * Brent's method inside its physical bounds, to 1e-9 relative. Never throws:
 * bad input comes back as `ok: false` with a message.
 */
export function calibrate(
  storm: Storm,
  method: LossMethod,
  parameter: string,
  targetExcessMm: number,
): CalibrationResult {
  const fused = checkedExactFit(storm, method, parameter, targetExcessMm);
  if (fused) return fused;
  const checked = attempt(() => {
    const rainMm = validateStormDepthMm(storm);
    validateMethod(method);
    return rainMm;
  });
  if (!checked.ok) return { ok: false, reason: 'invalid-input', message: checked.error.message };
  return calibrateUnchecked(storm, method, parameter, targetExcessMm, checked.value);
}

/**
 * calibrate in one read of the storm, for a fit with a checked exact
 * calibrator (the constant rate: the exact φ's bracket pass checks each bar
 * as it reads it and sums the rain), so the storm is not validated first
 * (issue 12: a second read of 10⁶ bars). Undefined when the fit has no such
 * calibrator, when anything fails a
 * check, or when the target exceeds the rain: calibrate then takes its
 * ordinary road, which validates in validateStorm's order and words the
 * refusal. The answer is the one calibrateUnchecked gives (exactPhi on the
 * same bars and target; the target is clamped to the rain in the same way).
 */
function checkedExactFit(
  storm: Storm,
  method: LossMethod,
  parameter: string,
  targetExcessMm: number,
): CalibrationResult | undefined {
  const solve = CHECKED_EXACT_CALIBRATORS[`${method?.kind}.${parameter}`];
  if (!solve) return undefined;
  if (!(typeof targetExcessMm === 'number' && targetExcessMm >= 0 && targetExcessMm < Infinity)) return undefined;
  const checked = attempt(() => {
    validateStormLists(storm);
    validateStormStart(storm);
    validateMethod(method);
  });
  if (!checked.ok) return undefined;
  const solved = solve(storm, method, targetExcessMm);
  if (!solved) return undefined;
  const rainMm = solved.rainMm;
  if (targetExcessMm > rainMm + rainSlackMm(rainMm)) return undefined;
  const fitted = { ...method, [parameter]: solved.value } as LossMethod;
  return { ok: true, value: solved.value, method: fitted, excessMm: totalExcessMm(storm, fitted) };
}

/** Rounding allowed when a target was itself summed from the bars. */
const rainSlackMm = (rainMm: number): number => 1e-12 * Math.max(rainMm, 1);

/**
 * calibrate without checking the storm and the method, for callers that
 * checked them once and fit again as other inputs change (the store, whose
 * documents are checked as they enter it). `rainMm` is the storm's total
 * depth when the caller has it. The target and the parameter are still
 * checked: they come with each call.
 */
export function calibrateUnchecked(
  storm: Storm,
  method: LossMethod,
  parameter: string,
  targetExcessMm: number,
  rainMm: number = totalDepthMm(storm),
): CalibrationResult {
  const spec = methodSpec(method.kind);
  const param = numericParam(method.kind, parameter);
  if (!param) {
    const known = spec.params.map((p) => p.key).join(', ');
    return {
      ok: false,
      reason: 'unknown-parameter',
      message: `${spec.label} has no parameter "${parameter}" to fit; it has ${known}.`,
    };
  }
  if (typeof targetExcessMm !== 'number' || !Number.isFinite(targetExcessMm)) {
    return {
      ok: false,
      reason: 'invalid-target',
      message: 'The observed runoff must be a finite number of millimetres.',
    };
  }
  if (targetExcessMm < 0) {
    return { ok: false, reason: 'negative-target', message: 'The observed runoff cannot be negative.' };
  }
  if (targetExcessMm > rainMm + rainSlackMm(rainMm)) {
    return {
      ok: false,
      reason: 'exceeds-rainfall',
      message: `The observed runoff (${fmt(targetExcessMm)} mm) is more than the storm's rainfall (${fmt(rainMm)} mm); no loss can produce it.`,
    };
  }
  const target = Math.min(targetExcessMm, rainMm);
  const withValue = (value: number): LossMethod => ({ ...method, [param.key]: value }) as LossMethod;
  const excessWith = (value: number): number => totalExcessMm(storm, withValue(value));

  const exact = EXACT_CALIBRATORS[`${method.kind}.${param.key}`];
  if (exact) {
    const value = exact(storm, method, target, rainMm);
    const fitted = withValue(value);
    return { ok: true, value, method: fitted, excessMm: totalExcessMm(storm, fitted) };
  }

  const ownLo = param.minExclusive ? param.min + Math.max(Math.abs(param.min) * 1e-9, 1e-9) : param.min;
  // Some lower ends depend on the other parameters (Horton: f₀ ≥ f_c).
  const lo = param.searchMin ? Math.max(ownLo, param.searchMin(storm, method as never)) : ownLo;
  let hi = Number.isFinite(param.max) ? param.max : (param.searchMax?.(storm, method as never) ?? lo + 1);
  if (!(hi > lo)) hi = lo;
  const monotone = param.monotone !== false;
  const solved = monotone ? solveMonotone(excessWith, lo, hi, target) : solveByScan(excessWith, lo, hi, target);
  if (!solved.ok && !monotone) {
    return {
      ok: false,
      reason: 'bound-reached',
      bound: solved.side,
      boundValue: solved.x,
      boundExcessMm: solved.g,
      message:
        `No ${lowerFirst(param.label)} ${describeRange(param)}${unitText(param)} was found to give ${fmt(target)} mm of runoff ` +
        `(runoff need not rise or fall steadily with it; of ${SCAN_POINTS + 1} values tried across the range, ` +
        `${fmt(solved.x)}${unitText(param)} came closest with ${fmt(solved.g)} mm).`,
    };
  }
  if (!solved.ok) {
    const bound = solved.side === 'min' ? 'lowest' : 'highest';
    return {
      ok: false,
      reason: 'bound-reached',
      bound: solved.side,
      boundValue: solved.x,
      boundExcessMm: solved.g,
      message:
        `No ${lowerFirst(param.label)} ${describeRange(param)}${unitText(param)} gives ${fmt(target)} mm of runoff: ` +
        `the ${bound} value (${fmt(solved.x)}${unitText(param)}) gives ${fmt(solved.g)} mm.`,
    };
  }
  const value = refineSmallRoot(excessWith, lo, hi, target, solved.x);
  const fitted = withValue(value);
  return { ok: true, value, method: fitted, excessMm: totalExcessMm(storm, fitted) };
}

/**
 * solveMonotone's tolerance is a fraction of the bracket. When the answer lies
 * far below the top of a wide bracket (a decay constant of 0.05 1/h searched up
 * to 1000 1/h), that fraction is too coarse relative to the answer itself, so
 * solve once more in a bracket a few tolerances wide around it: the answer is
 * then good to 1e-9 of its own size.
 */
function refineSmallRoot(g: (x: number) => number, lo: number, hi: number, target: number, x: number): number {
  const tol = PARAMETER_REL_TOL * 1e-3 * Math.max(Math.abs(lo), Math.abs(hi));
  if (tol <= PARAMETER_REL_TOL * Math.abs(x)) return x;
  const again = solveMonotone(g, Math.max(lo, x - 4 * tol), Math.min(hi, x + 4 * tol), target);
  return again.ok ? again.x : x;
}
