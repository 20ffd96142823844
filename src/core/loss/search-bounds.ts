import { peakIntensityMmH, totalDepthMm, type Storm } from '../storm';

/** Above the peak intensity a loss rate takes every drop, so no search goes past it. */
export const peakRate = (storm: Storm): number => peakIntensityMmH(storm);

/** An initial loss larger than the storm's rain takes every drop. */
export const stormDepth = (storm: Storm): number => totalDepthMm(storm);
