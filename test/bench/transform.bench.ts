// Runoff hydrographs (issue 13): rainfall excess of 10³, 10⁴ and 10⁵ bars
// routed through each transform by the public function (validation, unit
// response, gathering onto the step, convolution). Target (issue 13, median on
// the 2-core reference machine): 10⁵ bars to a hydrograph < 50 ms.
import { afterAll, test } from 'vitest';
import { TRANSFORMS, fitTransform, runoffHydrograph, type Transform } from '../../src/core';
import { measure, printTable, syntheticStorm } from './measure';

const SIZES = [1e3, 1e4, 1e5];
const AREA = 25e6;
const TRANSFORM_CASES: readonly [string, Transform][] = [
  ['nrcs-dimensionless, lag 1 h', { kind: 'nrcs-dimensionless', lagH: 1 }],
  ['nrcs-dimensionless, lag 6 h', { kind: 'nrcs-dimensionless', lagH: 6 }],
  ['nrcs, peak rate factor 300', { kind: 'nrcs-dimensionless', lagH: 1, peakRateFactor: 300 }],
  ['triangular, lag 1 h', { kind: 'triangular', lagH: 1 }],
  ['nash, n 3, k 0.5 h', { kind: 'nash', n: 3, kH: 0.5 }],
  ['nash, n 2.5, k 4 h', { kind: 'nash', n: 2.5, kH: 4 }],
  ['unit hydrograph (1 h, S-curve)', TRANSFORMS['unit-hydrograph'].defaults],
];

test('runoff hydrographs', () => {
  for (const n of SIZES) {
    // Gauge-like excess: 5–15 min bars, 30 % dry; the default step is the shortest bar.
    const storm = syntheticStorm(n, 11);
    const excess = { durationsH: storm.durationsH, excessMm: storm.depthsMm };
    for (const [name, transform] of TRANSFORM_CASES) {
      measure('runoffHydrograph', name, () => runoffHydrograph(excess, transform, AREA), {
        bars: n,
        ...(n === 1e5 ? { targetMs: 50 } : {}),
        samples: n >= 1e5 ? 9 : 15,
      });
    }
  }
  // Fitting on one event: 200 bars, every objective (each fit computes the
  // hydrograph some tens of times).
  const event = syntheticStorm(200, 5);
  const excess = { durationsH: event.durationsH, excessMm: event.depthsMm };
  const truth: Transform = { kind: 'nash', n: 3, kH: 1.2 };
  const observed = runoffHydrograph(excess, truth, AREA);
  const record = { timesH: observed.timesH, directM3s: observed.dischargeM3s };
  for (const objective of ['peak', 'time-of-peak', 'nse'] as const) {
    measure(
      'fitTransform',
      `nash k, ${objective}`,
      () => fitTransform(excess, { kind: 'nash', n: 3, kH: 0.3 }, 'kH', AREA, record, objective),
      { bars: 200, samples: 5, budgetMs: 1 },
    );
    measure(
      'fitTransform',
      `nrcs lag, ${objective}`,
      () => fitTransform(excess, { kind: 'nrcs-dimensionless', lagH: 0.3 }, 'lagH', AREA, record, objective),
      { bars: 200, samples: 5, budgetMs: 1 },
    );
  }
});

afterAll(() => printTable('Raincut runoff hydrograph benchmark (medians of repeated runs)'));
