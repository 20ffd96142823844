import type { LossBuffers, Storm } from '../core';

/** Storms from this many bars on take their results' arrays from a ring (below); smaller ones fresh arrays. */
export const RING_FROM_BARS = 1 << 16;

/**
 * Loss and excess arrays for one storm's results, taken in turn from a ring
 * of three pairs. Fresh arrays for 10⁶ bars cost about 65 ms in chromium per
 * move of a drag (16 MB zeroed and paged in, measured); the ring makes them
 * once per storm. A result stays intact through the two results that follow
 * it (a deferred render may still show the one before the latest); the ring
 * starts anew for another storm object.
 */
export function lossRing(): (storm: Storm) => LossBuffers | undefined {
  let owner: Storm | null = null;
  let ring: LossBuffers[] = [];
  let turn = 0;
  return (storm) => {
    const n = storm.depthsMm.length;
    if (n < RING_FROM_BARS) return undefined;
    if (storm !== owner) [owner, ring, turn] = [storm, [], 0];
    return (ring[turn++ % 3] ??= { lossMm: new Float64Array(n), excessMm: new Float64Array(n) });
  };
}
