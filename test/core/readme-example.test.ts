// The core example printed in README.md gives the numbers the README shows.
import { describe, expect, it } from 'vitest';
import { calibrate, computeLosses } from '../../src/core';
import { expectClose } from '../helpers/tolerance';

describe('README core example', () => {
  const storm = { durationsH: [0.5, 0.5, 1], depthsMm: [2, 10, 6] };
  it('computeLosses at 4 mm/h and calibrate to 9 mm of runoff', () => {
    expectClose(computeLosses(storm, { kind: 'constant', rateMmH: 4 }).totalExcessMm, 10); // 8 + 2
    const r = calibrate(storm, { kind: 'constant', rateMmH: 0 }, 'rateMmH', 9);
    expect(r.ok).toBe(true);
    if (r.ok) {
      expectClose(r.value, 14 / 3, 1e-14); // bars 2 and 3 above φ: 16 − 1.5φ = 9
      expectClose(r.excessMm, 9, 1e-14);
    }
  });
});
