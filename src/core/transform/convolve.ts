import { fft, fftPlan, nextPowerOfTwo } from './fft';

/**
 * y = x ∗ h, of length x.length + h.length − 1, by the direct sum
 * y_i = Σ_m x_m·h_(i−m). Zero entries of x (dry steps) are skipped, so a
 * sparse record costs only its wet steps. `y`, when given, must be zeroed and
 * at least that long (the convolutions add into it).
 */
export function convolveDirect(
  x: ArrayLike<number>,
  h: ArrayLike<number>,
  y: Float64Array = new Float64Array(x.length + h.length - 1),
): Float64Array {
  const n = x.length;
  const l = h.length;
  for (let m = 0; m < n; m++) {
    const xm = x[m] as number;
    if (xm === 0) continue;
    for (let j = 0; j < l; j++) y[m + j] = (y[m + j] as number) + xm * (h[j] as number);
  }
  return y;
}

/**
 * Block size of the FFT convolution: the power of two that makes the work per
 * output step, N·(log₂N + 2)/(N − L + 1), least (a block must hold at least
 * the kernel twice over), and no larger than the whole convolution needs.
 */
function blockSize(n: number, l: number): number {
  const whole = nextPowerOfTwo(n + l - 1);
  let best = Math.min(whole, Math.max(64, nextPowerOfTwo(2 * l)));
  let bestCost = Infinity;
  for (let size = best; size <= whole; size *= 2) {
    const cost = (size * (Math.log2(size) + 2)) / (size - l + 1);
    if (cost < bestCost) {
      bestCost = cost;
      best = size;
    }
  }
  return best;
}

/** Work arrays of one block size, kept between calls (fresh memory is slow to touch). */
let work = {
  size: 0,
  hRe: new Float64Array(0),
  hIm: new Float64Array(0),
  re: new Float64Array(0),
  im: new Float64Array(0),
};

function workBuffers(size: number): typeof work {
  if (work.size !== size) {
    work = {
      size,
      hRe: new Float64Array(size),
      hIm: new Float64Array(size),
      re: new Float64Array(size),
      im: new Float64Array(size),
    };
  }
  return work;
}

/**
 * y = x ∗ h for real x and h by the FFT, overlap-add (Oppenheim & Schafer
 * 1975, Digital Signal Processing, §3.8): the kernel's spectrum is worked out
 * once; the record is cut into blocks of B = N − L + 1 steps, two blocks ride
 * in one complex transform (one as the real part, one as the imaginary part:
 * h is real, so their convolutions stay apart in the two parts), and each
 * block's convolution is added in at its offset. Memory stays a few blocks
 * however long the record. Round-off is some 1e-16 of the largest output.
 */
export function convolveFft(
  x: ArrayLike<number>,
  h: ArrayLike<number>,
  y: Float64Array = new Float64Array(x.length + h.length - 1),
): Float64Array {
  const n = x.length;
  const l = h.length;
  const outLength = n + l - 1;
  const size = blockSize(n, l);
  const plan = fftPlan(size);
  const block = size - l + 1;
  const { hRe, hIm, re, im } = workBuffers(size);
  hRe.fill(0);
  hIm.fill(0);
  for (let j = 0; j < l; j++) hRe[j] = h[j] as number;
  fft(hRe, hIm, plan);
  const scale = 1 / size;
  for (let first = 0; first < n; first += 2 * block) {
    const second = first + block;
    re.fill(0);
    im.fill(0);
    const firstEnd = Math.min(n, second);
    for (let m = first; m < firstEnd; m++) re[m - first] = x[m] as number;
    const secondEnd = Math.min(n, second + block);
    for (let m = second; m < secondEnd; m++) im[m - second] = x[m] as number;
    fft(re, im, plan);
    for (let k = 0; k < size; k++) {
      const ar = re[k] as number;
      const ai = im[k] as number;
      const br = hRe[k] as number;
      const bi = hIm[k] as number;
      re[k] = ar * br - ai * bi;
      im[k] = ar * bi + ai * br;
    }
    fft(re, im, plan, true);
    const firstStop = Math.min(outLength - first, size);
    for (let t = 0; t < firstStop; t++) y[first + t] = (y[first + t] as number) + (re[t] as number) * scale;
    if (second < n) {
      const secondStop = Math.min(outLength - second, size);
      for (let t = 0; t < secondStop; t++) y[second + t] = (y[second + t] as number) + (im[t] as number) * scale;
    }
  }
  return y;
}

/**
 * y = x ∗ h by whichever way is cheaper: the direct sum costs one multiply-add
 * per wet step and kernel ordinate; the FFT about log₂N butterflies per step
 * of the record, whatever the kernel. The weights are this machine's measured
 * ratio (a multiply-add about 2.5 ns, a butterfly step about 8 ns, rounded):
 * a long record with a kernel of more than a few dozen ordinates goes through
 * the FFT, a short storm or a very short kernel through the direct sum. Both
 * give the same numbers to round-off (test/core/transform/convolve.test.ts).
 */
export function convolve(
  x: ArrayLike<number>,
  h: ArrayLike<number>,
  y: Float64Array = new Float64Array(x.length + h.length - 1),
): { y: Float64Array; byFft: boolean } {
  const n = x.length;
  const l = h.length;
  let wet = 0;
  for (let m = 0; m < n; m++) if ((x[m] as number) !== 0) wet++;
  const directCost = 2.5 * wet * l;
  const size = blockSize(n, l);
  const block = size - l + 1;
  const fftCost = 8 * (n + l) * (size / block) * (Math.log2(size) + 2);
  return directCost <= fftCost
    ? { y: convolveDirect(x, h, y), byFft: false }
    : { y: convolveFft(x, h, y), byFft: true };
}
