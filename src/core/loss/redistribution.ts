import { shortcuts } from './shortcuts';

/**
 * Redistribution of a Green–Ampt wetted zone while no rain falls, for the
 * Green–Ampt method's recovery in dry spells (green-ampt.ts holds the storm
 * logic around it; citations and equations from memory).
 *
 * The wetted zone is a layer of depth Z at water content θ₀ over soil at the
 * initial content θᵢ, holding I = Z(θ₀ − θᵢ) mm of infiltrated water. With no
 * rain at the surface the layer keeps its water, deepens and drains
 * (Smith, Corradini & Melone 1993, Water Resources Research 29(1), the
 * redistribution equation; used for a rainfall hiatus in the Green–Ampt
 * infiltration with redistribution of Ogden & Saghafian 1997, J. Irrig.
 * Drain. Eng. 123(5)):
 *
 *   dθ₀/dt = −[K(θ₀) + p·K_s·G(θᵢ, θ₀)/Z] / Z,   Z = I/(θ₀ − θᵢ),
 *
 * gravity drainage at the layer's conductivity K(θ₀) plus capillary pull at
 * the front; p is a profile shape factor, 1.7 (the value Ogden & Saghafian
 * use after Smith et al.; from memory; p = 1 is a rectangular profile).
 *
 * Soil water relations of Brooks & Corey (1964, Hydrology Paper 3, Colorado
 * State University), in the effective saturation S = (θ − θ_r)/θ_e:
 *   K(S) = K_s·S^ε, ε = (2 + 3λ)/λ;   S = (h_b/h)^λ below the air-entry head;
 * so the capillary drive G(a, b), the integral of K_r = K/K_s over the suction
 * head from the wetter content's head to the drier one's (as Smith et al.
 * 1993 define it), is, with c = 3 + 1/λ,
 *   G(Sᵢ, S₀) = h_b/(1 + 3λ)·(S₀^c − Sᵢ^c)             for S₀ < 1,
 *   G(S₀, 1)  = h_b/(1 + 3λ)·(2 + 3λ − S₀^c)           into saturated soil (air entry included).
 *
 * Our rules tying these to the Green–Ampt parameters K, ψ, Δθ (stated, not
 * from the papers):
 * - K_s is the method's K; G(Sᵢ, 1) is its ψ, so h_b/(1 + 3λ) = ψ/(2 + 3λ − Sᵢ^c);
 * - the layer at the end of rain is at S = 1 (θ₀ − θᵢ = Δθ), and the soil's
 *   effective porosity is θ_e = Δθ/(1 − Sᵢ).
 * In S, with x = S₀ − Sᵢ and I = Z·θ_e·x, the equation becomes
 *
 *   dS₀/dτ = −x·[S₀^ε + b·x·(S₀^c − Sᵢ^c)],   τ = K·t/I,
 *   b = p·ψΔθ / (I·(1 − Sᵢ)·(2 + 3λ − Sᵢ^c)),
 *
 * an autonomous equation in S₀ alone; I is fixed through a dry spell.
 *
 * No closed form exists, so it is solved by its Taylor series in τ, with
 * coefficients from the recurrences for powers and products of series
 * (automatic differentiation of the right-hand side), summed until the last
 * term is below 1e-16 of the sum and the one before below 1e-12; where the series would not
 * converge over the whole spell it is restarted from an intermediate point
 * inside its radius of convergence. (The short spells of a long record, most
 * of them, take the Taylor series of S₀ itself to order 3 to 5, in a few
 * pieces where one will not do: `shortSpell`.) It is written in y = (S₀/σ)^(−ε), σ the
 * value at the expansion point: there the leading drainage term is linear in
 * τ (exactly so for Sᵢ = 0 without capillarity), so the series converges fast
 * and cannot overflow. The whole spell is one solve from the state where the
 * rain stopped, so how the dry bars are cut cannot change the answer.
 */

/** Profile shape factor p of the redistribution equation (Ogden & Saghafian 1997, after Smith et al. 1993; from memory). */
export const REDISTRIBUTION_SHAPE_FACTOR = 1.7;

/** Highest order of the series before the step is shortened. */
const ORDER = 24;
/**
 * A series ends when its last term is below TERM_TOL of its sum and the one
 * before below PREVIOUS_TOL: the terms are then falling fast (by some 1e-4 a
 * step), so the rest is smaller still; two small terms in a row, so that one
 * coefficient near zero by chance cannot end it.
 */
const TERM_TOL = 1e-16;
const PREVIOUS_TOL = 1e-12;

/** A soil's numbers for the redistribution equation, worked out once per method. */
export interface RedistributionSoil {
  /** Initial effective saturation Sᵢ. */
  readonly si: number;
  /** ε = 3 + 2/λ, the exponent of K(S)/K_s = S^ε. */
  readonly eps: number;
  /** c = 3 + 1/λ, the exponent of the capillary drive in S. */
  readonly c: number;
  /** Sᵢ^c. */
  readonly siC: number;
  /** 1/λ. */
  readonly invLambda: number;
  /**
   * (a − 1)/2, (a − 2)/3, (a − 3)/4, (a − 4)/5 for a = 1/λ: the factors of the
   * binomial series of (1 + d)^(1/λ) (see `scaledSaturationPower`).
   */
  readonly binomial: readonly [number, number, number, number];
}

export function redistributionSoil(initialSaturation: number, poreSizeIndex: number): RedistributionSoil {
  const c = 3 + 1 / poreSizeIndex;
  return {
    si: initialSaturation,
    eps: 3 + 2 / poreSizeIndex,
    c,
    siC: initialSaturation > 0 ? Math.pow(initialSaturation, c) : 0,
    invLambda: 1 / poreSizeIndex,
    binomial: [
      (1 / poreSizeIndex - 1) / 2,
      (1 / poreSizeIndex - 2) / 3,
      (1 / poreSizeIndex - 3) / 4,
      (1 / poreSizeIndex - 4) / 5,
    ],
  };
}

/**
 * S₁^(1/λ) from S₀^(1/λ) (`satPow`) and S₁ = S₀(1 + d), for the small steps
 * of S a dry spell or a light burst makes: S₀^(1/λ)·(1 + d)^a, a = 1/λ, by
 * the binomial series 1 + a·d(1 + (a − 1)/2·d(1 + (a − 2)/3·d(1 + (a − 3)/4·d
 * (1 + (a − 4)/5·d)))) while (a + 5)|d| ≤ 1e-3: each factor (a − j)/(j + 1)·d
 * is then below 1e-3/(j + 1) in size, so the first term left out,
 * C(a, 6)·d⁶, is below (1e-3)⁶/6! ≈ 1.4e-21 of the sum. Otherwise (a long
 * spell, a heavy burst on a thin zone) Math.pow of S₁ itself. Either way
 * within a unit or two in the last place of S₁^(1/λ).
 */
export function scaledSaturationPower(soil: RedistributionSoil, satPow: number, d: number, sat: number): number {
  const a = soil.invLambda;
  if (!((a + 5) * Math.abs(d) <= 1e-3)) return Math.pow(sat, a);
  const c = soil.binomial;
  const tail =
    1 + (c[0] as number) * d * (1 + (c[1] as number) * d * (1 + (c[2] as number) * d * (1 + (c[3] as number) * d)));
  return satPow + satPow * (a * d * tail);
}

/** The wetted zone's effective saturation S₀ and S₀^(1/λ) (kept together: S₀^ε and S₀^c follow without a power). */
export interface WettedZone {
  sat: number;
  satPow: number;
}

// Series coefficients, reused across calls (the loop runs once per dry spell).
const Y = new Float64Array(ORDER + 2);
const S = new Float64Array(ORDER + 2);
const R = new Float64Array(ORDER + 2);
const Q = new Float64Array(ORDER + 2);
const D = new Float64Array(ORDER + 2);
const A = new Float64Array(ORDER + 2);
const G = new Float64Array(ORDER + 2);

/**
 * Redistributes a wetted zone for τ units of dimensionless time (τ = K·t/I):
 * dS₀/dτ = −x·[S₀^ε + b·x·(S₀^c − Sᵢ^c)], x = S₀ − Sᵢ (see the file comment
 * for the sources and the rules), updating `zone` in place. Nothing moves
 * when there is nothing to drain (x ≤ 0) or τ ≤ 0.
 */
export function redistribute(soil: RedistributionSoil, zone: WettedZone, tau: number, b: number): void {
  if (!(zone.sat > soil.si) || !(tau > 0)) return;
  if (!shortcuts.on) {
    redistributeBySeries(soil, zone, tau, b);
    return;
  }
  // In one piece by `shortSpell` when it converges; else in pieces it can take
  // (halving until one does), the equation being autonomous: the state after
  // τ₁ + τ₂ is the state after τ₂ from the state after τ₁. What a few dozen
  // tries leave goes to the general series. Pieces are at least as short as a
  // whole spell the test accepts, so each is as exact.
  let left = tau;
  let h = tau;
  for (let tries = 0; left > 0 && tries < 24; tries++) {
    const last = h >= left;
    const step = last ? left : h;
    if (shortSpell(soil, zone, step, b)) left = last ? 0 : left - step;
    else h = 0.5 * step;
  }
  if (left > 0) redistributeBySeries(soil, zone, left, b);
}

/**
 * `redistribute` by the general series alone, for every spell (the tests
 * hold the short spells' shortcut to it): the Taylor series in y described
 * in the file comment, restarted where it would not converge over the spell.
 */
export function redistributeBySeries(soil: RedistributionSoil, zone: WettedZone, tau: number, b: number): void {
  const { si, eps, siC } = soil;
  if (!(zone.sat > si) || !(tau > 0)) return;
  const toS = -1 / eps; // S = σ·Y^(−1/ε)
  const q = 1 / (3 / soil.invLambda + 2); // Y^(1 − c/ε) = Y^(1/(3λ + 2)): S^c·y = σ^c·Y^q
  let sigma = zone.sat;
  let sigmaPow = zone.satPow;
  let left = tau;
  for (let step = 0; step < 100000 && left > 0; step++) {
    // Expansion at S₀ = σ, where y = 1: dy/dτ = ε(1 − Sᵢ/S)[σ^ε + b(S − Sᵢ)(σ^c·Y^q − Sᵢ^c·Y)].
    const sigma3 = sigma * sigma * sigma;
    const sigmaC = sigma3 * sigmaPow;
    const sigmaEps = sigmaC * sigmaPow;
    Y[0] = 1;
    S[0] = sigma;
    R[0] = 1 / sigma;
    Q[0] = 1;
    D[0] = sigmaC - siC;
    A[0] = 1 - si * R[0];
    G[0] = sigmaEps + b * (sigma - si) * D[0];
    Y[1] = eps * A[0] * G[0];
    let h = left;
    let converged = false;
    let order = ORDER;
    let power = 1; // h^(k−1) in the loop
    let lastY = 0;
    let lastS = 0;
    let lastQ = 0;
    for (let k = 1; k < ORDER; k++) {
      // Powers of a series with y₀ = 1: w_k = Σ_{j=1..k} (a·j − (k − j))·y_j·w_{k−j} / k.
      let sk = 0;
      let rk = 0;
      let qk = 0;
      for (let j = 1; j <= k; j++) {
        const yj = Y[j] as number;
        const back = k - j;
        sk += (toS * j - back) * yj * (S[back] as number);
        rk += (-toS * j - back) * yj * (R[back] as number);
        qk += (q * j - back) * yj * (Q[back] as number);
      }
      S[k] = sk / k;
      R[k] = rk / k;
      Q[k] = qk / k;
      D[k] = sigmaC * (Q[k] as number) - siC * (Y[k] as number);
      A[k] = -si * (R[k] as number);
      // G = σ^ε + b·(S − Sᵢ)·D: the k-th coefficient of the product.
      let e = (sigma - si) * (D[k] as number);
      for (let j = 1; j <= k; j++) e += (S[j] as number) * (D[k - j] as number);
      G[k] = b * e;
      let f = 0;
      for (let j = 0; j <= k; j++) f += (A[j] as number) * (G[k - j] as number);
      Y[k + 1] = (eps * f) / (k + 1);
      // Terms of order k of the three sums (y ≈ 1, S ≈ σ, Q ≈ 1), and of order k + 1 for y.
      power *= h;
      const termY = Math.abs(Y[k + 1] as number) * power * h;
      const termS = (Math.abs(S[k] as number) * power) / sigma;
      const termQ = Math.abs(Q[k] as number) * power;
      if (
        termY <= TERM_TOL &&
        termS <= TERM_TOL &&
        termQ <= TERM_TOL &&
        lastY <= PREVIOUS_TOL &&
        lastS <= PREVIOUS_TOL &&
        lastQ <= PREVIOUS_TOL
      ) {
        converged = true;
        order = k;
        break;
      }
      lastY = termY;
      lastS = termS;
      lastQ = termQ;
    }
    if (!converged) {
      // Shorten the step: to half the radius of convergence, estimated from the
      // growth of each series' coefficients (S and S^(−1/λ) are singular where
      // y would reach 0, even when y itself is a polynomial), and to where each
      // series' last term is below the tolerance.
      order = ORDER - 1;
      h = left;
      for (const [z, scale] of [
        [Y, 1],
        [S, sigma],
        [Q, 1],
      ] as const) {
        const top = Math.abs(z[order] as number) / scale;
        if (!(top > 0)) continue;
        const first = Math.abs(z[1] as number) / scale;
        if (first > 0) h = Math.min(h, 0.5 * Math.pow(first / top, 1 / (order - 1)));
        h = Math.min(h, Math.pow(TERM_TOL / top, 1 / order));
      }
    }
    left = converged ? 0 : left - h;
    // S₀ and S₀^(1/λ) = σ^(1/λ)/Q at the end of the step, from their own series (Horner).
    let sNext = S[order] as number;
    let qNext = Q[order] as number;
    for (let k = order - 1; k >= 0; k--) {
      sNext = sNext * h + (S[k] as number);
      qNext = qNext * h + (Q[k] as number);
    }
    if (!(sNext > si)) {
      // The zone never drains below the initial content; rounding could say otherwise.
      sigma = si;
      sigmaPow = Math.pow(si, soil.invLambda);
      break;
    }
    sigma = sNext;
    sigmaPow /= qNext;
  }
  zone.sat = sigma;
  zone.satPow = sigmaPow;
}

/**
 * A spell short against the zone's pace (most of them, deep into a long
 * record: τ = K·t/I is small once I has grown): the Taylor series of S₀(τ)
 * itself, to order 3, 4 or 5, from the derivatives of the right-hand side
 *   f(S) = −x·[P + b·x·D],  x = S − Sᵢ,  P = S^ε,  D = S^c − Sᵢ^c,
 *   f′ = −P − x·P′ − 2b·x·D − b·x²·C′,
 *   f″ = −2P′ − x·P″ − 2b·D − 4b·x·C′ − b·x²·C″,
 *   f‴ = −3P″ − x·P‴ − 6b·C′ − 6b·x·C″ − b·x²·C‴,
 * with P⁽ᵏ⁾ = ε(ε − 1)…(ε − k + 1)·P/S^k and likewise C = S^c; for an
 * autonomous equation S″ = f′f, S‴ = f″f² + f′²f, S⁗ = f‴f³ + 4f″f′f² + f′³f.
 * These are the coefficients the general series of `redistribute` finds
 * through y (the same function of τ, so the same Taylor coefficients of S),
 * at a fraction of the work and with one division; the series ends by the
 * same test (its last term below TERM_TOL of S₀, the one before below
 * PREVIOUS_TOL). S₀^(1/λ) follows by `scaledSaturationPower`. Returns false,
 * leaving `zone` alone, when order 5 is not enough; `redistribute` then
 * tries shorter pieces, and the general series takes what they leave.
 */
function shortSpell(soil: RedistributionSoil, zone: WettedZone, h: number, b: number): boolean {
  const { si, eps, c, siC } = soil;
  const sigma = zone.sat;
  const satPow = zone.satPow;
  const inv = 1 / sigma;
  const cc = sigma * sigma * sigma * satPow; // S^c
  const pp = cc * satPow; // S^ε
  const x = sigma - si;
  const d = cc - siC;
  const p1 = eps * pp * inv;
  const p2 = (eps - 1) * p1 * inv;
  const c1 = c * cc * inv;
  const c2 = (c - 1) * c1 * inv;
  const bx = b * x;
  const f = -x * (pp + bx * d);
  const f1 = -pp - x * p1 - bx * (2 * d + x * c1);
  const f2 = -2 * p1 - x * p2 - b * (2 * d + x * (4 * c1 + x * c2));
  const h2 = h * h;
  const h3 = h2 * h;
  const tol = TERM_TOL * sigma;
  const s2 = (f * f1) / 2;
  const s3 = (f * (f2 * f + f1 * f1)) / 6;
  let delta: number;
  if (Math.abs(s3) * h3 <= tol && Math.abs(s2) * h2 <= PREVIOUS_TOL * sigma) {
    delta = h * (f + h * (s2 + h * s3));
  } else {
    const p3 = (eps - 2) * p2 * inv;
    const c3 = (c - 2) * c2 * inv;
    const f3 = -3 * p2 - x * p3 - b * (6 * c1 + x * (6 * c2 + x * c3));
    const s4 = (f * (f * (f3 * f + 4 * f2 * f1) + f1 * f1 * f1)) / 24;
    const h4 = h3 * h;
    if (Math.abs(s4) * h4 <= tol && Math.abs(s3) * h3 <= PREVIOUS_TOL * sigma) {
      delta = h * (f + h * (s2 + h * (s3 + h * s4)));
    } else {
      // Order 5: S⁽⁵⁾ = f⁗f⁴ + 7f‴f′f³ + 4f″²f³ + 11f″f′²f² + f′⁴f,
      // f⁗ = −4P‴ − x·P⁗ − 12b·C″ − 8b·x·C‴ − b·x²·C⁗.
      const p4 = (eps - 3) * p3 * inv;
      const c4 = (c - 3) * c3 * inv;
      const f4 = -4 * p3 - x * p4 - b * (12 * c2 + x * (8 * c3 + x * c4));
      const ff = f * f;
      const s5 = (f * (ff * (f4 * f + 7 * f3 * f1 + 4 * f2 * f2) + f1 * f1 * (11 * f2 * f + f1 * f1))) / 120;
      if (!(Math.abs(s5) * h4 * h <= tol && Math.abs(s4) * h4 <= PREVIOUS_TOL * sigma)) return false;
      delta = h * (f + h * (s2 + h * (s3 + h * (s4 + h * s5))));
    }
  }
  const sum = sigma + delta;
  if (!(sum > si)) return false;
  zone.sat = sum;
  zone.satPow = scaledSaturationPower(soil, satPow, delta * inv, sum);
  return true;
}

/**
 * The effective saturation S₀ after τ units of dimensionless time (τ = K·t/I)
 * from S₀ = `start` ∈ (Sᵢ, 1], by `redistribute`.
 */
export function redistributedSaturation(
  start: number,
  tau: number,
  initialSaturation: number,
  poreSizeIndex: number,
  b: number,
): number {
  const zone: WettedZone = { sat: start, satPow: Math.pow(start, 1 / poreSizeIndex) };
  redistribute(redistributionSoil(initialSaturation, poreSizeIndex), zone, tau, b);
  return zone.sat;
}
