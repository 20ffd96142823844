import { InputError } from '../errors';
import { peakIntensityMmH, totalDepthMm, type Storm } from '../storm';
import { sampleCapacity } from './sample-capacity';
import { halfRecoveryText, recoveryRateParam, recoveryRatePerH, recoverySwitch } from './recovery';
import type { CapacityFn, ComputeFn, HortonLoss, MethodSpec } from './types';

/**
 * Horton infiltration. Capacity f(τ) = f_c + (f_0 − f_c)·e^(−kτ) and cumulative
 * infiltration along that curve F(τ) = f_c·τ + (f_0 − f_c)(1 − e^(−kτ))/k
 * (Horton 1940, Soil Sci. Soc. Am. Proc. 5, 399–417; Chow, Maidment & Mays
 * 1988, Applied Hydrology, §4.2).
 *
 * Two readings of τ:
 * - time since the rain began (`ponding: false`): τ runs with the clock from
 *   the start of the first bar with rain (dry bars before it leave the soil
 *   at f₀), and each bar loses exactly ∫ min(i, f(τ)) dτ over the bar: f
 *   falls and i is constant, so the two cross at most once, in closed form;
 * - time compression (`ponding: true`): capacity depends on the cumulative
 *   infiltration F, so rain below capacity soaks in without moving along the
 *   curve. This is dF/dt = min(i, f(F)), solved exactly bar by bar: the bar is
 *   split where capacity falls to its intensity.
 * Either way the answer does not depend on how the rain is cut into bars.
 * Dry bars inside the storm: by the clock, capacity keeps falling (time runs
 * on); by infiltrated depth, it stays where the rain left it. With recovery
 * on, both instead regain capacity towards f₀ (see recovery.ts).
 *
 * The state of the soil is kept as D = e^(−kτ) ∈ [0, 1], the point of the
 * decay curve it stands on: f = f_c + (f₀ − f_c)·D. D depends only on k,
 * k_r and the timing of the wet bars, never on f₀ or f_c.
 */

/** Cumulative Horton infiltration after τ hours on the capacity curve, mm (Horton 1940). */
export function hortonCumulativeMm(f0MmH: number, fcMmH: number, kPerH: number, tH: number): number {
  return fcMmH * tH + ((f0MmH - fcMmH) * -Math.expm1(-kPerH * tH)) / kPerH;
}

/** Horton capacity after τ hours on the capacity curve, mm/h (Horton 1940). */
export function hortonCapacityMmH(f0MmH: number, fcMmH: number, kPerH: number, tH: number): number {
  return fcMmH + (f0MmH - fcMmH) * Math.exp(-kPerH * tH);
}

/** A Horton method's numbers, worked out once per call. */
interface HortonConstants {
  readonly f0: number;
  readonly fc: number;
  /** f₀ − f_c, mm/h. */
  readonly span: number;
  /** (f₀ − f_c)/k, mm. */
  readonly a: number;
  readonly k: number;
  /** Recovery rate in dry bars, 1/h; 0 when off. */
  readonly kr: number;
}

function constants(method: HortonLoss): HortonConstants {
  const span = method.f0MmH - method.fcMmH;
  return {
    f0: method.f0MmH,
    fc: method.fcMmH,
    span,
    a: span / method.kPerH,
    k: method.kPerH,
    kr: recoveryRatePerH(method),
  };
}

/** Time since the rain began: D = e^(−kτ), and whether the first drop has fallen. */
interface ClockState {
  decay: number;
  started: boolean;
}

/**
 * Bars `from` to `to` of the clock reading, from the state given (updated at
 * the end). Each bar loses ∫ min(i, f(τ)) dτ over the bar, mm, written to the
 * outputs when given (the capacity sampler runs without them). With D_a, D_b
 * the decay at the bar's ends (D_b = D_a·e^(−kΔt)):
 * - i ≥ f(τ_a): capacity is below the rain throughout, L = ∫ f dτ
 *   = f_c·Δt + (f₀ − f_c)/k·(D_a − D_b) (Horton 1940);
 * - i ≤ f(τ_b): capacity is above the rain throughout, L = P;
 * - otherwise f crosses i once, where D_c = (i − f_c)/(f₀ − f_c), after
 *   s = ln(D_a/D_c)/k; rain below capacity soaks in before it and the
 *   capacity curve from f = i applies after it, over r = Δt − s:
 *   L = i·s + f_c·r + (i − f_c)(1 − e^(−kr))/k.
 * A plain loop over local variables: this runs on every drag frame.
 */
function runClock(
  c: HortonConstants,
  st: ClockState,
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  from: number,
  to: number,
  lossOut: Float64Array | null,
  excessOut: Float64Array | null,
): void {
  const { fc, span, a, k, kr } = c;
  let decay = st.decay;
  let started = st.started;
  for (let j = from; j < to; j++) {
    const p = depthsMm[j] as number;
    const dt = durationsH[j] as number;
    let loss = 0;
    if (p === 0) {
      // Before the first drop the clock has not started; after it, time runs on
      // or (with recovery) capacity grows back: 1 − D shrinks by e^(−k_r Δt).
      if (started) {
        if (kr > 0) decay -= (1 - decay) * Math.expm1(-kr * dt);
        else if (decay > 0) decay *= Math.exp(-k * dt);
      }
    } else {
      started = true;
      const da = decay;
      // Once D has underflowed to zero it stays there: skip the exponential.
      const fall = da > 0 ? da * Math.expm1(-k * dt) : 0; // D_b − D_a (≤ 0)
      decay = da + fall;
      const i = p / dt;
      if (i >= fc + span * da) {
        loss = fc * dt - a * fall;
      } else if (i <= fc + span * decay) {
        loss = p;
      } else {
        // Here f_c < i < f₀ and D_b < D_c < D_a.
        let s = Math.log((da * span) / (i - fc)) / k;
        if (s < 0) s = 0;
        else if (s > dt) s = dt;
        const r = dt - s;
        loss = i * s + fc * r - ((i - fc) * Math.expm1(-k * r)) / k;
      }
      if (loss > p) loss = p;
    }
    if (lossOut !== null && excessOut !== null) {
      lossOut[j] = loss;
      excessOut[j] = p - loss;
    }
  }
  st.decay = decay;
  st.started = started;
}

const computeByClock = (
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  method: HortonLoss,
  lossOut: Float64Array,
  excessOut: Float64Array,
): void => {
  const st: ClockState = { decay: 1, started: false };
  runClock(constants(method), st, durationsH, depthsMm, 0, depthsMm.length, lossOut, excessOut);
};

/** Time compression: the infiltrated depth F, and where it stands on the curve. */
interface DepthState {
  depth: number;
  /** e^(−kτ) at `depth`, valid while `onCurve`. */
  decay: number;
  /**
   * τ at `depth` while `onCurve`; otherwise τ where the curve was last known,
   * a lower bound (F has only grown since), from which the next solve starts.
   */
  tau: number;
  /** True when `decay` and `tau` are known for `depth` (else found from F when needed). */
  onCurve: boolean;
  /**
   * Hours of dry spell whose recovery is not yet applied: a run of dry bars is
   * recovered in one step when the rain returns (or the capacity is read),
   * which is the same as bar by bar since the exponentials multiply.
   */
  dryH: number;
}

/**
 * Puts the state back on the curve: the τ where cumulative infiltration is F,
 * g(τ) = f_c·τ + a(1 − e^(−kτ)) − F = 0 (a = (f_0 − f_c)/k), and D = e^(−kτ).
 * The start comes from the last point known on the curve (τ₀, D₀), where
 * g′ = f(τ₀) and g″ = −k²aD₀ are known without an exponential: the root of
 * the quadratic Taylor model F₀ + f·Δ − k²aD₀Δ²/2 = F, error O(Δ³) (or the
 * bounds F ≤ f_0·τ and F ≤ f_c·τ + a, if larger). Then Halley's method, whose
 * error cubes each step: once a step is below 1e-5/k the next would be
 * below 1e-15 of it, so that step is the answer, and D follows from the last
 * exponential by its series (no further exp). Used where light rain has
 * soaked in below capacity (F moved off the curve) and the curve is needed
 * again: before ponding or a dry-spell recovery.
 */
function settle(c: HortonConstants, st: DepthState): void {
  const { fc, a, k, f0 } = c;
  const depth = st.depth;
  st.onCurve = true;
  if (fc === 0) {
    // F = a(1 − e^(−kτ)) exactly; F ≥ a means the curve has reached zero capacity.
    const e = 1 - depth / a;
    st.decay = e > 0 ? e : 0;
    st.tau = e > 0 ? -Math.log(e) / k : Infinity;
    return;
  }
  const d0 = st.decay;
  const gap = depth - fc * st.tau - a * (1 - d0); // F − F(τ₀) ≥ 0
  const slope = fc + k * a * d0; // f(τ₀)
  const bend = k * k * a * d0; // −g″(τ₀)
  const disc = slope * slope - 2 * bend * gap;
  // Root of slope·Δ − bend·Δ²/2 = gap, written so that it never cancels; Newton's step without the bend otherwise.
  const delta = disc > 0 ? (2 * gap) / (slope + Math.sqrt(disc)) : gap / slope;
  let tau = Math.max(st.tau + delta, depth / f0, (depth - a) / fc, 0);
  // e^(−kτ) underflows to zero beyond kτ ≈ 745, whatever the exact τ.
  if (k * tau > 746) {
    st.decay = 0;
    st.tau = tau;
    return;
  }
  for (let iter = 0; iter < 100; iter++) {
    const e = Math.exp(-k * tau);
    const r = depth - fc * tau - a * (1 - e); // −g
    const g1 = fc + k * a * e; // g′ > 0
    const g2 = -k * k * a * e; // g″ ≤ 0
    // Halley: Δ = 2·r·g′ / (2g′² + r·g″); Newton's r/g′ if the bend would more than double the step.
    const den = 2 * g1 * g1 + r * g2;
    const step = den > g1 * g1 ? (2 * r * g1) / den : r / g1;
    tau += step;
    const x = k * step;
    if (Math.abs(x) < 1e-5) {
      // e^(−kτ) at the new τ is e·e^(−x), e^(−x) = 1 − x + x²/2 − x³/6 to 1e-21.
      st.tau = tau;
      st.decay = e * (1 - x * (1 - x * (0.5 - x / 6)));
      return;
    }
  }
  st.tau = tau;
  st.decay = Math.exp(-k * tau);
}

/**
 * Applies the recovery of the pending dry hours, by infiltrated depth:
 * capacity regains f₀ as in recovery.ts, 1 − D shrinking by e^(−k_r Δt), and
 * F moves back to the depth the curve holds at the new D,
 * F = f_c·τ + (f₀ − f_c)(1 − D)/k with τ = −ln(D)/k (Horton 1940).
 */
function recoverDepth(c: HortonConstants, st: DepthState): void {
  const dt = st.dryH;
  st.dryH = 0;
  if (st.depth === 0) return;
  if (!st.onCurve) settle(c, st);
  const lost = (1 - st.decay) * Math.exp(-c.kr * dt); // 1 − D after the spell
  // No recovery to the last bit (D too small to hold, e^(−k_r Δt) rounding
  // to 1): the state stays as it is. τ from −ln(1 − lost) would be infinite,
  // and F with it (NaN a bar later), where the curve had only decayed past
  // what a double holds (e^(−kτ) underflows beyond kτ ≈ 745).
  if (lost === 1) return;
  const tau = -Math.log1p(-lost) / c.k;
  st.decay = 1 - lost;
  st.tau = tau;
  st.depth = c.fc * tau + c.a * lost;
}

/**
 * Bars `from` to `to` by infiltrated depth (time compression), from the state
 * given (updated at the end); losses written to the outputs when given. A
 * plain loop over local variables, as it runs on every drag frame; the rare
 * solves (settle, recovery) go through the state.
 */
function runDepth(
  c: HortonConstants,
  st: DepthState,
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  from: number,
  to: number,
  lossOut: Float64Array | null,
  excessOut: Float64Array | null,
): void {
  const { f0, fc, span, a, k, kr } = c;
  let depth = st.depth;
  let decay = st.decay;
  let tau = st.tau;
  let onCurve = st.onCurve;
  let dryH = st.dryH;
  for (let j = from; j < to; j++) {
    const p = depthsMm[j] as number;
    const dt = durationsH[j] as number;
    let loss = p;
    if (p === 0) {
      if (kr > 0) dryH += dt;
    } else {
      if (dryH > 0) {
        st.depth = depth;
        st.decay = decay;
        st.tau = tau;
        st.onCurve = onCurve;
        st.dryH = dryH;
        recoverDepth(c, st);
        depth = st.depth;
        decay = st.decay;
        tau = st.tau;
        onCurve = true;
        dryH = 0;
      }
      const i = p / dt;
      if (i <= fc) {
        // Capacity never falls below f_c: all rain soaks in.
        depth += p;
        onCurve = false;
      } else {
        // Is the bar ponded from its start (capacity already at or below i)?
        let pondedAtStart: boolean;
        if (onCurve) pondedAtStart = fc + span * decay <= i;
        // Off the curve, a cheap sufficient test first: −ln x ≤ 1/x − 1 bounds the
        // depth F_p at which capacity falls to i by (f_0 − i)·i / (k(i − f_c)).
        else pondedAtStart = depth * k * (i - fc) >= (f0 - i) * i;
        let pondDepth = depth; // F at which capacity equals i
        let pondDecay = decay; // e^(−kτ) there
        let pondTau = tau; // and τ
        let soaks = false;
        if (!pondedAtStart) {
          // Here f_c < i < f_0. f(τ_p) = i gives e^(−kτ_p) = (i − f_c)/(f_0 − f_c),
          // and then F(τ_p) = f_c·τ_p + (f_0 − i)/k.
          pondDecay = (i - fc) / span;
          pondTau = -Math.log(pondDecay) / k;
          pondDepth = fc * pondTau + (f0 - i) / k;
          // Capacity stays above i through the bar: all rain soaks in.
          soaks = depth + p <= pondDepth;
          if (!soaks) pondedAtStart = depth >= pondDepth;
        }
        if (soaks) {
          depth += p;
          onCurve = false;
        } else {
          let before = 0; // rain soaked in before ponding, mm
          let pondedH = dt;
          if (pondedAtStart) {
            if (!onCurve) {
              st.depth = depth;
              st.decay = decay;
              st.tau = tau;
              settle(c, st);
              decay = st.decay;
              tau = st.tau;
            }
          } else {
            before = pondDepth - depth;
            pondedH = dt - before / i;
            depth = pondDepth;
            tau = pondTau;
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
          tau += pondedH;
          onCurve = true;
          depth += ponded;
          loss = before + ponded;
          if (loss > p) loss = p;
        }
      }
    }
    if (lossOut !== null && excessOut !== null) {
      lossOut[j] = loss;
      excessOut[j] = p - loss;
    }
  }
  st.depth = depth;
  st.decay = decay;
  st.tau = tau;
  st.onCurve = onCurve;
  st.dryH = dryH;
}

const computeTimeCompression = (
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  method: HortonLoss,
  lossOut: Float64Array,
  excessOut: Float64Array,
): void => {
  // F = 0 is τ = 0, D = 1.
  const st: DepthState = { depth: 0, decay: 1, tau: 0, onCurve: true, dryH: 0 };
  runDepth(constants(method), st, durationsH, depthsMm, 0, depthsMm.length, lossOut, excessOut);
};

export const computeHorton: ComputeFn<'horton'> = (durationsH, depthsMm, method, lossOut, excessOut) => {
  if (method.ponding) computeTimeCompression(durationsH, depthsMm, method, lossOut, excessOut);
  else computeByClock(durationsH, depthsMm, method, lossOut, excessOut);
};

/**
 * Horton capacity through the storm, from the same bar loops as the losses:
 * f = f_c + (f₀ − f_c)·D for the state reached at each time (by the clock,
 * or from the infiltrated depth F(t) with time compression).
 */
export const hortonCapacity: CapacityFn<'horton'> = (durationsH, depthsMm, method, timesH, out) => {
  const c = constants(method);
  if (method.ponding) {
    sampleCapacity<DepthState>(
      durationsH,
      depthsMm,
      timesH,
      out,
      { depth: 0, decay: 1, tau: 0, onCurve: true, dryH: 0 },
      (st) => ({ ...st }),
      (st, d, p, from, to) => runDepth(c, st, d, p, from, to, null, null),
      (st) => {
        if (st.dryH > 0) recoverDepth(c, st);
        if (!st.onCurve) settle(c, st);
        return c.fc + c.span * st.decay;
      },
    );
  } else {
    sampleCapacity<ClockState>(
      durationsH,
      depthsMm,
      timesH,
      out,
      { decay: 1, started: false },
      (st) => ({ ...st }),
      (st, d, p, from, to) => runClock(c, st, d, p, from, to, null, null),
      (st) => c.fc + c.span * st.decay,
    );
  }
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
 * By the clock: a wet bar loses all its rain exactly when the capacity at
 * its end is at least its intensity, f_c + (f_0 − f_c)·D_b ≥ i, and D does
 * not depend on f_0, so f_0 = f_c + (i − f_c)/D_b for the most demanding bar.
 * Time compression: F(τ) ≥ a(1 − e^(−kτ)) gives f(F) ≥ f_0 − k·F, so
 * f_0 = i_max + k·ΣP keeps capacity above every intensity while F ≤ ΣP
 * (recovery only lowers F).
 */
export function hortonAbsorbingF0(storm: Storm, method: HortonLoss): number {
  const { fcMmH: fc } = method;
  let need = fc;
  if (method.ponding) {
    need = Math.max(fc, peakIntensityMmH(storm) + method.kPerH * totalDepthMm(storm));
  } else {
    const { durationsH, depthsMm } = storm;
    // The decay D is the same for any f_0: run the clock with f_0 = f_c.
    const c = constants({ ...method, f0MmH: fc });
    const st: ClockState = { decay: 1, started: false };
    for (let j = 0; j < depthsMm.length; j++) {
      const p = depthsMm[j] as number;
      const dt = durationsH[j] as number;
      runClock(c, st, durationsH, depthsMm, j, j + 1, null, null);
      const shortfall = p / dt - fc;
      if (p > 0 && shortfall > 0) need = Math.max(need, st.decay > 0 ? fc + shortfall / st.decay : Infinity);
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
    recoveryRateParam<'horton'>(
      'How fast capacity grows back towards f₀ while no rain falls: in 1/k_r hours it wins back about 63 % of what it lost. ' +
        'Drying is much slower than wetting, so k_r is usually far below k; 0.05 /h (about 70 % back in a day) is a rule of thumb, no source.',
    ),
  ],
  choices: [
    {
      key: 'ponding',
      label: 'Capacity follows',
      choices: [
        { value: true, label: 'infiltrated depth (time compression)' },
        { value: false, label: 'time since the rain began' },
      ],
      help:
        'Infiltrated depth: light rain does not use up capacity it did not need. ' +
        'Time since the rain began: capacity falls with the clock from the first bar with rain, as in a hand calculation; ' +
        'each bar loses exactly the rain the capacity curve takes in, also where the curve crosses the bar.',
    },
    recoverySwitch<'horton'>(
      'Off: a dry spell leaves the soil as the rain left it (by infiltrated depth) or lets the clock run on (by time). ' +
        'On: capacity grows back towards f₀ in every bar with no rain, f₀ − f = (f₀ − f_w)·e^(−k_r t) ' +
        '(Horton regeneration during drying, as given by Bedient, Huber & Vieux, Hydrology and Floodplain Analysis; from memory).',
    ),
  ],
  defaults: { kind: 'horton', f0MmH: 75, fcMmH: 10, kPerH: 4, ponding: true, recovers: false, recoveryPerH: 0.05 },
  dryBars: (method) => {
    if (method.recovers === true) {
      const half = halfRecoveryText(method);
      return (
        'A dry bar loses nothing. After the rain has begun, each dry bar lets the capacity grow back towards f₀' +
        (half ? ` (half of what was lost ${half})` : '') +
        '; the next rain starts from the recovered capacity.'
      );
    }
    return method.ponding
      ? 'A dry bar loses nothing and leaves the capacity where the rain left it: it moves only as water soaks in.'
      : 'A dry bar loses nothing. Dry bars before the first rain leave the capacity at f₀; once the rain has begun the clock runs on through dry bars, so capacity keeps falling.';
  },
  compute: computeHorton,
  capacity: hortonCapacity,
  validateExtra: (method) => {
    if (method.f0MmH < method.fcMmH) {
      throw new InputError(
        'f0MmH',
        `Initial capacity f₀ (${method.f0MmH} mm/h) must be at least the final capacity f_c (${method.fcMmH} mm/h).`,
      );
    }
  },
};
