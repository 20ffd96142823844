/**
 * Exact φ-index for a target excess, without iteration on φ or sorting.
 *
 * R(φ) = Σ max(0, P_k − φ·Δt_k) is continuous, piecewise linear and strictly
 * decreasing on [0, i_max]. With A the set of bars whose intensity exceeds φ,
 * R = D_A − φ·T_A, so φ = (D_A − R)/T_A once A is known (the φ-index
 * procedure of Chow, Maidment & Mays 1988, Applied Hydrology §5.2, where A is
 * found by hand by trial). Here A is found in linear time, by one of three
 * routes that all end in the same weighted quickselect (selectPhi):
 *
 * - Short storms (< 16,384 bars): quickselect over every bar.
 * - Long storms: a fixed pseudo-random sample of 8,192 bars estimates φ and a
 *   bracket around it; one branch-light pass sums the bars above the bracket,
 *   gathers the few inside it, and checks R at both ends. If the bracket holds
 *   φ (nearly always), quickselect decides the gathered bars. About 7 ms on
 *   10⁶ bars here.
 * - If the bracket misses, the bucket route: one pass finds the peak
 *   intensity; a second sorts bars into equal-width intensity buckets, summing
 *   depth and duration per bucket. R at every bucket edge follows from those
 *   sums, which brackets φ inside one bucket and decides every bar outside it;
 *   the bars of that bucket are gathered and decided by quickselect.
 *
 * Quickselect and the buckets form intensities as depth / duration, the same
 * division every time, so a bar's bucket and its comparisons with a pivot are
 * consistent. The bracket pass compares p > lo·Δt instead (no division); that
 * differs from p/Δt > lo only for a bar whose intensity equals a bracket end
 * to rounding, which adds nothing to R there, and the answer is clamped to
 * the proven bracket.
 *
 * Inputs must be clean (validated storm) and 0 ≤ target ≤ ΣP. Returns the
 * smallest φ with R(φ) = target: the peak intensity for target 0, and 0 for
 * target ΣP.
 */
const BUCKETS = 4096;

// Work arrays kept between calls and grown as needed, so repeated
// calibrations of a long storm do not allocate: 10 bytes a bar for the bucket
// route and 16 for the bracket route, of the longest storm solved so far.
let workIntensity = new Float64Array(0);
let workBucketOf = new Uint16Array(0);

/** Below this many bars the sampling step is not worth it: select on all of them. */
const SAMPLE_FROM = 16384;
const SAMPLE_SIZE = 8192;
let workDepth = new Float64Array(0);
let workDur = new Float64Array(0);

export function exactPhi(durationsH: ArrayLike<number>, depthsMm: ArrayLike<number>, targetMm: number): number {
  const n = depthsMm.length;
  if (n < SAMPLE_FROM) return exactPhiBySelection(durationsH, depthsMm, targetMm);
  const bracket = sampledBracket(durationsH, depthsMm, targetMm);
  return (
    exactPhiInBracket(durationsH, depthsMm, targetMm, bracket.lo, bracket.hi) ??
    exactPhiByBuckets(durationsH, depthsMm, targetMm)
  );
}

/** Weighted quickselect over every bar (short storms). */
export function exactPhiBySelection(
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  targetMm: number,
): number {
  const n = depthsMm.length;
  const depth = new Float64Array(n);
  const dur = new Float64Array(n);
  let total = 0;
  let peak = 0;
  for (let k = 0; k < n; k++) {
    const p = depthsMm[k] as number;
    const d = durationsH[k] as number;
    depth[k] = p;
    dur[k] = d;
    total += p;
    const i = p / d;
    if (i > peak) peak = i;
  }
  if (peak === 0 || targetMm >= total) return 0;
  if (targetMm <= 0) return peak;
  return selectPhi(depth, dur, n, targetMm, 0, 0, 0, peak);
}

/**
 * Estimates φ from a fixed pseudo-random sample of the bars (R scales with the
 * share of bars sampled) and returns sample intensities a few standard errors
 * of rank either side of the estimate. Only a guess: exactPhiInBracket checks it.
 */
function sampledBracket(
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  targetMm: number,
): { lo: number; hi: number } {
  const n = depthsMm.length;
  const depth = new Float64Array(SAMPLE_SIZE);
  const dur = new Float64Array(SAMPLE_SIZE);
  const intensity = new Float64Array(SAMPLE_SIZE);
  let seed = 0x2545f491 ^ n;
  let sampleRain = 0;
  for (let j = 0; j < SAMPLE_SIZE; j++) {
    seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0;
    const k = Math.floor((seed / 4294967296) * n);
    const p = depthsMm[k] as number;
    const d = durationsH[k] as number;
    depth[j] = p;
    dur[j] = d;
    intensity[j] = p / d;
    sampleRain += p;
  }
  const sampleTarget = (targetMm * SAMPLE_SIZE) / n;
  let estimate = 0;
  if (sampleTarget < sampleRain) {
    let peak = 0;
    for (let j = 0; j < SAMPLE_SIZE; j++) if ((intensity[j] as number) > peak) peak = intensity[j] as number;
    estimate = sampleTarget <= 0 ? peak : selectPhi(depth, dur, SAMPLE_SIZE, sampleTarget, 0, 0, 0, peak);
  }
  intensity.sort();
  // Rank of the estimate among the sample, then ± 4·√S ranks (about ±4.4 %).
  let rank = 0;
  let top = SAMPLE_SIZE;
  while (rank < top) {
    const mid = (rank + top) >>> 1;
    if ((intensity[mid] as number) <= estimate) rank = mid + 1;
    else top = mid;
  }
  const spread = Math.ceil(4 * Math.sqrt(SAMPLE_SIZE));
  const lo = rank - spread - 1 >= 0 ? (intensity[rank - spread - 1] as number) : 0;
  const hi = rank + spread < SAMPLE_SIZE ? (intensity[rank + spread] as number) : Infinity;
  return { lo, hi };
}

/**
 * One pass over the bars with a guessed bracket [lo, hi] for φ: bars above hi
 * are summed, bars between are gathered, bars at or below lo are dropped. If
 * R(lo) > target ≥ R(hi) the bracket holds φ and the gathered bars decide it
 * by weighted quickselect; otherwise returns null (the caller falls back).
 */
export function exactPhiInBracket(
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  targetMm: number,
  lo: number,
  hi: number,
): number | null {
  const n = depthsMm.length;
  if (workDepth.length < n) {
    workDepth = new Float64Array(n);
    workDur = new Float64Array(n);
  }
  const depth = workDepth;
  const dur = workDur;
  let depthAbove = 0;
  let durAbove = 0;
  let total = 0;
  let m = 0;
  for (let k = 0; k < n; k++) {
    const p = depthsMm[k] as number;
    const d = durationsH[k] as number;
    total += p;
    // Sums by a 0/1 factor rather than a branch: the share of bars above hi
    // is large and unpredictable. Bars inside the bracket are few, so one
    // test on "inside" predicts well (two tests joined by && did not: each
    // half alone is a coin toss, and the pass took twice as long).
    const above = +(p > hi * d);
    depthAbove += above * p;
    durAbove += above * d;
    if (+(p > lo * d) - above !== 0) {
      depth[m] = p;
      dur[m] = d;
      m++;
    }
  }
  if (targetMm >= total) return 0;
  let depthMid = 0;
  let durMid = 0;
  for (let j = 0; j < m; j++) {
    depthMid += depth[j] as number;
    durMid += dur[j] as number;
  }
  const runoffAtHi = hi === Infinity ? 0 : depthAbove - hi * durAbove;
  const runoffAtLo = depthAbove + depthMid - lo * (durAbove + durMid);
  if (!(runoffAtLo > targetMm) || !(runoffAtHi <= targetMm)) return null;
  let upper = hi;
  if (upper === Infinity) {
    upper = 0;
    for (let j = 0; j < m; j++) {
      const i = (depth[j] as number) / (dur[j] as number);
      if (i > upper) upper = i;
    }
  }
  return selectPhi(depth, dur, m, targetMm, depthAbove, durAbove, lo, upper);
}

/** The bucket route (module comment), used when the sampled bracket misses. */
export function exactPhiByBuckets(
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  targetMm: number,
): number {
  const n = depthsMm.length;
  // Pass 1: intensities (one division per bar, kept), total and peak.
  if (workIntensity.length < n) {
    workIntensity = new Float64Array(n);
    workBucketOf = new Uint16Array(n);
  }
  const intensity = workIntensity;
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
  // Depth and duration of a bucket side by side (2b, 2b + 1): one cache line
  // per update instead of two.
  const bucketSums = new Float64Array(2 * BUCKETS);
  const bucketCount = new Int32Array(BUCKETS);
  const bucketOf = workBucketOf;
  for (let k = 0; k < n; k++) {
    // i·perWidth ≤ BUCKETS fits an int32, so `| 0` is floor here.
    const b = Math.min(BUCKETS - 1, ((intensity[k] as number) * perWidth) | 0);
    bucketOf[k] = b;
    const at = 2 * b;
    bucketSums[at] = (bucketSums[at] as number) + (depthsMm[k] as number);
    bucketSums[at + 1] = (bucketSums[at + 1] as number) + (durationsH[k] as number);
    bucketCount[b] = (bucketCount[b] as number) + 1;
  }

  // Walk down from the top: R at the lower edge of bucket b, counting every
  // bar in buckets b and above, is D − edge·T. The first edge where R exceeds
  // the target brackets φ inside bucket b.
  let depthAbove = 0;
  let durAbove = 0;
  let b = BUCKETS - 1;
  for (; b > 0; b--) {
    const d = depthAbove + (bucketSums[2 * b] as number);
    const t = durAbove + (bucketSums[2 * b + 1] as number);
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
function selectPhi(
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
