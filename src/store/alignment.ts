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

const WALL = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2})(\.\d+)?)?/;
const ZONE = /(?:Z|[+-]\d{2}:\d{2})$/;

/** Milliseconds of the clock reading as written (zone ignored), on a UTC axis. */
function wallMs(iso: string): number | null {
  const m = WALL.exec(iso);
  if (!m) return null;
  const n = (i: number): number => (m[i] === undefined ? 0 : Number(m[i]));
  const ms = m[7] === undefined ? 0 : Math.round(Number(m[7]) * 1000);
  const t = Date.UTC(n(1), n(2) - 1, n(3), n(4), n(5), n(6), ms);
  return Number.isNaN(t) ? null : t;
}

/** Hours from `fromIso` to `toIso`, or null when either is not a readable date-time. */
export function hoursBetweenClocks(
  fromIso: string,
  toIso: string,
): { readonly hours: number; readonly asWritten: boolean } | null {
  const zoned = ZONE.test(fromIso) && ZONE.test(toIso);
  const a = zoned ? Date.parse(fromIso) : wallMs(fromIso);
  const b = zoned ? Date.parse(toIso) : wallMs(toIso);
  if (a === null || b === null || Number.isNaN(a) || Number.isNaN(b)) return null;
  return { hours: (b - a) / 3.6e6, asWritten: !zoned };
}

export function alignRecord(
  stormStartIso: string | undefined,
  recordStartIso: string | undefined,
  storedOffsetH: number,
): Alignment {
  if (stormStartIso !== undefined && recordStartIso !== undefined) {
    const between = hoursBetweenClocks(stormStartIso, recordStartIso);
    if (between !== null) {
      const oneZone = between.asWritten && (ZONE.test(stormStartIso) || ZONE.test(recordStartIso));
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
