import type { LargeMarker } from './large-marker';

// What the crash screen reports, apart from its code (./crash.ts) so that the
// large store's half (./crash-large.ts) takes the type without importing back.

/**
 * What the error screen may truthfully say, and do, after drawing the
 * workbench failed. The screen's claims come from storage as it is once the
 * autosave has been stopped, never from hope:
 *
 * - `shared`: the scenario on screen came from a link and was never saved;
 *   the user's own saved scenario is not touched, and the link is taken out
 *   of the address so a reload opens the user's own scenario.
 * - `saved`: the scenario that failed is the one saved in this browser (it
 *   was opened from it, or saved before it failed), so a reload would fail
 *   again: setting it aside breaks the loop without losing it.
 * - `older`: the change that failed was not saved; the saved scenario is the
 *   one before it, and a reload opens that.
 * - `nothing`: nothing is saved in this browser (or it cannot save).
 * - `large`: the saved scenario is in the large store (./large-store.ts) and
 *   has not been read yet; `checkLarge` reads it and says `saved` or `older`.
 * - `gone`: the large store cannot give the record the saved marker names;
 *   a reload sets the marker aside (listed) and opens the demo.
 */
export type SavedState = 'shared' | 'saved' | 'older' | 'nothing' | 'large' | 'gone';

export interface CrashReport {
  readonly state: SavedState;
  /** One or two plain sentences on what was and was not saved, and what a reload will show. */
  readonly text: string;
  /** The large-store marker the saved slot held, when the saved scenario is kept there. */
  readonly large?: LargeMarker;
}
