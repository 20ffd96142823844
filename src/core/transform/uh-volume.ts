import { InputError } from '../errors';
import { hasOrdinates } from './transforms';
import type { UnitHydrographTransform } from './types';
import { unitHydrographDepthMm } from './unit-hydrograph';
import { validateAreaM2, validateTransform } from './validate';

/**
 * The runoff depth a given unit hydrograph holds over the catchment, mm (its
 * ordinates linear between samples, trapezoidal rule, over the area). A true
 * unit hydrograph holds 1 mm; `runoffHydrograph` rescales it to exactly 1 mm,
 * and this says by how much the given ordinates were off (0.93: 7 % short).
 * Throws an InputError naming the field for bad input.
 */
export function unitHydrographVolumeMm(uh: UnitHydrographTransform, areaM2: number): number {
  validateTransform(uh);
  const kind: string = uh.kind;
  if (!hasOrdinates(uh)) {
    throw new InputError('kind', `Only a unit hydrograph of your own has a volume to check (got "${kind}").`);
  }
  validateAreaM2(areaM2);
  return unitHydrographDepthMm(uh, areaM2);
}
