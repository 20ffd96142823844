import { describe, expect, it } from 'vitest';
import { frameThrottle } from '../../../src/ui/chart/frame-throttle';

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

describe('one update per animation frame', () => {
  it('passes only the latest value of each frame', () => {
    const frames = fakeFrames();
    const applied: number[] = [];
    const t = frameThrottle((v: number) => applied.push(v), frames.request, frames.cancel);
    t.push(1);
    t.push(2);
    t.push(3);
    expect(frames.pending()).toBe(1);
    frames.tick();
    t.push(4);
    frames.tick();
    expect(applied).toEqual([3, 4]);
  });

  it('flush applies the pending value at once (release never loses the last move)', () => {
    const frames = fakeFrames();
    const applied: number[] = [];
    const t = frameThrottle((v: number) => applied.push(v), frames.request, frames.cancel);
    t.push(7);
    t.flush();
    expect(applied).toEqual([7]);
    expect(frames.pending()).toBe(0);
    t.flush();
    expect(applied).toEqual([7]);
  });

  it('cancel drops the pending value', () => {
    const frames = fakeFrames();
    const applied: number[] = [];
    const t = frameThrottle((v: number) => applied.push(v), frames.request, frames.cancel);
    t.push(7);
    t.cancel();
    frames.tick();
    expect(applied).toEqual([]);
  });
});
