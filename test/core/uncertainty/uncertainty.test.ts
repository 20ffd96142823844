// How sure a loss fit is: the fits at the ends of the observed runoff's
// uncertainty, and the runoff-against-parameter curve the fit sits on.
import { describe, expect, it } from 'vitest';
import { calibrate, calibrationInterval, runoffCurve } from '../../../src/core';
import { expectInputError } from '../../helpers/input-error';
import { expectClose } from '../../helpers/tolerance';

// Two 1-hour bars of 10 and 20 mm. For φ ≤ 10 mm/h the runoff is (10 − φ) + (20 − φ)
// = 30 − 2φ; for 10 ≤ φ ≤ 20 it is 20 − φ.
const storm = { durationsH: [1, 1], depthsMm: [10, 20] };
const phi = { kind: 'constant', rateMmH: 5 } as const;

describe('calibrationInterval', () => {
  it('fits the loss rate at both ends of ±10 % on the observed runoff', () => {
    // 14 mm: φ = (30 − 14)/2 = 8. 12.6 mm: φ = 8.7. 15.4 mm: φ = 7.3.
    const r = calibrationInterval(storm, phi, 'rateMmH', 14, 10);
    expect(r.fit).toEqual(calibrate(storm, phi, 'rateMmH', 14));
    expectClose(r.lowRunoff.runoffMm, 12.6, 1e-15);
    expectClose(r.highRunoff.runoffMm, 15.4, 1e-15);
    expect(r.lowRunoff.result.ok && r.highRunoff.result.ok).toBe(true);
    if (!r.lowRunoff.result.ok || !r.highRunoff.result.ok || !r.range) return;
    expectClose(r.lowRunoff.result.value, 8.7, 1e-12);
    expectClose(r.highRunoff.result.value, 7.3, 1e-12);
    expectClose(r.range.min, 7.3, 1e-12);
    expectClose(r.range.max, 8.7, 1e-12);
  });

  it('gives three equal fits with no uncertainty', () => {
    const r = calibrationInterval(storm, phi, 'rateMmH', 14, 0);
    expect(r.lowRunoff.result).toEqual(r.fit);
    expect(r.highRunoff.result).toEqual(r.fit);
    expect(r.range).toEqual({ min: 8, max: 8 });
  });

  it('keeps the central fit and says why an end has no answer', () => {
    // 28 mm + 10 % = 30.8 mm, more than the 30 mm of rain.
    const r = calibrationInterval(storm, phi, 'rateMmH', 28, 10);
    expect(r.fit.ok).toBe(true);
    expect(r.highRunoff.result).toMatchObject({ ok: false, reason: 'exceeds-rainfall' });
    expect(r.range).toBeNull();
  });

  it('names the uncertainty when it is not a per cent from 0 to below 100', () => {
    for (const bad of [-1, 100, NaN]) {
      expectInputError(() => calibrationInterval(storm, phi, 'rateMmH', 14, bad), 'uncertaintyPct', /per cent/);
    }
  });
});

describe('runoffCurve', () => {
  it('traces runoff against the loss rate across its range (0 to the peak intensity)', () => {
    const c = runoffCurve(storm, phi, 'rateMmH', { points: 5 });
    expect(Array.from(c.values)).toEqual([0, 5, 10, 15, 20]);
    // 30 − 2φ to 10 mm/h, then 20 − φ: 30, 20, 10, 5, 0.
    expect(Array.from(c.runoffMm)).toEqual([30, 20, 10, 5, 0]);
  });

  it('passes through the fit', () => {
    const fit = calibrate(storm, phi, 'rateMmH', 14);
    const c = runoffCurve(storm, phi, 'rateMmH', { from: 6, to: 10, points: 3 });
    expect(fit.ok && c.values[1] === fit.value).toBe(true);
    expectClose(c.runoffMm[1] as number, 14, 1e-14);
  });

  it('has 64 points by default and follows every method of the table', () => {
    const horton = { kind: 'horton', f0MmH: 60, fcMmH: 5, kPerH: 2, ponding: false } as const;
    const c = runoffCurve(storm, horton, 'kPerH');
    expect(c.values.length).toBe(64);
    // Faster decay, more infiltration capacity lost sooner: runoff never falls as k grows.
    for (let i = 1; i < 64; i++) expect(c.runoffMm[i]).toBeGreaterThanOrEqual((c.runoffMm[i - 1] as number) - 1e-12);
  });

  it('names the field of bad input', () => {
    expectInputError(() => runoffCurve(storm, phi, 'initialMm'), 'parameter', /no parameter "initialMm"/);
    expectInputError(() => runoffCurve(storm, phi, 'rateMmH', { points: 1 }), 'options.points', /2 to 10,000/);
    expectInputError(() => runoffCurve(storm, phi, 'rateMmH', { from: -1 }), 'options.from', /start/);
    expectInputError(() => runoffCurve(storm, phi, 'rateMmH', { from: 5, to: 5 }), 'options.to', /end above/);
    const horton = { kind: 'horton', f0MmH: 60, fcMmH: 5, kPerH: 2, ponding: false } as const;
    expectInputError(() => runoffCurve(storm, horton, 'f0MmH', { from: 1, to: 50 }), 'f0MmH', /./);
    expectInputError(() => runoffCurve({ durationsH: [1], depthsMm: [-1] }, phi, 'rateMmH'), 'depthsMm', /Bar 1/);
  });
});
