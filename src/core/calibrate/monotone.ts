import { brentRoot } from './brent';

/** Relative tolerance on the fitted parameter (issue contract: 1e-9). */
export const PARAMETER_REL_TOL = 1e-9;

export type MonotoneSolve =
  | { readonly ok: true; readonly x: number }
  | { readonly ok: false; readonly side: 'min' | 'max'; readonly x: number; readonly g: number };

/**
 * Solves g(x) = target for a monotone (non-increasing or non-decreasing) g on
 * [lo, hi]. When the target is out of reach, says which end comes closest.
 * On a plateau (g flat at the target) returns its smallest x.
 */
export function solveMonotone(g: (x: number) => number, lo: number, hi: number, target: number): MonotoneSolve {
  const gLo = g(lo);
  const gHi = g(hi);
  const decreasing = gLo >= gHi;
  const scale = Math.max(Math.abs(target), Math.abs(gLo), Math.abs(gHi), 1e-300);
  const gTol = scale * 1e-13;
  const minG = Math.min(gLo, gHi);
  const maxG = Math.max(gLo, gHi);
  if (target < minG - gTol) {
    return decreasing ? { ok: false, side: 'max', x: hi, g: gHi } : { ok: false, side: 'min', x: lo, g: gLo };
  }
  if (target > maxG + gTol) {
    return decreasing ? { ok: false, side: 'min', x: lo, g: gLo } : { ok: false, side: 'max', x: hi, g: gHi };
  }
  const xTol = PARAMETER_REL_TOL * 1e-3 * Math.max(Math.abs(lo), Math.abs(hi), 1e-12);
  let x: number;
  if (Math.abs(gLo - target) <= gTol) x = lo;
  else if (Math.abs(gHi - target) <= gTol) x = hi;
  else x = brentRoot((t) => g(t) - target, lo, hi, gLo - target, gHi - target, { xTol });
  return { ok: true, x: leftEdgeOfPlateau(g, lo, x, target, gTol, xTol) };
}

/**
 * When g is flat at the target to the left of x, walk back by bisection to
 * where the plateau starts, so the answer is the smallest x that gives it.
 */
function leftEdgeOfPlateau(
  g: (x: number) => number,
  lo: number,
  x: number,
  target: number,
  gTol: number,
  xTol: number,
): number {
  const probe = x - Math.max(xTol * 16, Math.abs(x) * 1e-9);
  if (probe <= lo) return x;
  if (Math.abs(g(probe) - target) > gTol) return x;
  let left = lo;
  let right = probe;
  if (Math.abs(g(left) - target) <= gTol) return lo;
  for (let iter = 0; iter < 200 && right - left > xTol; iter++) {
    const mid = 0.5 * (left + right);
    if (Math.abs(g(mid) - target) <= gTol) right = mid;
    else left = mid;
  }
  return right;
}
