const MS_PER_H = 3_600_000;
const ISO = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2})(?:\.(\d{1,3})\d*)?)?(Z|[+-]\d{2}:?\d{2})?$/;
const pad = (n: number, width = 2): string => String(n).padStart(width, '0');

/**
 * An ISO 8601 date-time `hours` later, written as the original was: the same
 * zone suffix (or none), so a storm start without a zone stays a wall-clock
 * reading and one with a zone keeps it. Shifted on a zone-free timeline in
 * whole milliseconds. Text in another ISO form Date.parse accepts comes back
 * in UTC.
 */
export function shiftIso(iso: string, hours: number): string {
  const m = ISO.exec(iso.trim());
  if (!m) return new Date(Date.parse(iso) + Math.round(hours * MS_PER_H)).toISOString();
  const wall = Date.UTC(
    Number(m[1]),
    Number(m[2]) - 1,
    Number(m[3]),
    Number(m[4]),
    Number(m[5]),
    Number(m[6] ?? 0),
    Number((m[7] ?? '0').padEnd(3, '0')),
  );
  const d = new Date(wall + Math.round(hours * MS_PER_H));
  const ms = d.getUTCMilliseconds();
  return (
    `${pad(d.getUTCFullYear(), 4)}-${pad(d.getUTCMonth() + 1)}-${pad(d.getUTCDate())}` +
    `T${pad(d.getUTCHours())}:${pad(d.getUTCMinutes())}:${pad(d.getUTCSeconds())}` +
    (ms === 0 ? '' : `.${pad(ms, 3)}`) +
    (m[8] ?? '')
  );
}
