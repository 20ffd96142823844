// The Nash cascade (Nash 1957): its instantaneous unit hydrograph, S-curve and
// the hydrograph built from them.
import { describe, expect, it } from 'vitest';
import { logGamma, nashIuh, nashSCurve, runoffHydrograph, unitResponse } from '../../../src/core';
import { expectClose } from '../../helpers/tolerance';

describe('Nash instantaneous unit hydrograph', () => {
  it('peaks at t = (n − 1)·k with u = (n−1)^(n−1)·e^(−(n−1))/(k·Γ(n))', () => {
    // n = 3, k = 2 h: peak at 4 h, u = 2²·e^(−2)/(2·2!) = e^(−2) = 0.1353352832366127 /h.
    expectClose(nashIuh(4, 3, 2), Math.exp(-2), 1e-14);
    for (const [n, k] of [
      [3, 2],
      [2.5, 0.8],
      [1.7, 3],
      [6.3, 0.25],
    ] as const) {
      const tp = (n - 1) * k;
      const peak = Math.exp((n - 1) * Math.log(n - 1) - (n - 1) - logGamma(n)) / k;
      expectClose(nashIuh(tp, n, k), peak, 1e-13);
      // Lower on both sides, by the second-order amount of a true maximum.
      for (const dt of [1e-3, 1e-2]) {
        expect(nashIuh(tp - dt * k, n, k)).toBeLessThan(peak);
        expect(nashIuh(tp + dt * k, n, k)).toBeLessThan(peak);
      }
    }
  });

  it('is a linear reservoir for n = 1: u = e^(−t/k)/k, S = 1 − e^(−t/k)', () => {
    for (const t of [0.1, 1, 3.7]) {
      expectClose(nashIuh(t, 1, 2), Math.exp(-t / 2) / 2, 1e-14);
      expectClose(nashSCurve(t, 1, 2), -Math.expm1(-t / 2), 1e-14);
    }
  });

  it('has an S-curve that is its integral (Simpson, 2000 panels over 1–3 h)', () => {
    // Away from t = 0, where u ~ t^1.5 would slow Simpson's convergence.
    const n = 2.5;
    const k = 0.8;
    const [a, b] = [1, 3];
    const panels = 2000;
    const h = (b - a) / panels;
    let sum = nashIuh(a, n, k) + nashIuh(b, n, k);
    for (let i = 1; i < panels; i++) sum += (i % 2 === 1 ? 4 : 2) * nashIuh(a + i * h, n, k);
    expectClose(nashSCurve(b, n, k) - nashSCurve(a, n, k), (sum * h) / 3, 1e-12);
  });
});

describe('Nash hydrograph', () => {
  it('from a short pulse peaks at (n − 1)·k plus half the pulse with the IUH peak', () => {
    // 1 mm in 0.01 h on 1 km² (1000 m³): q(t) ≈ 1000·u(t − 0.005)/3600, peak
    // 1000·e^(−2)/3600 = 0.0375931 m³/s at 4.005 h; the sampled peak (every 0.01 h)
    // is within 1e-4 of it, at 4.00 or 4.01 h.
    const h = runoffHydrograph({ durationsH: [0.01], excessMm: [1] }, { kind: 'nash', n: 3, kH: 2 }, 1e6);
    expectClose(h.peakM3s, (1000 * Math.exp(-2)) / 3600, 1e-4);
    expect(Math.abs(h.timeOfPeakH - 4.005)).toBeLessThanOrEqual(0.0051);
    expectClose(h.volumeM3, 1000, 1e-12);
  });

  it('gives the linear reservoir exactly for n = 1', () => {
    // 2 mm over one 0.5 h step on 1 km², k = 1 h: at t = j·0.5 h (j ≥ 1) the
    // outflow is 2000 m³ × (e^(−(j−1)/2) − e^(−j/2)) / 1800 s.
    const h = runoffHydrograph({ durationsH: [0.5], excessMm: [2] }, { kind: 'nash', n: 1, kH: 1 }, 1e6);
    expect(h.dischargeM3s[0]).toBe(0);
    for (let j = 1; j < 30; j++) {
      const expected = (2000 * (Math.exp(-(j - 1) / 2) - Math.exp(-j / 2))) / 1800;
      // 1e-13: the weights are rescaled by 1/(1 − 1e-14 tail).
      expectClose(h.dischargeM3s[j] as number, expected, 1e-13);
    }
  });

  it('carries its response until all but 1e-14 of it has run off, for whole and fractional n', () => {
    for (const [n, k, step] of [
      [0.6, 0.3, 0.05],
      [2.5, 0.8, 1 / 12],
      [12, 0.1, 0.25],
    ] as const) {
      const r = unitResponse({ kind: 'nash', n, kH: k }, step);
      let sum = 0;
      for (const w of r) sum += w;
      expectClose(sum, 1, 1e-14);
      const lastH = (r.length - 1) * step;
      expect(nashSCurve(lastH - step, n, k)).toBeLessThan(1 - 1e-14);
      expect(1 - nashSCurve(lastH + step, n, k)).toBeLessThan(1e-13);
    }
  });
});
