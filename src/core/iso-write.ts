import { ZONE_AT_END, wallClockParts } from './wall-clock';

/**
 * The writer beside the one clock reader (wall-clock.ts): ISO 8601 text that
 * readIsoDateTime reads back. Its own module so it loads with the import
 * and record code that writes starts, not with the first screen, which
 * only reads them.
 */
/** The zone as written at the end of the text ("Z", "+10:00"), or "" when none is written. */
export function zoneSuffix(iso: string): string {
  return ZONE_AT_END.exec(iso)?.[0] ?? '';
}

const pad = (n: number, width = 2): string => String(n).padStart(width, '0');

/**
 * The date-time that readIsoDateTime reads back as `wallMs`, written
 * "2024-05-01T10:00:00" (".250" when the milliseconds are not whole
 * seconds) followed by `zone` as given ("", "Z", "+10:00"). The writer
 * beside the one reader, so a written start always reads back.
 */
export function writeIsoDateTime(wallMs: number, zone: string): string {
  const p = wallClockParts(wallMs);
  if (p === null) throw new RangeError(`${String(wallMs)} ms is outside the calendar's range.`);
  return (
    `${pad(p.year, 4)}-${pad(p.month)}-${pad(p.day)}` +
    `T${pad(p.hour)}:${pad(p.minute)}:${pad(p.second)}` +
    (p.millisecond === 0 ? '' : `.${pad(p.millisecond, 3)}`) +
    zone
  );
}

/** A zone offset in minutes written as readIsoDateTime reads it: "Z" for 0, "+10:00", "-03:30"; "" for none. */
export function zoneText(zoneMinutes: number | null): string {
  if (zoneMinutes === null) return '';
  if (zoneMinutes === 0) return 'Z';
  const abs = Math.abs(zoneMinutes);
  return `${zoneMinutes < 0 ? '-' : '+'}${pad(Math.floor(abs / 60))}:${pad(abs % 60)}`;
}
