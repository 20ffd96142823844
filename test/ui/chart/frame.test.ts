import { describe, expect, it } from 'vitest';
import { convertRate } from '../../../src/core';
import { formatWallTime, wallClockMs } from '../../../src/ui/chart/clock';
import { MARGIN, chartFrame, intensityPath } from '../../../src/ui/chart/frame';

const storm = { durationsH: [0.5, 0.5, 0.5, 0.5], depthsMm: [2, 6, 10, 2] }; // peak 20 mm/h

describe('chart frame', () => {
  it('the rate axis tops out at a round value above the peak, in the units on screen', () => {
    const si = chartFrame(storm, 800, 300, 'si');
    expect(si.topDisplay).toBeGreaterThan(20);
    expect(si.topMmH).toBe(si.topDisplay);
    expect(si.yTitle).toBe('Rainfall intensity (mm/h)');
    const us = chartFrame(storm, 800, 300, 'us');
    expect(us.topDisplay).toBeGreaterThan(convertRate(20, 'mm/h', 'in/h'));
    expect(us.topMmH).toBeCloseTo(convertRate(us.topDisplay, 'in/h', 'mm/h'), 12);
    expect(us.yTitle).toBe('Rainfall intensity (in/h)');
    expect(us.yTicks.map((t) => t.label)).toContain('0.2');
  });

  it('bar edges run from the left to the right of the plot; tops are the bars’ intensities', () => {
    const f = chartFrame(storm, 800, 300, 'si');
    expect(f.edgesPx[0]).toBe(MARGIN.left);
    expect(f.edgesPx[4]).toBe(800 - MARGIN.right);
    // 718 px over 2 h: bars 179.5 px wide, each its own rectangle at its intensity (2 mm / 0.5 h = 4 mm/h, 12, 20, 4).
    const r = (v: number): number => Math.round(v * 100) / 100;
    const tops = [...intensityPath(f, storm.depthsMm, storm.durationsH).matchAll(/V([\d.]+)H/g)].map((m) =>
      Number(m[1]),
    );
    expect(tops).toEqual([4, 12, 20, 4].map((mmH) => r(f.y(mmH))));
  });

  it('without a start the time axis is hours and minutes from the start', () => {
    const f = chartFrame(storm, 800, 300, 'si');
    expect(f.xTitle).toBe('Time from storm start (h:mm)');
    expect(f.xTicks[0]?.label).toBe('0:00');
  });

  it('without a start, ticks fall on bar edges: 18 bars of 10 min get a tick every 30 min, each under a bar’s start', () => {
    const tenMin = {
      durationsH: Array.from({ length: 18 }, () => 1 / 6),
      depthsMm: Array.from({ length: 18 }, () => 1),
    };
    // 880 px wide: (880 − 62 − 20)/90 → at most 8 ticks over 180 min. Round steps that are whole bars: 10 (18
    // ticks), 20 (9), 30 (6 + 1): the first that fits is 30 min.
    const f = chartFrame(tenMin, 880, 300, 'si');
    expect(f.xTicks.map((t) => t.label)).toEqual(['0:00', '0:30', '1:00', '1:30', '2:00', '2:30', '3:00']);
    f.xTicks.forEach((t, i) => expect(t.px).toBeCloseTo(f.edgesPx[i * 3] as number, 9));
  });

  it('without a start, bars of an odd length get ticks every whole number of bars (7-min bars: every 14 min)', () => {
    const seven = {
      durationsH: Array.from({ length: 10 }, () => 7 / 60),
      depthsMm: Array.from({ length: 10 }, () => 1),
    };
    // 70 min over at most 8 ticks: 8.75 min a tick at least; no round step (1, 2, 5, 10 …) is whole 7-min bars,
    // so two bars: 14 min → 0:00, 0:14, 0:28, 0:42, 0:56, 1:10.
    const f = chartFrame(seven, 880, 300, 'si');
    expect(f.xTicks.map((t) => t.label)).toEqual(['0:00', '0:14', '0:28', '0:42', '0:56', '1:10']);
    f.xTicks.forEach((t, i) => expect(t.px).toBeCloseTo(f.edgesPx[i * 2] as number, 9));
  });

  it('with a start the time axis reads the storm’s own clock, whatever the viewer’s zone', () => {
    const f = chartFrame({ ...storm, startIso: '2026-07-14T15:00:00+10:00' }, 800, 300, 'si');
    expect(f.xTicks[0]?.label).toBe('15:00');
    expect(f.xTicks.map((t) => t.label)).toContain('16:00');
    expect(f.xTitle).toBe('Clock time, storm from 14 Jul 2026 15:00');
  });

  it('an empty storm still has a drawable frame', () => {
    const f = chartFrame({ durationsH: [], depthsMm: [] }, 800, 300, 'si');
    expect(f.topDisplay).toBe(10);
    expect(f.edgesPx).toHaveLength(1);
  });
});

describe('wall clock', () => {
  it('reads the fields as written', () => {
    const t = wallClockMs('2026-07-14T23:45:30.5Z');
    expect(t).toBe(Date.UTC(2026, 6, 14, 23, 45, 30, 500));
    expect(formatWallTime(wallClockMs('2026-07-14T09:05-05:00') ?? NaN)).toBe('09:05');
    expect(wallClockMs('yesterday')).toBeNull();
  });
});
