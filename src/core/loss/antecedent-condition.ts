import { InputError } from '../errors';

/**
 * Antecedent runoff condition for the curve number: converts a curve number
 * for average conditions (II) to dry (I) or wet (III) conditions,
 *   CN(I)   = 4.2·CN(II) / (10 − 0.058·CN(II))
 *   CN(III) = 23·CN(II) / (10 + 0.13·CN(II))
 * (Chow, Maidment & Mays 1988, Applied Hydrology, eqs. 5.5.4 and 5.5.5 —
 * equation numbers from memory). Both map 100 to 100 and keep 0 < CN ≤ 100.
 */
export type AntecedentCondition = 'I' | 'II' | 'III';

export function curveNumberForCondition(cnII: number, condition: AntecedentCondition): number {
  if (typeof cnII !== 'number' || !(cnII > 0 && cnII <= 100)) {
    throw new InputError('cn', `Curve number CN must be greater than 0 and at most 100 (got ${String(cnII)}).`);
  }
  if (condition === 'I') return (4.2 * cnII) / (10 - 0.058 * cnII);
  if (condition === 'III') return (23 * cnII) / (10 + 0.13 * cnII);
  if (condition === 'II') return cnII;
  throw new InputError(
    'condition',
    `Antecedent runoff condition must be "I", "II" or "III" (got ${JSON.stringify(condition)}).`,
  );
}
