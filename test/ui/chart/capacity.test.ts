// @vitest-environment jsdom
import { line } from 'd3-shape';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeLosses, greenAmptRateMmH, hortonCapacityMmH, type LossMethod } from '../../../src/core';
import { CAPACITY_CURVES, capacityPath } from '../../../src/ui/chart/capacity';
import { chartFrame } from '../../../src/ui/chart/frame';

const storm = { durationsH: [0.5, 0.5, 0.5, 0.5], depthsMm: [2, 6, 10, 2] };
const frame = chartFrame(storm, 800, 300, 'si');

/** The path's points, px (d3-shape writes them to three decimals). */
const points = (d: string | null): [number, number][] =>
  (d ?? '')
    .replace(/^M/, '')
    .split('L')
    .map((p) => p.split(',').map(Number) as [number, number]);

describe('capacity curves through the storm', () => {
  it('Horton from the storm start follows the core’s capacity at clock time', () => {
    const method: LossMethod = { kind: 'horton', f0MmH: 15, fcMmH: 3, kPerH: 1.5, ponding: false };
    const d = CAPACITY_CURVES.horton?.path(frame, storm, method, computeLosses(storm, method).lossMm) ?? null;
    const pts = points(d);
    expect(pts.length).toBeGreaterThan(100);
    const [x0, y0] = pts[0] as [number, number];
    expect(x0).toBeCloseTo(frame.x(0), 2);
    expect(y0).toBeCloseTo(frame.y(15), 2);
    const [x1, y1] = pts[pts.length - 1] as [number, number];
    expect(x1).toBeCloseTo(frame.x(2), 2);
    expect(y1).toBeCloseTo(frame.y(hortonCapacityMmH(15, 3, 1.5, 2)), 2);
  });

  it('Horton with time compression draws f from the infiltrated depth F(t), ending at f(F) for F = the losses summed', () => {
    const method: LossMethod = { kind: 'horton', f0MmH: 15, fcMmH: 3, kPerH: 1.5, ponding: true };
    const loss = computeLosses(storm, method).lossMm;
    const pts = points(CAPACITY_CURVES.horton?.path(frame, storm, method, loss) ?? null);
    expect(pts.length).toBeGreaterThan(100);
    expect(pts[0]?.[1]).toBeCloseTo(frame.y(15), 2);
    // τ with F(τ) = ΣL by bisection on F(τ) = 3τ + 8(1 − e^(−1.5τ)) (Horton 1940), then f(τ).
    const total = Array.from(loss).reduce((a, b) => a + b, 0);
    let lo = 0;
    let hi = 50;
    for (let i = 0; i < 200; i++) {
      const mid = (lo + hi) / 2;
      if (3 * mid + 8 * (1 - Math.exp(-1.5 * mid)) < total) lo = mid;
      else hi = mid;
    }
    const last = pts[pts.length - 1] as [number, number];
    expect(last[0]).toBeCloseTo(frame.x(2), 2);
    expect(last[1]).toBeCloseTo(frame.y(3 + 12 * Math.exp(-1.5 * lo)), 2);
  });

  it('Horton with recovery rises again through a dry bar', () => {
    const gap = { durationsH: [0.5, 1, 0.5], depthsMm: [10, 0, 10] };
    const gapFrame = chartFrame(gap, 800, 300, 'si');
    const method: LossMethod = {
      kind: 'horton',
      f0MmH: 15,
      fcMmH: 3,
      kPerH: 1.5,
      ponding: false,
      recovers: true,
      recoveryPerH: 2,
    };
    const pts = points(CAPACITY_CURVES.horton?.path(gapFrame, gap, method, computeLosses(gap, method).lossMm) ?? null);
    const at = (h: number): number => {
      const px = gapFrame.x(h);
      return pts.reduce((best, p) => (Math.abs(p[0] - px) < Math.abs(best[0] - px) ? p : best))[1];
    };
    // Higher capacity is higher on the chart, a smaller y.
    expect(at(1.5)).toBeLessThan(at(0.5));
  });

  it('Green–Ampt capacity at each bar end comes from the depth infiltrated so far', () => {
    const method: LossMethod = { kind: 'green-ampt', ksMmH: 3.4, suctionMm: 88.9, moistureDeficit: 0.3 };
    const loss = computeLosses(storm, method).lossMm;
    const pts = points(CAPACITY_CURVES['green-ampt']?.path(frame, storm, method, loss) ?? null);
    expect(pts.length).toBeGreaterThan(100);
    // Dry soil at the start: unbounded capacity, drawn along the top of the axis.
    expect(pts[0]?.[1]).toBeCloseTo(frame.y(frame.topMmH), 2);
    const f2 = (loss[0] as number) + (loss[1] as number);
    const atOne = pts.find((p) => Math.abs(p[0] - frame.x(1)) < 1e-3);
    expect(atOne?.[1]).toBeCloseTo(frame.y(Math.min(frame.topMmH, greenAmptRateMmH(3.4, 88.9, 0.3, f2))), 2);
  });

  it('methods without a capacity curve have none', () => {
    expect(CAPACITY_CURVES.constant).toBeUndefined();
    expect(CAPACITY_CURVES.proportional).toBeUndefined();
  });
});

describe('a capacity above the chart’s top is marked, never clipped silently', () => {
  it('Horton with f₀ = 80 mm/h over a storm peaking at 20 mm/h says it runs up to 80 mm/h', () => {
    // The axis tops out near 20 × 1.12 = 22.4 → a round 25 mm/h; f(0) = f₀ = 80 mm/h is above it (Horton 1940).
    const method: LossMethod = { kind: 'horton', f0MmH: 80, fcMmH: 3, kPerH: 1.5, ponding: false };
    const drawn = CAPACITY_CURVES.horton?.draw(frame, storm, method) ?? null;
    expect(frame.topMmH).toBeLessThan(80);
    expect(drawn?.aboveTopMmH).toBeCloseTo(80, 9);
  });
  it('Horton under the top is not marked', () => {
    const method: LossMethod = { kind: 'horton', f0MmH: 15, fcMmH: 3, kPerH: 1.5, ponding: false };
    expect(CAPACITY_CURVES.horton?.draw(frame, storm, method)?.aboveTopMmH).toBeNull();
  });
  it('on the workbench the chart says so under the plot and marks the top edge', async () => {
    const { renderWorkbench } = await import('../../helpers/render');
    const { FOUR_BARS } = await import('../../helpers/scenario-fixtures');
    const { screen } = await import('@testing-library/react');
    renderWorkbench({ ...FOUR_BARS, method: { kind: 'horton', f0MmH: 80, fcMmH: 3, kPerH: 1.5, ponding: false } });
    expect(
      screen.getByText(/The infiltration capacity runs above the top of the chart.*up to 80 mm\/h\./),
    ).toBeInTheDocument();
    expect(screen.getByText('▲ capacity above the chart')).toBeInTheDocument();
  });
});

describe('the capacity polyline', () => {
  it('is written as d3-shape’s line() writes the same points (the reference library, at its default 3 digits)', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            tH: fc.double({ min: 0, max: 2, noNaN: true }),
            rateMmH: fc.oneof(fc.double({ min: 0, max: 80, noNaN: true }), fc.constant(Infinity)),
          }),
          { minLength: 2, maxLength: 60 },
        ),
        (samples) => {
          const tH = samples.map((p) => p.tH);
          const rate = samples.map((p) => p.rateMmH);
          const clipped = rate.map((r) => (Number.isFinite(r) ? Math.min(r, frame.topMmH) : frame.topMmH));
          const reference = line()(tH.map((t, i) => [frame.x(t), frame.y(clipped[i] as number)]));
          expect(capacityPath(frame, tH, rate)).toBe(reference);
        },
      ),
    );
  });
});
