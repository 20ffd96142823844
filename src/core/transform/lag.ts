/**
 * Lag from the time of concentration: lag = 0.6·Tc (USDA NRCS, National
 * Engineering Handbook Part 630, ch. 15, from memory; the relation the
 * dimensionless unit hydrograph of ch. 16 is used with). Hours in, hours out.
 */
export function lagFromTimeOfConcentration(tcH: number): number {
  return 0.6 * tcH;
}

/** Time to peak of the NRCS unit hydrographs, h: Tp = D/2 + lag, D the excess step (NEH-630 ch. 16). */
export function nrcsTimeToPeakH(lagH: number, stepH: number): number {
  return stepH / 2 + lagH;
}
