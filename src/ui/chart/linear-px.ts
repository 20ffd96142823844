/** What a loop needs of a linear scale (d3-scale's scaleLinear). */
export interface LinearScale {
  domain(): number[];
  range(): number[];
  clamp(): boolean;
  (value: number): number | undefined;
}

/** A two-stop linear scale as numbers: t = (v − d0)/span, pixel = r0·(1 − t) + r1·t. */
export interface LinearMap {
  readonly d0: number;
  readonly span: number;
  readonly r0: number;
  readonly r1: number;
}

/**
 * A linear scale's arithmetic, for loops over every bar: the same two steps
 * d3-scale takes (its bimap normalises to t, its interpolateNumber gives
 * r0·(1 − t) + r1·t), so a loop writing them out gets the scale's own
 * pixels to the last bit, without two closure calls per value (over 10⁶
 * bars those calls were most of a first draw). Null for a scale that is
 * not plain two-stop arithmetic (clamped, piecewise, a domain of one
 * point): call the scale itself.
 */
export function linearMap(scale: LinearScale): LinearMap | null {
  const domain = scale.domain();
  const range = scale.range();
  if (domain.length !== 2 || range.length !== 2 || scale.clamp()) return null;
  let [d0, d1] = domain as [number, number];
  let [r0, r1] = range as [number, number];
  if (d1 < d0) [d0, d1, r0, r1] = [d1, d0, r1, r0];
  const span = d1 - d0;
  if (!span) return null;
  return { d0, span, r0, r1 };
}

/** Every value through the scale, into a new column. */
export function mapLinear(scale: LinearScale, values: ArrayLike<number>): Float64Array {
  const n = values.length;
  const out = new Float64Array(n);
  const m = linearMap(scale);
  if (m === null) {
    for (let k = 0; k < n; k++) out[k] = scale(values[k] as number) ?? NaN;
    return out;
  }
  const { d0, span, r0, r1 } = m;
  for (let k = 0; k < n; k++) {
    const t = ((values[k] as number) - d0) / span;
    out[k] = r0 * (1 - t) + r1 * t;
  }
  return out;
}
