import { retention02Mm } from '../loss/curve-number';
import type { RetentionConversion } from '../loss/types';

/**
 * The curve number that turns a storm total of rain P into runoff Q, mm:
 * the closed-form inversion of Q = (P − λS)²/(P − λS + S) (Hawkins 1993,
 * Asymptotic determination of runoff curve numbers from data, J. Irrig.
 * Drain. Eng. 119(2)), which for λ = 0.2 reads S = 5[P + 2Q − √(4Q² + 5PQ)].
 *
 * For any λ, S is the smaller root of λ²S² − (2λP + (1 − λ)Q)·S + P(P − Q) = 0
 * (the branch with P ≥ λS), written as 2c/(b + √(b² − 4ac)) so that it never
 * subtracts nearly equal numbers:
 *   S = 2P(P − Q) / (2λP + (1 − λ)Q + √(Q·(4λP + (1 − λ)²Q))).
 * Q = P gives S = 0 (CN 100); Q = 0 gives S = P/λ, the largest CN with no
 * runoff. S on the λ = 0.05 basis is converted back to the λ = 0.2 basis by
 * the inverse of the chosen conversion (see loss/curve-number.ts).
 * Needs P > 0 and 0 ≤ Q ≤ P.
 */
export function curveNumberFromRunoff(
  rainMm: number,
  runoffMm: number,
  iaRatio: 0.2 | 0.05,
  conversion?: RetentionConversion,
): number {
  const p = rainMm;
  const q = Math.min(Math.max(runoffMm, 0), p);
  const l = iaRatio;
  const root = Math.sqrt(q * (4 * l * p + (1 - l) * (1 - l) * q));
  const s = (2 * p * (p - q)) / (2 * l * p + (1 - l) * q + root);
  const s02 = iaRatio === 0.05 ? retention02Mm(s, conversion) : s;
  // S = 25400/CN − 254 mm, inverted.
  return 25400 / (s02 + 254);
}
