import { describe, expect, it } from 'vitest';
import { barsPath } from '../../../src/ui/chart/bar-path';

const subpaths = (d: string): string[] =>
  d
    .split('M')
    .filter(Boolean)
    .map((p) => `M${p}`);

describe('bars as one path', () => {
  it('a wide bar is a closed rectangle from the baseline to its top, with a hairline gap', () => {
    expect(barsPath([0, 10, 20], [40, 70], 100)).toBe('M0,100V40H9V100ZM10,100V70H19V100Z');
  });

  it('narrow bars that are not sub-pixel have no gap', () => {
    expect(barsPath([0, 3], [50], 100)).toBe('M0,100V50H3V100Z');
  });

  it('a dry bar draws nothing', () => {
    expect(barsPath([0, 10, 20], [100, 50], 100)).toBe('M10,100V50H19V100Z');
  });

  it('sub-pixel bars share their pixel column at the tallest of them', () => {
    // 100 bars in 10 px: ten columns, each as tall as its tallest bar.
    const n = 100;
    const edges = Array.from({ length: n + 1 }, (_, k) => k * 0.1);
    const tops = Array.from({ length: n }, (_, k) => 100 - (k % 10) - Math.floor(k / 10));
    const parts = subpaths(barsPath(edges, tops, 100));
    expect(parts).toHaveLength(10);
    expect(parts[0]).toBe('M0,100V91H1V100Z');
    expect(parts[9]).toBe('M9,100V82H10V100Z');
  });

  it('a 100,000-bar record becomes at most one subpath per pixel column', () => {
    const n = 100_000;
    const width = 1200;
    const edges = new Float64Array(n + 1);
    for (let k = 0; k <= n; k++) edges[k] = (k / n) * width;
    const tops = new Float64Array(n).fill(50);
    expect(subpaths(barsPath(edges, tops, 100)).length).toBeLessThanOrEqual(width);
  });
});
