import { calibrate, type CalibrationResult } from '../calibrate/calibrate';
import { isInputError } from '../errors';
import { computeLosses } from '../loss/compute';
import type { LossMethod } from '../loss/types';
import type { Storm } from '../storm';
import { fitTransform, type ObservedDirectRunoff, type TransformFitResult } from '../transform/fit';
import type { TransformObjective } from '../transform/transforms';
import type { Transform } from '../transform/types';
import { summariseValues, type FitSummary } from './summary';

/** One event as the transform fit needs it: its storm, its observed runoff depth and its observed direct runoff. */
export interface HydrographEvent {
  readonly id: string;
  readonly storm: Storm;
  /** Observed direct runoff depth, mm over the catchment: the loss is matched to it first. */
  readonly observedExcessMm: number;
  /** The event's observed direct runoff on its storm's time axis (h from the storm start); null: no record. */
  readonly observed: ObservedDirectRunoff | null;
}

/** What one event's transform fit found, and the loss fit that set its volume. */
export interface EventTransformFit {
  readonly id: string;
  /** Exactly what `calibrate` returns for this event's storm and observed depth. */
  readonly loss: CalibrationResult;
  /** The transform fit on the excess of the matched loss, or why there is none. */
  readonly result:
    TransformFitResult | { readonly ok: false; readonly reason: 'no-record' | 'no-loss-fit'; readonly message: string };
}

export interface TransformFitSettings {
  readonly method: LossMethod;
  /** The loss parameter matched to each event's observed volume. */
  readonly lossParameter: string;
  readonly transform: Transform;
  /** The transform parameter fitted (lag, k, n). */
  readonly parameter: string;
  readonly areaM2: number;
  readonly objective: TransformObjective;
}

/**
 * Fits a transform parameter to every event of a catchment, each on its own
 * observed record: the loss parameter is first matched to the event's
 * observed volume (`calibrate`), then the transform's parameter is fitted to
 * the event's observed direct runoff with that excess (`fitTransform`), so
 * the volume is matched while the shape is fitted, exactly as the workbench's
 * "Fit the hydrograph" does for one event. Events without a record or without
 * a loss answer say why; one bad event does not hide the others.
 */
export function fitEventTransforms(
  events: readonly HydrographEvent[],
  settings: TransformFitSettings,
): EventTransformFit[] {
  const { method, lossParameter, transform, parameter, areaM2, objective } = settings;
  return events.map((event): EventTransformFit => {
    const loss = calibrate(event.storm, method, lossParameter, event.observedExcessMm);
    if (event.observed === null) {
      return {
        id: event.id,
        loss,
        result: {
          ok: false,
          reason: 'no-record',
          message: 'This event has no separated streamflow record to fit the hydrograph to.',
        },
      };
    }
    if (!loss.ok) {
      return {
        id: event.id,
        loss,
        result: {
          ok: false,
          reason: 'no-loss-fit',
          message: `The loss cannot be matched to the observed volume, so the hydrograph is not fitted: ${loss.message}`,
        },
      };
    }
    let excessMm: Float64Array;
    try {
      excessMm = computeLosses(event.storm, loss.method).excessMm;
    } catch (error) {
      if (!isInputError(error)) throw error;
      return { id: event.id, loss, result: { ok: false, reason: 'no-loss-fit', message: error.message } };
    }
    const result = fitTransform(
      { durationsH: event.storm.durationsH, excessMm },
      transform,
      parameter,
      areaM2,
      event.observed,
      objective,
    );
    return { id: event.id, loss, result };
  });
}

/** The spread of the fitted transform parameter over the events that have one (as `summariseFits` for the loss). */
export function summariseTransformFits(fits: readonly EventTransformFit[]): FitSummary {
  const values: number[] = [];
  for (const fit of fits) if (fit.result.ok) values.push(fit.result.value);
  return summariseValues(values, fits.length - values.length);
}
