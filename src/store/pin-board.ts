import { createStore } from 'zustand/vanilla';
import type { StorageLike } from '../scenario/stored-slot';
import type { Scenario } from '../scenario/types';
import type { PinBoard, PinBoardOptions, PinResult, PinState } from './pins';

/**
 * The page's pins as the screen holds them: the board's state from the
 * first frame (empty), and the board itself (./pins.ts: reading, checking,
 * setting aside, other tabs) fetched just after the first screen, so its
 * code is not part of it. Pinning waits for the board if it has not come yet.
 */
export { MAX_PINS, PINS_KEY } from './pin-limits';

export interface PinShelf extends Pick<PinBoard, 'getState' | 'subscribe'> {
  pin(scenario: Scenario): Promise<PinResult>;
  unpin(id: string): Promise<void>;
  /** Fetches the board and follows another tab's pins from then on; returns how to stop. */
  watchOtherTabs(): () => void;
}

export function createPinShelf(storage: StorageLike | null, options: PinBoardOptions = {}): PinShelf {
  const state = createStore<PinState>()(() => ({ pins: [], problems: [] }));
  let board: Promise<PinBoard> | null = null;
  const ready = (): Promise<PinBoard> =>
    (board ??= import('./pins').then(({ createPinBoard }) => {
      const made = createPinBoard(storage, options);
      state.setState(made.getState(), true);
      made.subscribe((s) => state.setState(s, true));
      return made;
    }));
  return {
    getState: state.getState,
    subscribe: state.subscribe,
    pin: (scenario) => ready().then((b) => b.pin(scenario)),
    unpin: (id) => ready().then((b) => b.unpin(id)),
    watchOtherTabs() {
      let stop: (() => void) | null = null;
      let stopped = false;
      void ready().then((b) => {
        if (!stopped) stop = b.watchOtherTabs();
      });
      return () => {
        stopped = true;
        stop?.();
      };
    },
  };
}
