/**
 * An iterative radix-2 fast Fourier transform (Cooley & Tukey 1965), in place
 * on separate real and imaginary arrays, with the twiddle factors and the
 * bit-reversal permutation worked out once per size and kept. Unnormalised in
 * both directions: the inverse of the forward transform returns N·x.
 */
export interface FftPlan {
  readonly size: number;
  /** cos(2πk/N) and sin(2πk/N) for k < N/2. */
  readonly cos: Float64Array;
  readonly sin: Float64Array;
  /** Bit-reversed index of each k. */
  readonly reversed: Uint32Array;
}

const plans = new Map<number, FftPlan>();

/** The smallest power of two at least `n` (n ≥ 1). */
export function nextPowerOfTwo(n: number): number {
  let p = 1;
  while (p < n) p *= 2;
  return p;
}

/** The plan for a power-of-two size, made once and kept. */
export function fftPlan(size: number): FftPlan {
  const known = plans.get(size);
  if (known) return known;
  if (!(size >= 1) || nextPowerOfTwo(size) !== size) throw new RangeError(`FFT size ${size} is not a power of two.`);
  const half = size >> 1;
  const cos = new Float64Array(half);
  const sin = new Float64Array(half);
  for (let k = 0; k < half; k++) {
    const angle = (2 * Math.PI * k) / size;
    cos[k] = Math.cos(angle);
    sin[k] = Math.sin(angle);
  }
  const reversed = new Uint32Array(size);
  let bits = 0;
  while (1 << bits < size) bits++;
  for (let k = 0; k < size; k++) {
    let r = 0;
    for (let b = 0, v = k; b < bits; b++, v >>= 1) r = (r << 1) | (v & 1);
    reversed[k] = r;
  }
  const plan = { size, cos, sin, reversed };
  plans.set(size, plan);
  return plan;
}

/**
 * Transforms (re, im) in place: X_k = Σ x_j·e^(∓2πi·jk/N), minus sign forward,
 * plus sign for `inverse`. The arrays' length must be the plan's size.
 */
export function fft(re: Float64Array, im: Float64Array, plan: FftPlan, inverse = false): void {
  const n = plan.size;
  const { cos, sin, reversed } = plan;
  for (let k = 0; k < n; k++) {
    const r = reversed[k] as number;
    if (r > k) {
      const tr = re[k] as number;
      re[k] = re[r] as number;
      re[r] = tr;
      const ti = im[k] as number;
      im[k] = im[r] as number;
      im[r] = ti;
    }
  }
  // Size-2 butterflies need no twiddle.
  for (let a = 0; a + 1 < n; a += 2) {
    const ar = re[a] as number;
    const ai = im[a] as number;
    const br = re[a + 1] as number;
    const bi = im[a + 1] as number;
    re[a] = ar + br;
    im[a] = ai + bi;
    re[a + 1] = ar - br;
    im[a + 1] = ai - bi;
  }
  const sign = inverse ? 1 : -1;
  for (let size = 4; size <= n; size *= 2) {
    const half = size >> 1;
    const stride = n / size;
    if (half < SHORT_RUN) {
      // Early stages: few twiddles, many groups. Each twiddle once, its
      // butterflies across the array (short inner loops cost more than strides).
      for (let j = 0; j < half; j++) {
        const wr = cos[j * stride] as number;
        const wi = sign * (sin[j * stride] as number);
        for (let a = j; a < n; a += size) butterfly(re, im, a, a + half, wr, wi);
      }
    } else {
      for (let start = 0; start < n; start += size) {
        for (let j = 0, t = 0; j < half; j++, t += stride) {
          butterfly(re, im, start + j, start + j + half, cos[t] as number, sign * (sin[t] as number));
        }
      }
    }
  }
}

/** Below this many twiddles per stage, loop over twiddles outside. */
const SHORT_RUN = 64;

/** (x_a, x_b) ← (x_a + w·x_b, x_a − w·x_b) with w = wr + i·wi. */
function butterfly(re: Float64Array, im: Float64Array, a: number, b: number, wr: number, wi: number): void {
  const br = re[b] as number;
  const bi = im[b] as number;
  const xr = wr * br - wi * bi;
  const xi = wr * bi + wi * br;
  const ar = re[a] as number;
  const ai = im[a] as number;
  re[a] = ar + xr;
  im[a] = ai + xi;
  re[b] = ar - xr;
  im[b] = ai - xi;
}
