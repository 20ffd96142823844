import { calibrate, type CalibrationResult } from '../calibrate/calibrate';
import { attempt } from '../errors';
import type { LossMethod } from '../loss/types';
import { totalDepthMm, validateStorm, type Storm } from '../storm';
import { validateEventList, type CatchmentEvent } from './event';

/** One row of the event table: what was observed and what the fit found. */
export interface EventFit {
  readonly id: string;
  /** Storm rainfall, mm (null when the storm itself is invalid: no NaN leaves the core). */
  readonly rainMm: number | null;
  /** Observed runoff as given, mm. */
  readonly observedMm: number;
  /** Observed runoff / rainfall (null without rain or without a usable storm). */
  readonly runoffFraction: number | null;
  /** Exactly what `calibrate` returns for this event alone. */
  readonly result: CalibrationResult;
}

function rainOf(storm: Storm): number | null {
  return attempt(() => validateStorm(storm)).ok ? totalDepthMm(storm) : null;
}

/**
 * Fits one parameter of one loss method to every event of a catchment. Each
 * event is calibrated on its own by `calibrate` (same storm, method,
 * parameter and target), so the table always agrees with the single-event
 * answer; events without an answer keep calibrate's reason and message.
 * Throws InputError only for a malformed list (see `validateEventList`).
 */
export function fitEvents(events: readonly CatchmentEvent[], method: LossMethod, parameter: string): EventFit[] {
  validateEventList(events);
  return events.map((event) => {
    const rainMm = rainOf(event.storm);
    const observedMm = event.observedExcessMm;
    return {
      id: event.id,
      rainMm,
      observedMm,
      runoffFraction: rainMm !== null && rainMm > 0 ? observedMm / rainMm : null,
      result: calibrate(event.storm, method, parameter, observedMm),
    };
  });
}
