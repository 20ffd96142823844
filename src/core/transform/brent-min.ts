/**
 * Brent's method for a minimum of f on [a, b] (Brent 1973, Algorithms for
 * Minimization without Derivatives, ch. 5, the procedure localmin): parabolic
 * steps through the three best points when they behave, golden-section steps
 * when they do not, so it never leaves the interval and is never slower than
 * golden section. Finds a local minimum; the caller brackets the one it wants.
 * Converges to |x − x*| ≤ relTol·|x| + absTol (no tighter than about √ε·|x|
 * is meaningful: near a minimum f changes by the square of the step).
 */
export interface MinimizeOptions {
  readonly relTol: number;
  readonly absTol: number;
  readonly maxIterations?: number;
}

export function brentMinimize(
  f: (x: number) => number,
  a: number,
  b: number,
  options: MinimizeOptions,
): { x: number; fx: number } {
  const golden = 0.5 * (3 - Math.sqrt(5));
  const maxIterations = options.maxIterations ?? 200;
  let x = a + golden * (b - a);
  let w = x;
  let v = x;
  let fx = f(x);
  let fw = fx;
  let fv = fx;
  let d = 0;
  let e = 0;
  for (let iter = 0; iter < maxIterations; iter++) {
    const m = 0.5 * (a + b);
    const tol = options.relTol * Math.abs(x) + options.absTol;
    const tol2 = 2 * tol;
    if (Math.abs(x - m) <= tol2 - 0.5 * (b - a)) break;
    let parabolic = false;
    if (Math.abs(e) > tol) {
      let r = (x - w) * (fx - fv);
      let q = (x - v) * (fx - fw);
      let p = (x - v) * q - (x - w) * r;
      q = 2 * (q - r);
      if (q > 0) p = -p;
      else q = -q;
      r = e;
      e = d;
      if (Math.abs(p) < Math.abs(0.5 * q * r) && p > q * (a - x) && p < q * (b - x)) {
        d = p / q;
        const u = x + d;
        if (u - a < tol2 || b - u < tol2) d = x < m ? tol : -tol;
        parabolic = true;
      }
    }
    if (!parabolic) {
      e = (x < m ? b : a) - x;
      d = golden * e;
    }
    const u = x + (Math.abs(d) >= tol ? d : d > 0 ? tol : -tol);
    const fu = f(u);
    if (fu <= fx) {
      if (u < x) b = x;
      else a = x;
      v = w;
      fv = fw;
      w = x;
      fw = fx;
      x = u;
      fx = fu;
    } else {
      if (u < x) a = u;
      else b = u;
      if (fu <= fw || w === x) {
        v = w;
        fv = fw;
        w = u;
        fw = fu;
      } else if (fu <= fv || v === x || v === w) {
        v = u;
        fv = fu;
      }
    }
  }
  return { x, fx };
}
