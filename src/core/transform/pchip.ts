/**
 * Monotone piecewise cubic Hermite interpolation (Fritsch & Carlson 1980,
 * SIAM J. Numer. Anal. 17(2); the slopes as in Fritsch & Butland 1984: a
 * weighted harmonic mean of the neighbouring secants inside, a one-sided
 * three-point formula kept shape-preserving at the ends). It passes through
 * every point, is monotone wherever the data are, and adds no overshoot:
 * what an S-curve read at a finer step needs.
 *
 * Returns an evaluator for x inside [xs[0], xs[last]]; `xs` strictly increasing.
 * Queries in increasing order are fastest (the segment is searched onward
 * from the last one).
 */
export function monotoneCubic(xs: ArrayLike<number>, ys: ArrayLike<number>): (x: number) => number {
  const n = xs.length;
  const x = Float64Array.from(xs);
  const y = Float64Array.from(ys);
  if (n === 1) return () => y[0] as number;
  const h = new Float64Array(n - 1);
  const delta = new Float64Array(n - 1);
  for (let k = 0; k < n - 1; k++) {
    h[k] = (x[k + 1] as number) - (x[k] as number);
    delta[k] = ((y[k + 1] as number) - (y[k] as number)) / (h[k] as number);
  }
  const d = new Float64Array(n);
  if (n === 2) {
    d[0] = delta[0] as number;
    d[1] = delta[0] as number;
  } else {
    for (let k = 1; k < n - 1; k++) {
      const a = delta[k - 1] as number;
      const b = delta[k] as number;
      if (a * b <= 0) continue; // an extremum or a flat: slope 0
      const w1 = 2 * (h[k] as number) + (h[k - 1] as number);
      const w2 = (h[k] as number) + 2 * (h[k - 1] as number);
      d[k] = (w1 + w2) / (w1 / a + w2 / b);
    }
    d[0] = endSlope(h[0] as number, h[1] as number, delta[0] as number, delta[1] as number);
    d[n - 1] = endSlope(h[n - 2] as number, h[n - 3] as number, delta[n - 2] as number, delta[n - 3] as number);
  }
  let k = 0;
  return (t: number): number => {
    if (t < (x[k] as number)) k = 0;
    while (k < n - 2 && t > (x[k + 1] as number)) k++;
    const hk = h[k] as number;
    const s = (t - (x[k] as number)) / hk;
    const y0 = y[k] as number;
    const y1 = y[k + 1] as number;
    // Hermite basis on [0, 1].
    const s2 = s * s;
    const s3 = s2 * s;
    return (
      (2 * s3 - 3 * s2 + 1) * y0 +
      (s3 - 2 * s2 + s) * hk * (d[k] as number) +
      (-2 * s3 + 3 * s2) * y1 +
      (s3 - s2) * hk * (d[k + 1] as number)
    );
  };
}

/** Shape-preserving three-point slope at an end (h0, δ0 the end interval; h1, δ1 the next). */
function endSlope(h0: number, h1: number, delta0: number, delta1: number): number {
  let d = ((2 * h0 + h1) * delta0 - h0 * delta1) / (h0 + h1);
  if (Math.sign(d) !== Math.sign(delta0)) d = 0;
  else if (Math.sign(delta0) !== Math.sign(delta1) && Math.abs(d) > Math.abs(3 * delta0)) d = 3 * delta0;
  return d;
}
