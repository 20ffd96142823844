import { describe, expect, it } from 'vitest';
import { dischargeAtH, validateHydrograph } from '../../../src/core/baseflow/hydrograph';
import { inputErrorOf } from '../../helpers/input-error';

describe('validateHydrograph', () => {
  it('accepts a record with irregular, strictly increasing times and zero flows', () => {
    expect(() => validateHydrograph({ timesH: [0, 0.25, 1, 3.5], dischargeM3s: [0, 2, 0, 1] })).not.toThrow();
  });

  it('names the sample whose time does not come after the one before', () => {
    const error = inputErrorOf(() => validateHydrograph({ timesH: [0, 1, 2, 1.5, 4], dischargeM3s: [1, 1, 1, 1, 1] }));
    expect(error.field).toBe('timesH');
    expect(error.index).toBe(3);
    expect(error.message).toMatch(/Sample 4/);
  });

  it('rejects a repeated time, naming the second of the pair', () => {
    const error = inputErrorOf(() => validateHydrograph({ timesH: [0, 1, 1], dischargeM3s: [1, 1, 1] }));
    expect([error.field, error.index]).toEqual(['timesH', 2]);
  });

  it('rejects a time that is not a finite number', () => {
    const error = inputErrorOf(() => validateHydrograph({ timesH: [0, Number.NaN, 2], dischargeM3s: [1, 1, 1] }));
    expect([error.field, error.index]).toEqual(['timesH', 1]);
  });

  it('names the sample with a negative discharge', () => {
    const error = inputErrorOf(() => validateHydrograph({ timesH: [0, 1, 2, 3], dischargeM3s: [1, 2, -0.5, 1] }));
    expect(error.field).toBe('dischargeM3s');
    expect(error.index).toBe(2);
    expect(error.message).toMatch(/Sample 3/);
  });

  it('rejects a discharge that is NaN or infinite', () => {
    expect(inputErrorOf(() => validateHydrograph({ timesH: [0, 1], dischargeM3s: [Number.NaN, 1] })).index).toBe(0);
    expect(inputErrorOf(() => validateHydrograph({ timesH: [0, 1], dischargeM3s: [1, Infinity] })).index).toBe(1);
  });

  it('rejects times and discharges of different lengths', () => {
    expect(inputErrorOf(() => validateHydrograph({ timesH: [0, 1, 2], dischargeM3s: [1, 1] })).field).toBe(
      'dischargeM3s',
    );
  });

  it('needs at least two samples, since a volume needs one step', () => {
    expect(inputErrorOf(() => validateHydrograph({ timesH: [0], dischargeM3s: [1] })).field).toBe('timesH');
  });

  it('rejects a record with a missing column', () => {
    const noTimes = { dischargeM3s: [1, 2] } as unknown as Parameters<typeof validateHydrograph>[0];
    expect(inputErrorOf(() => validateHydrograph(noTimes)).field).toBe('timesH');
  });
});

describe('dischargeAtH', () => {
  const t = [0, 1, 4, 5];
  const q = [2, 6, 0, 3];

  it('returns the sample value at a sample time', () => {
    expect(dischargeAtH(t, q, 4)).toBe(0);
    expect(dischargeAtH(t, q, 0)).toBe(2);
    expect(dischargeAtH(t, q, 5)).toBe(3);
  });

  it('interpolates linearly within an irregular step', () => {
    expect(dischargeAtH(t, q, 2.5)).toBe(3);
    expect(dischargeAtH(t, q, 0.25)).toBe(3);
  });
});
