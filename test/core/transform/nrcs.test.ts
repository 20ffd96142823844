// The NRCS unit hydrographs against the published table, the peak rate
// factor and a textbook worked example.
import { describe, expect, it } from 'vitest';
import {
  NRCS_DIMENSIONLESS_UH,
  NRCS_PEAK_RATE_FACTOR,
  TRIANGULAR_BASE_OVER_TP,
  dimensionlessArea,
  gammaShapeForPeakRateFactor,
  lagFromTimeOfConcentration,
  logGamma,
  nrcsTimeToPeakH,
  peakRateFactorSi,
  runoffHydrograph,
} from '../../../src/core';
import { readFixtureCsv } from '../../helpers/fixture-csv';
import { expectClose } from '../../helpers/tolerance';

const table = readFixtureCsv('nrcs-dimensionless-unit-hydrograph.csv');
const rows = table.rows.map((r) => r.map(Number) as [number, number, number]);

/** Trapezoidal area under the table's rows (t/Tp, q/qp). */
function tableArea(): number {
  let area = 0;
  for (let i = 1; i < rows.length; i++) {
    const [t0, q0] = rows[i - 1] as [number, number, number];
    const [t1, q1] = rows[i] as [number, number, number];
    area += 0.5 * (q0 + q1) * (t1 - t0);
  }
  return area;
}

describe('NRCS dimensionless unit hydrograph table (NEH-630 ch. 16, Table 16-1, from memory)', () => {
  it('names its source', () => {
    expect(table.header).toMatch(/National Engineering Handbook Part 630/);
    expect(table.header).toMatch(/Table 16-1/);
  });

  it('is the table the core uses, row for row', () => {
    expect(NRCS_DIMENSIONLESS_UH.tOverTp).toEqual(rows.map((r) => r[0]));
    expect(NRCS_DIMENSIONLESS_UH.qOverQp).toEqual(rows.map((r) => r[1]));
  });

  it('holds the volume of the peak rate factor 484 to within its rounding', () => {
    // By hand: t/Tp 0–2 in steps of 0.1: 0.1 × (Σq − (q₀ + q₂₀)/2) = 0.1 × (11.76 − 0.14) = 1.162;
    // 2–4 in steps of 0.2: 0.2 × (0.989 − (0.28 + 0.011)/2) = 0.1687; 4–4.5: 0.004; 4.5–5: 0.00125.
    // Area 1.33595, against 4/3 for 484 (645.33/484): the factor it implies is 645.33/1.33595 = 483.05.
    expectClose(tableArea(), 1.33595, 1e-12);
    expectClose(dimensionlessArea(NRCS_PEAK_RATE_FACTOR), 4 / 3, 1e-14);
    expectClose(dimensionlessArea(NRCS_PEAK_RATE_FACTOR) / tableArea(), 1, 0.002);
  });

  it('passes 3/8 of the volume before the peak, and its mass column is its own running area', () => {
    const total = tableArea();
    let area = 0;
    for (let i = 0; i < rows.length; i++) {
      if (i > 0) {
        const [t0, q0] = rows[i - 1] as [number, number, number];
        const [t1, q1] = rows[i] as [number, number, number];
        area += 0.5 * (q0 + q1) * (t1 - t0);
      }
      const [t, , mass] = rows[i] as [number, number, number];
      // The printed mass ratios were smoothed and rounded to 0.001; the running
      // trapezoid agrees to within 0.005 (largest at t/Tp = 0.3).
      expect(Math.abs(area / total - mass), `t/Tp = ${t}`).toBeLessThanOrEqual(0.005);
      if (t === 1) expect(mass).toBe(0.375);
    }
  });
});

describe('peak rate factor', () => {
  it('484 in US units is 5/24 = 0.2083 in m³/s per km²·mm/h', () => {
    // 1 ft³/s = 0.3048³ = 0.028316846592 m³/s; 1 mi²·in = 1609.344² m² × 0.0254 m
    // = 65,785.6980025344 m³ = 65.7856980025344 km²·mm. 484 × 0.028316846592 = 13.705353750528;
    // ÷ 65.7856980025344 = 0.208333….
    expectClose(peakRateFactorSi(484), (484 * 0.028316846592) / 65.7856980025344, 1e-15);
    expectClose(peakRateFactorSi(484), 5 / 24, 1e-15);
    expect(peakRateFactorSi(484).toFixed(4)).toBe('0.2083');
  });

  it('sets the gamma shape for other factors: m ≈ 3.7 reproduces 484 (Haan, Barfield & Hayes 1994, from memory)', () => {
    const m = gammaShapeForPeakRateFactor(484);
    // scipy.optimize.brentq on e^m·Γ(m+1)/m^(m+1) = 4/3 gives m = 3.696876422824472.
    expectClose(m, 3.696876422824472, 1e-10);
    for (const factor of [100, 300, 484, 600, 1000]) {
      const shape = gammaShapeForPeakRateFactor(factor);
      const area = Math.exp(shape + logGamma(shape + 1) - (shape + 1) * Math.log(shape));
      expectClose(area, 645.3333333333334 / factor, 1e-12);
    }
  });

  it('gives a peak of factor·A·Q/Tp for any factor, the volume held exact', () => {
    // 1 mm in 0.01 h on 1 km², lag 0.995 h: Tp = 0.005 + 0.995 = 1 h; at 300 the
    // peak should be (300/2323.2)·1·1/1 = 0.129132 m³/s (sampling on a 0.01 h grid
    // moves it by less than 1e-4).
    for (const factor of [300, 600]) {
      const h = runoffHydrograph(
        { durationsH: [0.01], excessMm: [1] },
        { kind: 'nrcs-dimensionless', lagH: 0.995, peakRateFactor: factor },
        1e6,
      );
      expectClose(h.peakM3s, factor / 2323.2, 1e-4);
      expectClose(h.timeOfPeakH, 1, 1e-12);
      expectClose(h.volumeM3, 1000, 1e-12);
    }
  });
});

describe('NRCS hydrographs of one pulse of excess', () => {
  it('peak at Tp with qp = V/(3600·Tp·area) on a grid through the table rows', () => {
    // Step 0.1 h, lag 0.95 h: Tp = 0.05 + 0.95 = 1 h, so the instants 0.1·j h are
    // the rows t/Tp = 0.1·j and the sampled area is the table's own, 1.33595.
    // 1 mm on 1 km² = 1000 m³: qp = 1000/(3600 × 1 × 1.33595) = 0.207924 m³/s,
    // against 0.2083 (484) from the factor: the table's rounding, 0.2 %.
    const h = runoffHydrograph({ durationsH: [0.1], excessMm: [1] }, { kind: 'nrcs-dimensionless', lagH: 0.95 }, 1e6);
    expectClose(h.peakM3s, 1000 / (3600 * 1.33595), 1e-12);
    expectClose(h.timeOfPeakH, 1, 1e-12);
    // Every ordinate is the table's ratio × that peak; the last (t = 5 Tp) is 0.
    for (let j = 0; j <= 50; j++) {
      const x = j / 10;
      const i = NRCS_DIMENSIONLESS_UH.tOverTp.findIndex((t) => Math.abs(t - x) < 1e-9);
      if (i >= 0)
        expectClose(
          h.dischargeM3s[j] as number,
          (NRCS_DIMENSIONLESS_UH.qOverQp[i] as number) * h.peakM3s,
          1e-12,
          1e-15,
        );
    }
    // It ends at t = 5 Tp = 5 h, back at zero: 51 samples 0.1 h apart.
    expect(h.timesH.length).toBe(51);
    expectClose(h.timesH[50] as number, 5, 1e-15);
    expect(h.dischargeM3s[50]).toBe(0);
  });

  it('reproduces the 10-minute unit hydrograph of a 3 km² basin with Tc = 1.25 h (Chow, Maidment & Mays 1988, Example 7.7.3, from memory)', () => {
    // Printed: tp = 0.6 Tc = 0.75 h, Tp = 10 min/2 + 0.75 h = 0.833 h, qp = 2.08 × 3.0/0.833
    // = 7.49 m³/s per cm of excess, base 2.67 × 0.833 = 2.22 h.
    const lagH = lagFromTimeOfConcentration(1.25);
    expectClose(lagH, 0.75, 1e-15);
    expectClose(nrcsTimeToPeakH(lagH, 1 / 6), 0.8333333333333334, 1e-15);
    const excess = { durationsH: [1 / 6], excessMm: [10] };
    // Triangle sampled every 1/6 h, Tp = 5 steps, base 8/3 × 5 = 13.33 steps: weights
    // 0, .2, .4, .6, .8, 1, then (8/3 − j/5)/(5/3) = .88, .76, .64, .52, .40, .28, .16, .04:
    // sum 6.68. 10 mm on 3 km² = 30,000 m³ over a 600 s step = 50 m³/s; peak 50/6.68 = 7.485.
    const tri = runoffHydrograph(excess, { kind: 'triangular', lagH }, 3e6);
    expectClose(tri.peakM3s, 50 / 6.68, 1e-12);
    expectClose(tri.timeOfPeakH, 5 / 6, 1e-12);
    expectClose(tri.peakM3s, 7.49, 0.001);
    // Last non-zero ordinate at 13/6 = 2.17 h, below the printed base 2.22 h.
    expect(tri.timesH[tri.timesH.length - 1]).toBeCloseTo(14 / 6, 12);
    // Curvilinear: rows t/Tp = 0.2·j; Σ q/qp = 6.6698 (the rows 0–4.0 every 0.2, then
    // 0.0086, 0.0062, 0.004, 0.002 between 4 and 5): peak 50/6.6698 = 7.4965.
    const curved = runoffHydrograph(excess, { kind: 'nrcs-dimensionless', lagH }, 3e6);
    expectClose(curved.peakM3s, 50 / 6.6698, 1e-12);
    expectClose(curved.peakM3s, 7.49, 0.002);
  });

  it('the triangle holds the excess volume with peak 484 exactly when its base is 8/3 Tp (printed 2.67)', () => {
    // qp·Tb/2 = (5/24)·A·Q/Tp·(8/3)·Tp/2 × 3600 s/h = (5/24)(4/3)(3600)/1000 km²·mm = 1 km²·mm.
    expect(TRIANGULAR_BASE_OVER_TP.toFixed(2)).toBe('2.67');
    expectClose(((peakRateFactorSi(484) * TRIANGULAR_BASE_OVER_TP) / 2) * 3.6, 1, 1e-15);
  });
});
