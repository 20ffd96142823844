import { AREA_UNITS } from '../units';

/**
 * Days from the peak to the end of direct runoff, N = A^0.2 with A in mi²
 * (Linsley, Kohler & Paulhus, Hydrology for Engineers). The area comes in m²
 * and is converted here, since the formula is empirical in US units.
 */
export function recessionDays(areaM2: number): number {
  return Math.pow(areaM2 / AREA_UNITS.mi2, 0.2);
}
