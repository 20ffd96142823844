// The FFT and the two convolutions behind runoffHydrograph.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { convolve, convolveDirect, convolveFft, fft, fftPlan, nextPowerOfTwo } from '../../../src/core';
import { expectClose } from '../../helpers/tolerance';

/** The discrete Fourier transform by its definition, O(N²). */
function naiveDft(re: number[], im: number[], sign: -1 | 1): [number[], number[]] {
  const n = re.length;
  const outRe: number[] = [];
  const outIm: number[] = [];
  for (let k = 0; k < n; k++) {
    let sr = 0;
    let si = 0;
    for (let j = 0; j < n; j++) {
      const a = (sign * 2 * Math.PI * j * k) / n;
      sr += (re[j] as number) * Math.cos(a) - (im[j] as number) * Math.sin(a);
      si += (re[j] as number) * Math.sin(a) + (im[j] as number) * Math.cos(a);
    }
    outRe.push(sr);
    outIm.push(si);
  }
  return [outRe, outIm];
}

describe('fft', () => {
  it('agrees with the DFT by definition, both ways', () => {
    for (const n of [1, 2, 4, 8, 64, 256]) {
      const re = Array.from({ length: n }, (_, j) => Math.sin(j * 1.3) + 0.25 * j);
      const im = Array.from({ length: n }, (_, j) => Math.cos(j * 0.7));
      for (const inverse of [false, true]) {
        const [eRe, eIm] = naiveDft(re, im, inverse ? 1 : -1);
        const r = Float64Array.from(re);
        const i = Float64Array.from(im);
        fft(r, i, fftPlan(n), inverse);
        const scale = Math.max(1, ...eRe.map(Math.abs), ...eIm.map(Math.abs));
        for (let k = 0; k < n; k++) {
          expectClose(r[k] as number, eRe[k] as number, 0, 1e-12 * scale);
          expectClose(i[k] as number, eIm[k] as number, 0, 1e-12 * scale);
        }
      }
    }
  });

  it('inverts: the inverse of the transform is N times the input', () => {
    const n = 1024;
    const re = Float64Array.from({ length: n }, (_, j) => ((j * 7919) % 101) / 101);
    const im = new Float64Array(n);
    const r = re.slice();
    const i = im.slice();
    fft(r, i, fftPlan(n));
    fft(r, i, fftPlan(n), true);
    for (let k = 0; k < n; k++) {
      expectClose((r[k] as number) / n, re[k] as number, 0, 1e-14);
      expectClose((i[k] as number) / n, 0, 0, 1e-14);
    }
  });

  it('refuses a size that is not a power of two', () => {
    expect(() => fftPlan(12)).toThrow(RangeError);
    expect(nextPowerOfTwo(1)).toBe(1);
    expect(nextPowerOfTwo(1000)).toBe(1024);
    expect(nextPowerOfTwo(1024)).toBe(1024);
  });
});

describe('convolution', () => {
  it('works a small case by hand', () => {
    // [1, 2, 0, 3] ∗ [0, 0.5, 0.25] = [0, 0.5, 1.25, 0.5, 1.5, 0.75].
    const expected = [0, 0.5, 1.25, 0.5, 1.5, 0.75];
    expect(Array.from(convolveDirect([1, 2, 0, 3], [0, 0.5, 0.25]))).toEqual(expected);
    const byFft = convolveFft([1, 2, 0, 3], [0, 0.5, 0.25]);
    expected.forEach((v, k) => expectClose(byFft[k] as number, v, 0, 1e-15));
  });

  it('by FFT equals the direct sum to round-off, records of 1 to 3000 steps, kernels of 1 to 700', () => {
    const series = (max: number) =>
      fc.array(fc.oneof(fc.constant(0), fc.double({ min: 0, max: 50, noNaN: true })), { minLength: 1, maxLength: max });
    fc.assert(
      fc.property(series(3000), series(700), (x, h) => {
        const direct = convolveDirect(x, h);
        const byFft = convolveFft(x, h);
        expect(byFft.length).toBe(direct.length);
        let largest = 0;
        for (const v of direct) largest = Math.max(largest, v);
        // Round-off of the FFT: some 1e-16 of the largest output per pass.
        for (let k = 0; k < direct.length; k++)
          expectClose(byFft[k] as number, direct[k] as number, 0, 1e-12 * largest + 1e-300);
      }),
      { numRuns: 60 },
    );
  });

  it('spans several blocks of the overlap-add, with odd and even block counts', () => {
    for (const n of [5000, 5300, 20_011]) {
      const x = Float64Array.from({ length: n }, (_, j) => (j % 17 === 0 ? 0 : ((j * 31) % 23) / 7));
      const h = Float64Array.from({ length: 300 }, (_, j) => Math.exp(-j / 40));
      const direct = convolveDirect(x, h);
      const byFft = convolveFft(x, h);
      for (let k = 0; k < direct.length; k++) expectClose(byFft[k] as number, direct[k] as number, 1e-11, 1e-11);
    }
  });

  it('takes the FFT for a long record and a long kernel, the direct sum for a short storm', () => {
    const long = new Float64Array(100_000).fill(1);
    expect(convolve(long, new Float64Array(200).fill(0.005)).byFft).toBe(true);
    expect(convolve(new Float64Array(50).fill(1), new Float64Array(200).fill(0.005)).byFft).toBe(false);
    // A kernel of three ordinates is cheaper summed directly, however long the record.
    expect(convolve(long, [0.2, 0.5, 0.3]).byFft).toBe(false);
  });
});
