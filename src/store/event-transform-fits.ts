import {
  TRANSFORMS,
  attempt,
  fitEventTransforms,
  separateBaseflow,
  summariseTransformFits,
  type EventTransformFit,
  type FitSummary,
  type HydrographEvent,
  type ObservedDirectRunoff,
  type TransformParam,
} from '../core';
import type { Scenario, SetEvent } from '../scenario/types';
import { alignRecord } from './alignment';
import type { EventFits } from './event-fits';

/** The transform fitted for every event: the parameter, each event's fit by id, and their spread. */
export interface EventTransformFits {
  readonly param: TransformParam;
  readonly byId: ReadonlyMap<string, EventTransformFit>;
  readonly summary: FitSummary;
}

const withoutTarget = (summary: FitSummary, more: number): FitSummary =>
  more === 0 ? summary : { ...summary, withoutAnswer: summary.withoutAnswer + more };

/**
 * An event's separated direct runoff on its storm's time axis (the record
 * lined up by the two clocks, else by its offset, as the workbench does), or
 * null when it has no record or its record cannot be separated.
 */
function observedDirect(event: SetEvent, areaM2: number): ObservedDirectRunoff | null {
  const flow = event.streamflow;
  if (flow === null) return null;
  const r = attempt(() => {
    const sep = separateBaseflow({ timesH: flow.timesH, dischargeM3s: flow.dischargeM3s }, flow.baseflow, { areaM2 });
    const { offsetH } = alignRecord(event.storm.startIso, flow.startIso, flow.offsetH);
    const timesH = new Float64Array(flow.timesH.length);
    for (let i = 0; i < timesH.length; i++) timesH[i] = (flow.timesH[i] as number) + offsetH;
    return { timesH, directM3s: sep.directM3s };
  });
  return r.ok ? r.value : null;
}

/** What the transform fits read of a scenario: the events, the area and the hydrograph's transform settings. */
export interface TransformFitInputs {
  readonly events: Scenario['eventSet']['events'];
  readonly areaM2: number;
  readonly transform: Scenario['hydrograph']['transform'];
  /** The transform parameter fitted (store `transformFitParameter`), or null. */
  readonly parameter: string | null;
  readonly objective: Scenario['hydrograph']['objective'];
}

/**
 * Fits the workbench's transform parameter to every event with a target
 * (core `fitEventTransforms`: the event's loss matched to its observed
 * volume, then the shape fitted to its own separated record by the
 * workbench's objective), or null when no transform with a parameter to fit
 * is chosen.
 */
export function fitAllEventTransforms(inputs: TransformFitInputs, fits: EventFits): EventTransformFits | null {
  const { transform, parameter: key, areaM2 } = inputs;
  if (transform === null || key === null) return null;
  const param = (TRANSFORMS[transform.kind].params as readonly TransformParam[]).find((p) => p.key === key);
  if (param === undefined) return null;
  const byEvent = new Map(inputs.events.map((e) => [e.id, e]));
  const events: HydrographEvent[] = fits.calibratable.map((c) => {
    const event = byEvent.get(c.id);
    return {
      id: c.id,
      storm: c.storm,
      observedExcessMm: c.observedExcessMm,
      observed: event ? observedDirect(event, areaM2) : null,
    };
  });
  const results = fitEventTransforms(events, {
    method: fits.method,
    lossParameter: fits.parameter,
    transform,
    parameter: key,
    areaM2,
    objective: inputs.objective,
  });
  return {
    param,
    byId: new Map(results.map((r) => [r.id, r])),
    // Events with no observed runoff to match have no fit either, as in the loss's spread.
    summary: withoutTarget(summariseTransformFits(results), fits.withoutTarget),
  };
}
