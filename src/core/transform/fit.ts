import { findPeakIndex } from '../baseflow/peak';
import { solveMonotone } from '../calibrate/monotone';
import { InputError, attempt } from '../errors';
import type { Hydrograph } from '../baseflow/types';
import { brentMinimize } from './brent-min';
import { checkSeries, compareClean, nashSutcliffe, type HydrographComparison } from './compare';
import { runoffHydrograph } from './hydrograph';
import { TRANSFORMS, TRANSFORM_OBJECTIVES, type TransformObjective, type TransformParam } from './transforms';
import type { Excess, RunoffHydrograph, Transform } from './types';

/**
 * What a transform parameter is fitted to: the observed peak discharge, the
 * observed time of peak, or the best Nash–Sutcliffe efficiency over the
 * observed direct runoff.
 */

/** Observed direct runoff (after baseflow separation), times in h from the storm start. */
export interface ObservedDirectRunoff {
  readonly timesH: ArrayLike<number>;
  readonly directM3s: ArrayLike<number>;
}

export interface TransformFitOptions {
  /** Output step of the computed hydrograph, h; default the storm's shortest bar. */
  readonly stepH?: number;
  /** Search range of the parameter; default the table's, its top capped by the record (see fitTransform). */
  readonly minValue?: number;
  readonly maxValue?: number;
}

export type TransformFitFailure =
  'invalid-input' | 'unknown-parameter' | 'invalid-target' | 'bound-reached' | 'no-exact-match';

export type TransformFitResult =
  | {
      readonly ok: true;
      /** The fitted parameter value. */
      readonly value: number;
      /** The transform with the fitted value set. */
      readonly transform: Transform;
      readonly objective: TransformObjective;
      /** The objective's value at the fit: peak m³/s, time of peak h, or the efficiency. */
      readonly achieved: number;
      /** The hydrograph of the fitted transform… */
      readonly hydrograph: RunoffHydrograph;
      /** …and how it compares with the observed one. */
      readonly comparison: HydrographComparison;
    }
  | {
      readonly ok: false;
      readonly reason: TransformFitFailure;
      /** One plain sentence for the user. */
      readonly message: string;
      /** For 'bound-reached' and 'no-exact-match': the value that comes closest… */
      readonly bound?: 'min' | 'max';
      readonly boundValue?: number;
      /** …and the objective's value there. */
      readonly boundAchieved?: number;
    };

/**
 * Tolerance of the efficiency's maximum, in the parameter's logarithm (so
 * 1e-7 relative): near a maximum the efficiency changes by the square of the
 * step, so finer is not meaningful (see brentMinimize). Roots are solved by
 * solveMonotone to 1e-12 of the bracket, which is 1e-11 relative here.
 */
const MAX_TOL = 1e-7;
/** Points of the coarse scan that finds the efficiency's best bracket. */
const SCAN_POINTS = 41;

const fmt = (x: number): string => (Number.isInteger(x) ? String(x) : x.toPrecision(4).replace(/\.?0+$/, ''));

/**
 * Time of the hydrograph's peak between samples: the vertex of the parabola
 * through the highest sample and its two neighbours (within half a step of
 * that sample). The time-of-peak fit uses it so that the time moves smoothly
 * with the parameter; `timeOfPeakH` is the nearest sample to it.
 */
export function peakTimeBetweenSamples(hydrograph: RunoffHydrograph): number {
  const { timesH: t, dischargeM3s: q } = hydrograph;
  const i = findPeakIndex(q);
  if (i === 0 || i === q.length - 1) return t[i] as number;
  const before = q[i - 1] as number;
  const at = q[i] as number;
  const after = q[i + 1] as number;
  const curvature = before - 2 * at + after;
  if (!(curvature < 0)) return t[i] as number;
  const stepH = (t[i + 1] as number) - (t[i] as number);
  return (t[i] as number) + (0.5 * (before - after) * stepH) / curvature;
}

function checkOptions(options: TransformFitOptions, param: TransformParam): void {
  for (const key of ['minValue', 'maxValue'] as const) {
    const v = options[key];
    if (v === undefined) continue;
    const tooLow = param.minExclusive ? v <= param.min : v < param.min;
    if (typeof v !== 'number' || !Number.isFinite(v) || tooLow || v > param.max) {
      throw new InputError(
        `options.${key}`,
        `The search range of ${param.label.toLowerCase()} must lie within its bounds (${param.min} to ${param.max}; got ${String(v)}).`,
      );
    }
  }
  if (options.minValue !== undefined && options.maxValue !== undefined && !(options.minValue < options.maxValue)) {
    throw new InputError('options.maxValue', 'The top of the search range must be above its bottom.');
  }
}

/**
 * Fits one parameter of a transform (lag of the NRCS hydrographs; k, or n,
 * of the Nash cascade, the other held fixed) so that the direct runoff
 * hydrograph of a fixed excess matches an observed one. The excess, and so
 * the volume, does not change: the loss stays matched to the observed volume
 * while the shape is fitted.
 *
 * - 'peak': the computed peak equals the observed peak (the highest observed
 *   sample). Brent's root method (Brent 1973) on the parameter's logarithm,
 *   to 1e-9 relative.
 * - 'time-of-peak': the computed time of peak (between samples, see
 *   `peakTimeBetweenSamples`) equals the observed one. Same solver; when the
 *   computed peak jumps past the observed time (it moves from one burst to
 *   another), no value matches and the answer says so.
 * - 'nse': the highest Nash–Sutcliffe efficiency of the direct runoff at the
 *   observed samples. A scan of 41 values evenly spaced in logarithm across the
 *   range picks the best bracket, then Brent's minimiser (Brent 1973, ch. 5)
 *   refines it to 1e-7 relative. The best value at an end of the range is
 *   reported as out of reach.
 *
 * Range: the parameter's search range in TRANSFORMS, or the one given; by
 * default a time parameter (lag, k) is searched no further than twice the
 * longer of the storm and the observed record (at least 1 h): beyond that
 * the computed runoff falls outside what was observed.
 *
 * Never throws: bad input comes back as `ok: false` with a message, like
 * `calibrate`.
 */
export function fitTransform(
  excess: Excess,
  transform: Transform,
  parameter: string,
  areaM2: number,
  observed: ObservedDirectRunoff,
  objective: TransformObjective,
  options: TransformFitOptions = {},
): TransformFitResult {
  const observedHydrograph = { timesH: observed?.timesH, dischargeM3s: observed?.directM3s } as Hydrograph;
  const stepOption = options?.stepH === undefined ? {} : { stepH: options.stepH };
  const checked = attempt(() => {
    // One full computation validates the excess, transform, area and step.
    runoffHydrograph(excess, transform, areaM2, stepOption);
    if (excess.durationsH.length === 0) throw new InputError('durationsH', 'The excess has no bars to route.');
    checkSeries(observedHydrograph, 'observed', 'directM3s');
    if (!TRANSFORM_OBJECTIVES.includes(objective)) {
      throw new InputError('objective', `Unknown objective "${String(objective)}"; use peak, time-of-peak or nse.`);
    }
    const found = (TRANSFORMS[transform.kind].params as readonly TransformParam[]).find((p) => p.key === parameter);
    if (found?.fit) checkOptions(options ?? {}, found);
    return found;
  });
  if (!checked.ok) return { ok: false, reason: 'invalid-input', message: checked.error.message };
  const param = checked.value;
  const spec = TRANSFORMS[transform.kind];
  if (!param?.fit) {
    const fittable = (spec.params as readonly TransformParam[]).filter((p) => p.fit).map((p) => p.key);
    return {
      ok: false,
      reason: 'unknown-parameter',
      message:
        fittable.length === 0
          ? 'A unit hydrograph given by its ordinates has no parameter to fit; it is used as given.'
          : `${spec.label} has no parameter "${parameter}" to fit; it has ${fittable.join(', ')}.`,
    };
  }
  // A value in the range that the transform cannot take at this step (a
  // response too long for it) is bad input too.
  const solved = attempt(() =>
    solveFit(excess, transform, param, areaM2, observedHydrograph, objective, options ?? {}, stepOption),
  );
  return solved.ok ? solved.value : { ok: false, reason: 'invalid-input', message: solved.error.message };
}

/** The fit itself, on validated input (see fitTransform). */
function solveFit(
  excess: Excess,
  transform: Transform,
  param: TransformParam,
  areaM2: number,
  obs: Hydrograph,
  objective: TransformObjective,
  options: TransformFitOptions,
  stepOption: { stepH?: number },
): TransformFitResult {
  const fitRange = param.fit as NonNullable<TransformParam['fit']>;
  const observedPeak = obs.dischargeM3s[findPeakIndex(obs.dischargeM3s)] as number;
  if (!(observedPeak > 0)) {
    return {
      ok: false,
      reason: 'invalid-target',
      message: 'The observed direct runoff never rises above zero; there is no hydrograph to fit.',
    };
  }

  let lo = options.minValue ?? fitRange.searchMin;
  let hi = options.maxValue;
  if (hi === undefined) {
    hi = fitRange.searchMax;
    if (param.unit === 'h') {
      let stormH = 0;
      for (let k = 0; k < excess.durationsH.length; k++) stormH += excess.durationsH[k] as number;
      const recordEndH = obs.timesH[obs.timesH.length - 1] as number;
      hi = Math.min(hi, 2 * Math.max(stormH, recordEndH, 1));
    }
    if (!(hi > lo)) hi = Math.min(param.max, lo * 10);
  }
  lo = Math.log(lo);
  hi = Math.log(hi);

  const withValue = (value: number): Transform => ({ ...transform, [param.key]: value }) as Transform;
  const hydrographAt = (y: number): RunoffHydrograph =>
    runoffHydrograph(excess, withValue(Math.exp(y)), areaM2, stepOption);
  const unitText = param.unit === 'h' ? ' h' : '';
  const label = param.label.toLowerCase();
  const succeed = (y: number, hydrograph: RunoffHydrograph, achieved: number): TransformFitResult => {
    const comparison = compareClean(asSeries(hydrograph), obs);
    const value = Math.exp(y);
    return { ok: true, value, transform: withValue(value), objective, achieved, hydrograph, comparison };
  };

  if (objective === 'nse') {
    const efficiency = (y: number): number => nashSutcliffe(asSeries(hydrographAt(y)), obs) ?? -Infinity;
    let bestK = 0;
    let best = -Infinity;
    const ys: number[] = [];
    for (let k = 0; k < SCAN_POINTS; k++) {
      const y = lo + ((hi - lo) * k) / (SCAN_POINTS - 1);
      ys.push(y);
      const e = efficiency(y);
      if (e > best) {
        best = e;
        bestK = k;
      }
    }
    if (best === -Infinity) {
      return {
        ok: false,
        reason: 'invalid-target',
        message: 'The observed direct runoff is the same at every sample; the efficiency needs it to vary.',
      };
    }
    const a = ys[Math.max(0, bestK - 1)] as number;
    const b = ys[Math.min(SCAN_POINTS - 1, bestK + 1)] as number;
    const { x: y, fx } = brentMinimize((t) => -efficiency(t), a, b, { relTol: 0, absTol: MAX_TOL });
    const yBest = -fx >= best ? y : (ys[bestK] as number);
    const nse = Math.max(-fx, best);
    const edge = 4 * MAX_TOL;
    if (yBest - lo <= edge || hi - yBest <= edge) {
      const side = yBest - lo <= edge ? 'min' : 'max';
      const value = Math.exp(side === 'min' ? lo : hi);
      return {
        ok: false,
        reason: 'bound-reached',
        bound: side,
        boundValue: value,
        boundAchieved: nse,
        message:
          `The efficiency keeps rising toward the ${side === 'min' ? 'smallest' : 'largest'} ${label} searched ` +
          `(${fmt(value)}${unitText}, efficiency ${nse.toFixed(3)}); widen the search range or check the record.`,
      };
    }
    return succeed(yBest, hydrographAt(yBest), nse);
  }

  const target = objective === 'peak' ? observedPeak : (obs.timesH[findPeakIndex(obs.dischargeM3s)] as number);
  const measureOf = (h: RunoffHydrograph): number => (objective === 'peak' ? h.peakM3s : peakTimeBetweenSamples(h));
  const what = objective === 'peak' ? 'a peak of' : 'the peak at';
  const show = (v: number): string => (objective === 'peak' ? `${fmt(v)} m³/s` : `${fmt(v)} h`);
  const solved = solveMonotone((y) => measureOf(hydrographAt(y)), lo, hi, target);
  if (!solved.ok) {
    const value = Math.exp(solved.x);
    const end = solved.side === 'min' ? 'smallest' : 'largest';
    return {
      ok: false,
      reason: 'bound-reached',
      bound: solved.side,
      boundValue: value,
      boundAchieved: solved.g,
      message:
        `No ${label} from ${fmt(Math.exp(lo))} to ${fmt(Math.exp(hi))}${unitText} gives ${what} ${show(target)}: ` +
        `the ${end} ${label} (${fmt(value)}${unitText}) gives ${what} ${show(solved.g)}.`,
    };
  }
  const y = solved.x;
  const hydrograph = hydrographAt(y);
  const achieved = measureOf(hydrograph);
  // Tolerance on the match: the solver's own for the peak; a tenth of a step
  // for the time of peak (the between-samples time jumps a little when the
  // highest sample moves to its neighbour).
  const tol = objective === 'peak' ? 1e-6 * target : 0.1 * hydrographStep(hydrograph);
  if (Math.abs(achieved - target) > tol) {
    const value = Math.exp(y);
    return {
      ok: false,
      reason: 'no-exact-match',
      boundValue: value,
      boundAchieved: achieved,
      message:
        `No ${label} gives ${what} ${show(target)}: at ${fmt(value)}${unitText} the computed peak jumps from one ` +
        `burst of the storm to another, over it (it comes no closer than ${show(achieved)}).`,
    };
  }
  return succeed(y, hydrograph, achieved);
}

function asSeries(h: RunoffHydrograph): Hydrograph {
  return { timesH: h.timesH, dischargeM3s: h.dischargeM3s };
}

function hydrographStep(h: RunoffHydrograph): number {
  return h.timesH.length > 1 ? (h.timesH[1] as number) - (h.timesH[0] as number) : 0;
}
