import { describe, expect, it } from 'vitest';
import { cumulativePath } from '../../../src/ui/chart/mass-path';

describe('cumulativePath', () => {
  it('runs from zero at the first edge through each bar’s end value', () => {
    // Edges at 0, 10, 20 px; cumulative 2 and 8 mm; y = 100 − 10·mm: 100 at 0, 80 at 2, 20 at 8.
    expect(cumulativePath([0, 10, 20], [2, 8], (mm) => 100 - 10 * mm)).toBe('M0,100L10,80L20,20');
  });

  it('skips bars less than half a pixel wide but always ends at the last bar’s end', () => {
    // Ten bars of 0.1 px: the points at 0.1 … 0.4 px are under half a pixel from the start and skipped;
    // 0.5 px is drawn, then 0.6 … 0.9 skipped again, and the end at 1.0 px is always drawn.
    const edges = Array.from({ length: 11 }, (_, k) => k / 10);
    const cumulative = Array.from({ length: 10 }, (_, k) => k + 1);
    expect(cumulativePath(edges, cumulative, (v) => v)).toBe('M0,0L0.5,5L1,10');
  });

  it('an empty storm draws nothing', () => {
    expect(cumulativePath([0], [], (v) => v)).toBe('');
  });
});
