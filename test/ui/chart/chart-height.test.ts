import { describe, expect, it } from 'vitest';
import { CHART_HEIGHT, CHART_MIN_HEIGHT, chartHeightFor } from '../../../src/ui/chart/chart-height';

describe('the hyetograph’s height follows the window’s', () => {
  it('is the full 360 px on a tall window', () => {
    expect(chartHeightFor(900)).toBe(CHART_HEIGHT);
    expect(chartHeightFor(1200)).toBe(360);
  });
  it('gives way on a laptop screen, 420 px of page around it: 768 → 348 px, 720 → 300 px', () => {
    // 768 − 420 = 348; 720 − 420 = 300 (both between the 240 px floor and the 360 px ceiling).
    expect(chartHeightFor(768)).toBe(348);
    expect(chartHeightFor(720)).toBe(300);
  });
  it('never shrinks below 240 px, and an unknown window gets the full height', () => {
    expect(chartHeightFor(500)).toBe(CHART_MIN_HEIGHT);
    expect(chartHeightFor(0)).toBe(CHART_HEIGHT);
    expect(chartHeightFor(Number.NaN)).toBe(CHART_HEIGHT);
  });
});
