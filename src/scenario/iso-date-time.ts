import { readIsoDateTime } from '../core';

// ISO 8601 date-times as the scenario stores a storm start: a calendar date
// and a clock time, seconds and fraction optional, with or without a zone
// ("2026-07-14T15:00", "2026-07-14T15:00:00.5Z", "2026-07-14T15:00+10:00").
// Read by the core's one strict reader (src/core/wall-clock.ts), as the core
// reads the start itself; Date.parse would roll 30 February over into March.

export function isIsoDateTime(text: string): boolean {
  return readIsoDateTime(text)?.hasTime === true;
}
