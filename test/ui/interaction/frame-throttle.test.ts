import { describe, expect, it } from 'vitest';
import { frameThrottle } from '../../../src/ui/interaction/frame-throttle';

/** Animation frames run by hand: tick() is one frame. */
function fakeFrames() {
  const queue = new Map<number, () => void>();
  let next = 1;
  return {
    request: (cb: () => void) => {
      queue.set(next, cb);
      return next++;
    },
    cancel: (id: number) => void queue.delete(id),
    tick: () => {
      const callbacks = [...queue.values()];
      queue.clear();
      for (const cb of callbacks) cb();
    },
    pending: () => queue.size,
  };
}

function setup() {
  const frames = fakeFrames();
  const applied: number[] = [];
  const t = frameThrottle((v: number) => applied.push(v), frames.request, frames.cancel);
  return { frames, applied, t };
}

describe('one update per animation frame', () => {
  it('the first value of a frame is applied at once, without waiting for the frame', () => {
    const { applied, t } = setup();
    t.push(1);
    expect(applied).toEqual([1]);
  });

  it('later values in the same frame wait, and only the latest is kept', () => {
    const { frames, applied, t } = setup();
    t.push(1);
    t.push(2);
    t.push(3);
    expect(applied).toEqual([1]);
    // The frame closes with 3 waiting: 1 was applied in it already, so 3 waits for the next frame…
    frames.tick();
    expect(applied).toEqual([1]);
    // …where a new move supersedes it, applied at once.
    t.push(4);
    expect(applied).toEqual([1, 4]);
  });

  it('a waiting value is applied by the next frame when no move comes', () => {
    const { frames, applied, t } = setup();
    t.push(1);
    t.push(2);
    frames.tick();
    frames.tick();
    expect(applied).toEqual([1, 2]);
  });

  it('never applies more than one value between two frames', () => {
    const { frames, applied, t } = setup();
    const perFrame: number[] = [];
    let v = 0;
    for (let f = 0; f < 20; f++) {
      const before = applied.length;
      for (let m = 0; m < f % 4; m++) t.push(v++);
      frames.tick();
      perFrame.push(applied.length - before);
    }
    expect(Math.max(...perFrame)).toBeLessThanOrEqual(1);
    t.flush();
    expect(applied[applied.length - 1]).toBe(v - 1);
  });

  it('flush applies the waiting value at once and stops counting frames', () => {
    const { frames, applied, t } = setup();
    t.push(6);
    t.push(7);
    t.flush();
    expect(applied).toEqual([6, 7]);
    expect(frames.pending()).toBe(0);
    t.flush();
    expect(applied).toEqual([6, 7]);
  });

  it('cancel drops the waiting value', () => {
    const { frames, applied, t } = setup();
    t.push(6);
    t.push(7);
    t.cancel();
    frames.tick();
    expect(applied).toEqual([6]);
    expect(frames.pending()).toBe(0);
  });
});
