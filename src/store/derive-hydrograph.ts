import {
  calibrationInterval,
  compareHydrographs,
  dischargeAtH,
  attempt,
  hasOrdinates,
  runoffCurve,
  runoffHydrograph,
  unitHydrographVolumeMm,
  unitResponse,
  type CalibrationInterval,
  type HydrographComparison,
  type LossMethod,
  type ObservedDirectRunoff,
  type RunoffCurve,
  type RunoffHydrograph,
  type Storm,
  type Transform,
} from '../core';
import type { Scenario } from '../scenario/types';
import { heldKey } from './held-key';
import { memoLast } from './memo';

/** The computed direct runoff hydrograph, or why there is none (the core's message). */
export type ComputedHydrograph =
  | { readonly ok: true; readonly hydrograph: RunoffHydrograph; readonly transform: Transform }
  | { readonly ok: false; readonly message: string; readonly field: string };

/** A series on the storm's time axis (h from the storm start). */
export interface TimeSeries {
  readonly timesH: Float64Array;
  readonly dischargeM3s: Float64Array;
}

/** A value of the core, or the core's message when it refuses the input. */
export type Outcome<T> = { readonly ok: true; readonly value: T } | { readonly ok: false; readonly message: string };

/** The parts of the derived results the hydrograph needs from the loss side. */
export interface LossSide {
  readonly excessMm: (s: Scenario) => Float64Array | null;
  readonly observedDirect: (s: Scenario) => ObservedDirectRunoff | null;
  readonly baseflowOnStormAxis: (s: Scenario) => TimeSeries | null;
  readonly targetMm: (s: Scenario) => number | null;
}

export interface HydrographDerived {
  /** The computed direct runoff hydrograph (null when no transform is chosen). */
  hydrograph(s: Scenario): ComputedHydrograph | null;
  /** Computed total flow: the computed direct runoff plus the separated baseflow, at the record's samples. */
  totalFlow(s: Scenario): TimeSeries | null;
  /** The computed hydrograph against the observed direct runoff (null without both). */
  comparison(s: Scenario): HydrographComparison | null;
  /** End of the stretch the computed hydrograph needs on the time axis, h from the storm start (null: none). */
  hydrographEndH(s: Scenario): number | null;
  /** Depth a pasted unit hydrograph holds over the catchment, mm (null for other kinds or without an area). */
  unitHydrographDepthMm(s: Scenario): number | null;
  /** The loss fit at the observed runoff and at its ± uncertainty (null without an uncertainty or a target). */
  lossInterval(s: Scenario): Outcome<CalibrationInterval> | null;
  /** Runoff depth against the parameter being fitted, across its range (null without a parameter to fit). */
  lossCurve(s: Scenario): Outcome<RunoffCurve> | null;
}

/** The value of `work` as an Outcome, or the core's refusal (any other error is thrown on). */
function outcome<T>(work: () => T): Outcome<T> {
  const r = attempt(work);
  if (r.ok) return r;
  const refused = { ok: false as const, message: r.error.message, field: r.error.field };
  return refused;
}

/** Share of the unit response's volume the time axis shows after the storm (the rest is a long, low tail). */
const AXIS_VOLUME_SHARE = 0.999;

/**
 * Memoised selectors for the runoff hydrograph (scenario version 5), keyed on
 * the identity of their inputs as the others in derive.ts are. Dragging the
 * loss line gives a new excess each frame, so the hydrograph follows it live;
 * its time span depends on the storm and the transform only, so the charts'
 * axis stays put during a drag.
 */
export function createHydrographDerived(loss: LossSide): HydrographDerived {
  const hydrograph = memoLast(
    (
      durationsH: Storm['durationsH'],
      excessMm: Float64Array | null,
      transform: Transform | null,
      areaM2: number,
    ): ComputedHydrograph | null => {
      if (transform === null) return null;
      if (excessMm === null) {
        return { ok: false, message: 'The losses cannot be computed, so there is no excess to route.', field: 'storm' };
      }
      if (!(areaM2 > 0)) {
        return {
          ok: false,
          message: 'Enter the catchment area to turn the rainfall excess into discharge.',
          field: 'areaM2',
        };
      }
      const r = attempt(() => runoffHydrograph({ durationsH, excessMm }, transform, areaM2));
      return r.ok
        ? { ok: true, hydrograph: r.value, transform }
        : { ok: false, message: r.error.message, field: r.error.field };
    },
  );
  const hydrographOf = (s: Scenario): ComputedHydrograph | null =>
    hydrograph(s.storm.durationsH, loss.excessMm(s), s.hydrograph.transform, s.catchment.areaM2);

  const totalFlow = memoLast((computed: ComputedHydrograph | null, base: TimeSeries | null): TimeSeries | null => {
    if (!computed?.ok || base === null) return null;
    const { timesH, dischargeM3s } = computed.hydrograph;
    const first = timesH[0] as number;
    const last = timesH[timesH.length - 1] as number;
    const out = new Float64Array(base.timesH.length);
    for (let i = 0; i < out.length; i++) {
      const t = base.timesH[i] as number;
      // The computed direct runoff is zero before the storm and after its recession.
      const direct = t < first || t > last ? 0 : dischargeAtH(timesH, dischargeM3s, t);
      out[i] = (base.dischargeM3s[i] as number) + direct;
    }
    return { timesH: base.timesH, dischargeM3s: out };
  });

  const comparison = memoLast(
    (computed: ComputedHydrograph | null, observed: ObservedDirectRunoff | null): HydrographComparison | null => {
      if (!computed?.ok || observed === null) return null;
      const r = attempt(() =>
        compareHydrographs(computed.hydrograph, { timesH: observed.timesH, dischargeM3s: observed.directM3s }),
      );
      return r.ok ? r.value : null;
    },
  );

  const endH = memoLast((durationsH: Storm['durationsH'], transform: Transform | null): number | null => {
    if (transform === null || durationsH.length === 0) return null;
    let stormH = 0;
    let stepH = Infinity;
    for (let k = 0; k < durationsH.length; k++) {
      const d = durationsH[k] as number;
      stormH += d;
      stepH = Math.min(stepH, d);
    }
    const response = attempt(() => unitResponse(transform, stepH));
    if (!response.ok) return null;
    const r = response.value;
    let sum = 0;
    let j = 0;
    while (j < r.length && sum < AXIS_VOLUME_SHARE) sum += r[j++] as number;
    return stormH + j * stepH;
  });

  const uhDepth = memoLast((transform: Transform | null, areaM2: number): number | null => {
    if (transform === null || !hasOrdinates(transform) || !(areaM2 > 0)) return null;
    const r = attempt(() => unitHydrographVolumeMm(transform, areaM2));
    return r.ok ? r.value : null;
  });

  // Both hold every parameter but the one fitted, whose value they never read: keyed on the
  // others (`heldKey`) rather than on the method object, so dragging the loss line does not
  // compute them again each frame. `method` is read only when the key changed.
  let method: LossMethod | null = null;
  const interval = memoLast(
    (
      storm: Storm,
      _held: string,
      parameter: string | null,
      targetMm: number | null,
      pct: number,
    ): Outcome<CalibrationInterval> | null => {
      if (method === null || parameter === null || targetMm === null || !(pct > 0)) return null;
      return outcome(() => calibrationInterval(storm, method as LossMethod, parameter, targetMm, pct));
    },
  );

  const curve = memoLast((storm: Storm, _held: string, parameter: string | null): Outcome<RunoffCurve> | null => {
    if (method === null || parameter === null) return null;
    return outcome(() => runoffCurve(storm, method as LossMethod, parameter, { points: 64 }));
  });

  return {
    hydrograph: hydrographOf,
    totalFlow: (s) => totalFlow(hydrographOf(s), loss.baseflowOnStormAxis(s)),
    comparison: (s) => comparison(hydrographOf(s), loss.observedDirect(s)),
    hydrographEndH: (s) => endH(s.storm.durationsH, s.hydrograph.transform),
    unitHydrographDepthMm: (s) => uhDepth(s.hydrograph.transform, s.catchment.areaM2),
    // The stored method: the curve and the interval are about the parameter being fitted, not its fitted value.
    lossInterval: (s) => {
      const parameter = s.observed?.parameter ?? null;
      method = s.method;
      return interval(s.storm, heldKey(s.method, parameter), parameter, loss.targetMm(s), s.observedUncertaintyPct);
    },
    lossCurve: (s) => {
      const parameter = s.observed?.parameter ?? null;
      method = s.method;
      return curve(s.storm, heldKey(s.method, parameter), parameter);
    },
  };
}
