// Hand-worked cases for the three simplest loss methods. Every expected value
// below was worked out by hand from the method's definition (DESIGN.md,
// "Loss methods"), not taken from the code.
import { describe, expect, it } from 'vitest';
import { InputError, computeLosses } from '../../../src/core';
import { expectAllClose, expectClose } from '../../helpers/tolerance';

// An invented storm: four bars, unequal durations.
const storm = { durationsH: [0.5, 0.5, 1, 0.25], depthsMm: [2, 10, 6, 5] };

describe('constant loss rate (φ-index)', () => {
  it('a bar below the loss rate loses all its rain; bars above lose φ·Δt', () => {
    // φ = 4 mm/h: capacities 2, 2, 4, 1 mm against rain 2, 10, 6, 5.
    const r = computeLosses(storm, { kind: 'constant', rateMmH: 4 });
    expectAllClose(r.lossMm, [2, 2, 4, 1]);
    expectAllClose(r.excessMm, [0, 8, 2, 4]);
    expect(r.rainMm).toBe(23);
    expectClose(r.totalExcessMm, 14);
    expectClose(r.runoffFraction, 14 / 23);
    expectClose(r.peakExcessMmH, 16); // 4 mm in 0.25 h
  });

  it('a zero rate loses nothing and a rate above the peak loses everything', () => {
    expectClose(computeLosses(storm, { kind: 'constant', rateMmH: 0 }).totalExcessMm, 23);
    expect(computeLosses(storm, { kind: 'constant', rateMmH: 20 }).totalExcessMm).toBe(0);
  });

  it('Chow, Maidment & Mays (1988) Example 5.2.1 pattern (values from memory): φ = 2.04 in/h over the three wettest half-hours', () => {
    // From memory, not checked against the printed page: rainfall in half-hour
    // bars 0.15, 0.26, 1.33, 2.20, 2.08, 0.20, 0.09 in, φ = 2.04 in/h, excess
    // 0.31, 1.18, 1.06 in. Worked here in inches throughout (the method is
    // unit-free as long as depth and rate agree).
    const shoal = { durationsH: Array(7).fill(0.5), depthsMm: [0.15, 0.26, 1.33, 2.2, 2.08, 0.2, 0.09] };
    const r = computeLosses(shoal, { kind: 'constant', rateMmH: 2.04 });
    expectAllClose(r.excessMm, [0, 0, 0.31, 1.18, 1.06, 0, 0], 1e-9, 1e-12);
    expectClose(r.totalExcessMm, 2.55, 1e-12);
  });
});

describe('initial loss then continuing loss', () => {
  it('the initial loss is filled first, then the continuing rate applies to the rest of that bar', () => {
    // IL = 5 mm, CL = 2 mm/h. Bar 1 (2 mm) goes into IL (3 mm left). Bar 2:
    // 10 mm in 0.5 h (20 mm/h): IL runs out after 3/20 h = 0.15 h; the other
    // 0.35 h give (20 − 2)·0.35 = 6.3 mm of excess. Bar 3: 6 − 2·1 = 4.
    // Bar 4: 5 − 2·0.25 = 4.5.
    const r = computeLosses(storm, { kind: 'initial-continuing', initialMm: 5, rateMmH: 2 });
    expectAllClose(r.excessMm, [0, 6.3, 4, 4.5], 1e-12);
    expectAllClose(r.lossMm, [2, 3.7, 2, 0.5], 1e-12);
  });

  it('an initial loss larger than the storm takes all of it', () => {
    const r = computeLosses(storm, { kind: 'initial-continuing', initialMm: 30, rateMmH: 0 });
    expect(r.totalExcessMm).toBe(0);
    expect(r.totalLossMm).toBe(23);
  });

  it('with no initial loss it is the constant-rate method', () => {
    const a = computeLosses(storm, { kind: 'initial-continuing', initialMm: 0, rateMmH: 3 });
    const b = computeLosses(storm, { kind: 'constant', rateMmH: 3 });
    expectAllClose(a.excessMm, b.excessMm);
  });
});

describe('proportional loss', () => {
  it('every bar keeps the same fraction as excess', () => {
    const r = computeLosses(storm, { kind: 'proportional', coefficient: 0.25 });
    expectAllClose(r.excessMm, [0.5, 2.5, 1.5, 1.25]);
    expectClose(r.runoffFraction, 0.25);
  });
});

describe('parameter validation', () => {
  const cases: [string, object, string][] = [
    ['a negative loss rate', { kind: 'constant', rateMmH: -1 }, 'rateMmH'],
    ['a NaN loss rate', { kind: 'constant', rateMmH: Number.NaN }, 'rateMmH'],
    ['a missing initial loss', { kind: 'initial-continuing', rateMmH: 1 }, 'initialMm'],
    ['a coefficient above 1', { kind: 'proportional', coefficient: 1.2 }, 'coefficient'],
    ['a coefficient below 0', { kind: 'proportional', coefficient: -0.1 }, 'coefficient'],
    ['an unknown kind', { kind: 'magic' }, 'kind'],
  ];
  it.each(cases)('rejects %s and names the field', (_label, method, field) => {
    let caught: unknown;
    try {
      computeLosses(storm, method as never);
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(InputError);
    expect((caught as InputError).field).toBe(field);
  });

  it('a dry storm has runoff fraction 0, not NaN', () => {
    const r = computeLosses({ durationsH: [1, 1], depthsMm: [0, 0] }, { kind: 'constant', rateMmH: 1 });
    expect(r.runoffFraction).toBe(0);
    expect(r.peakExcessMmH).toBe(0);
  });
});
