import { calibrate, type CalibrationResult } from '../calibrate/calibrate';
import { isInputError } from '../errors';
import type { LossMethod } from '../loss/types';
import { totalDepthMm, validateStorm, type Storm } from '../storm';
import { validateEventList, type CatchmentEvent } from './event';

/** One row of the event table: what was observed and what the fit found. */
export interface EventFit {
  readonly id: string;
  /** Storm rainfall, mm (NaN when the storm itself is invalid). */
  readonly rainMm: number;
  /** Observed runoff as given, mm. */
  readonly observedMm: number;
  /** Observed runoff / rainfall (NaN without rain or without a usable storm). */
  readonly runoffFraction: number;
  /** Exactly what `calibrate` returns for this event alone. */
  readonly result: CalibrationResult;
}

function rainOf(storm: Storm): number {
  try {
    validateStorm(storm);
  } catch (error) {
    if (isInputError(error)) return Number.NaN;
    throw error;
  }
  return totalDepthMm(storm);
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
      runoffFraction: rainMm > 0 ? observedMm / rainMm : Number.NaN,
      result: calibrate(event.storm, method, parameter, observedMm),
    };
  });
}
