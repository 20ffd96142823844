import { describe, expect, it } from 'vitest';
import { chartFrame, intensityPath, rainPath } from '../../../src/ui/chart/frame';
import { chartFrameInSteps } from '../../../src/ui/chart/frame-steps';
import { SLICE } from '../../../src/store/next-task';

/**
 * n bars of uneven length (1 to 30 min, a seeded sequence) with depths to
 * 0.1 mm: invented, made so that the running sum of durations rounds
 * differently from bar to bar, as a gauge record's does.
 */
function unevenStorm(n: number, startIso?: string) {
  let seed = 12345;
  const next = (): number => (seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648;
  const durationsH = Array.from({ length: n }, () => (1 + Math.floor(next() * 30)) / 60);
  const depthsMm = Array.from({ length: n }, () => Math.round(next() * 40) / 10);
  return startIso === undefined ? { durationsH, depthsMm } : { durationsH, depthsMm, startIso };
}

/** The first index where two columns differ bit for bit (Object.is: −0 and NaN told apart), or −1. */
function firstDifference(a: Float64Array, b: Float64Array): number {
  if (a.length !== b.length) return Math.min(a.length, b.length);
  for (let k = 0; k < a.length; k++) if (!Object.is(a[k], b[k])) return k;
  return -1;
}

describe('a long storm’s chart frame worked out in steps', () => {
  // Over two slices and a part, so the slices' seams are crossed.
  const n = 2 * SLICE + 1234;

  it('is chartFrame’s frame to the last bit: scales, ticks, every edge, and the rainfall path', async () => {
    for (const storm of [unevenStorm(n), unevenStorm(n, '2026-03-01T06:00')]) {
      const whole = chartFrame(storm, 880, 300, 'si');
      const stepped = await chartFrameInSteps(storm, 880, 300, 'si', undefined, () => true);
      expect(stepped).not.toBeNull();
      if (!stepped) continue;
      expect(firstDifference(stepped.edgesPx, whole.edgesPx)).toBe(-1);
      expect(stepped.xTicks).toEqual(whole.xTicks);
      expect(stepped.yTicks).toEqual(whole.yTicks);
      expect([stepped.topMmH, stepped.xTitle, stepped.plot]).toEqual([whole.topMmH, whole.xTitle, whole.plot]);
      expect(rainPath(stepped, storm)).toBe(intensityPath(whole, storm.depthsMm, storm.durationsH));
    }
  });

  it('on a shared time span (a streamflow record beside the storm) as well', async () => {
    const storm = unevenStorm(n);
    const span = { startH: -3, endH: 20_000 };
    const whole = chartFrame(storm, 1000, 260, 'us', span);
    const stepped = await chartFrameInSteps(storm, 1000, 260, 'us', span, () => true);
    expect(stepped && firstDifference(stepped.edgesPx, whole.edgesPx)).toBe(-1);
  });

  it('stops, giving nothing, once it is no longer wanted (the storm or the size changed)', async () => {
    let asked = 0;
    const stepped = await chartFrameInSteps(unevenStorm(n), 880, 300, 'si', undefined, () => ++asked < 3);
    expect(stepped).toBeNull();
    expect(asked).toBe(3);
  });
});
