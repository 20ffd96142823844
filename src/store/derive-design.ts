import {
  computeLossesUnchecked,
  runoffHydrograph,
  type LossMethod,
  type LossResult,
  type RunoffHydrograph,
  type Storm,
  type Transform,
} from '../core';
import { attempt } from '../core';
import { methodProblem, stormProblem } from './checked';
import type { Derived } from './derive';
import { memoLast } from './memo';

/** The design storm's losses, or the core's message when it refuses the storm or the method. */
export type DesignLosses =
  { readonly ok: true; readonly r: LossResult } | { readonly ok: false; readonly message: string };

/** The design storm's peak through the workbench's transform, or the core's message. */
export type DesignPeak =
  | { readonly ok: true; readonly peakM3s: number; readonly timeOfPeakH: number; readonly hydrograph: RunoffHydrograph }
  | { readonly ok: false; readonly message: string };

/**
 * The design storm view's derived values. The storm is the view's own (built
 * from its form, not part of the document), so they are keyed on the objects
 * passed in; one set per store, found by the store's Derived. Apart from
 * derive.ts because only the design storm view (loaded on first use) reads them.
 */
export interface DesignDerived {
  /** The core's losses of the design storm under `method` (each checked once per object). */
  losses(storm: Storm, method: LossMethod): DesignLosses;
  /** The design peak, or null without a transform, a catchment area or losses. */
  peak(storm: Storm, losses: DesignLosses, transform: Transform | null, areaM2: number): DesignPeak | null;
}

const perStore = new WeakMap<Derived, DesignDerived>();

export function designDerived(derived: Derived): DesignDerived {
  let d = perStore.get(derived);
  if (!d) perStore.set(derived, (d = createDesignDerived()));
  return d;
}

function createDesignDerived(): DesignDerived {
  const losses = memoLast((storm: Storm, method: LossMethod): DesignLosses => {
    const problem = stormProblem(storm) ?? methodProblem(method);
    return problem ? { ok: false, message: problem.message } : { ok: true, r: computeLossesUnchecked(storm, method) };
  });
  const peak = memoLast(
    (storm: Storm, l: DesignLosses, transform: Transform | null, areaM2: number): DesignPeak | null => {
      if (!l.ok || transform === null || !(areaM2 > 0)) return null;
      const h = attempt(() =>
        runoffHydrograph({ durationsH: storm.durationsH, excessMm: l.r.excessMm }, transform, areaM2),
      );
      return h.ok
        ? { ok: true, peakM3s: h.value.peakM3s, timeOfPeakH: h.value.timeOfPeakH, hydrograph: h.value }
        : { ok: false, message: h.error.message };
    },
  );
  return { losses, peak };
}
