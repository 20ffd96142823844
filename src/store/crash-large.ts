import type { CrashReport } from './crash-report';
import { OLDER_TEXT, SAVED_TEXT } from './crash-text';
import type { LargeMarker } from './large-marker';
import { readLargeText } from './large-store';
import type { Scenario } from '../scenario/types';

/**
 * The error screen's dealings with the large store (./crash.ts), loaded only
 * when the saved slot holds a large-store marker: the slot then holds no
 * scenario, so what was saved is told, and downloaded, from the record the
 * marker names.
 */

const IN_LARGE =
  ' It is kept in this browser’s larger database (IndexedDB), where the Download button below fetches it from.';

/** Whether the record the marker names is the scenario on screen (`saved`), an older one (`older`), or cannot be had (`gone`). */
export async function checkLarge(large: LargeMarker, onScreen: Scenario): Promise<CrashReport> {
  const read = await readLargeText(large);
  if (!read.ok) {
    return {
      state: 'gone',
      large,
      text:
        `The saved scenario is meant to be in this browser’s larger database (IndexedDB), but it cannot be had: ${read.message} ` +
        'Reloading keeps the pointer to it under Saved scenarios, “Set-aside copies”, and starts from the demo scenario.',
    };
  }
  // The same test as for a scenario in localStorage: the saved document's text against the scenario on screen.
  return read.text === JSON.stringify(onScreen)
    ? { state: 'saved', large, text: SAVED_TEXT + IN_LARGE }
    : { state: 'older', large, text: OLDER_TEXT + IN_LARGE };
}

/** The record the marker names as a scenario document's text, for the download. */
export async function largeText(
  large: LargeMarker,
): Promise<{ readonly ok: true; readonly text: string } | { readonly ok: false; readonly text: string }> {
  const read = await readLargeText(large);
  return read.ok
    ? read
    : { ok: false, text: `The saved scenario could not be fetched from the larger database: ${read.message}` };
}
