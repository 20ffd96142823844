/**
 * Bar edges that land within this many steps of a step boundary are taken to
 * be on it: edges summed from thousands of bar durations carry rounding (a
 * 1e6-bar record of 5-minute bars is off by some 1e-7 steps at its end), and
 * a bar meant to fill whole steps must not leak a 1e-12 mm sliver into the
 * next one. A real offset this small (a millionth of a step) changes nothing.
 */
const SNAP_STEPS = 1e-6;

function snap(positionSteps: number): number {
  const nearest = Math.round(positionSteps);
  return Math.abs(positionSteps - nearest) <= SNAP_STEPS ? nearest : positionSteps;
}

/**
 * The bars' end times, h, summed with Neumaier's compensation (Neumaier 1974,
 * the improved Kahan summation): each edge is the sum of the durations before
 * it to within an ulp or so, whatever their number and order. Plain running
 * sums drift (some 1e-7 steps over 10⁶ bars), and where an edge lies near
 * SNAP_STEPS from a step boundary, the drift decided on which side it fell:
 * the same bars after a dry lead of whole steps then gave a hydrograph one
 * sample longer, and a different tail (found by the time-shift property).
 */
export function totalHours(durationsH: ArrayLike<number>): number {
  let sum = 0;
  let compensation = 0;
  for (let k = 0; k < durationsH.length; k++) {
    const d = durationsH[k] as number;
    const t = sum + d;
    compensation += Math.abs(sum) >= Math.abs(d) ? sum - t + d : d - t + sum;
    sum = t;
  }
  return sum + compensation;
}

/** Number of output steps that cover a storm of `totalH` hours. */
export function stepsCovering(totalH: number, stepH: number): number {
  return Math.ceil(snap(totalH / stepH));
}

/**
 * The excess of each output step, mm, written into `out[0 … steps)`: each
 * bar's excess spread over the bar at its constant intensity and gathered into
 * the steps it overlaps, in proportion to the overlap. The volume is kept
 * exactly (every bar's depth is shared out in full); where a bar edge falls
 * inside a step, that step's share is then taken as spread over the whole
 * step, so timing is good to within one step. With bar edges on step
 * boundaries (equal bars, or bars that are whole multiples of the step) the
 * gathering is exact. `out` may be longer than `steps` (a reused buffer).
 */
export function excessOnSteps(
  durationsH: ArrayLike<number>,
  excessMm: ArrayLike<number>,
  stepH: number,
  steps: number,
  out: Float64Array = new Float64Array(steps),
): Float64Array {
  const cells = out.subarray(0, steps);
  cells.fill(0);
  // The bar's end, h, compensated as in totalHours (the last edge is that total).
  let edgeH = 0;
  let compensation = 0;
  let a = 0; // bar start, in steps
  for (let k = 0; k < durationsH.length; k++) {
    const d = durationsH[k] as number;
    const t = edgeH + d;
    compensation += Math.abs(edgeH) >= Math.abs(d) ? edgeH - t + d : d - t + edgeH;
    edgeH = t;
    const b = snap((edgeH + compensation) / stepH);
    const e = excessMm[k] as number;
    if (e !== 0) spread(cells, a, b, e);
    a = b;
  }
  return cells;
}

/** Adds depth e spread evenly over [a, b) (in steps) to the steps it overlaps. */
function spread(out: Float64Array, a: number, b: number, e: number): void {
  const last = out.length - 1;
  const first = Math.min(Math.floor(a), last);
  const width = b - a;
  if (!(width > 0) || b <= first + 1) {
    out[first] = (out[first] as number) + e; // the whole bar sits in one step
    return;
  }
  const end = Math.min(Math.ceil(b) - 1, last);
  const perStep = e / width;
  out[first] = (out[first] as number) + perStep * (first + 1 - a);
  for (let i = first + 1; i < end; i++) out[i] = (out[i] as number) + perStep;
  out[end] = (out[end] as number) + perStep * (b - end);
}
