import { validateHydrograph } from '../baseflow/hydrograph';
import type { Hydrograph } from '../baseflow/types';
import { InputError } from '../errors';
import { validateStorm, type Storm } from '../storm';
import { shiftIso } from './clock';
import type { RecordEvent } from './split';

/** Checks that an event's bars lie inside the record, naming the field. */
function checkEvent(storm: Storm, event: RecordEvent): void {
  const n = storm.depthsMm.length;
  const { firstBar, lastBar } = event ?? ({} as RecordEvent);
  if (!Number.isInteger(firstBar) || firstBar < 0 || firstBar >= n) {
    throw new InputError(
      'firstBar',
      `The event's first bar (${String(firstBar)}) is not a bar of the record (0 to ${n - 1}).`,
    );
  }
  if (!Number.isInteger(lastBar) || lastBar < firstBar || lastBar >= n) {
    throw new InputError(
      'lastBar',
      `The event's last bar (${String(lastBar)}) must be a bar of the record at or after its first (${firstBar} to ${n - 1}).`,
    );
  }
}

/** Start and end of an event on the record's clock, h from the record start. */
export function eventSpanH(storm: Storm, event: RecordEvent): { startH: number; endH: number } {
  validateStorm(storm);
  checkEvent(storm, event);
  let startH = 0;
  for (let k = 0; k < event.firstBar; k++) startH += storm.durationsH[k] as number;
  let endH = startH;
  for (let k = event.firstBar; k <= event.lastBar; k++) endH += storm.durationsH[k] as number;
  return { startH, endH };
}

/**
 * The event's own storm: its bars, starting at hour 0, placed on the calendar
 * at the event's start when the record is.
 */
export function eventStorm(storm: Storm, event: RecordEvent): Storm {
  const { startH } = eventSpanH(storm, event);
  const durationsH = Array.from(
    { length: event.lastBar - event.firstBar + 1 },
    (_, i) => storm.durationsH[event.firstBar + i] as number,
  );
  const depthsMm = Array.from({ length: durationsH.length }, (_, i) => storm.depthsMm[event.firstBar + i] as number);
  return storm.startIso === undefined
    ? { durationsH, depthsMm }
    : { durationsH, depthsMm, startIso: shiftIso(storm.startIso, startH) };
}

export interface FlowWindowOptions {
  /** How long after the event's last bar the window runs, h (the recession to keep). */
  readonly afterH: number;
  /** Where the record's hour 0 falls on the rainfall record's clock, h (default 0: the same start). */
  readonly offsetH?: number;
}

export interface FlowWindow {
  /** First and last sample of the record taken (0-based, inclusive). */
  readonly firstSample: number;
  readonly lastSample: number;
  /** Sample times, h from the event's start (the first may be a little before it). */
  readonly timesH: Float64Array;
  readonly dischargeM3s: Float64Array;
}

/** Index of the last time ≤ t (−1 when none). */
function lastAtOrBefore(timesH: ArrayLike<number>, tH: number): number {
  let lo = -1;
  let hi = timesH.length;
  while (hi - lo > 1) {
    const mid = (lo + hi) >>> 1;
    if ((timesH[mid] as number) <= tH) lo = mid;
    else hi = mid;
  }
  return lo;
}

/**
 * The part of a streamflow record that belongs to an event, from the event's
 * start to `options.afterH` hours after its last bar ends, ready for baseflow
 * separation against the event's storm (`eventStorm`). The record's times are
 * h on its own clock, whose hour 0 falls `options.offsetH` h after the
 * rainfall record's start (a record that starts later than the rain has a
 * positive offset). Whole samples are taken, from the last one at or before
 * the window's start to the first one at or after its end, so the window is
 * covered without inventing samples; the returned times are h from the
 * event's start. Throws an InputError naming the field when the record does
 * not reach the window or leaves fewer than two samples.
 */
export function eventFlowWindow(
  storm: Storm,
  event: RecordEvent,
  record: Hydrograph,
  options: FlowWindowOptions,
): FlowWindow {
  const { afterH, offsetH = 0 } = options ?? ({} as FlowWindowOptions);
  if (typeof afterH !== 'number' || !Number.isFinite(afterH) || afterH < 0) {
    throw new InputError(
      'afterH',
      `The time after the event must be a finite number of hours, zero or more (got ${String(afterH)}).`,
    );
  }
  if (typeof offsetH !== 'number' || !Number.isFinite(offsetH)) {
    throw new InputError('offsetH', `The record's offset must be a finite number of hours (got ${String(offsetH)}).`);
  }
  validateHydrograph(record);
  const { startH, endH } = eventSpanH(storm, event);
  const { timesH, dischargeM3s } = record;
  const n = timesH.length;
  // On the record's own clock.
  const fromH = startH - offsetH;
  const toH = endH + afterH - offsetH;
  const recordStart = timesH[0] as number;
  const recordEnd = timesH[n - 1] as number;
  if (recordEnd < fromH || recordStart > toH) {
    throw new InputError(
      'timesH',
      `The streamflow record (${fmt(recordStart + offsetH)} h to ${fmt(recordEnd + offsetH)} h on the rainfall clock) ` +
        `does not reach the event's window (${fmt(startH)} h to ${fmt(endH + afterH)} h).`,
    );
  }
  const firstSample = Math.max(0, lastAtOrBefore(timesH, fromH));
  const atOrBeforeEnd = lastAtOrBefore(timesH, toH);
  const lastSample = (timesH[atOrBeforeEnd] as number) === toH ? atOrBeforeEnd : Math.min(n - 1, atOrBeforeEnd + 1);
  if (lastSample - firstSample < 1) {
    throw new InputError(
      'timesH',
      `Only one sample of the streamflow record falls in the event's window (${fmt(startH)} h to ${fmt(endH + afterH)} h); a volume needs two.`,
    );
  }
  const count = lastSample - firstSample + 1;
  const outTimes = new Float64Array(count);
  const outFlow = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    outTimes[i] = (timesH[firstSample + i] as number) + offsetH - startH;
    outFlow[i] = dischargeM3s[firstSample + i] as number;
  }
  return { firstSample, lastSample, timesH: outTimes, dischargeM3s: outFlow };
}

const fmt = (x: number): string => (Number.isInteger(x) ? String(x) : x.toPrecision(4).replace(/\.?0+$/, ''));
