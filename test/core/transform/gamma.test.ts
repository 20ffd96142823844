// The gamma functions behind the Nash S-curve, against SciPy's (fixtures
// computed with scipy.special.gammaln, gammainc and gammaincc; see their headers).
import { describe, expect, it } from 'vitest';
import { gammaP, gammaQ, logGamma } from '../../../src/core';
import { readFixtureCsv } from '../../helpers/fixture-csv';
import { expectClose } from '../../helpers/tolerance';

describe('ln Γ', () => {
  const { header, rows } = readFixtureCsv('scipy-log-gamma.csv');

  it('names its source', () => {
    expect(header).toMatch(/scipy\.special\.gammaln/);
    expect(rows.length).toBeGreaterThan(15);
  });

  it.each(rows.map((r) => r.map(Number) as [number, number]))('ln Γ(%d) agrees with SciPy to 1e-13', (x, lnGamma) => {
    expectClose(logGamma(x), lnGamma, 1e-13, 1e-13);
  });

  it('gives the factorials: Γ(n + 1) = n!', () => {
    // 10! = 3 628 800, 20! = 2 432 902 008 176 640 000 (exact integers).
    expectClose(Math.exp(logGamma(11)), 3628800, 1e-13);
    expectClose(Math.exp(logGamma(21)), 2432902008176640000, 1e-12);
  });

  it('gives Γ(½) = √π', () => {
    expectClose(Math.exp(logGamma(0.5)), Math.sqrt(Math.PI), 1e-14);
  });
});

describe('regularised incomplete gamma', () => {
  const { header, rows } = readFixtureCsv('scipy-regularised-incomplete-gamma.csv');
  const cases = rows.map((r) => r.map(Number) as [number, number, number, number]);

  it('names its source', () => {
    expect(header).toMatch(/scipy\.special\.gammainc/);
    expect(cases.length).toBeGreaterThan(200);
  });

  it.each(cases)('P(%d, %d) and Q agree with SciPy', (a, x, p, q) => {
    // Relative 1e-12 on each, the small one included, down to the far tail
    // (worst seen 6e-14); absolute 1e-300 so exact zeros compare.
    expectClose(gammaP(a, x), p, 1e-12, 1e-300);
    expectClose(gammaQ(a, x), q, 1e-12, 1e-300);
  });

  it('is the exponential distribution for a = 1: P(1, x) = 1 − e^(−x)', () => {
    for (const x of [0.01, 0.5, 1, 2.5, 7]) expectClose(gammaP(1, x), -Math.expm1(-x), 1e-14);
  });

  it('starts at 0 and ends at 1', () => {
    expect(gammaP(2.5, 0)).toBe(0);
    expect(gammaQ(2.5, 0)).toBe(1);
    expect(gammaP(2.5, Infinity)).toBe(1);
    expect(gammaQ(2.5, Infinity)).toBe(0);
  });
});
