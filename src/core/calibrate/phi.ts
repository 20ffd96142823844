/**
 * Exact φ-index for a target excess, without iteration or sorting.
 *
 * R(φ) = Σ max(0, P_k − φ·Δt_k) is continuous, piecewise linear and strictly
 * decreasing on [0, i_max]. With A the set of bars whose intensity exceeds φ,
 * R = D_A − φ·T_A, so φ = (D_A − R)/T_A once A is known (the classical
 * φ-index procedure, Chow, Maidment & Mays 1988, §5.2, done by hand by trial of
 * the bar set). A is found by weighted quickselect on intensity: each pivot
 * decides for a whole part of the bars whether they lie above or below φ, so
 * the expected work is linear in the number of bars.
 *
 * Inputs must be clean (validated storm) and 0 ≤ target ≤ ΣP. Returns the
 * smallest φ with R(φ) = target: the peak intensity for target 0, and 0 for
 * target ΣP.
 */
export function exactPhi(durationsH: ArrayLike<number>, depthsMm: ArrayLike<number>, targetMm: number): number {
  const n = depthsMm.length;
  // Intensities are always formed as depth / duration, the same division for
  // the pivot and every bar, so ties compare exactly and each round removes
  // at least the pivot bar from the undecided set.
  // Work copies of the wet bars only; dry bars never lie above any φ ≥ 0.
  const depth = new Float64Array(n);
  const dur = new Float64Array(n);
  let m = 0;
  let total = 0;
  for (let k = 0; k < n; k++) {
    const p = depthsMm[k] as number;
    if (p > 0) {
      depth[m] = p;
      dur[m] = durationsH[k] as number;
      total += p;
      m++;
    }
  }
  if (m === 0 || targetMm >= total) return 0;

  // Bars decided to lie above φ contribute depthAbove and durAbove.
  let depthAbove = 0;
  let durAbove = 0;
  // φ is known to lie in (lo, hi].
  let lo = 0;
  let hi = Infinity;
  let start = 0;
  let end = m; // undecided bars are depth[start..end)
  let seed = 0x9e3779b9 ^ m;

  while (end > start) {
    // A pseudo-random pivot keeps the expected work linear on sorted input.
    seed = (Math.imul(seed, 1664525) + 1013904223) >>> 0;
    const pick = start + (seed % (end - start));
    const pivot = (depth[pick] as number) / (dur[pick] as number);

    // Partition [start, end): bars above the pivot first, then the rest.
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
      // φ is above the pivot: everything at or below it is below φ.
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
