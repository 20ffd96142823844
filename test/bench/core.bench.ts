// Core throughput: each method's pass over the bars, and calibration, on
// storms of 10³, 10⁵ and 10⁶ bars. Targets (issue 2, medians on the 2-core
// reference machine): constant pass on 10⁶ bars < 8 ms; exact φ on 10⁶ < 20 ms.
import { afterAll, test } from 'vitest';
import { calibrate, computeLossesUnchecked, type LossBuffers, type LossMethod } from '../../src/core';
import { measure, printTable, syntheticStorm } from './measure';

const SIZES = [1e3, 1e5, 1e6];
const METHODS: readonly LossMethod[] = [
  { kind: 'constant', rateMmH: 6 },
  { kind: 'initial-continuing', initialMm: 15, rateMmH: 4 },
  { kind: 'proportional', coefficient: 0.35 },
];

test('loss passes and calibration', () => {
  for (const n of SIZES) {
    const storm = syntheticStorm(n, 7);
    const buffers: LossBuffers = { lossMm: new Float64Array(n), excessMm: new Float64Array(n) };
    for (const method of METHODS) {
      measure('pass (reused buffers)', method.kind, () => computeLossesUnchecked(storm, method, buffers), {
        bars: n,
        ...(method.kind === 'constant' && n === 1e6 ? { targetMs: 8 } : {}),
      });
    }
    const rain = computeLossesUnchecked(storm, { kind: 'proportional', coefficient: 1 }).rainMm;
    const target = 0.3 * rain;
    measure(
      'calibrate',
      'constant.rateMmH (exact φ)',
      () => calibrate(storm, METHODS[0] as LossMethod, 'rateMmH', target),
      {
        bars: n,
        ...(n === 1e6 ? { targetMs: 20 } : {}),
      },
    );
    measure(
      'calibrate',
      'proportional.coefficient',
      () => calibrate(storm, METHODS[2] as LossMethod, 'coefficient', target),
      {
        bars: n,
      },
    );
    for (const p of ['initialMm', 'rateMmH']) {
      measure(
        'calibrate',
        `initial-continuing.${p} (Brent)`,
        () => calibrate(storm, METHODS[1] as LossMethod, p, target),
        {
          bars: n,
          samples: n >= 1e6 ? 5 : 15,
        },
      );
    }
  }
});

afterAll(() => printTable('Raincut core benchmark (medians of repeated runs)'));
