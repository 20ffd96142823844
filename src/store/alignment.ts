import { InputError, MAX_RECORD_YEARS, describeHours, hoursBetweenClocks, isSpanH, namesZone } from '../core';
import type { Scenario } from '../scenario/types';

/**
 * How the streamflow record lines up with the storm on one time axis: the
 * hours from the start of the storm to the record's first sample.
 *
 * When both carry a clock time the clocks decide. Two times that both name
 * their zone ("Z", "+10:00") are compared as instants; otherwise the clock
 * readings are compared as written, since a gauge and a rain logger in one
 * catchment keep the same local time (and the chart shows the storm's own
 * wall clock, see src/ui/chart/clock.ts). Without both clocks the stored
 * offset is used, which the user sets.
 */
export type AlignmentSource = 'clocks' | 'offset';

export interface Alignment {
  /** Storm time (h from the storm start) = record time (h from its first sample) + offsetH. */
  readonly offsetH: number;
  readonly source: AlignmentSource;
  /** Set when the clocks were compared as written although one of them names a zone. */
  readonly note: string | null;
}

export function alignRecord(
  stormStartIso: string | undefined,
  recordStartIso: string | undefined,
  storedOffsetH: number,
): Alignment {
  if (stormStartIso !== undefined && recordStartIso !== undefined) {
    const between = hoursBetweenClocks(stormStartIso, recordStartIso);
    if (between !== null) {
      const oneZone = between.asWritten && (namesZone(stormStartIso) || namesZone(recordStartIso));
      return {
        offsetH: between.hours,
        source: 'clocks',
        note: oneZone
          ? 'Only one of the two start times names its time zone, so the clock readings are compared as written.'
          : null,
      };
    }
  }
  return { offsetH: storedOffsetH, source: 'offset', note: null };
}

/**
 * Throws an InputError naming `startIso` when the scenario's storm and
 * record clocks put the record further from the storm than a record spans
 * (core/time-limits.ts); the schema refuses such a document, so no edit may
 * make one.
 */
export function checkRecordNearStorm(s: Scenario): void {
  const flow = s.streamflow;
  if (!flow || s.storm.startIso === undefined || flow.startIso === undefined) return;
  const between = hoursBetweenClocks(s.storm.startIso, flow.startIso);
  if (between === null || isSpanH(between.hours)) return;
  throw new InputError(
    'startIso',
    `The streamflow record starts ${describeHours(Math.abs(between.hours))} ${between.hours < 0 ? 'before' : 'after'} the storm start; ` +
      `a record lies within ${MAX_RECORD_YEARS} years of its storm. Check the two start times.`,
  );
}
