import { InputError, attempt } from '../errors';
import { computeLossesUnchecked } from '../loss/compute';
import { methodSpec, numericParam, validateMethod } from '../loss/methods';
import type { LossMethod } from '../loss/types';
import { validateStorm } from '../storm';
import { validateEventList, type CatchmentEvent } from './event';

/** One event's runoff with the design value, and how far it is from what was observed. */
export type EventRunoff =
  | {
      readonly id: string;
      readonly ok: true;
      readonly rainMm: number;
      readonly observedMm: number;
      /** Runoff (rainfall excess) with the design value, mm. */
      readonly runoffMm: number;
      /** runoffMm / rainMm (0 for a dry storm, as for any loss result). */
      readonly runoffFraction: number;
      /** runoffMm − observedMm: positive when the design value over-predicts. */
      readonly errorMm: number;
      /** errorMm as a percentage of observedMm (null when nothing was observed). */
      readonly errorPct: number | null;
    }
  | {
      readonly id: string;
      readonly ok: false;
      /** The field at fault, as named by the core's InputError. */
      readonly field: string;
      readonly message: string;
    };

/**
 * Runs every event with `parameter` set to `value` (the other parameters of
 * `method` as given) and compares each runoff with the observed one. Throws
 * InputError for what applies to all events (the list, an unknown parameter,
 * a value outside the parameter's bounds, naming that parameter); an event
 * whose own storm or observed depth is unusable gets an `ok: false` row.
 */
export function applyDesignValue(
  events: readonly CatchmentEvent[],
  method: LossMethod,
  parameter: string,
  value: number,
): EventRunoff[] {
  validateEventList(events);
  validateMethod(method);
  if (!numericParam(method.kind, parameter)) {
    const spec = methodSpec(method.kind);
    throw new InputError(
      'parameter',
      `${spec.label} has no parameter "${parameter}"; it has ${spec.params.map((p) => p.key).join(', ')}.`,
    );
  }
  const design = { ...method, [parameter]: value } as LossMethod;
  validateMethod(design);

  return events.map((event): EventRunoff => {
    const checked = attempt(() => validateStorm(event.storm));
    if (!checked.ok) return { id: event.id, ok: false, field: checked.error.field, message: checked.error.message };
    const observedMm = event.observedExcessMm;
    if (typeof observedMm !== 'number' || !Number.isFinite(observedMm) || observedMm < 0) {
      return {
        id: event.id,
        ok: false,
        field: 'observedExcessMm',
        message: `The observed runoff must be a finite number of millimetres, 0 or more (got ${String(observedMm)}).`,
      };
    }
    const result = computeLossesUnchecked(event.storm, design);
    const errorMm = result.totalExcessMm - observedMm;
    return {
      id: event.id,
      ok: true,
      rainMm: result.rainMm,
      observedMm,
      runoffMm: result.totalExcessMm,
      runoffFraction: result.runoffFraction,
      errorMm,
      errorPct: observedMm > 0 ? (100 * errorMm) / observedMm : null,
    };
  });
}
