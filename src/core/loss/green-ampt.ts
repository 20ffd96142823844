import { peakIntensityMmH, totalDepthMm, type Storm } from '../storm';
import {
  REDISTRIBUTION_SHAPE_FACTOR,
  redistribute,
  redistributionSoil,
  scaledSaturationPower,
  type RedistributionSoil,
} from './redistribution';
import { recoverySwitch } from './recovery';
import { shortcuts } from './shortcuts';
import { sampleCapacity } from './sample-capacity';
import type { BarTotals, CapacityFn, ComputeFn, GreenAmptLoss, MethodSpec } from './types';

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
 * does not depend on how the rain is cut into bars.
 *
 * Dry spells. Without recovery a dry bar leaves F, and so the capacity, as
 * the rain left it. With recovery the method follows the Green–Ampt
 * infiltration with redistribution of Ogden & Saghafian (1997, J. Irrig.
 * Drain. Eng. 123(5); the description here is from memory):
 * 1. While no rain falls (bars with zero depth, once rain has begun) the
 *    wetted zone, holding I = F mm, keeps its water, deepens and drains: its
 *    water content θ₀ falls towards the initial θᵢ by the redistribution
 *    equation of Smith, Corradini & Melone (1993), solved over the whole
 *    spell in one piece (redistribution.ts, which also states how the
 *    Brooks–Corey soil relations are tied to K, ψ and Δθ).
 * 2. When rain returns, a new wetting front starts at the surface and moves
 *    into soil at θ₀: Green–Ampt with the same K, the deficit θ_s − θ₀ and
 *    the capillary drive G(θ₀, θ_s), so its M₂ = G(θ₀, θ_s)·(θ_s − θ₀) and
 *    its capacity K(1 + M₂/F₂), F₂ counted from zero (infinite at the first
 *    drop, as on dry soil), with ponding by Mein & Larson as above.
 * 3. When the new front reaches the old zone's depth Z (F₂ = Z(θ_s − θ₀)),
 *    the two are one front again at Z with θ_s above it: F = I + F₂ = Z·Δθ,
 *    and plain Green–Ampt goes on from there.
 * Our stated assumptions where the model leaves a choice: a hiatus is a bar
 * with no rain (any rain is a burst); the old zone stays as it is while the
 * new front advances; rain that stops before its new front has reached the
 * old zone is spread over the old zone's depth (water kept) before the zone
 * redistributes again; the soil relations are those of redistribution.ts.
 * The meeting point is found in closed form (the ponded equation solved for
 * the time), so wet bars stay exact and a dry spell is one solve: cutting
 * any bar in two changes nothing.
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
  PONDED[0] = ksMmH;
  PONDED[1] = suctionDeficitMm;
  PONDED[2] = startMm;
  PONDED[3] = hours;
  solvePonded();
  return PONDED[0];
}

/**
 * K, ψΔθ, F₁ and t for `solvePonded`, which leaves x in the first slot. The
 * bar loop calls it half a million times on a long storm, and a call that is
 * not inlined (this one is too large to be) passes and returns its numbers
 * boxed: five allocations a call, which showed in the profile as allocation
 * and collection. Numbers in a typed array are not boxed.
 */
const PONDED = new Float64Array(4);

/** greenAmptPondedIncrementMm on the numbers in PONDED (see there). */
function solvePonded(): void {
  const startMm = PONDED[2] as number;
  const kt = (PONDED[0] as number) * (PONDED[3] as number);
  const m = PONDED[1] as number;
  PONDED[0] = kt;
  if (m === 0 || kt === 0) return;
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
  if (m * u * u * u <= 3e-15 * low * ((startMm + low) / (base + low))) {
    PONDED[0] = low < high ? low : high;
    return;
  }
  // Newton's method from a lower bound, here rather than in a helper of its
  // own: a call that is not inlined passes its numbers boxed, and eight of
  // them on every solve showed in the profile (as allocation and collection).
  let x = low;
  // L(a) at an anchor a for the steps below (none yet: NaN fails every test).
  let anchor = NaN;
  let anchorLog = 0;
  let anchorScale = 0; // 1/(B + a)
  if (!(u < 1)) {
    // Far beyond F₁ + M (a new front after a dry spell, a dry start) the quadratic
    // bound is poor; K·t + M·ln(1 + K·t/(F₁ + M)) is another lower bound (x ≥ K·t
    // inside the logarithm) and close to the root there. Its logarithm at K·t
    // anchors the ones the steps need next.
    anchor = kt;
    anchorLog = growth(kt, base);
    anchorScale = 1 / (base + kt);
    const far = kt + m * anchorLog;
    if (far > low) x = far < high ? far : high;
  }
  // Each step needs L(x) = ln(1 + x/B), B = F₁ + M. Three ways, cheapest first:
  // - x/B ≤ 1e-3 (most bars of a long storm, F₁ having grown far past a bar's
  //   increment): the series of ln(1 + u) itself, no logarithm at all;
  // - x close to an anchor a where L(a) is known: L(x) = L(a) + ln(1 + v),
  //   v = (x − a)/(B + a), by the series when |v| ≤ 1e-3. Newton's iterates
  //   after the first lie that close to each other (and on a new front after a
  //   dry spell the first lies that close to K·t): one logarithm per solve
  //   instead of one per step;
  // - else Math.log1p, which becomes the new anchor.
  // The anchored sum rounds once more than log1p alone (and v once more than
  // x/B), so L may be a unit or two in the last place further off; that moves
  // the root by at most M·L·3ε/g′. With F₁ + x ≥ M the slope g′ = (F₁ + x)/(F₁
  // + M + x) is at least 1/2 and M·L ≤ x − K·t, so the root moves by at most
  // 6ε of itself: the series are used only there (x only grows past `low`, bar
  // the last step's rounding). Below, g′ can be small, rounding in the residual
  // is magnified, and log1p's own rounding is kept.
  // (Without the shortcuts: the series only where F₁ ≥ M, log1p elsewhere, no
  // anchor, and the loop ends only on a step below 1e-15 of x.)
  const quick = shortcuts.on;
  const series = quick ? startMm + low >= m : startMm >= m;
  // Newton's error after a step s is at most 2C·s², C = max g″/(2·min g′) over
  // the iterates, which all lie at or above the start x₀ (the first step goes
  // up from a lower bound, the rest stay above the root): g″ = M/(B + x)² falls
  // and g′ rises with x, so C = M/(2(B + x₀)(F₁ + x₀)). When 2C·s² is below
  // 1e-16 of x the next step could not move x past rounding, so the loop ends
  // a step sooner than by waiting for a step that small (the result differs
  // from that by at most 1e-16 of itself). Only where g′ ≥ 1/2 (C·x ≤ 1/2),
  // so that s ≪ x makes C·s small and the bound holds.
  const curve = series && quick ? m / (2 * (base + x) * (startMm + x)) : Infinity;
  for (let iter = 0; iter < 60; iter++) {
    let lx: number;
    // The anchor first: it saves the division x/B on the steps after the first
    // (an anchor is only ever set where x/B > 1e-3).
    const v = (x - anchor) * anchorScale;
    if (series && quick && v <= 1e-3 && v >= -1e-3) {
      lx = anchorLog + log1pSeries(v);
    } else {
      const ux = x / base;
      if (series && ux <= 1e-3 && ux >= 0) {
        lx = log1pSeries(ux);
      } else {
        lx = growth(x, base);
        anchor = x;
        anchorLog = lx;
        anchorScale = 1 / (base + x);
      }
    }
    const residual = x - m * lx - kt;
    const step = (residual * (base + x)) / (startMm + x); // residual / g′(x), g′ = (F₁ + x)/(F₁ + M + x)
    x -= step;
    // The first step may go up (from the lower bound); after it every step goes
    // down, so a step that does not (rounding noise at the root) means done.
    if ((iter === 0 ? !(Math.abs(step) > 1e-15 * x) : !(step > 1e-15 * x)) || 2 * curve * step * step <= 1e-16 * x) {
      // Settled: inside the bracket up to rounding (the start is often exact
      // to the last bit, and a step of noise may leave it by one), else fall back.
      if (x >= low * (1 - 1e-12) && x <= high * (1 + 1e-12)) {
        PONDED[0] = x < low ? low : x > high ? high : x;
        return;
      }
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
  PONDED[0] = 0.5 * (a + b);
}

/** ln(1 + x/base); for a tiny base x/base can overflow, and then ln x − ln base is exact enough. */
function growth(x: number, base: number): number {
  const ratio = x / base;
  return ratio < 1e300 ? Math.log1p(ratio) : Math.log(x) - Math.log(base);
}

/**
 * ln(1 + u) for |u| ≤ 1e-3 by its Taylor series u − u²(1/2 − u/3 + u²/4 −
 * u³/5 + u⁴/6): the next term, u⁷/7, is below 2e-19 of the sum. There it is
 * as accurate as Math.log1p (within half a unit in the last place, and the
 * same double in all but about 1 in 6,000, from a 200-bit check of 30,000
 * ratios in [0, 1e-3]) and several times cheaper.
 */
function log1pSeries(u: number): number {
  return u - u * u * (0.5 - u * (1 / 3 - u * (0.25 - u * (0.2 - u / 6))));
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

/** Sᵢ used when a method object leaves it out: loam's default, 0.3. */
export const DEFAULT_INITIAL_SATURATION = 0.3;
/** λ used when a method object leaves it out: loam's, 0.22 (Rawls, Brakensiek & Saxton 1982; from memory). */
export const DEFAULT_PORE_SIZE_INDEX = 0.22;

/** A Green–Ampt method's numbers, worked out once per call. */
interface GreenAmptConstants {
  readonly k: number;
  /** ψΔθ, mm. */
  readonly m: number;
  /** K·ψΔθ, mm²/h. */
  readonly km: number;
  /** Recovery in dry spells is on and can change something (ψΔθ > 0, Sᵢ < 1). */
  readonly recovers: boolean;
  /** The soil's numbers for the redistribution equation (Sᵢ, λ). */
  readonly soil: RedistributionSoil;
  /** 2 + 3λ: with Sᵢ^c, the drives G(Sᵢ, 1) and G(S₀, 1) over h_b/(1 + 3λ). */
  readonly airEntry: number;
  /** 2 + 3λ − Sᵢ^c: ψ·(1 + 3λ)/h_b, the drive from Sᵢ to saturation over h_b/(1 + 3λ). */
  readonly drive: number;
  /** b·I of the redistribution equation, p·ψΔθ/((1 − Sᵢ)(2 + 3λ − Sᵢ^c)), mm. */
  readonly bI: number;
}

function constants(method: GreenAmptLoss): GreenAmptConstants {
  const k = method.ksMmH;
  const m = method.suctionMm * method.moistureDeficit;
  const si = method.initialSaturation ?? DEFAULT_INITIAL_SATURATION;
  const soil = redistributionSoil(si, method.poreSizeIndex ?? DEFAULT_PORE_SIZE_INDEX);
  const airEntry = 2 + 3 / soil.invLambda;
  const drive = airEntry - soil.siC;
  return {
    k,
    m,
    km: k * m,
    recovers: method.recovers === true && m > 0 && si < 1,
    soil,
    airEntry,
    drive,
    bI: (REDISTRIBUTION_SHAPE_FACTOR * m) / ((1 - si) * drive),
  };
}

/**
 * The soil's state. While one wetting front is at work (always without
 * recovery) `sat` is 1 and `depth` is the Green–Ampt F. After a dry spell
 * with recovery the old wetted zone has drained to `sat` < 1, and a new
 * front from the surface has taken in `fresh` mm since the rain returned.
 */
interface GreenAmptState {
  /** Infiltrated water above the initial content in the (deeper) wetted zone, mm: F, or I. */
  depth: number;
  /** Effective saturation S₀ of that zone (1: at θᵢ + Δθ). */
  sat: number;
  /** S₀^(1/λ). */
  satPow: number;
  /** Water the new front has taken in since the last dry spell, mm (0 while one front). */
  fresh: number;
  /** The new front's ψΔθ: G(S₀, 1)·(θ_s − θ₀), mm. */
  freshM: number;
  /** `fresh` at which the new front reaches the old one, mm. */
  join: number;
  /** Hours of dry spell not yet applied (the spell is solved in one piece when it ends). */
  dryH: number;
}

const startState = (): GreenAmptState => ({ depth: 0, sat: 1, satPow: 1, fresh: 0, freshM: 0, join: 0, dryH: 0 });

/**
 * Loss of one bar of rain p over dt hours, mm, for a front that has taken in
 * `depth` mm, with M = ψΔθ and km = K·M (Green & Ampt 1911; Mein & Larson
 * 1973): rain at or below K, or below the ponding depth F_p = KM/(i − K),
 * soaks in; once ponded, the implicit ponded equation from the depth reached.
 */
function barLoss(k: number, m: number, km: number, depth: number, p: number, dt: number): number {
  const i = p / dt;
  if (i <= k || depth + p <= km / (i - k)) return p;
  const pondDepth = km / (i - k);
  let before = 0;
  let pondedH = dt;
  let from = depth;
  if (depth < pondDepth) {
    // Ponding starts inside the bar, t_p = (F_p − F)/i after its start.
    before = pondDepth - depth;
    pondedH = dt - before / i;
    from = pondDepth;
  }
  let ponded = 0;
  if (pondedH > 0) {
    PONDED[0] = k;
    PONDED[1] = m;
    PONDED[2] = from;
    PONDED[3] = pondedH;
    solvePonded();
    ponded = PONDED[0] as number;
  }
  const loss = before + ponded;
  return loss > p ? p : loss;
}

/**
 * u − ln(1 + u) for u > −1. Directly above |u| = 1e-3, where cancellation
 * costs at most 2ε/|u| ≤ 5e-13 of the result; below, u²·(1/2 − u/3 + u²/4 −
 * u³/5 + u⁴/6), whose next term is below 1e-15 of the first.
 */
function uMinusLog1p(u: number): number {
  if (Math.abs(u) > 1e-3) return u - Math.log1p(u);
  return u * u * (1 / 2 - u * (1 / 3 - u * (1 / 4 - u * (1 / 5 - u / 6))));
}

/**
 * Hours for a front with M = ψΔθ that has taken in `from` mm to take in
 * `to` mm under rain of intensity i: below ponding at the rain rate; once
 * ponded (F ≥ F_p) from the ponded Green–Ampt equation solved for the time,
 * t = [x − M·ln(1 + x/(F₁ + M))]/K, x = F₂ − F₁ (Chow, Maidment & Mays 1988,
 * §4.4), written as [x·F₁/(F₁ + M) + M·(u − ln(1 + u))]/K, u = x/(F₁ + M).
 */
function hoursToTake(k: number, m: number, km: number, from: number, to: number, i: number): number {
  if (!(to > from)) return 0;
  // A zone drained to Sᵢ (to rounding) is never reached: F₂ = I(1 − S₀)/(S₀ − Sᵢ) is infinite.
  if (to === Infinity) return Infinity;
  const pondDepth = i > k ? km / (i - k) : Infinity;
  if (to <= pondDepth) return (to - from) / i;
  const start = from > pondDepth ? from : pondDepth;
  const before = (start - from) / i;
  const x = to - start;
  const base = start + m;
  // Without suction (M = 0, or too small to add to F₁) the ponded rate is K.
  if (!(m > 0) || base === start) return before + x / k;
  const u = x / base;
  // For a subnormal M on a dry surface u can overflow: then ln(1 + u) = ln x − ln(F₁ + M).
  const curved = u < 1e300 ? m * uMinusLog1p(u) : x * (m / base) - m * (Math.log(x) - Math.log(base));
  return before + ((x * start) / base + curved) / k;
}

/**
 * Ends a dry spell: the wetted zone redistributes over the spell's hours
 * (redistribution.ts), and the next rain starts a new front at the surface
 * into soil at the zone's content (Ogden & Saghafian 1997; from memory).
 * Rain that stopped before its new front reached the old zone is first
 * spread over the old zone's depth Z, the water kept: S₀ − Sᵢ grows by the
 * factor (I + F₂)/I (our rule: the model keeps one zone through a spell).
 */
function endDrySpell(c: GreenAmptConstants, st: GreenAmptState): void {
  const si = c.soil.si;
  if (st.fresh > 0) {
    const sat = st.sat;
    const grown = sat < 1 ? si + (sat - si) * ((st.depth + st.fresh) / st.depth) : 1;
    // S₀ grows by the factor 1 + d, d = (S₀ − Sᵢ)·F₂/(I·S₀), written so as not to cancel.
    const d = ((sat - si) * (st.fresh / st.depth)) / sat;
    st.satPow =
      grown < 1
        ? shortcuts.on
          ? scaledSaturationPower(c.soil, st.satPow, d, grown)
          : Math.pow(grown, c.soil.invLambda)
        : 1;
    st.sat = grown < 1 ? grown : 1;
    st.depth += st.fresh;
    st.fresh = 0;
  }
  redistribute(c.soil, st, (c.k * st.dryH) / st.depth, c.bI / st.depth);
  st.dryH = 0;
  const sat = st.sat;
  if (sat < 1) {
    // The new front: deficit θ_s − θ₀ = Δθ(1 − S₀)/(1 − Sᵢ) and drive
    // G(S₀, 1) = ψ(2 + 3λ − S₀^c)/(2 + 3λ − Sᵢ^c); it meets the old front at
    // F₂ = Z(θ_s − θ₀) = I(1 − S₀)/(S₀ − Sᵢ).
    const satC = sat * sat * sat * st.satPow;
    st.freshM = (c.m * ((1 - sat) / (1 - si)) * (c.airEntry - satC)) / c.drive;
    st.join = (st.depth * (1 - sat)) / (sat - si);
  }
}

/**
 * Bars `from` to `to` from the state given (updated at the end), losses
 * written to the outputs when given (the capacity sampler runs without them).
 * Returns the totals, summed in the same loop as compute.ts's summing pass
 * would sum them (same order, same sums), so 10⁶ bars are not read twice.
 * A plain loop over local variables: this runs on every drag frame.
 */
function runGreenAmpt(
  c: GreenAmptConstants,
  st: GreenAmptState,
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  from: number,
  to: number,
  lossOut: Float64Array | null,
  excessOut: Float64Array | null,
): BarTotals {
  const { k, m, km, recovers } = c;
  let rainSum = 0;
  let lossSum = 0;
  let excessSum = 0;
  let peak = 0;
  let depth = st.depth;
  for (let j = from; j < to; j++) {
    const p = depthsMm[j] as number;
    const dt = durationsH[j] as number;
    let loss = p;
    if (p === 0) {
      // A dry bar: with recovery, once there is water to move, the spell's hours count.
      if (recovers && depth > 0) st.dryH += dt;
    } else if (!recovers) {
      loss = barLoss(k, m, km, depth, p, dt);
      depth += loss;
    } else {
      st.depth = depth;
      if (st.dryH > 0) endDrySpell(c, st);
      if (st.sat < 1) {
        // Two fronts: the new one takes rain until it reaches the old zone.
        const freshKm = k * st.freshM;
        const i = p / dt;
        // No need to time the meeting when the front cannot reach the old zone in
        // this bar: it takes at most the bar's rain, and at most its capacity at
        // the bar's start, K(1 + M₂/F₂), for the whole bar (the capacity only
        // falls). On the first bar after a spell (F₂ = 0, capacity unbounded), at
        // most what it would take ponded from a dry surface, K·t + √(2M₂K·t) (see
        // greenAmptPondedIncrementMm): half the meetings there were timed in vain.
        // That bound is held a hair (1e-12) below the meeting point, so that
        // rounding cannot skip a meeting that happens.
        const joinH =
          st.fresh + p <= st.join ||
          (st.fresh > 0
            ? st.fresh + (k + freshKm / st.fresh) * dt < st.join
            : k * dt + Math.sqrt(2 * freshKm * dt) < st.join * (1 - 1e-12))
            ? dt
            : hoursToTake(k, st.freshM, freshKm, st.fresh, st.join, i);
        if (joinH >= dt) {
          loss = barLoss(k, st.freshM, freshKm, st.fresh, p, dt);
          st.fresh += loss;
        } else {
          // They join: one front again, at Z with θ_s above, F = I + F₂ = Z·Δθ.
          const taken = st.join - st.fresh;
          const joined = st.depth + st.join;
          const restH = dt - joinH;
          const rest = i * restH;
          // Below capacity on both fronts (never ponded in this bar): all of it,
          // exactly, rather than a sum of parts that rounds off the rain.
          const soaked = i <= k || (st.join <= freshKm / (i - k) && joined + rest <= km / (i - k));
          loss = soaked ? p : taken + (restH > 0 ? barLoss(k, m, km, joined, rest, restH) : 0);
          if (loss > p) loss = p;
          st.depth = joined + (loss - taken);
          st.sat = 1;
          st.satPow = 1;
          st.fresh = 0;
        }
      } else {
        loss = barLoss(k, m, km, depth, p, dt);
        st.depth += loss;
      }
      depth = st.depth;
    }
    const excess = p - loss;
    if (lossOut !== null && excessOut !== null) {
      lossOut[j] = loss;
      excessOut[j] = excess;
    }
    rainSum += p;
    lossSum += loss;
    excessSum += excess;
    // Compare by multiplication; divide only when the peak moves (rarely).
    if (excess > peak * dt) peak = excess / dt;
  }
  st.depth = depth;
  return { rainMm: rainSum, totalLossMm: lossSum, totalExcessMm: excessSum, peakExcessMmH: peak };
}

export const computeGreenAmpt: ComputeFn<'green-ampt'> = (durationsH, depthsMm, method, lossOut, excessOut) =>
  runGreenAmpt(constants(method), startState(), durationsH, depthsMm, 0, depthsMm.length, lossOut, excessOut);

/**
 * Green–Ampt capacity through the storm from the same bar loop as the
 * losses: f = K(1 + ψΔθ/F) at the depth F(t) reached (Green & Ampt 1911);
 * while a new front follows a dry spell, its own K(1 + M₂/F₂). Infinite on
 * dry soil (F = 0) when ψΔθ > 0, and so also in a dry spell with recovery:
 * the surface has dried below saturation and the next rain starts a new front.
 */
export const greenAmptCapacity: CapacityFn<'green-ampt'> = (durationsH, depthsMm, method, timesH, out) => {
  const c = constants(method);
  sampleCapacity<GreenAmptState>(
    durationsH,
    depthsMm,
    timesH,
    out,
    startState(),
    (st) => ({ ...st }),
    (st, d, p, from, to) => {
      runGreenAmpt(c, st, d, p, from, to, null, null);
    },
    (state) => {
      if (c.m === 0) return c.k;
      const st = { ...state };
      if (st.dryH > 0) endDrySpell(c, st);
      if (st.sat < 1) return st.fresh > 0 ? c.k * (1 + st.freshM / st.fresh) : Infinity;
      return st.depth > 0 ? c.k * (1 + c.m / st.depth) : Infinity;
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
    'Green & Ampt (1911); ponding time by Mein & Larson (1973); Chow, Maidment & Mays (1988) Applied Hydrology, sections 4.3–4.4; ' +
    'recovery in dry spells: Ogden & Saghafian (1997), with the redistribution of Smith, Corradini & Melone (1993).',
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
    {
      key: 'initialSaturation',
      label: 'Initial saturation Sᵢ',
      unit: '-',
      min: 0,
      // At 1 no deficit could remain (the porosity Δθ/(1 − Sᵢ) would be unbounded).
      max: 0.99,
      step: 0.01,
      omitted: DEFAULT_INITIAL_SATURATION,
      monotone: false,
      activeWhen: (method) => method.recovers === true,
      help:
        'Effective saturation of the soil before the storm (0 as dry as it gets, up to 0.99), for the drainage in dry spells; ' +
        'with Δθ it gives the effective porosity, Δθ/(1 − Sᵢ). "Use soil values" sets it together with Δθ.',
    },
    {
      key: 'poreSizeIndex',
      label: 'Pore-size distribution index λ',
      unit: '-',
      min: 0.01,
      max: 10,
      step: 0.01,
      omitted: DEFAULT_PORE_SIZE_INDEX,
      monotone: false,
      activeWhen: (method) => method.recovers === true,
      help:
        'Brooks–Corey λ: how fast conductivity and suction change as the wetted zone drains (smaller in fine soils). ' +
        '"Use soil values" sets the texture\'s value (Rawls, Brakensiek & Saxton 1982; from memory); 0.22 is loam\'s. ' +
        'Runoff need not rise or fall steadily with λ (faster drainage, but less pull into the drained zone), so a fit of it may find one of two values.',
    },
  ],
  soilPresets: true,
  choices: [
    recoverySwitch<'green-ampt'>(
      'Off: a dry spell leaves the wetted zone as the rain left it, so the next burst meets the same wet soil. ' +
        'On: in bars with no rain the wetted zone keeps its water but drains deeper and drier (the redistribution equation of ' +
        'Smith, Corradini & Melone 1993); the next rain starts a new wetting front at the surface, which takes water quickly ' +
        'until it reaches the old one, and then one front goes on (Green–Ampt with redistribution, Ogden & Saghafian 1997; ' +
        'from memory). How fast the soil recovers follows from K, ψ, Δθ, Sᵢ and λ: there is no rate to set.',
    ),
  ],
  // Loam with initial effective saturation 0.3 (Rawls, Brakensiek & Miller 1983; λ from
  // Rawls, Brakensiek & Saxton 1982; see soils.ts).
  defaults: {
    kind: 'green-ampt',
    ksMmH: 3.4,
    suctionMm: 88.9,
    moistureDeficit: 0.3038,
    recovers: false,
    initialSaturation: DEFAULT_INITIAL_SATURATION,
    poreSizeIndex: DEFAULT_PORE_SIZE_INDEX,
  },
  dryBars: (method) => {
    if (method.recovers === true) {
      return (
        'A dry bar loses nothing; the wetted zone keeps its water but drains deeper and drier, so the next rain ' +
        "starts a new wetting front that takes water at an unbounded rate at first, falling to the old front's " +
        'capacity once it reaches it.'
      );
    }
    return 'A dry bar loses nothing and leaves the infiltrated depth, and so the capacity, where the rain left it.';
  },
  compute: computeGreenAmpt,
  capacity: greenAmptCapacity,
};
