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
 * inside its radius of convergence (the short spells of a long record, most
 * of them, take the same series written out to order 4). It is written in y = (S₀/σ)^(−ε), σ the
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
}

export function redistributionSoil(initialSaturation: number, poreSizeIndex: number): RedistributionSoil {
  const c = 3 + 1 / poreSizeIndex;
  return {
    si: initialSaturation,
    eps: 3 + 2 / poreSizeIndex,
    c,
    siC: initialSaturation > 0 ? Math.pow(initialSaturation, c) : 0,
    invLambda: 1 / poreSizeIndex,
  };
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
  const { si, eps, siC } = soil;
  if (!(zone.sat > si) || !(tau > 0)) return;
  if (shortSpell(soil, zone, tau, b)) return;
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
 * The general series of `redistribute` written out to order 4 in local
 * variables, for the spells short against the zone's pace (most of them deep
 * into a long record): the same coefficients and the same test for
 * convergence. Returns false, leaving `zone` alone, when the series needs more
 * terms; the general loop then starts again.
 */
function shortSpell(soil: RedistributionSoil, zone: WettedZone, h: number, b: number): boolean {
  const { si, eps, siC } = soil;
  const a = -1 / eps; // S = σ·Y^a
  const q = 1 / (3 / soil.invLambda + 2); // Q = Y^q
  const sigma = zone.sat;
  const sigmaC = sigma * sigma * sigma * zone.satPow;
  const sigmaEps = sigmaC * zone.satPow;
  const x0 = sigma - si;
  const tol = TERM_TOL;
  const before = PREVIOUS_TOL;
  // Order 0 (y = 1).
  const s0 = sigma;
  const r0 = 1 / sigma;
  const d0 = sigmaC - siC;
  const a0 = 1 - si * r0;
  const g0 = sigmaEps + b * x0 * d0;
  const y1 = eps * a0 * g0;
  // Order 1.
  const s1 = a * y1 * s0;
  const r1 = -a * y1 * r0;
  const q1 = q * y1;
  const d1 = sigmaC * q1 - siC * y1;
  const a1 = -si * r1;
  const g1 = b * (x0 * d1 + s1 * d0);
  const y2 = (eps * (a0 * g1 + a1 * g0)) / 2;
  const h2 = h * h;
  const h3 = h2 * h;
  const h4 = h3 * h;
  // Order 2.
  const s2 = ((a - 1) * y1 * s1 + 2 * a * y2 * s0) / 2;
  const r2 = ((-a - 1) * y1 * r1 - 2 * a * y2 * r0) / 2;
  const q2 = ((q - 1) * y1 * q1 + 2 * q * y2) / 2;
  const d2 = sigmaC * q2 - siC * y2;
  const a2 = -si * r2;
  const g2 = b * (x0 * d2 + s1 * d1 + s2 * d0);
  const y3 = (eps * (a0 * g2 + a1 * g1 + a2 * g0)) / 3;
  // Order 3.
  const s3 = ((a - 2) * y1 * s2 + (2 * a - 1) * y2 * s1 + 3 * a * y3 * s0) / 3;
  const r3 = ((-a - 2) * y1 * r2 + (-2 * a - 1) * y2 * r1 - 3 * a * y3 * r0) / 3;
  const q3 = ((q - 2) * y1 * q2 + (2 * q - 1) * y2 * q1 + 3 * q * y3) / 3;
  const d3 = sigmaC * q3 - siC * y3;
  const a3 = -si * r3;
  const g3 = b * (x0 * d3 + s1 * d2 + s2 * d1 + s3 * d0);
  const y4 = (eps * (a0 * g3 + a1 * g2 + a2 * g1 + a3 * g0)) / 4;
  let sum: number;
  let qSum: number;
  // Converged at order 3: terms of orders 2 and 3 (4 for y) below the tolerance.
  if (
    Math.abs(y4) * h4 <= tol &&
    Math.abs(y3) * h3 <= before &&
    (Math.abs(s3) * h3) / sigma <= tol &&
    (Math.abs(s2) * h2) / sigma <= before &&
    Math.abs(q3) * h3 <= tol &&
    Math.abs(q2) * h2 <= before
  ) {
    sum = s0 + h * (s1 + h * (s2 + h * s3));
    qSum = 1 + h * (q1 + h * (q2 + h * q3));
  } else {
    // Order 4.
    const s4 = ((a - 3) * y1 * s3 + (2 * a - 2) * y2 * s2 + (3 * a - 1) * y3 * s1 + 4 * a * y4 * s0) / 4;
    const r4 = ((-a - 3) * y1 * r3 + (-2 * a - 2) * y2 * r2 + (-3 * a - 1) * y3 * r1 - 4 * a * y4 * r0) / 4;
    const q4 = ((q - 3) * y1 * q3 + (2 * q - 2) * y2 * q2 + (3 * q - 1) * y3 * q1 + 4 * q * y4) / 4;
    const d4 = sigmaC * q4 - siC * y4;
    const a4 = -si * r4;
    const g4 = b * (x0 * d4 + s1 * d3 + s2 * d2 + s3 * d1 + s4 * d0);
    const y5 = (eps * (a0 * g4 + a1 * g3 + a2 * g2 + a3 * g1 + a4 * g0)) / 5;
    const h5 = h4 * h;
    if (!(
      Math.abs(y5) * h5 <= tol &&
      Math.abs(y4) * h4 <= before &&
      (Math.abs(s4) * h4) / sigma <= tol &&
      (Math.abs(s3) * h3) / sigma <= before &&
      Math.abs(q4) * h4 <= tol &&
      Math.abs(q3) * h3 <= before
    )) {
      return false;
    }
    sum = s0 + h * (s1 + h * (s2 + h * (s3 + h * s4)));
    qSum = 1 + h * (q1 + h * (q2 + h * (q3 + h * q4)));
  }
  if (!(sum > si)) return false;
  zone.sat = sum;
  zone.satPow /= qSum;
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
