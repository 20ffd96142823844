import { InputError } from '../errors';
import { validateStorm, type Storm } from '../storm';

/** One event of a long record: bars `firstBar`..`lastBar` (0-based, inclusive). */
export interface RecordEvent {
  readonly firstBar: number;
  readonly lastBar: number;
  /** Rainfall of the event's bars, mm. */
  readonly depthMm: number;
  /** From the start of `firstBar` to the end of `lastBar`, h. */
  readonly durationH: number;
}

export interface SplitOptions {
  /**
   * Minimum inter-event time, h: the shortest dry spell that separates two
   * events. The practice of splitting a continuous record at dry spells of at
   * least a set length is the minimum inter-event time (also "inter-event time
   * definition"); Restrepo-Posada & Eagleson (1982, J. Hydrology 55, 303–319)
   * give a way to choose it for a gauge (the dry spells between independent
   * storms then follow an exponential distribution) and found values of a few
   * hours to a day; 6 h is the value used for the rainfall statistics of US
   * gauges by Driscoll, Palhegyi, Strecker & Shelley (1989, US EPA
   * 440/5-89-001). Both from memory.
   */
  readonly minDryH: number;
  /**
   * Events with less rain than this are dropped, mm (default 0: none). A small
   * threshold (0.1 in ≈ 2.5 mm, or a gauge's own resolution) keeps drizzle that
   * produces no runoff out of the list: common practice, no source.
   */
  readonly minDepthMm?: number;
}

/**
 * Bars whose dry spell reaches the minimum within this share of it count as
 * reaching it: durations summed from many bars carry rounding, and cutting a
 * bar in two must not move a spell across the line.
 */
const DRY_SLACK = 1e-9;

function checkOptions(options: SplitOptions): { minDryH: number; minDepthMm: number } {
  if (!options || typeof options !== 'object') {
    throw new InputError('minDryH', 'The splitting options (minDryH, minDepthMm) were not given.');
  }
  const { minDryH, minDepthMm = 0 } = options;
  if (typeof minDryH !== 'number' || !Number.isFinite(minDryH) || minDryH < 0) {
    throw new InputError(
      'minDryH',
      `The minimum dry spell between events must be a finite number of hours, zero or more (got ${String(minDryH)}).`,
    );
  }
  if (typeof minDepthMm !== 'number' || !Number.isFinite(minDepthMm) || minDepthMm < 0) {
    throw new InputError(
      'minDepthMm',
      `The minimum event depth must be a finite number of millimetres, zero or more (got ${String(minDepthMm)}).`,
    );
  }
  return { minDryH, minDepthMm };
}

/**
 * Splits a long rainfall record into events. An event is a run of bars with
 * rain (depth > 0) bounded by dry spells (runs of bars with no rain) lasting
 * at least `minDryH` hours; dry bars inside a shorter spell belong to the
 * event, and the dry bars before its first wet bar and after its last do not.
 * Wet bars next to each other are always one event (no dry spell between
 * them). A record's dry start and end bound its first and last events
 * whatever their length. Events with less rain than `minDepthMm` are dropped.
 * One pass over the bars. Throws an InputError naming the field for bad input.
 */
export function splitEvents(storm: Storm, options: SplitOptions): RecordEvent[] {
  validateStorm(storm);
  const { minDryH, minDepthMm } = checkOptions(options);
  const { durationsH: d, depthsMm: p } = storm;
  const n = p.length;
  const threshold = minDryH * (1 - DRY_SLACK);
  const events: RecordEvent[] = [];
  let first = -1; // first bar of the open event
  let last = -1; // its last wet bar
  let depth = 0;
  let wetH = 0; // duration from the event's start to the end of its last wet bar
  let dryH = 0; // the dry spell since `last`
  const close = (): void => {
    if (depth >= minDepthMm) events.push({ firstBar: first, lastBar: last, depthMm: depth, durationH: wetH });
  };
  for (let k = 0; k < n; k++) {
    const pk = p[k] as number;
    const dk = d[k] as number;
    if (pk > 0) {
      if (first >= 0 && dryH > 0 && dryH >= threshold) {
        close();
        first = -1;
      }
      if (first < 0) {
        first = k;
        depth = 0;
        wetH = 0;
      } else {
        wetH += dryH; // a short dry spell belongs to the event
      }
      depth += pk;
      wetH += dk;
      last = k;
      dryH = 0;
    } else if (first >= 0) {
      dryH += dk;
    }
  }
  if (first >= 0) close();
  return events;
}
