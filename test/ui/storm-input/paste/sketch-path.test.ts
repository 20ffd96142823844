import fc from 'fast-check';
import { scaleLinear } from 'd3-scale';
import { describe, expect, it } from 'vitest';
import { barEdgesH, peakIntensityMmH, totalDurationH } from '../../../../src/core';
import { barsPath } from '../../../../src/ui/chart/bar-path';
import { SKETCH_HEIGHT, SKETCH_PAD, SKETCH_WIDTH } from '../../../../src/ui/import-kit';
import { sketchPath } from '../../../../src/ui/storm-input/paste/sketch-path';

/**
 * The sketch as it was drawn before the one-pass path: every bar's edges
 * (barEdgesH), its intensity, both through d3's scales one value at a time,
 * then barsPath on those columns.
 */
function sketchByColumns(durationsH: number[], depthsMm: number[]): string {
  const storm = { durationsH, depthsMm };
  const totalH = totalDurationH(storm);
  const peak = peakIntensityMmH(storm);
  const x = scaleLinear()
    .domain([0, totalH || 1])
    .range([SKETCH_PAD.left, SKETCH_WIDTH - SKETCH_PAD.right]);
  const y = scaleLinear()
    .domain([0, peak > 0 ? peak : 1])
    .range([SKETCH_HEIGHT - SKETCH_PAD.bottom, SKETCH_PAD.top]);
  const edges = Array.from(barEdgesH(storm), (e) => x(e));
  const tops = depthsMm.map((p, k) => y(p / (durationsH[k] as number)));
  return barsPath(edges, tops, SKETCH_HEIGHT - SKETCH_PAD.bottom);
}

describe('the import preview sketch in one pass', () => {
  it('draws the path the bars drawn column by column give, on random storms of few to many bars', () => {
    const bar = fc.tuple(
      fc.constantFrom(1 / 60, 5 / 60, 0.25, 1, 3),
      fc.oneof(fc.constant(0), fc.double({ min: 0, max: 80, noNaN: true })),
    );
    fc.assert(
      fc.property(fc.array(bar, { minLength: 0, maxLength: 3000 }), (bars) => {
        const durationsH = bars.map(([d]) => d);
        const depthsMm = bars.map(([, p]) => p);
        const storm = { durationsH, depthsMm };
        expect(sketchPath(storm, totalDurationH(storm), peakIntensityMmH(storm))).toBe(
          sketchByColumns(durationsH, depthsMm),
        );
      }),
      { numRuns: 60 },
    );
  });

  it('merges 10⁵ five-minute bars into at most one mark per pixel column', () => {
    // 10⁵ bars over a 552 px wide plot (560 − 4 − 4): about 181 bars a pixel column, so at most 553 marks.
    const n = 100_000;
    const durationsH = new Array<number>(n).fill(5 / 60);
    const depthsMm = Array.from({ length: n }, (_, k) => (k % 7 === 0 ? 1.2 : 0.2));
    const storm = { durationsH, depthsMm };
    const d = sketchPath(storm, totalDurationH(storm), peakIntensityMmH(storm));
    expect(d).toBe(sketchByColumns(durationsH, depthsMm));
    expect(d.split('M').length - 1).toBeLessThanOrEqual(553);
    expect(d.split('M').length - 1).toBeGreaterThan(500);
  });
});
