import { solveMonotone, type MonotoneSolve } from './monotone';

/** Stretches the search interval is cut into for a parameter whose response need not be monotone. */
export const SCAN_POINTS = 48;

/**
 * Solves g(x) = target on [lo, hi] for a g that need not be monotone (a soil
 * value whose effects pull both ways, e.g. Green–Ampt's λ for recovery):
 * evaluates g at SCAN_POINTS + 1 points, evenly spaced (on a log scale when
 * the range spans a decade or more), and solves, as a
 * monotone piece (Brent), in the first stretch whose ends straddle or touch
 * the target. When every point lies on one side, the target may still be
 * met near the point that came closest, in a dip (or peak) between its
 * neighbours: the extremum there is found by golden-section search and, if
 * it reaches the target, the piece from it is solved. Otherwise reports the
 * closest point, its side taken from the nearer end. Two crossings inside a
 * stretch away from the closest point are missed: the message says the
 * answer comes from a scan.
 */
export function solveByScan(g: (x: number) => number, lo: number, hi: number, target: number): MonotoneSolve {
  if (!(hi > lo)) return solveMonotone(g, lo, hi, target);
  // Evenly spaced, or evenly on a log scale over a range of a decade or more
  // (λ from 0.01 to 10 acts on a log scale).
  const geometric = lo > 0 && hi >= 10 * lo;
  const at = (k: number): number =>
    k === SCAN_POINTS ? hi : geometric ? lo * Math.pow(hi / lo, k / SCAN_POINTS) : lo + ((hi - lo) * k) / SCAN_POINTS;
  // Within rounding of the target counts as meeting it (as in solveMonotone).
  const meets = (v: number): boolean => Math.abs(v - target) <= 1e-13 * Math.max(Math.abs(target), Math.abs(v), 1e-300);
  let gPrev = g(lo);
  if (meets(gPrev)) return solveMonotone(g, lo, at(1), target);
  let best = 0;
  let bestG = gPrev;
  for (let k = 1; k <= SCAN_POINTS; k++) {
    const gx = g(at(k));
    if ((gPrev - target) * (gx - target) <= 0 || meets(gx)) return solveMonotone(g, at(k - 1), at(k), target);
    if (Math.abs(gx - target) < Math.abs(bestG - target)) {
      best = k;
      bestG = gx;
    }
    gPrev = gx;
  }
  // Every point is above the target (look for a dip) or below it (a peak).
  const sign = bestG > target ? 1 : -1;
  const a = at(Math.max(0, best - 1));
  const b = at(Math.min(SCAN_POINTS, best + 1));
  const x = goldenMinimum((t) => sign * g(t), a, b);
  if (sign * (g(x) - target) <= 0) {
    return x < at(best) || best === SCAN_POINTS ? solveMonotone(g, a, x, target) : solveMonotone(g, x, b, target);
  }
  const side = at(best) - lo <= hi - at(best) ? 'min' : 'max';
  return { ok: false, side, x: at(best), g: bestG };
}

/** Minimum of f on [a, b] by golden-section search, to 1e-12 of the interval's scale. */
function goldenMinimum(f: (x: number) => number, a: number, b: number): number {
  const ratio = (Math.sqrt(5) - 1) / 2;
  let lo = a;
  let hi = b;
  let x1 = hi - ratio * (hi - lo);
  let x2 = lo + ratio * (hi - lo);
  let f1 = f(x1);
  let f2 = f(x2);
  const tol = 1e-12 * Math.max(Math.abs(a), Math.abs(b), 1e-300);
  for (let iter = 0; iter < 200 && hi - lo > tol; iter++) {
    if (f1 <= f2) {
      hi = x2;
      x2 = x1;
      f2 = f1;
      x1 = hi - ratio * (hi - lo);
      f1 = f(x1);
    } else {
      lo = x1;
      x1 = x2;
      f1 = f2;
      x2 = lo + ratio * (hi - lo);
      f2 = f(x2);
    }
  }
  return f1 <= f2 ? x1 : x2;
}
