import { isCleanBarBelowSums, PASS_BLOCK, summedBarsClean } from '../storm';

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
 *   bracket around it; one branch-free pass sums the bars above the bracket,
 *   gathers the few inside it, and checks R at both ends. If the bracket holds
 *   φ (nearly always), quickselect decides the gathered bars. calibrate on
 *   10⁶ bars, which checks the bars in that pass and sums the excess at the
 *   answer once more: 5.5–6.5 ms here, 0.30–0.35 of scipy's brentq in the
 *   same run (test/bench/peer.bench.ts).
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
// The sample's bars, kept between calls (three new arrays a call were a tenth of the sampling's time).
const sampleDepth = new Float64Array(SAMPLE_SIZE);
const sampleDur = new Float64Array(SAMPLE_SIZE);
const sampleIntensity = new Float64Array(SAMPLE_SIZE);
let workDepth = new Float64Array(0);
let workDur = new Float64Array(0);
let workGatheredIntensity = new Float64Array(0);

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
  const intensity = new Float64Array(n);
  let total = 0;
  let peak = 0;
  for (let k = 0; k < n; k++) {
    const p = depthsMm[k] as number;
    const d = durationsH[k] as number;
    depth[k] = p;
    dur[k] = d;
    total += p;
    const i = p / d;
    intensity[k] = i;
    if (i > peak) peak = i;
  }
  if (peak === 0 || targetMm >= total) return 0;
  if (targetMm <= 0) return peak;
  return selectPhi(depth, dur, intensity, n, targetMm, 0, 0, 0, peak);
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
  const depth = sampleDepth;
  const dur = sampleDur;
  const intensity = sampleIntensity;
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
    estimate = sampleTarget <= 0 ? peak : selectPhi(depth, dur, intensity, SAMPLE_SIZE, sampleTarget, 0, 0, 0, peak);
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
  const phi = phiInBracket(durationsH, depthsMm, targetMm, lo, hi);
  return phi >= 0 ? phi : null;
}

/** phiInBracket's answer when a bar is not clean (the bracket pass checks each bar as it reads it). */
const UNCLEAN = -2;
/** phiInBracket's answer when the bracket does not hold φ. */
const MISSED = -1;

/**
 * φ for a storm not yet validated, in one read of the bars: the checks of
 * validateStorm's loop (isCleanBarBelowSums on each bar, summedBarsClean on
 * the sums) ride in the bracket pass, which sums the depths anyway. Returns
 * the storm's depth with φ, or null when a bar is not clean (or the storm is
 * short): the caller then validates, and the validation names the bar. The lists must match one to
 * one (validateStormLists); a target above the returned rain gives φ = 0, and
 * the caller refuses it. Calibration's own pass (calibrate.ts): validating
 * first read all 10⁶ bars of a long storm once more (1.1 ms of 9).
 */
export function exactPhiChecked(
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  targetMm: number,
): { readonly phi: number; readonly rainMm: number } | null {
  // Short storms: validating first costs little; the caller's ordinary road does it.
  if (depthsMm.length < SAMPLE_FROM) return null;
  const bracket = sampledBracket(durationsH, depthsMm, targetMm);
  const inBracket = phiInBracket(durationsH, depthsMm, targetMm, bracket.lo, bracket.hi);
  if (inBracket === UNCLEAN) return null;
  // The pass read every bar and found them clean, so the bucket route may run.
  const phi = inBracket === MISSED ? exactPhiByBuckets(durationsH, depthsMm, targetMm) : inBracket;
  return { phi, rainMm: passTotal };
}

// The bracket pass in blocks of PASS_BLOCK bars, for the reasons given in
// loss/constant.ts: a function whose loop runs 10⁶ bars once per call stays
// in on-stack-replacement code (the unblocked pass took 4.7 of calibrate's
// 9 ms on 10⁶ bars); one block for Float64Array columns and one for other
// lists, so neither sees both kinds of element read; the sums pass from
// block to block in module variables; the check is called through a local
// name. The bars are summed in order across blocks, as in one loop.
const BLOCK = PASS_BLOCK;
const cleanBar = isCleanBarBelowSums;
const cleanSums = summedBarsClean;
let passTotal = 0;
let passSpan = 0;
let passDepthAbove = 0;
let passDurAbove = 0;
let passGathered = 0;

/** exactPhiInBracket's pass and selection: φ, or MISSED, or UNCLEAN. */
function phiInBracket(
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  targetMm: number,
  lo: number,
  hi: number,
): number {
  const n = depthsMm.length;
  if (workDepth.length < n) {
    workDepth = new Float64Array(n);
    workDur = new Float64Array(n);
    workGatheredIntensity = new Float64Array(n);
  }
  const depth = workDepth;
  const dur = workDur;
  const intensity = workGatheredIntensity;
  const typed = durationsH instanceof Float64Array && depthsMm instanceof Float64Array;
  passTotal = 0;
  passSpan = 0;
  passDepthAbove = 0;
  passDurAbove = 0;
  passGathered = 0;
  for (let start = 0; start < n; start += BLOCK) {
    const end = Math.min(n, start + BLOCK);
    const clean = typed
      ? bracketBlockTyped(durationsH, depthsMm, lo, hi, depth, dur, start, end)
      : bracketBlockListed(durationsH, depthsMm, lo, hi, depth, dur, start, end);
    if (!clean) return UNCLEAN;
  }
  if (!cleanSums(passSpan, passTotal)) return UNCLEAN;
  const total = passTotal;
  const depthAbove = passDepthAbove;
  const durAbove = passDurAbove;
  const m = passGathered;
  for (let j = 0; j < m; j++) intensity[j] = (depth[j] as number) / (dur[j] as number);
  if (targetMm >= total) return 0;
  let depthMid = 0;
  let durMid = 0;
  for (let j = 0; j < m; j++) {
    depthMid += depth[j] as number;
    durMid += dur[j] as number;
  }
  const runoffAtHi = hi === Infinity ? 0 : depthAbove - hi * durAbove;
  const runoffAtLo = depthAbove + depthMid - lo * (durAbove + durMid);
  if (!(runoffAtLo > targetMm) || !(runoffAtHi <= targetMm)) return MISSED;
  let upper = hi;
  if (upper === Infinity) {
    upper = 0;
    for (let j = 0; j < m; j++) if ((intensity[j] as number) > upper) upper = intensity[j] as number;
  }
  return selectPhi(depth, dur, intensity, m, targetMm, depthAbove, durAbove, lo, upper);
}

/**
 * Bars start to end − 1 of the bracket pass: false at a bar that fails
 * isCleanBarBelowSums. No branch on where a bar lies: the share of bars above
 * hi is large and unpredictable, so their sums take a 0/1 factor; and every
 * bar is written at the gathered end, which moves on only past a bar inside
 * the bracket (a branch on "inside", true for some 9 % of bars on the bench
 * storm, mispredicted often enough to cost more than the two stores). The
 * gathered bars' intensities are formed after the pass, one division each.
 */
function bracketBlockTyped(
  durationsH: Float64Array,
  depthsMm: Float64Array,
  lo: number,
  hi: number,
  depth: Float64Array,
  dur: Float64Array,
  start: number,
  end: number,
): boolean {
  let total = passTotal;
  let span = passSpan;
  let depthAbove = passDepthAbove;
  let durAbove = passDurAbove;
  let m = passGathered;
  for (let k = start; k < end; k++) {
    const p = depthsMm[k] as number;
    const d = durationsH[k] as number;
    if (!cleanBar(d, p)) return false;
    total += p;
    span += d;
    const above = +(p > hi * d);
    depthAbove += above * p;
    durAbove += above * d;
    depth[m] = p;
    dur[m] = d;
    m += +(p > lo * d) - above;
  }
  passTotal = total;
  passSpan = span;
  passDepthAbove = depthAbove;
  passDurAbove = durAbove;
  passGathered = m;
  return true;
}

/** bracketBlockTyped for plain arrays and other array-likes; the two must stay alike. */
function bracketBlockListed(
  durationsH: ArrayLike<number>,
  depthsMm: ArrayLike<number>,
  lo: number,
  hi: number,
  depth: Float64Array,
  dur: Float64Array,
  start: number,
  end: number,
): boolean {
  let total = passTotal;
  let span = passSpan;
  let depthAbove = passDepthAbove;
  let durAbove = passDurAbove;
  let m = passGathered;
  for (let k = start; k < end; k++) {
    const p = depthsMm[k] as number;
    const d = durationsH[k] as number;
    if (!cleanBar(d, p)) return false;
    total += p;
    span += d;
    const above = +(p > hi * d);
    depthAbove += above * p;
    durAbove += above * d;
    depth[m] = p;
    dur[m] = d;
    m += +(p > lo * d) - above;
  }
  passTotal = total;
  passSpan = span;
  passDepthAbove = depthAbove;
  passDurAbove = durAbove;
  passGathered = m;
  return true;
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
  const gathered = new Float64Array(m);
  let j = 0;
  for (let k = 0; k < n && j < m; k++) {
    if (bucketOf[k] === b) {
      depth[j] = depthsMm[k] as number;
      dur[j] = durationsH[k] as number;
      gathered[j] = intensity[k] as number;
      j++;
    }
  }
  return selectPhi(depth, dur, gathered, j, targetMm, depthAbove, durAbove, lo, hi);
}

/**
 * Weighted quickselect over m undecided bars (arrays are reordered). Each bar
 * comes with its intensity, depth / duration formed once when it was
 * gathered (the same division everywhere in this file), so no pass divides.
 * Bars already known to lie above φ contribute depthAbove and durAbove; φ is
 * known to lie in [lo, hi].
 */
function selectPhi(
  depth: Float64Array,
  dur: Float64Array,
  intensity: Float64Array,
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
    const pivot = intensity[pick] as number;

    // Partition [start, end): bars above the pivot first. Branch-free: every
    // bar is swapped with the one at `split`, which moves on only past a bar
    // above the pivot (swapping two bars not above it changes nothing that
    // matters). Whether a bar lies above the pivot is a coin toss on a real
    // storm, and a branch on it mispredicted half the time: the partitions
    // took 2.7 of calibrate's 9 ms on 10⁶ bars.
    let split = start;
    let partDepth = 0;
    let partDur = 0;
    for (let j = start; j < end; j++) {
      const ij = intensity[j] as number;
      const pj = depth[j] as number;
      const dj = dur[j] as number;
      const above = +(ij > pivot);
      partDepth += above * pj;
      partDur += above * dj;
      intensity[j] = intensity[split] as number;
      depth[j] = depth[split] as number;
      dur[j] = dur[split] as number;
      intensity[split] = ij;
      depth[split] = pj;
      dur[split] = dj;
      split += above;
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
      // Nearly every bar here lies below the pivot (ties are rare): a branch predicts well.
      let keep = split;
      for (let j = split; j < end; j++) {
        const ij = intensity[j] as number;
        const pj = depth[j] as number;
        const dj = dur[j] as number;
        if (ij < pivot) {
          intensity[keep] = ij;
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
