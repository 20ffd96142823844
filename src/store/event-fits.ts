import {
  applyDesignValue,
  attempt,
  calibrateUnchecked,
  depthFromVolumeMm,
  totalDepthMm,
  type InputError,
  methodSpec,
  pickDesignValue,
  separateBaseflow,
  summariseFits,
  type CatchmentEvent,
  type EventFit,
  type EventRunoff,
  type FitSummary,
  type LossMethod,
} from '../core';
import type { Scenario, SetEvent } from '../scenario/types';
import { methodProblem, stormProblem } from './checked';

/** An event's observed runoff as a depth to match, or why there is none. */
export type EventTarget = { readonly ok: true; readonly mm: number } | { readonly ok: false; readonly message: string };

/**
 * The depth an event's runoff is matched to: the typed depth, the typed
 * volume over the catchment, or the direct-runoff depth of its own record's
 * baseflow separation, as the workbench does for the event on it. All
 * arithmetic is the core's.
 */
function eventTarget(event: SetEvent, areaM2: number): EventTarget {
  if (event.observed === null) return { ok: false, message: 'No observed runoff is entered for this event.' };
  const flow = event.streamflow;
  if (flow?.useAsObserved) {
    const sep = attempt(() =>
      separateBaseflow({ timesH: flow.timesH, dischargeM3s: flow.dischargeM3s }, flow.baseflow, { areaM2 }),
    );
    if (!sep.ok) return { ok: false, message: `The streamflow record cannot be separated: ${sep.error.message}` };
    if (sep.value.directDepthMm === undefined) {
      return { ok: false, message: 'Enter the catchment area to turn the separated direct runoff into a depth.' };
    }
    return { ok: true, mm: sep.value.directDepthMm };
  }
  if (event.observed.as === 'depth') return { ok: true, mm: event.observed.value };
  if (!(areaM2 > 0))
    return { ok: false, message: 'Enter the catchment area to turn the observed volume into a depth.' };
  return { ok: true, mm: depthFromVolumeMm(event.observed.value, areaM2) };
}

/** The parameter fitted for every event: the set's choice, else the workbench's, else the method's first. */
export function fittedParameter(s: Scenario): string {
  const keys: string[] = methodSpec(s.method.kind).params.map((p) => String(p.key));
  const chosen = s.eventSet.parameter;
  if (chosen !== null && keys.includes(chosen)) return chosen;
  const bench = s.observed?.parameter;
  if (bench !== undefined && keys.includes(bench)) return bench;
  return keys[0] ?? '';
}

/** One row of the fit table: an event with its fit, or the reason it has no target to fit. */
export type FitRow =
  | { readonly event: SetEvent; readonly kind: 'fit'; readonly fit: EventFit }
  | { readonly event: SetEvent; readonly kind: 'no-target'; readonly message: string };

export interface EventFits {
  readonly method: LossMethod;
  readonly parameter: string;
  readonly rows: readonly FitRow[];
  /** Over the events with a target (those without one are counted in `withoutTarget`). */
  readonly summary: FitSummary;
  readonly withoutTarget: number;
  /** The events with a target, as the core's CatchmentEvent. */
  readonly calibratable: readonly CatchmentEvent[];
}

/**
 * Fits the parameter for every event and summarises the fitted values (core
 * `summariseFits`). Row for row what the core's `fitEvents` gives, but each
 * storm and the method are checked once per object (checked.ts), not again at
 * every fit, and each event's target is worked out once per event and area.
 */
export function fitAllEvents(s: Scenario, method: LossMethod): EventFits {
  const parameter = fittedParameter(s);
  const calibratable: CatchmentEvent[] = [];
  const missing = new Map<string, string>();
  for (const event of s.eventSet.events) {
    const target = targetOf(event, s.catchment.areaM2);
    if (target.ok)
      calibratable.push({ id: event.id, name: event.name, storm: event.storm, observedExcessMm: target.mm });
    else missing.set(event.id, target.message);
  }
  const methodBad = methodProblem(method);
  const fits = calibratable.map((event) => fitOne(event, method, methodBad, parameter));
  const byId = new Map(fits.map((f) => [f.id, f]));
  const rows = s.eventSet.events.map((event): FitRow => {
    const fit = byId.get(event.id);
    return fit ? { event, kind: 'fit', fit } : { event, kind: 'no-target', message: missing.get(event.id) ?? '' };
  });
  return { method, parameter, rows, summary: summariseFits(fits), withoutTarget: missing.size, calibratable };
}

/** One event's row as `fitEvents` makes it: calibrate's answer, or its refusal of the storm or the method. */
function fitOne(event: CatchmentEvent, method: LossMethod, methodBad: InputError | null, parameter: string): EventFit {
  const stormBad = stormProblem(event.storm);
  const rainMm = stormBad ? null : totalDepthMm(event.storm);
  const observedMm = event.observedExcessMm;
  const problem = stormBad ?? methodBad;
  return {
    id: event.id,
    rainMm,
    observedMm,
    runoffFraction: rainMm !== null && rainMm > 0 ? observedMm / rainMm : null,
    result:
      problem === null
        ? calibrateUnchecked(event.storm, method, parameter, observedMm, rainMm ?? undefined)
        : { ok: false, reason: 'invalid-input', message: problem.message },
  };
}

// An event's target, kept while the event (the same object) and the area stay: a separation per event, once.
const targets = new WeakMap<SetEvent, { readonly areaM2: number; readonly target: EventTarget }>();
function targetOf(event: SetEvent, areaM2: number): EventTarget {
  const known = targets.get(event);
  if (known?.areaM2 === areaM2) return known.target;
  const target = eventTarget(event, areaM2);
  targets.set(event, { areaM2, target });
  return target;
}

export type DesignOutcome =
  | { readonly ok: true; readonly value: number; readonly runoff: readonly EventRunoff[] }
  | { readonly ok: false; readonly field: string; readonly message: string };

/** The design value for the set's pick (core `pickDesignValue`) and every event's runoff with it (core `applyDesignValue`). */
export function designOutcome(s: Scenario, fits: EventFits): DesignOutcome {
  const r = attempt(() => {
    const value = pickDesignValue(fits.summary, s.eventSet.designPick);
    return { value, runoff: applyDesignValue(fits.calibratable, fits.method, fits.parameter, value) };
  });
  return r.ok ? { ok: true, ...r.value } : { ok: false, field: r.error.field, message: r.error.message };
}

/** The design loss method: the fitted method with the design value, or null when there is none. */
export function designMethod(fits: EventFits, outcome: DesignOutcome): LossMethod | null {
  if (!outcome.ok) return null;
  return { ...fits.method, [fits.parameter]: outcome.value } as LossMethod;
}
