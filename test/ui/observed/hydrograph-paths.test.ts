import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { seriesPath } from '../../../src/ui/observed/hydrograph-paths';

const points = (d: string): [number, number][] =>
  d === ''
    ? []
    : d
        .slice(1)
        .split('L')
        .map((p) => p.split(',').map(Number) as [number, number]);

describe('a series path thinned per pixel column', () => {
  test('a short series keeps every point, in order', () => {
    // Three samples in three columns (x = 10 t): nothing to thin.
    expect(
      seriesPath(
        [0, 1, 2],
        [0, 5, 1],
        0,
        (t) => 10 * t,
        (q) => 100 - q,
      ),
    ).toBe('M0.0,100.0L10.0,95.0L20.0,99.0');
  });

  test('keeps at most four points per column: the first, the highest, the lowest and the last, as they came', () => {
    // Five samples in column 0 (x = 0.1 t rounds to 0 for t ≤ 4): y 50, 10, 90, 30, 40.
    // Kept: first (50), highest (10, the least y), lowest (90), last (40), in that order.
    const d = seriesPath(
      [0, 1, 2, 3, 4],
      [50, 90, 10, 70, 60],
      0,
      (t) => 0.1 * t,
      (q) => 100 - q,
    );
    expect(points(d).map(([, y]) => y)).toEqual([50, 10, 90, 40]);
  });

  test('long random series: every column’s extremes drawn, never more than four points a column', () => {
    let cases = 0;
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0, max: 100, noNaN: true }), { minLength: 2, maxLength: 3000, size: 'max' }),
        (qs) => {
          const times = qs.map((_, i) => i);
          // A quarter pixel into each column, so the drawn x (to 0.1 px) rounds to the same column.
          const x = (t: number): number => Math.floor((t * 400) / qs.length) + 0.25;
          const y = (q: number): number => 200 - q;
          const pts = points(seriesPath(times, qs, 0, x, y));
          const columns = new Map<number, number[]>();
          qs.forEach((q, i) => {
            const c = Math.round(x(i));
            const list = columns.get(c);
            if (list) list.push(y(q));
            else columns.set(c, [y(q)]);
          });
          const drawn = new Map<number, number[]>();
          let lastX = -Infinity;
          let inOrder = true;
          for (const [px, py] of pts) {
            if (px < lastX) inOrder = false;
            lastX = px;
            const c = Math.round(px);
            const list = drawn.get(c);
            if (list) list.push(py);
            else drawn.set(c, [py]);
          }
          expect(inOrder).toBe(true);
          for (const [c, ys] of columns) {
            const got = drawn.get(c) ?? [];
            expect(got.length).toBeLessThanOrEqual(4);
            expect(got).toContain(Number(Math.min(...ys).toFixed(1))); // spread-ok: one column, at most 3000 samples
            expect(got).toContain(Number(Math.max(...ys).toFixed(1))); // spread-ok: one column, at most 3000 samples
          }
          cases++;
        },
      ),
      { numRuns: 40 },
    );
    expect(cases).toBe(40);
  });
});
