// ISO 8601 date-times as the scenario stores a storm start: a calendar date
// and a clock time, seconds and fraction optional, with or without a zone
// ("2026-07-14T15:00", "2026-07-14T15:00:00.5Z", "2026-07-14T15:00+10:00").
// Date.parse alone is too lenient (it rolls 30 February over into March and
// reads many non-ISO forms), so fields are checked one by one.

const PATTERN = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2})(?:\.\d{1,9})?)?(?:Z|[+-](\d{2}):(\d{2}))?$/;

function daysInMonth(year: number, month: number): number {
  if (month === 2) return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0 ? 29 : 28;
  return month === 4 || month === 6 || month === 9 || month === 11 ? 30 : 31;
}

export function isIsoDateTime(text: string): boolean {
  const m = PATTERN.exec(text);
  if (!m) return false;
  const [year, month, day, hour, minute] = [m[1], m[2], m[3], m[4], m[5]].map(Number) as [
    number,
    number,
    number,
    number,
    number,
  ];
  const second = m[6] === undefined ? 0 : Number(m[6]);
  if (month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) return false;
  if (hour > 23 || minute > 59 || second > 59) return false;
  if (m[7] !== undefined && (Number(m[7]) > 23 || Number(m[8]) > 59)) return false;
  // The core reads the start with Date.parse; make sure it agrees.
  return !Number.isNaN(Date.parse(text));
}
