import { describe, expect, it } from 'vitest';
import { calibrate } from '../../../src/core';
import { SCAN_POINTS, solveByScan } from '../../../src/core/calibrate/scan';

describe('solving a response that need not be monotone (scan, then Brent on the piece)', () => {
  it('finds the first crossing of a response that falls and rises again', () => {
    // g(x) = (x − 3)², target 1: crossings at 2 and 4; the scan meets 2 first.
    const r = solveByScan((x) => (x - 3) ** 2, 0, 10, 1);
    expect(r.ok && Math.abs(r.x - 2)).toBeLessThanOrEqual(1e-9);
  });

  it('finds a dip that lies between two scanned points', () => {
    // Points at 0, 0.25, …, 12 (48 stretches of [0, 12]); the dip of g = |x − 3.1|·100 + 1 reaches
    // 1 at x = 3.1, between 3 and 3.25 where g is 11 and 16: a target of 2 is met at 3.09 and 3.11.
    expect(SCAN_POINTS).toBe(48);
    const r = solveByScan((x) => Math.abs(x - 3.1) * 100 + 1, 0, 12, 2);
    expect(r.ok).toBe(true);
    if (r.ok) expect(Math.min(Math.abs(r.x - 3.09), Math.abs(r.x - 3.11))).toBeLessThanOrEqual(1e-9);
  });

  it('says plainly that no value was found, naming the closest one tried', () => {
    const r = solveByScan((x) => (x - 3) ** 2 + 5, 0, 12, 1);
    expect(r).toMatchObject({ ok: false, x: 3, g: 5 });
  });

  it('is how calibrate fits Green–Ampt λ, whose runoff falls and then rises', () => {
    // Loam, 5 mm in 15 min, an hour dry, 5 mm in 15 min: runoff is lowest near λ = 1
    // (see test/core/calibrate/infiltration.test.ts); a runoff below that minimum has no answer.
    const storm = { durationsH: [0.25, 1, 0.25], depthsMm: [5, 0, 5] };
    const method = { kind: 'green-ampt', ksMmH: 3.4, suctionMm: 88.9, moistureDeficit: 0.3, recovers: true } as const;
    const r = calibrate(storm, method, 'poreSizeIndex', 0.5);
    expect(r).toMatchObject({ ok: false, reason: 'bound-reached' });
    if (!r.ok)
      expect(r.message).toMatch(
        /^No pore-size distribution index λ between 0.01 and 10 was found to give 0.5 mm of runoff \(runoff need not rise or fall steadily with it; of 49 values tried across the range, .* came closest with 0.65\d* mm\)\.$/,
      );
  });
});
