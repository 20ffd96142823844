import type { Scenario } from '../scenario/types';

/**
 * A scenario too large for localStorage is kept in the browser's IndexedDB
 * (src/store/large-store.ts, loaded only when one is met). The current
 * scenario's localStorage slot then holds this small marker instead of the
 * document: { "$format": "raincut-large-store", "id", "numbers", "savedAt" }.
 * The marker is what the two-tab rule and the start-up read see: another
 * tab's large save rewrites it, so the browser's "storage" event announces
 * it like any other save, and the page waits for IndexedDB at start-up only
 * when the slot holds a marker. This file is on the first screen: keep it small.
 */
export const LARGE_MARKER_TAG = 'raincut-large-store';

export interface LargeMarker {
  /** The record's key in the large store; a new one for every save, so a half-done save never replaces a whole one. */
  readonly id: string;
  /** How many numbers the columns held (for the message; see `columnNumbers`). */
  readonly numbers: number;
  readonly savedAt: string;
}

/**
 * Column numbers (bars, samples) from which a scenario goes to the large
 * store without trying localStorage: 2 × 10⁵ numbers of up to ~20
 * characters is ~4 M characters, near the 5 M characters localStorage
 * allows an origin in the common browsers (from memory). A smaller one
 * that still does not fit goes there too, when localStorage refuses it.
 */
export const LARGE_NUMBERS = 200_000;

/** The numbers held in a scenario's columns: its storm, its streamflow record, and each event's. */
export function columnNumbers(scenario: Scenario): number {
  let n = scenario.storm.depthsMm.length * 2 + (scenario.streamflow?.timesH.length ?? 0) * 2;
  for (const e of scenario.eventSet.events) n += e.storm.depthsMm.length * 2 + (e.streamflow?.timesH.length ?? 0) * 2;
  return n;
}

const PREFIX = `{"$format":"${LARGE_MARKER_TAG}"`;

/** The marker in a stored text, or null when the text is anything else (checked by its start, so a long document is never parsed twice). */
export function readLargeMarker(text: string | null): LargeMarker | null {
  if (text === null || !text.startsWith(PREFIX) || text.length > 1000) return null;
  try {
    const m = JSON.parse(text) as Record<string, unknown>;
    const { id, numbers, savedAt } = m;
    return typeof id === 'string' && typeof numbers === 'number' && typeof savedAt === 'string'
      ? { id, numbers, savedAt }
      : null;
  } catch {
    return null;
  }
}
