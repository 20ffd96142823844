// A unit hydrograph of one's own: the S-curve conversion to the output step,
// and the volume it holds over the catchment.
import { describe, expect, it } from 'vitest';
import {
  TRANSFORMS,
  nashSCurve,
  runoffHydrograph,
  unitHydrographVolumeMm,
  unitResponse,
  type UnitHydrographTransform,
} from '../../../src/core';
import { monotoneCubic } from '../../../src/core/transform/pchip';
import { expectInputError } from '../../helpers/input-error';
import { expectClose } from '../../helpers/tolerance';

const AREA = 2e6; // 2 km²: 1 mm is 2000 m³

/**
 * The D-hour unit hydrograph of a Nash cascade, exactly: 1 mm spread over D
 * hours gives q(t) = V·(S(t) − S(t − D))/D (V in m³, D in s). Sampled every
 * `stepH` until the S-curve is within 1e-15 of 1.
 */
function nashUnitHydrograph(n: number, kH: number, durationH: number, stepH: number): UnitHydrographTransform {
  const v = AREA * 1e-3;
  const ordinates: number[] = [];
  for (let i = 0; ; i++) {
    const t = i * stepH;
    const s = nashSCurve(t, n, kH) - (t > durationH ? nashSCurve(t - durationH, n, kH) : 0);
    ordinates.push((v * s) / (durationH * 3600));
    if (t > durationH && 1 - nashSCurve(t - durationH, n, kH) < 1e-15) break;
  }
  return { kind: 'unit-hydrograph', durationH, stepH, ordinatesM3sPerMm: ordinates };
}

describe('S-curve conversion', () => {
  it('turns a 2-hour unit hydrograph into the 1-hour one of the same catchment', () => {
    // Known pair: both the 2-h and the 1-h unit hydrographs of a Nash cascade
    // (n = 3, k = 1.5 h) are exact; the 2-h one, given every 0.5 h, converted
    // to 1 h must give the 1-h one. A storm routed through each agrees.
    const given = nashUnitHydrograph(3, 1.5, 2, 0.5);
    const excess = { durationsH: [1, 1, 1, 1], excessMm: [3, 10, 6, 1] };
    const converted = runoffHydrograph(excess, given, AREA);
    const truth = runoffHydrograph(excess, { kind: 'nash', n: 3, kH: 1.5 }, AREA);
    for (let i = 0; i < truth.timesH.length; i++) {
      const converted_i = converted.dischargeM3s[i] ?? 0;
      expectClose(converted_i, truth.dischargeM3s[i] as number, 0, 1e-9 * truth.peakM3s);
    }
    expectClose(converted.volumeM3, 20 * 2000, 1e-12);
  });

  it('reads the S-curve smoothly between ordinates when the step is finer than theirs', () => {
    // The same 2-h hydrograph given every 0.5 h, converted to 10 minutes: between
    // the given times the S-curve is interpolated, and the 10-min ordinates, its
    // differences × 12, magnify that error. On these exact S-curve values scipy's
    // PchipInterpolator (SciPy 1.17.1) is off by at most 2.73 % of the peak
    // (straight lines: 9.3 %), worst where the S-curve rises as t³ from zero.
    const given = nashUnitHydrograph(3, 1.5, 2, 0.5);
    const r = unitResponse(given, 1 / 6);
    const truth = unitResponse({ kind: 'nash', n: 3, kH: 1.5 }, 1 / 6);
    let peak = 0;
    for (const w of truth) peak = Math.max(peak, w);
    let worst = 0;
    for (let j = 0; j < Math.min(r.length, truth.length); j++) {
      worst = Math.max(worst, Math.abs((r[j] as number) - (truth[j] as number)) / peak);
    }
    expect(worst).toBeLessThan(0.0275);
    // No two neighbouring ordinates of the rising limb are equal (no staircase).
    for (let j = 1; j < 12; j++) expect(r[j]).not.toBe(r[j - 1]);
  });

  it('gives back the same hydrograph when the step is its own duration', () => {
    // D = Δ = ordinate step: U_Δ(jΔ) = S(jΔ) − S(jΔ − D) = U_D(jΔ).
    const uh = TRANSFORMS['unit-hydrograph'].defaults as UnitHydrographTransform;
    const r = unitResponse(uh, 1);
    const u = Array.from(uh.ordinatesM3sPerMm);
    const total = u.reduce((a, b) => a + b, 0);
    // Trimmed after the last non-zero ordinate (the trailing 0 of the given list).
    expect(r.length).toBe(u.length - 1);
    r.forEach((w, j) => expectClose(w, (u[j] as number) / total, 1e-13, 1e-16));
  });

  it('holds a hunting S-curve at its plateau and keeps the volume exact', () => {
    // A rough 1-h hydrograph sampled every 0.5 h whose S-curve does not settle;
    // its 0.25-h version must still hold exactly the excess volume.
    const rough: UnitHydrographTransform = {
      kind: 'unit-hydrograph',
      durationH: 1,
      stepH: 0.5,
      ordinatesM3sPerMm: [0, 0.2, 0.5, 0.3, 0.35, 0.1, 0.12, 0.02, 0],
    };
    const h = runoffHydrograph({ durationsH: [0.25, 0.25], excessMm: [4, 2] }, rough, AREA);
    expectClose(h.volumeM3, 6 * 2000, 1e-12);
    for (const q of h.dischargeM3s) expect(q).toBeGreaterThanOrEqual(0);
  });
});

describe('volume of a given unit hydrograph', () => {
  it('is its trapezoidal volume over the area, mm', () => {
    // Ordinates 0, 0.5, 0.3, 0.1, 0 m³/s every 0.5 h: Σ = 0.9 m³/s × 1800 s = 1620 m³,
    // over 2 km² = 0.81 mm.
    const uh: UnitHydrographTransform = {
      kind: 'unit-hydrograph',
      durationH: 0.5,
      stepH: 0.5,
      ordinatesM3sPerMm: [0, 0.5, 0.3, 0.1, 0],
    };
    expectClose(unitHydrographVolumeMm(uh, AREA), 0.81, 1e-14);
    // The hydrograph from it is scaled to 1 mm: 5 mm on 2 km² is 10,000 m³.
    expectClose(runoffHydrograph({ durationsH: [0.5], excessMm: [5] }, uh, AREA).volumeM3, 10_000, 1e-12);
  });

  it('is 1 mm for an exact unit hydrograph', () => {
    expectClose(unitHydrographVolumeMm(nashUnitHydrograph(2.5, 0.8, 1, 0.25), AREA), 1, 1e-3);
  });

  it('names the field of bad input', () => {
    const uh = TRANSFORMS['unit-hydrograph'].defaults as UnitHydrographTransform;
    expectInputError(() => unitHydrographVolumeMm(uh, -1), 'areaM2', /area/);
    expectInputError(() => unitHydrographVolumeMm({ ...uh, stepH: 0 }, AREA), 'stepH', /Time between ordinates/);
    expectInputError(
      () => unitHydrographVolumeMm({ kind: 'nash', n: 2, kH: 1 } as never, AREA),
      'kind',
      /unit hydrograph of your own/,
    );
  });
});

describe('monotone cubic (Fritsch & Carlson 1980)', () => {
  it('passes through its points, is exact on a straight line and never overshoots', () => {
    const xs = [0, 0.5, 1, 2, 2.5, 4];
    const f = monotoneCubic(xs, [0, 0.1, 0.7, 0.95, 1, 1]);
    expect(f(0)).toBe(0);
    expectClose(f(1), 0.7, 1e-15);
    expectClose(f(4), 1, 1e-15);
    let before = -Infinity;
    for (let t = 0; t <= 4; t += 0.01) {
      const v = f(t);
      expect(v).toBeGreaterThanOrEqual(before - 1e-15);
      expect(v).toBeLessThanOrEqual(1 + 1e-15);
      before = v;
    }
    const line = monotoneCubic(
      xs,
      xs.map((x) => 3 * x - 1),
    );
    for (const t of [0.2, 1.7, 3.3]) expectClose(line(t), 3 * t - 1, 1e-14);
  });
});
