import { peakIntensityMmH, totalDepthMm, type Storm } from '../storm';
import { halfRecoveryText, recoveryRateParam, recoveryRatePerH, recoverySwitch } from './recovery';
import { sampleCapacity } from './sample-capacity';
import type { CapacityFn, ComputeFn, GreenAmptLoss, MethodSpec } from './types';

/**
 * Green–Ampt infiltration under variable rainfall.
 *
 * Capacity f = K(1 + ψΔθ/F) (Green & Ampt 1911; Chow, Maidment & Mays 1988,
 * Applied Hydrology, eq. 4.3.7 — equation numbers from memory). Infiltration
 * follows dF/dt = min(i, f(F)): while rain is below capacity all of it soaks
 * in; surface ponding starts when F reaches
 *   F_p = K·ψΔθ / (i − K)   for i > K            (Mein & Larson 1973)
 * and never for i ≤ K. Once ponded within a bar of constant intensity the
 * capacity only falls, so the bar stays ponded, and F follows the implicit
 * ponded equation
 *   F₂ − F₁ − ψΔθ·ln((F₂ + ψΔθ)/(F₁ + ψΔθ)) = K·Δt
 * (Chow, Maidment & Mays 1988, §4.4, the Green–Ampt equation from a known
 * starting depth F₁). Each bar is solved exactly in this way, so the result
 * does not depend on how the rain is cut into bars. Dry bars leave F as it
 * is unless recovery is on (see recovery.ts), when the wetted zone drains
 * and F decays, F·e^(−k_r Δt).
 */

/**
 * Depth infiltrated in `hours` of ponded infiltration starting from a
 * cumulative depth `startMm` (mm): the x solving
 *   g(x) = x − M·ln(1 + x/(F₁ + M)) = K·t,   M = ψΔθ
 * (the ponded Green–Ampt equation above, written in the increment x = F₂ − F₁
 * so that short steps do not cancel). g is increasing and convex, so after at
 * most one step Newton's method approaches the root from above and descends
 * monotonically onto it. The start is the root of the quadratic that replaces
 * ln(1 + u) by u − u²/2 (u = x/(F₁ + M)): a lower bound, exact to O(u³), so
 * the short steps of a long storm need no iteration and others one or two;
 * bisection on the bracket [K·t, f(F₁)·t] takes over if Newton ever fails to
 * settle.
 */
export function greenAmptPondedIncrementMm(
  ksMmH: number,
  suctionDeficitMm: number,
  startMm: number,
  hours: number,
): number {
  const kt = ksMmH * hours;
  const m = suctionDeficitMm;
  if (m === 0 || kt === 0) return kt;
  const base = startMm + m;
  let root = Math.sqrt(startMm * startMm + 2 * m * kt);
  // Squares of tiny depths can underflow; then take the same root without squaring.
  if (!(root >= startMm) || root === 0) root = Math.hypot(startMm, Math.sqrt(2 * m) * Math.sqrt(kt));
  // Lower bound from ln(1 + u) ≥ u − u²/2, in the form that does not cancel:
  // x = B(√(F₁² + 2MKt) − F₁)/M = 2BKt/(F₁ + √(F₁² + 2MKt)).
  const guess = (2 * base * kt) / (startMm + root);
  // Upper bound: the rate only falls, x ≤ f(F₁)·t. From a dry surface f(0) is
  // infinite; there e^L ≥ 1 + L + L²/2 (L = ln(1 + x/M)) gives x ≤ K·t + √(2MKt).
  const high = startMm > 0 ? kt + kt * (m / startMm) : kt + root;
  // (Written so that a 0/0 guess falls back to K·t; past `high` it can only be by rounding.)
  const low = guess > kt ? (guess < high ? guess : high) : kt;
  // ln(1 + u) − (u − u²/2) ≤ u³/3, so g(low) ≥ K·t − M·u³/3 and, g being convex,
  // the root lies within (M·u³/3)/g′(low) above `low`. On the short steps of a
  // long storm (u ~ 1e-6) that is below 1e-15 of the answer: no iteration needed.
  const u = low / base;
  if (m * u * u * u <= 3e-15 * low * ((startMm + low) / (base + low))) return low < high ? low : high;
  return solveIncrement(kt, m, startMm, base, low, high);
}

/** ln(1 + x/base); for a tiny base x/base can overflow, and then ln x − ln base is exact enough. */
function growth(x: number, base: number): number {
  const ratio = x / base;
  return ratio < 1e300 ? Math.log1p(ratio) : Math.log(x) - Math.log(base);
}

function solveIncrement(kt: number, m: number, startMm: number, base: number, low: number, high: number): number {
  let x = low;
  for (let iter = 0; iter < 60; iter++) {
    const residual = x - m * growth(x, base) - kt;
    const step = (residual * (base + x)) / (startMm + x); // residual / g′(x), g′ = (F₁ + x)/(F₁ + M + x)
    x -= step;
    // The first step may go up (from the lower bound); after it every step goes
    // down, so a step that does not (rounding noise at the root) means done.
    if (iter === 0 ? !(Math.abs(step) > 1e-15 * x) : !(step > 1e-15 * x)) {
      // Settled: inside the bracket up to rounding (the start is often exact
      // to the last bit, and a step of noise may leave it by one), else fall back.
      if (x >= low * (1 - 1e-12) && x <= high * (1 + 1e-12)) return x < low ? low : x > high ? high : x;
      break;
    }
  }
  // Safe fallback: plain bisection on [low, high], where the residual changes sign.
  let a = low;
  let b = high;
  for (let iter = 0; iter < 200 && b - a > 1e-15 * b; iter++) {
    const mid = 0.5 * (a + b);
    if (mid - m * growth(mid, base) - kt > 0) b = mid;
    else a = mid;
  }
  return 0.5 * (a + b);
}

/**
 * Green–Ampt ponded infiltration from a dry surface (F = 0 at t = 0): the
 * cumulative infiltration F(t), mm, of F − ψΔθ·ln(1 + F/ψΔθ) = K·t
 * (Chow, Maidment & Mays 1988, eq. 4.3.8, number from memory).
 */
export function greenAmptPondedDepthMm(
  ksMmH: number,
  suctionMm: number,
  moistureDeficit: number,
  hours: number,
): number {
  return greenAmptPondedIncrementMm(ksMmH, suctionMm * moistureDeficit, 0, hours);
}

/** Infiltration rate at cumulative depth F, f = K(1 + ψΔθ/F), mm/h (Green & Ampt 1911). */
export function greenAmptRateMmH(ksMmH: number, suctionMm: number, moistureDeficit: number, depthMm: number): number {
  return ksMmH * (1 + (suctionMm * moistureDeficit) / depthMm);
}

/**
 * Cumulative infiltration at which rain of intensity i starts to pond,
 * F_p = K·ψΔθ/(i − K), mm; Infinity for i ≤ K (Mein & Larson 1973).
 */
export function greenAmptPondingDepthMm(
  ksMmH: number,
  suctionMm: number,
  moistureDeficit: number,
  intensityMmH: number,
): number {
  return intensityMmH > ksMmH ? (ksMmH * suctionMm * moistureDeficit) / (intensityMmH - ksMmH) : Infinity;
}

/** A Green–Ampt method's numbers, worked out once per call. */
interface GreenAmptConstants {
  readonly k: number;
  /** ψΔθ, mm. */
  readonly m: number;
  /** K·ψΔθ, mm²/h. */
  readonly km: number;
  /** Recovery rate in dry bars, 1/h; 0 when off. */
  readonly kr: number;
}

function constants(method: GreenAmptLoss): GreenAmptConstants {
  const m = method.suctionMm * method.moistureDeficit;
  return { k: method.ksMmH, m, km: method.ksMmH * m, kr: recoveryRatePerH(method) };
}

/** The cumulative infiltration F, mm, that sets the capacity. */
interface DepthState {
  depth: number;
  /** Hours of dry spell not yet drained from F (one exponential per spell: they multiply). */
  dryH: number;
}

/**
 * Bars `from` to `to` from the state given (updated at the end), losses
 * written to the outputs when given (the capacity sampler runs without them).
 * A plain loop over local variables: this runs on every drag frame.
 */
function runGreenAmpt(
  c: GreenAmptConstants,
  st: DepthState,
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  from: number,
  to: number,
  lossOut: Float64Array | null,
  excessOut: Float64Array | null,
): void {
  const { k, m, km, kr } = c;
  let depth = st.depth;
  let dryH = st.dryH;
  for (let j = from; j < to; j++) {
    const p = depthsMm[j] as number;
    const dt = durationsH[j] as number;
    let loss = p;
    if (p === 0) {
      // With recovery the wetted zone drains, F·e^(−k_r Δt) (see recovery.ts).
      if (kr > 0) dryH += dt;
    } else {
      if (dryH > 0) {
        depth *= Math.exp(-kr * dryH);
        dryH = 0;
      }
      const i = p / dt;
      // Rain at or below K never ponds; below F_p = Kψ∆θ/(i − K) (Mein & Larson 1973) all soaks in.
      if (i <= k || depth + p <= km / (i - k)) {
        depth += p;
      } else {
        const pondDepth = km / (i - k);
        let before = 0;
        let pondedH = dt;
        if (depth < pondDepth) {
          // Ponding starts inside the bar, t_p = (F_p − F)/i after its start.
          before = pondDepth - depth;
          pondedH = dt - before / i;
          depth = pondDepth;
        }
        const ponded = pondedH > 0 ? greenAmptPondedIncrementMm(k, m, depth, pondedH) : 0;
        depth += ponded;
        loss = before + ponded;
        if (loss > p) loss = p;
      }
    }
    if (lossOut !== null && excessOut !== null) {
      lossOut[j] = loss;
      excessOut[j] = p - loss;
    }
  }
  st.depth = depth;
  st.dryH = dryH;
}

export const computeGreenAmpt: ComputeFn<'green-ampt'> = (durationsH, depthsMm, method, lossOut, excessOut) => {
  const st: DepthState = { depth: 0, dryH: 0 };
  runGreenAmpt(constants(method), st, durationsH, depthsMm, 0, depthsMm.length, lossOut, excessOut);
};

/**
 * Green–Ampt capacity through the storm, f = K(1 + ψΔθ/F) at the depth F(t)
 * reached at each time, from the same bar loop as the losses (Green & Ampt
 * 1911). Infinite on dry soil (F = 0) when ψΔθ > 0.
 */
export const greenAmptCapacity: CapacityFn<'green-ampt'> = (durationsH, depthsMm, method, timesH, out) => {
  const c = constants(method);
  sampleCapacity<DepthState>(
    durationsH,
    depthsMm,
    timesH,
    out,
    { depth: 0, dryH: 0 },
    (st) => ({ ...st }),
    (st, d, p, from, to) => runGreenAmpt(c, st, d, p, from, to, null, null),
    (st) => {
      const depth = st.depth * (st.dryH > 0 ? Math.exp(-c.kr * st.dryH) : 1);
      return c.m === 0 ? c.k : depth > 0 ? c.k * (1 + c.m / depth) : Infinity;
    },
  );
};

/**
 * A suction head at which no bar ponds: with F ≤ ΣP throughout, F_p(i_max) ≥ ΣP
 * keeps every bar below capacity, i.e. ψ ≥ ΣP·(i_max − K)/(K·Δθ). When ψ has no
 * effect (Δθ = 0, or no bar above K) any positive bound will do.
 */
export function greenAmptAbsorbingSuctionMm(storm: Storm, method: GreenAmptLoss): number {
  const excessRate = peakIntensityMmH(storm) - method.ksMmH;
  if (!(excessRate > 0) || !(method.moistureDeficit > 0)) return 1;
  return Math.max(1, (totalDepthMm(storm) * excessRate) / (method.ksMmH * method.moistureDeficit));
}

export const greenAmptSpec: MethodSpec<'green-ampt'> = {
  kind: 'green-ampt',
  label: 'Green–Ampt infiltration',
  summary:
    'A wetting front moves down into the soil; capacity falls as the soil fills, and rain above it becomes excess.',
  source:
    'Green & Ampt (1911); ponding time by Mein & Larson (1973); Chow, Maidment & Mays (1988) Applied Hydrology, sections 4.3–4.4.',
  params: [
    {
      key: 'ksMmH',
      label: 'Hydraulic conductivity K',
      unit: 'mm/h',
      min: 0,
      minExclusive: true,
      max: Infinity,
      step: 0.1,
      // Rain at or below K never ponds: above the peak intensity every drop soaks in.
      searchMax: (storm) => peakIntensityMmH(storm),
      help: 'Saturated (effective) hydraulic conductivity of the soil: the long-run infiltration rate.',
    },
    {
      key: 'suctionMm',
      label: 'Wetting-front suction head ψ',
      unit: 'mm',
      min: 0,
      max: Infinity,
      step: 1,
      searchMax: greenAmptAbsorbingSuctionMm,
      help: 'Capillary suction at the wetting front; larger in fine soils.',
    },
    {
      key: 'moistureDeficit',
      label: 'Moisture deficit Δθ',
      unit: '-',
      min: 0,
      max: 1,
      step: 0.01,
      help: 'Soil water the soil can still take up, (1 − initial effective saturation) × effective porosity.',
    },
    recoveryRateParam<'green-ampt'>(
      'How fast the infiltrated depth that sets the capacity drains away while no rain falls: F falls by 63 % in 1/k_r hours. ' +
        '0.05 /h (about 70 % gone in a day) is a rule of thumb, no source.',
    ),
  ],
  choices: [
    recoverySwitch<'green-ampt'>(
      'Off: a dry spell leaves the wetting front as the rain left it, so the next burst meets the same wet soil. ' +
        'On: the infiltrated depth drains away in every bar with no rain, F = F_w·e^(−k_r t), so capacity climbs back towards that of dry soil ' +
        '(a one-parameter stand-in for the redistribution modelled by Smith, Corradini & Melone 1993 and Ogden & Saghafian 1997; from memory).',
    ),
  ],
  // Loam with initial effective saturation 0.3 (Rawls, Brakensiek & Miller 1983; see soils.ts).
  defaults: {
    kind: 'green-ampt',
    ksMmH: 3.4,
    suctionMm: 88.9,
    moistureDeficit: 0.3038,
    recovers: false,
    recoveryPerH: 0.05,
  },
  dryBars: (method) => {
    if (method.recovers === true) {
      const half = halfRecoveryText(method);
      return (
        'A dry bar loses nothing, and the infiltrated depth drains away' +
        (half ? ` (half of it ${half})` : '') +
        ', so the next burst meets drier soil with a higher capacity.'
      );
    }
    return 'A dry bar loses nothing and leaves the infiltrated depth, and so the capacity, where the rain left it.';
  },
  compute: computeGreenAmpt,
  capacity: greenAmptCapacity,
};
