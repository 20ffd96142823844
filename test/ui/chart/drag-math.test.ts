import { scaleLinear } from 'd3-scale';
import { describe, expect, it } from 'vitest';
import { fineStep, grabOffsetPx, snapToStep, valueAfterKey, valueAtPointer } from '../../../src/ui/chart/drag-math';

// A rate axis from 0 mm/h at 300 px (bottom) to 50 mm/h at 20 px (top).
const y = scaleLinear().domain([0, 50]).range([300, 20]);

describe('dragging the loss-rate line', () => {
  it('the value under the pointer is the scale’s inverse', () => {
    expect(valueAtPointer(y, 160, 0, 0, 50)).toBeCloseTo(25, 12);
    expect(valueAtPointer(y, 300, 0, 0, 50)).toBe(0);
  });

  it('holding the line a few pixels off its centre does not make it jump', () => {
    const grab = grabOffsetPx(y, 163, 25); // pressed 3 px below the line at 25 mm/h
    expect(grab).toBeCloseTo(3, 12);
    expect(valueAtPointer(y, 163, grab, 0, 50)).toBeCloseTo(25, 12);
    // Moving 28 px up is 5 mm/h up, wherever the line was held.
    expect(valueAtPointer(y, 135, grab, 0, 50)).toBeCloseTo(30, 12);
  });

  it('is clamped to the ends of the axis', () => {
    expect(valueAtPointer(y, 900, 0, 0, 50)).toBe(0);
    expect(valueAtPointer(y, -900, 0, 0, 50)).toBe(50);
    expect(valueAtPointer(y, 160, 0, 30, 40)).toBe(30);
  });
});

describe('stepping the line with keys', () => {
  const steps = { step: 0.1, coarse: 1, min: 0, max: 50 };
  it('arrows move one fine step, Page keys one coarse step, on the step grid', () => {
    expect(valueAfterKey('ArrowUp', 0.2, steps)).toBe(0.3);
    expect(valueAfterKey('ArrowRight', 0.2, steps)).toBe(0.3);
    expect(valueAfterKey('ArrowDown', 8.04, steps)).toBe(7.9);
    expect(valueAfterKey('PageUp', 8, steps)).toBe(9);
    expect(valueAfterKey('PageDown', 8.25, steps)).toBe(7.3);
  });
  it('Home and End go to the ends, and no key goes past them', () => {
    expect(valueAfterKey('Home', 8, steps)).toBe(0);
    expect(valueAfterKey('End', 8, steps)).toBe(50);
    expect(valueAfterKey('ArrowDown', 0, steps)).toBe(0);
    expect(valueAfterKey('PageUp', 49.5, steps)).toBe(50);
  });
  it('other keys are not the slider’s', () => {
    expect(valueAfterKey('a', 8, steps)).toBeNull();
    expect(valueAfterKey('Tab', 8, steps)).toBeNull();
  });
  it('the fine step is a power of ten about a hundredth of the axis', () => {
    expect(fineStep(50)).toBeCloseTo(0.1, 15);
    expect(fineStep(2)).toBeCloseTo(0.01, 15);
    expect(fineStep(400)).toBe(1);
    expect(fineStep(0)).toBe(1);
  });
});

describe('snapToStep', () => {
  it('puts a dragged value on the arrow keys’ grid with no binary residue', () => {
    // 6.2137 on a 0.1 grid is 62 steps = 6.2; 0.1 × 3 would print as 0.30000000000000004 unrounded.
    expect(snapToStep(6.2137, 0.1)).toBe(6.2);
    expect(snapToStep(0.3000001, 0.1)).toBe(0.3);
    expect(snapToStep(0.0149, 0.01)).toBe(0.01);
    expect(snapToStep(47.5, 1)).toBe(48);
  });
  it('leaves the value alone for a step that is not a positive number', () => {
    expect(snapToStep(6.2137, 0)).toBe(6.2137);
    expect(snapToStep(6.2137, Number.NaN)).toBe(6.2137);
  });
});
