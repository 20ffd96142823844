import type { LossBuffers, Storm } from '../core';

/** Storms from this many bars on take their results' arrays from a ring (below); smaller ones fresh arrays. */
export const RING_FROM_BARS = 1 << 16;

/** Values paged in per task while the ring warms (2 MB): each task a few ms, so input is never held up. */
const WARM_CHUNK = 1 << 18;

/** Runs a task later, after what the page is doing now. */
export type Later = (task: () => void) => void;

const afterNow: Later = (task) => void setTimeout(task, 0);

/**
 * Loss and excess arrays for one storm's results, taken in turn from a ring
 * of three pairs. Fresh arrays for 10⁶ bars cost about 65 ms in chromium per
 * move of a drag (16 MB zeroed and paged in, measured); the ring makes them
 * once per storm. A result stays intact through the two results that follow
 * it (a deferred render may still show the one before the latest); the ring
 * starts anew for another storm object.
 *
 * The first result takes the first pair; the other two are made and paged in
 * (written once) in small tasks `later`, while the storm is only on screen:
 * made at the first moves of a drag instead, they held each of those moves
 * for 50 to 230 ms on 10⁶ bars (measured, bench:ui drag1e6). A pair a result
 * has taken is never written by the warming.
 */
export interface LossRing {
  (storm: Storm): LossBuffers | undefined;
  /**
   * Starts the ring for a storm about to enter the store and pages in its
   * first pair in small tasks, so the first result's arrays are not made in
   * the task that shows the storm (issue 11: 16 MB for 10⁶ bars, 60 ms of it
   * measured); settles once that pair is ready (or taken).
   */
  prepare(storm: Storm): Promise<void>;
  /** True when the storm's first result takes no new arrays: a short storm, or the ring's own (taken or prepared). */
  ready(storm: Storm): boolean;
}

export function lossRing(later: Later = afterNow): LossRing {
  let owner: Storm | null = null;
  let ring: LossBuffers[] = [];
  let turn = 0;
  const pair = (n: number): LossBuffers => ({ lossMm: new Float64Array(n), excessMm: new Float64Array(n) });

  // Values paged in so far, counted over the slots' arrays in order (slot s's loss from 2n·s, its excess from
  // 2n·s + n): slot 0 is the first result's, so warming starts at slot 1 unless the ring is prepared.
  const warm = (storm: Storm, n: number, at = 2 * n, firstReady?: () => void): void => {
    const step = (): void => {
      let slot = Math.floor(at / (2 * n));
      // A slot is taken once the turns have passed it (the ring hands slots out in order).
      if (turn > slot) at = 2 * n * (slot = turn);
      if (slot > 0 || storm !== owner) firstReady?.();
      if (storm !== owner || slot > 2) return;
      const from = at % n;
      const to = Math.min(n, from + WARM_CHUNK);
      (ring[slot] ??= pair(n))[at % (2 * n) < n ? 'lossMm' : 'excessMm'].fill(0, from, to);
      at += to - from;
      later(step);
    };
    later(step);
  };

  const take = (storm: Storm): LossBuffers | undefined => {
    const n = storm.depthsMm.length;
    if (n < RING_FROM_BARS) return undefined;
    if (storm !== owner) {
      [owner, ring, turn] = [storm, [], 0];
      warm(storm, n);
    }
    return (ring[turn++ % 3] ??= pair(n));
  };
  const prepare = (storm: Storm): Promise<void> =>
    new Promise((ready) => {
      const n = storm.depthsMm.length;
      if (n < RING_FROM_BARS || storm === owner) return ready();
      [owner, ring, turn] = [storm, [], 0];
      warm(storm, n, 0, ready);
    });
  const ready = (storm: Storm): boolean => storm.depthsMm.length < RING_FROM_BARS || storm === owner;
  return Object.assign(take, { prepare, ready });
}
