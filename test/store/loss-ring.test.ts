import { describe, expect, it } from 'vitest';
import { computeLosses, METHOD_KINDS } from '../../src/core';
import { createWorkbenchStore } from '../../src/store';
import { lossRing, RING_FROM_BARS } from '../../src/store/loss-ring';
import { FOUR_BARS } from '../helpers/scenario-fixtures';

/** n bars of 5 minutes; depths 0, 0.5, 1, … 2.5 mm in turn (invented). */
function longStorm(n: number): { durationsH: number[]; depthsMm: number[] } {
  return {
    durationsH: new Array<number>(n).fill(1 / 12),
    depthsMm: Array.from({ length: n }, (_, k) => (k % 6) * 0.5),
  };
}

describe('lossRing', () => {
  it('gives small storms no buffers (fresh arrays), and large ones three pairs in turn', () => {
    const next = lossRing();
    expect(next(longStorm(RING_FROM_BARS - 1))).toBeUndefined();
    const storm = longStorm(RING_FROM_BARS);
    const [a, b, c, d] = [next(storm), next(storm), next(storm), next(storm)];
    expect(a?.lossMm.length).toBe(RING_FROM_BARS);
    expect(new Set([a?.lossMm, b?.lossMm, c?.lossMm]).size).toBe(3);
    expect(new Set([a?.excessMm, b?.excessMm, c?.excessMm, a?.lossMm]).size).toBe(4);
    // The fourth result takes the first one's arrays: the two before it stay intact.
    expect(d).toBe(a);
    // Another storm object, even of the same length, starts a ring of its own.
    const other = longStorm(RING_FROM_BARS);
    const e = next(other);
    expect([a, b, c]).not.toContain(e);
    expect(e?.lossMm).not.toBe(a?.lossMm);
  });
});

describe('lossRing warming its other pairs while the storm is only shown', () => {
  /** A `later` that keeps its tasks until run() is called. */
  function queue(): { later: (task: () => void) => void; run: () => number } {
    const tasks: (() => void)[] = [];
    return {
      later: (task) => void tasks.push(task),
      run: () => {
        let ran = 0;
        for (let task = tasks.shift(); task; task = tasks.shift()) {
          ran++;
          task();
        }
        return ran;
      },
    };
  }

  it('makes the two other pairs ahead of the drag, in small tasks, and hands them out in turn', () => {
    const q = queue();
    const next = lossRing(q.later);
    const n = RING_FROM_BARS * 8; // 2^19 bars
    const storm = longStorm(n);
    const a = next(storm);
    // n = 2^19 values an array; chunks of 2^18: 2 tasks an array, 4 a pair, 8 for the two pairs, then one that
    // finds nothing left to warm.
    expect(q.run()).toBe(9);
    const [b, c] = [next(storm), next(storm)];
    expect(b?.lossMm.length).toBe(n);
    expect(new Set([a, b, c]).size).toBe(3);
    expect(next(storm)).toBe(a);
  });

  it('never writes a pair a result has taken, and stops for another storm', () => {
    const q = queue();
    const next = lossRing(q.later);
    const storm = longStorm(RING_FROM_BARS * 2);
    next(storm);
    const b = next(storm); // slot 1 taken before any warming ran
    b?.lossMm.fill(7);
    b?.excessMm.fill(3);
    q.run();
    expect(b?.lossMm.every((v) => v === 7)).toBe(true);
    expect(b?.excessMm.every((v) => v === 3)).toBe(true);
    // A new storm: the old storm's warming does nothing more (the queue holds the new storm's alone).
    const warmOld = queue();
    const next2 = lossRing(warmOld.later);
    next2(storm);
    next2(longStorm(RING_FROM_BARS));
    // The old storm's one task finds it gone (1); the new storm's 2^16 values are one chunk an array, 2 a pair,
    // 4 for the two pairs (4), and one more finds nothing left (1).
    expect(warmOld.run()).toBe(1 + 4 + 1);
  });
});

describe('the store’s results of a large storm', () => {
  it('match fresh computeLosses for every method, from buffers another method wrote', () => {
    const n = RING_FROM_BARS + 10;
    const store = createWorkbenchStore({ ...FOUR_BARS, storm: longStorm(n) });
    const { derived } = store;
    const kept: { loss: Float64Array; result: { lossMm: Float64Array } }[] = [];
    // Each kind twice over, so every pair of the ring is written by one method and then read back by another.
    for (const kind of [...METHOD_KINDS, ...METHOD_KINDS]) {
      store.getState().actions.setMethodKind(kind);
      const s = store.getState().scenario;
      const r = derived.results(s);
      expect(r.ok).toBe(true);
      if (!r.ok) continue;
      // The reference: computeLosses into fresh arrays, on the plain-array storm as the user entered it.
      const fresh = computeLosses(s.storm, r.method);
      expect(r.result.lossMm).toEqual(fresh.lossMm);
      expect(r.result.excessMm).toEqual(fresh.excessMm);
      expect(r.result.totalExcessMm).toBe(fresh.totalExcessMm);
      kept.push({ loss: Float64Array.from(r.result.lossMm), result: r.result });
    }
    // The result before the latest (a deferred render may still show it) still holds its own numbers.
    const before = kept[kept.length - 2];
    expect(before).toBeDefined();
    expect(before?.result.lossMm).toEqual(before?.loss);
  });
});

describe('lossRing readied for a storm about to enter the store', () => {
  it('pages in the first pair in small tasks, and the first result then takes that pair', async () => {
    const tasks: (() => void)[] = [];
    const next = lossRing((task) => void tasks.push(task));
    const storm = longStorm(RING_FROM_BARS * 4); // 2^18 values an array: one chunk each
    let ready = false;
    const prepared = next.prepare(storm).then(() => (ready = true));
    // Nothing is written in the call itself: the first chunk waits for a task.
    expect(tasks.length).toBe(1);
    // The first pair: one chunk of its loss array, one of its excess; the next task finds it done and says so.
    for (let i = 0; i < 3; i++) tasks.shift()?.();
    await prepared;
    expect(ready).toBe(true);
    const a = next(storm);
    expect(a?.lossMm.length).toBe(RING_FROM_BARS * 4);
    // The warming goes on to the two other pairs, which the next results take.
    for (let task = tasks.shift(); task; task = tasks.shift()) task();
    expect(new Set([a, next(storm), next(storm)]).size).toBe(3);
    expect(next(storm)).toBe(a);
  });

  it('settles at once for a short storm, and when another storm takes the ring meanwhile', async () => {
    const tasks: (() => void)[] = [];
    const next = lossRing((task) => void tasks.push(task));
    await next.prepare(longStorm(10));
    const prepared = next.prepare(longStorm(RING_FROM_BARS * 2));
    next(longStorm(RING_FROM_BARS)); // another storm's result before the warming ran
    tasks.shift()?.();
    await prepared;
  });
});
