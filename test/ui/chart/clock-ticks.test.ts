import { scaleUtc } from 'd3-scale';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { totalDurationH } from '../../../src/core';
import { wallClockMs } from '../../../src/ui/chart/clock';
import { MARGIN, chartFrame } from '../../../src/ui/chart/frame';
import { stormArb } from '../../helpers/arbitraries';

/** Clock starts from 2001 to 2038, to the minute, as ISO wall-clock text. */
const startArb = fc
  .integer({ min: Date.UTC(2001, 0, 1) / 60_000, max: Date.UTC(2038, 0, 1) / 60_000 })
  .map((minutes) => new Date(minutes * 60_000).toISOString().slice(0, 16) + ':00');

describe('the clock axis', () => {
  it('places the same ticks at the same pixels as d3’s UTC time scale (reference: d3-scale’s scaleUtc)', () => {
    fc.assert(
      fc.property(stormArb(40), startArb, fc.integer({ min: 300, max: 1600 }), (storm, startIso, width) => {
        const frame = chartFrame({ ...storm, startIso }, width, 300, 'si');
        // What the chart drew with d3's time scale: the storm's span on the clock, ticks one per ~90 px.
        const startMs = wallClockMs(startIso);
        if (startMs === null) throw new Error(`${startIso} is not read as a clock`);
        const left = MARGIN.left;
        const right = width - MARGIN.right;
        const clock = scaleUtc()
          .domain([startMs, startMs + totalDurationH(storm) * 3.6e6])
          .range([left, right]);
        const want = clock.ticks(Math.max(2, Math.floor((right - left) / 90))).map((t) => clock(t));
        expect(frame.xTicks.map((t) => t.px)).toEqual(want);
      }),
    );
  });
});
