/**
 * Exact φ-index for a target excess, without iteration on φ or sorting.
 *
 * R(φ) = Σ max(0, P_k − φ·Δt_k) is continuous, piecewise linear and strictly
 * decreasing on [0, i_max]. With A the set of bars whose intensity exceeds φ,
 * R = D_A − φ·T_A, so φ = (D_A − R)/T_A once A is known (the φ-index
 * procedure of Chow, Maidment & Mays 1988, Applied Hydrology §5.2, where A is
 * found by hand by trial). Here A is found in linear time:
 *
 * 1. One pass finds the peak intensity; a second sorts bars into equal-width
 *    intensity buckets, summing depth and duration per bucket. R at every
 *    bucket edge follows from those sums, which brackets φ inside one bucket
 *    and decides every bar outside it.
 * 2. The bars of that one bucket are gathered and decided by weighted
 *    quickselect on intensity (each pivot settles a whole part of them).
 *
 * Intensities are always formed as depth / duration, the same division every
 * time, so a bar's bucket and its comparisons with a pivot are consistent.
 *
 * Inputs must be clean (validated storm) and 0 ≤ target ≤ ΣP. Returns the
 * smallest φ with R(φ) = target: the peak intensity for target 0, and 0 for
 * target ΣP.
 */
const BUCKETS = 4096;

export function exactPhi(durationsH: ArrayLike<number>, depthsMm: ArrayLike<number>, targetMm: number): number {
  const n = depthsMm.length;
  // Pass 1: intensities (one division per bar, kept), total and peak.
  const intensity = new Float64Array(n);
  let total = 0;
  let peak = 0;
  for (let k = 0; k < n; k++) {
    const p = depthsMm[k] as number;
    total += p;
    const i = p / (durationsH[k] as number);
    intensity[k] = i;
    if (i > peak) peak = i;
  }
  if (peak === 0 || targetMm >= total) return 0;
  if (targetMm <= 0) return peak;

  // Pass 2: bucket b holds intensities in [b·w, (b+1)·w); the peak goes in
  // the last. Branch-free on purpose: dry bars (intensity 0) land in bucket 0
  // with no depth, where they are decided like any other bar; a test on
  // "is this bar wet" mispredicts on real storms and doubles the time.
  const width = peak / BUCKETS;
  const perWidth = BUCKETS / peak;
  const bucketDepth = new Float64Array(BUCKETS);
  const bucketDur = new Float64Array(BUCKETS);
  const bucketCount = new Int32Array(BUCKETS);
  const bucketOf = new Uint16Array(n);
  for (let k = 0; k < n; k++) {
    // i·perWidth ≤ BUCKETS fits an int32, so `| 0` is floor here.
    const b = Math.min(BUCKETS - 1, ((intensity[k] as number) * perWidth) | 0);
    bucketOf[k] = b;
    bucketDepth[b] = (bucketDepth[b] as number) + (depthsMm[k] as number);
    bucketDur[b] = (bucketDur[b] as number) + (durationsH[k] as number);
    bucketCount[b] = (bucketCount[b] as number) + 1;
  }

  // Walk down from the top: R at the lower edge of bucket b, counting every
  // bar in buckets b and above, is D − edge·T. The first edge where R exceeds
  // the target brackets φ inside bucket b.
  let depthAbove = 0;
  let durAbove = 0;
  let b = BUCKETS - 1;
  for (; b > 0; b--) {
    const d = depthAbove + (bucketDepth[b] as number);
    const t = durAbove + (bucketDur[b] as number);
    if (d - b * width * t > targetMm) break;
    depthAbove = d;
    durAbove = t;
  }
  // Every bar above bucket b lies above φ, every bar below it below φ.
  const lo = b * width;
  const hi = b === BUCKETS - 1 ? peak : (b + 1) * width;

  // Pass 3: gather the undecided bars of bucket b.
  const m = bucketCount[b] as number;
  const depth = new Float64Array(m);
  const dur = new Float64Array(m);
  let j = 0;
  for (let k = 0; k < n && j < m; k++) {
    if (bucketOf[k] === b) {
      depth[j] = depthsMm[k] as number;
      dur[j] = durationsH[k] as number;
      j++;
    }
  }
  return selectPhi(depth, dur, j, targetMm, depthAbove, durAbove, lo, hi);
}

/**
 * Weighted quickselect over m undecided bars (arrays are reordered). Bars
 * already known to lie above φ contribute depthAbove and durAbove; φ is known
 * to lie in [lo, hi].
 */
export function selectPhi(
  depth: Float64Array,
  dur: Float64Array,
  m: number,
  targetMm: number,
  depthAbove: number,
  durAbove: number,
  lo: number,
  hi: number,
): number {
  let start = 0;
  let end = m; // undecided bars are [start, end)
  let seed = 0x9e3779b9 ^ m;
  while (end > start) {
    // A pseudo-random pivot keeps the expected work linear on sorted input.
    seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0;
    const pick = start + (seed % (end - start));
    const pivot = (depth[pick] as number) / (dur[pick] as number);

    // Partition [start, end): bars above the pivot first.
    let split = start;
    let partDepth = 0;
    let partDur = 0;
    for (let j = start; j < end; j++) {
      const pj = depth[j] as number;
      const dj = dur[j] as number;
      if (pj / dj > pivot) {
        partDepth += pj;
        partDur += dj;
        depth[j] = depth[split] as number;
        dur[j] = dur[split] as number;
        depth[split] = pj;
        dur[split] = dj;
        split++;
      }
    }
    const runoffAtPivot = depthAbove + partDepth - pivot * (durAbove + partDur);
    if (runoffAtPivot > targetMm) {
      // φ is above the pivot: the pivot bar and all below it lie below φ.
      lo = pivot;
      end = split;
    } else if (runoffAtPivot === targetMm) {
      return pivot;
    } else {
      // φ is strictly below the pivot: bars above it, and bars at exactly the
      // pivot intensity, all lie above φ. Only the bars below stay undecided.
      hi = pivot;
      depthAbove += partDepth;
      durAbove += partDur;
      let keep = split;
      for (let j = split; j < end; j++) {
        const pj = depth[j] as number;
        const dj = dur[j] as number;
        if (pj / dj < pivot) {
          depth[keep] = pj;
          dur[keep] = dj;
          keep++;
        } else {
          depthAbove += pj;
          durAbove += dj;
        }
      }
      start = split;
      end = keep;
    }
  }
  if (durAbove === 0) return hi;
  const phi = (depthAbove - targetMm) / durAbove;
  // Guard the rounding of the last division against the proven bracket.
  if (phi < lo) return lo;
  if (phi > hi) return hi;
  return phi;
}
