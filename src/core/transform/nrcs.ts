import { brentRoot } from '../calibrate/brent';
import { gammaTailEnd, responseArray } from './tail';
import { logGamma } from './gamma';
import { NRCS_PEAK_RATE_FACTOR } from './transforms';

/**
 * The NRCS dimensionless unit hydrograph: discharge ratio q/qp against time
 * ratio t/Tp. USDA NRCS (2007) National Engineering Handbook Part 630,
 * ch. 16 "Hydrographs", Table 16-1 (from memory; the same table was printed in
 * NEH-4 ch. 16 and is carried by the standard textbooks). Linear between rows;
 * the hydrograph ends at t = 5·Tp.
 */
export const NRCS_DIMENSIONLESS_UH: { readonly tOverTp: readonly number[]; readonly qOverQp: readonly number[] } = {
  tOverTp: [
    0, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8, 0.9, 1, 1.1, 1.2, 1.3, 1.4, 1.5, 1.6, 1.7, 1.8, 1.9, 2, 2.2, 2.4, 2.6,
    2.8, 3, 3.2, 3.4, 3.6, 3.8, 4, 4.5, 5,
  ],
  qOverQp: [
    0, 0.03, 0.1, 0.19, 0.31, 0.47, 0.66, 0.82, 0.93, 0.99, 1, 0.99, 0.93, 0.86, 0.78, 0.68, 0.56, 0.46, 0.39, 0.33,
    0.28, 0.207, 0.147, 0.107, 0.077, 0.055, 0.04, 0.029, 0.021, 0.015, 0.011, 0.005, 0,
  ],
};

/**
 * The same factor in m³/s per (km²·mm/h): qp = factor·A·Q/Tp with A in km²,
 * Q in mm and Tp in h. From the exact unit definitions (1 ft = 0.3048 m,
 * 1 mi = 5280 ft, 1 in = 25.4 mm):
 *   1 ft³/s = 0.3048³ m³/s = 0.028316846592 m³/s;
 *   1 mi²·in = 1609.344² m² × 0.0254 m = 65,785.6980025344 m³
 *            = 65.7856980025344 (km²·mm, each 1000 m³);
 * so SI factor = US factor × 0.028316846592 / 65.7856980025344
 *              = US factor / 2323.2 (since 1 mi²·in = 5280² ft² × 1/12 ft
 *                = 2,323,200 ft³ and 1 km²·mm = 1000 m³),
 * and 484 / 2323.2 = 0.208333… = 5/24 exactly (484 × 24 = 11,616 = 5 × 2323.2).
 */
export function peakRateFactorSi(usFactor: number): number {
  return usFactor / 2323.2;
}

/**
 * Area under a dimensionless hydrograph, in units of qp·Tp, that a peak rate
 * factor implies: V = qp·Tp·K, and with qp = C·A·Q/Tp (SI) and V = 1000·A·Q m³
 * (A in km², Q in mm) over Tp in h (3600 s), K = 1000/(3600·C) = 645.33…/C_US.
 * For 484 this is 4/3 exactly: the published table's own area is 1.336 (the
 * rows' trapezoids), 0.2 % more, from the rounding of its ratios.
 */
export function dimensionlessArea(usFactor: number): number {
  return 1000 / (3600 * peakRateFactorSi(usFactor));
}

/**
 * For a peak rate factor other than 484 the table does not apply: the shape
 * then is the gamma-function form of the dimensionless unit hydrograph,
 * q/qp = (t/Tp)^m·e^(m(1 − t/Tp)) (Haan, Barfield & Hayes 1994, Design
 * Hydrology and Sedimentology for Small Catchments, ch. 4, from memory; m ≈ 3.7
 * reproduces the table), with m chosen so that its area e^m·Γ(m+1)/m^(m+1)
 * equals `dimensionlessArea(factor)`. The area falls steadily as m grows
 * (the integrand (x·e^(1−x))^m falls with m at every x ≠ 1), so one root.
 */
export function gammaShapeForPeakRateFactor(usFactor: number): number {
  const target = Math.log(dimensionlessArea(usFactor));
  const logArea = (m: number): number => m + logGamma(m + 1) - (m + 1) * Math.log(m);
  const f = (m: number): number => logArea(m) - target;
  const lo = 1e-3;
  const hi = 1e3;
  return brentRoot(f, lo, hi, f(lo), f(hi), { xTol: 1e-13 });
}

/** q/qp of the table at t/Tp = x (linear between rows, 0 past the last). */
function tableRatio(x: number, row: { k: number }): number {
  const { tOverTp: t, qOverQp: q } = NRCS_DIMENSIONLESS_UH;
  const last = t.length - 1;
  if (x >= (t[last] as number)) return 0;
  while ((t[row.k + 1] as number) < x) row.k++;
  const t0 = t[row.k] as number;
  const t1 = t[row.k + 1] as number;
  const q0 = q[row.k] as number;
  return q0 + (((q[row.k + 1] as number) - q0) * (x - t0)) / (t1 - t0);
}

/**
 * The D-hour NRCS unit hydrograph with D = the output step, sampled at the
 * step's instants j·Δ from the start of the excess; unnormalised weights.
 * Tp = D/2 + lag (NEH-630 ch. 16).
 */
export function nrcsWeights(lagH: number, peakRateFactor: number | undefined, stepH: number): Float64Array {
  const tpH = stepH / 2 + lagH;
  if (peakRateFactor === undefined || peakRateFactor === NRCS_PEAK_RATE_FACTOR) {
    const last = NRCS_DIMENSIONLESS_UH.tOverTp[NRCS_DIMENSIONLESS_UH.tOverTp.length - 1] as number;
    const count = Math.ceil((last * tpH) / stepH) + 1;
    const w = responseArray(count, stepH, last * tpH);
    const row = { k: 0 };
    for (let j = 0; j < count; j++) w[j] = tableRatio((j * stepH) / tpH, row);
    return w;
  }
  const m = gammaShapeForPeakRateFactor(peakRateFactor);
  // ∫₀^x (s·e^(1−s))^m ds ∝ P(m + 1, m·x): end where the rest is below the tail.
  const endX = gammaTailEnd(m + 1) / m;
  const count = Math.ceil((endX * tpH) / stepH) + 1;
  const w = responseArray(count, stepH, endX * tpH);
  for (let j = 1; j < count; j++) {
    const x = (j * stepH) / tpH;
    w[j] = Math.exp(m * (Math.log(x) + 1 - x));
  }
  return w;
}
