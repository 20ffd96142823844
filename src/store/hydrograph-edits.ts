import {
  InputError,
  TRANSFORMS,
  computeLosses,
  fitTransform,
  attempt,
  fittableTransformKeys,
  hasOrdinates,
  validateTransform,
  type LossMethod,
  withTransformValue,
  type Transform,
  type TransformFitResult,
  type TransformKind,
  type TransformObjective,
} from '../core';
import type { HydrographSettings, Scenario } from '../scenario/types';
import type { Derived } from './derive';
import { withMethod } from './edits';

/** A transform as the document holds it: plain lists, so it serialises as it is. */
function plain(transform: Transform): Transform {
  return hasOrdinates(transform)
    ? { ...transform, ordinatesM3sPerMm: Array.from(transform.ordinatesM3sPerMm) }
    : transform;
}

/** The parameter the Fit sets: the one chosen, else the kind's `fitFirst` or first fittable one (lag, or Nash's k with n held). */
export function transformFitParameter(settings: HydrographSettings): string | null {
  const t = settings.transform;
  if (t === null) return null;
  const keys = fittableTransformKeys(t.kind);
  if (settings.fitParameter !== null && keys.includes(settings.fitParameter)) return settings.fitParameter;
  return TRANSFORMS[t.kind].fitFirst ?? keys[0] ?? null;
}

function withSettings(s: Scenario, patch: Partial<HydrographSettings>): Scenario {
  return { ...s, hydrograph: { ...s.hydrograph, ...patch } };
}

/** Uses a transform (checked by the core: throws its InputError, changing nothing), remembering it for its kind. */
export function withTransform(s: Scenario, transform: Transform): Scenario {
  validateTransform(transform);
  const t = plain(transform);
  const fitParameter = s.hydrograph.fitParameter;
  return withSettings(s, {
    transform: t,
    transformMemory: { ...s.hydrograph.transformMemory, [t.kind]: t },
    fitParameter: fitParameter !== null && fittableTransformKeys(t.kind).includes(fitParameter) ? fitParameter : null,
  });
}

/** Switches the transform kind (null: no hydrograph), restoring the kind's last parameters or its defaults. */
export function withTransformKind(s: Scenario, kind: TransformKind | null): Scenario {
  if (kind === null) return s.hydrograph.transform === null ? s : withSettings(s, { transform: null });
  if (s.hydrograph.transform?.kind === kind) return s;
  return withTransform(s, s.hydrograph.transformMemory[kind] ?? TRANSFORMS[kind].defaults);
}

/** Sets one numeric parameter of the transform in use (undefined: leave an optional one out). */
export function withTransformParam(s: Scenario, key: string, value: number | undefined): Scenario {
  const t = s.hydrograph.transform;
  if (t === null) throw new InputError('transform', 'Choose a unit hydrograph before setting its parameters.');
  return withTransform(s, withTransformValue(t, key, value));
}

export function withTransformFit(
  s: Scenario,
  patch: { readonly fitParameter?: string | null; readonly objective?: TransformObjective },
): Scenario {
  return withSettings(s, patch);
}

/** The uncertainty of the observed runoff, ± % (0 ≤ u < 100). */
export function withObservedUncertainty(s: Scenario, pct: number): Scenario {
  if (!(Number.isFinite(pct) && pct >= 0 && pct < 100)) {
    throw new InputError(
      'observedUncertaintyPct',
      `The uncertainty of the observed runoff must be a number of per cent from 0 to below 100 (got ${String(pct)}).`,
    );
  }
  return pct === s.observedUncertaintyPct ? s : { ...s, observedUncertaintyPct: pct };
}

/** What "Fit" did: the core's answer, and the scenario to put on screen when there is one. */
export interface TransformFitOutcome {
  readonly result: TransformFitResult | { readonly ok: false; readonly message: string };
  /** The fitted scenario (the loss matched to the observed volume, the transform's parameter fitted), or null. */
  readonly next: Scenario | null;
  /** True when the loss parameter was matched to the observed volume first. */
  readonly lossMatched: boolean;
}

/**
 * Fits the transform's parameter to the observed direct runoff by the chosen
 * objective (fitTransform), keeping the loss matched to the observed volume:
 * when the observed runoff gives the loss fit an answer and it is not in use
 * yet, that fit is applied first, so the volume is matched while the shape
 * is fitted.
 */
export function fitRunoffTransform(s: Scenario, derived: Derived): TransformFitOutcome {
  const transform = s.hydrograph.transform;
  const parameter = transformFitParameter(s.hydrograph);
  const observed = derived.observedDirect(s);
  const none = (message: string): TransformFitOutcome => ({
    result: { ok: false, message },
    next: null,
    lossMatched: false,
  });
  if (transform === null || parameter === null) return none('Choose a unit hydrograph with a parameter to fit.');
  if (observed === null) {
    return none('Bring in a streamflow record and separate its baseflow: the fit needs an observed direct runoff.');
  }
  const lossFit = derived.fit(s);
  const useLossFit = Boolean(lossFit?.ok && !derived.fitInUse(s));
  const method: LossMethod = useLossFit && lossFit?.ok ? lossFit.method : derived.effectiveMethod(s);
  const losses = attempt(() => computeLosses(s.storm, method));
  if (!losses.ok) return none(losses.error.message);
  const result = fitTransform(
    { durationsH: s.storm.durationsH, excessMm: losses.value.excessMm },
    transform,
    parameter,
    s.catchment.areaM2,
    observed,
    s.hydrograph.objective,
  );
  if (!result.ok) return { result, next: null, lossMatched: false };
  const withLoss = useLossFit ? withMethod(s, method) : s;
  return { result, next: withTransform(withLoss, result.transform), lossMatched: useLossFit };
}
