import { InputError } from '../errors';
import { peakIntensityMmH, totalDepthMm, type Storm } from '../storm';
import type { ComputeFn, HortonLoss, MethodSpec } from './types';

/**
 * Horton infiltration. Capacity f(τ) = f_c + (f_0 − f_c)·e^(−kτ) and cumulative
 * infiltration along that curve F(τ) = f_c·τ + (f_0 − f_c)(1 − e^(−kτ))/k
 * (Horton 1940, Soil Sci. Soc. Am. Proc. 5, 399–417; Chow, Maidment & Mays
 * 1988, Applied Hydrology, §4.2).
 *
 * Two readings of τ:
 * - time from storm start (`ponding: false`): τ is clock time, and a bar loses
 *   the smaller of its rain and the capacity integrated over the bar;
 * - time compression (`ponding: true`): capacity depends on the cumulative
 *   infiltration F, so rain below capacity soaks in without moving along the
 *   curve. This is dF/dt = min(i, f(F)), solved exactly bar by bar: the bar is
 *   split where capacity falls to its intensity.
 * Dry bars do not restore capacity in either reading (no recovery term).
 */

/** Cumulative Horton infiltration after τ hours on the capacity curve, mm (Horton 1940). */
export function hortonCumulativeMm(f0MmH: number, fcMmH: number, kPerH: number, tH: number): number {
  return fcMmH * tH + ((f0MmH - fcMmH) * -Math.expm1(-kPerH * tH)) / kPerH;
}

/** Horton capacity after τ hours on the capacity curve, mm/h (Horton 1940). */
export function hortonCapacityMmH(f0MmH: number, fcMmH: number, kPerH: number, tH: number): number {
  return fcMmH + (f0MmH - fcMmH) * Math.exp(-kPerH * tH);
}

const computeFromStart = (
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  method: HortonLoss,
  lossOut: Float64Array,
  excessOut: Float64Array,
): void => {
  const { fcMmH: fc, kPerH: k } = method;
  const a = (method.f0MmH - fc) / k;
  const n = depthsMm.length;
  let t = 0;
  let decayStart = 1; // e^(−k t) at the bar's start
  for (let j = 0; j < n; j++) {
    const p = depthsMm[j] as number;
    const dt = durationsH[j] as number;
    t += dt;
    // Once e^(−kt) has underflowed to zero it stays there: skip the exponential.
    const decayEnd = decayStart > 0 ? Math.exp(-k * t) : 0;
    // ∫ f dt over the bar = f_c·Δt + (f_0 − f_c)/k·(e^(−k t_a) − e^(−k t_b)) (Horton 1940).
    let loss = fc * dt + a * (decayStart - decayEnd);
    if (loss > p) loss = p;
    lossOut[j] = loss;
    excessOut[j] = p - loss;
    decayStart = decayEnd;
  }
};

/**
 * e^(−kτ) for the point τ of the capacity curve where cumulative infiltration
 * is F: solves f_c·τ + a(1 − e^(−kτ)) = F (a = (f_0 − f_c)/k). F(τ) is
 * increasing and concave, so Newton's method from a lower bound climbs
 * monotonically to the root and never overshoots.
 */
function decayAtDepth(fc: number, a: number, k: number, f0: number, depth: number): number {
  if (fc === 0) {
    // F = a(1 − e^(−kτ)) exactly; F ≥ a means the curve has reached zero capacity.
    const e = 1 - depth / a;
    return e > 0 ? e : 0;
  }
  // Lower bounds: F ≤ f_0·τ and F ≤ f_c·τ + a.
  let tau = Math.max(depth / f0, (depth - a) / fc, 0);
  // e^(−kτ) underflows to zero beyond kτ ≈ 745, whatever the exact τ.
  if (k * tau > 746) return 0;
  for (let iter = 0; iter < 100; iter++) {
    const e = Math.exp(-k * tau);
    const residual = depth - fc * tau - a * (1 - e);
    const step = residual / (fc + k * a * e);
    tau += step;
    if (!(step > 1e-15 * tau)) break;
  }
  return Math.exp(-k * tau);
}

const computeTimeCompression = (
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  method: HortonLoss,
  lossOut: Float64Array,
  excessOut: Float64Array,
): void => {
  const { f0MmH: f0, fcMmH: fc, kPerH: k } = method;
  const span = f0 - fc;
  const a = span / k;
  const n = depthsMm.length;
  let depth = 0; // cumulative infiltration F, mm
  let decay = 1; // e^(−kτ) on the capacity curve, valid while `onCurve`
  let onCurve = true; // F = 0 is τ = 0
  for (let j = 0; j < n; j++) {
    const p = depthsMm[j] as number;
    if (p === 0) {
      lossOut[j] = 0;
      excessOut[j] = 0;
      continue;
    }
    const dt = durationsH[j] as number;
    const i = p / dt;
    if (i <= fc) {
      // Capacity never falls below f_c: all rain soaks in.
      lossOut[j] = p;
      excessOut[j] = 0;
      depth += p;
      onCurve = false;
      continue;
    }
    // Is the bar ponded from its start (capacity already at or below i)?
    let pondedAtStart: boolean;
    if (onCurve) pondedAtStart = fc + span * decay <= i;
    // Off the curve, a cheap sufficient test first: −ln x ≤ 1/x − 1 bounds the
    // depth F_p at which capacity falls to i by (f_0 − i)·i / (k(i − f_c)).
    else pondedAtStart = depth * k * (i - fc) >= (f0 - i) * i;
    let pondDepth = depth; // F at which capacity equals i
    let pondDecay = decay; // e^(−kτ) there
    if (!pondedAtStart) {
      // Here f_c < i < f_0. f(τ_p) = i gives e^(−kτ_p) = (i − f_c)/(f_0 − f_c),
      // and then F(τ_p) = f_c·τ_p + (f_0 − i)/k.
      pondDecay = (i - fc) / span;
      pondDepth = (fc * -Math.log(pondDecay)) / k + (f0 - i) / k;
      if (depth + p <= pondDepth) {
        // Capacity stays above i through the bar: all rain soaks in.
        lossOut[j] = p;
        excessOut[j] = 0;
        depth += p;
        onCurve = false;
        continue;
      }
      pondedAtStart = depth >= pondDepth;
    }
    let before = 0; // rain soaked in before ponding, mm
    let pondedH = dt;
    if (pondedAtStart) {
      if (!onCurve) decay = decayAtDepth(fc, a, k, f0, depth);
    } else {
      before = pondDepth - depth;
      pondedH = dt - before / i;
      depth = pondDepth;
      decay = pondDecay;
    }
    // Ponded: τ advances with clock time, F(τ + Δ) − F(τ) = f_c·Δ + a·e^(−kτ)(1 − e^(−kΔ)).
    let ponded = fc * pondedH;
    if (decay > 0) {
      // (Once e^(−kτ) has underflowed to zero the curve is f_c alone.)
      const step = -Math.expm1(-k * pondedH);
      ponded += a * decay * step;
      decay -= decay * step;
    }
    onCurve = true;
    depth += ponded;
    let loss = before + ponded;
    if (loss > p) loss = p;
    lossOut[j] = loss;
    excessOut[j] = p - loss;
  }
};

export const computeHorton: ComputeFn<'horton'> = (durationsH, depthsMm, method, lossOut, excessOut) => {
  if (method.ponding) computeTimeCompression(durationsH, depthsMm, method, lossOut, excessOut);
  else computeFromStart(durationsH, depthsMm, method, lossOut, excessOut);
};

/**
 * Highest initial capacity a search tries, mm/h. Rates of metres per hour are
 * no longer soil infiltration: published f_0 values are of the order of
 * hundreds of mm/h at most (an order of magnitude from memory, not a cited
 * table).
 */
export const HORTON_F0_CEILING_MMH = 10_000;

/**
 * Highest decay constant a search tries, 1/h: at 1000 /h the capacity above
 * f_c halves in 2.5 s, finer than any rain gauge resolves.
 */
export const HORTON_K_CEILING_PER_H = 1000;

/**
 * The smallest f_0 at which every drop soaks in, capped at the ceiling.
 * From storm start: bar j needs f_c·Δt + (f_0 − f_c)·c_j ≥ P_j with
 * c_j = (e^(−k t_a) − e^(−k t_b))/k. Time compression: F(τ) ≥ a(1 − e^(−kτ))
 * gives f(F) ≥ f_0 − k·F, so f_0 = i_max + k·ΣP keeps capacity above every
 * intensity while F ≤ ΣP.
 */
export function hortonAbsorbingF0(storm: Storm, method: HortonLoss): number {
  const { fcMmH: fc, kPerH: k } = method;
  let need = fc;
  if (method.ponding) {
    need = Math.max(fc, peakIntensityMmH(storm) + k * totalDepthMm(storm));
  } else {
    const { durationsH, depthsMm } = storm;
    let t = 0;
    let decayStart = 1;
    for (let j = 0; j < depthsMm.length; j++) {
      const p = depthsMm[j] as number;
      const dt = durationsH[j] as number;
      t += dt;
      const decayEnd = Math.exp(-k * t);
      const shortfall = p - fc * dt;
      if (shortfall > 0) {
        const c = (decayStart - decayEnd) / k;
        need = Math.max(need, c > 0 ? fc + shortfall / c : Infinity);
      }
      decayStart = decayEnd;
    }
  }
  return Math.min(Math.max(need, fc), Math.max(HORTON_F0_CEILING_MMH, fc));
}

export const hortonSpec: MethodSpec<'horton'> = {
  kind: 'horton',
  label: 'Horton infiltration',
  summary:
    'Infiltration capacity decays exponentially from an initial to a final rate; rain above capacity becomes excess.',
  source: 'Horton (1940), Soil Sci. Soc. Am. Proc. 5; Chow, Maidment & Mays (1988) Applied Hydrology, section 4.2.',
  params: [
    {
      key: 'f0MmH',
      label: 'Initial capacity f₀',
      unit: 'mm/h',
      min: 0,
      max: Infinity,
      step: 1,
      searchMin: (_storm, method) => method.fcMmH,
      searchMax: hortonAbsorbingF0,
      help: 'Infiltration capacity of the dry soil at the start; at least the final capacity.',
    },
    {
      key: 'fcMmH',
      label: 'Final capacity f_c',
      unit: 'mm/h',
      min: 0,
      max: Infinity,
      step: 0.5,
      searchMax: (_storm, method) => method.f0MmH,
      help: 'Capacity the soil tends to when wet for a long time; at most the initial capacity.',
    },
    {
      key: 'kPerH',
      label: 'Decay constant k',
      unit: '1/h',
      min: 0,
      minExclusive: true,
      max: Infinity,
      step: 0.1,
      searchMax: () => HORTON_K_CEILING_PER_H,
      help: 'How fast capacity falls from f₀ to f_c; larger is faster.',
    },
  ],
  choices: [
    {
      key: 'ponding',
      label: 'Capacity follows',
      choices: [
        { value: true, label: 'infiltrated depth (time compression)' },
        { value: false, label: 'time from storm start' },
      ],
      help:
        'Infiltrated depth: light rain does not use up capacity it did not need. ' +
        'Time from storm start: capacity falls with the clock, as in a hand calculation.',
    },
  ],
  defaults: { kind: 'horton', f0MmH: 75, fcMmH: 10, kPerH: 4, ponding: true },
  compute: computeHorton,
  validateExtra: (method) => {
    if (method.f0MmH < method.fcMmH) {
      throw new InputError(
        'f0MmH',
        `Initial capacity f₀ (${method.f0MmH} mm/h) must be at least the final capacity f_c (${method.fcMmH} mm/h).`,
      );
    }
  },
};
