// From rainfall excess to a direct runoff hydrograph (issue 13). Pure
// functions; no React, no DOM. Re-exported from src/core/index.ts.
export type {
  Transform,
  TransformKind,
  TransformOf,
  NrcsDimensionlessTransform,
  NashTransform,
  TriangularTransform,
  UnitHydrographTransform,
  Excess,
  RunoffHydrograph,
} from './types';
export {
  TRANSFORMS,
  TRANSFORM_KINDS,
  TRANSFORM_OBJECTIVES,
  NRCS_PEAK_RATE_FACTOR,
  isTransformKind,
  hasOrdinates,
  fittableTransformKeys,
  transformValue,
  withTransformValue,
  type TransformObjective,
  type TransformParam,
  type TransformSpec,
  type OrdinatesTransform,
} from './transforms';
export { TRANSFORM_WEIGHTS } from './weights';
export { validateTransform, validateExcess } from './validate';
export { runoffHydrograph, MAX_HYDROGRAPH_SAMPLES, type RunoffHydrographOptions } from './hydrograph';
export { unitResponse } from './response';
export { unitHydrographVolumeMm } from './uh-volume';
export { NRCS_DIMENSIONLESS_UH, peakRateFactorSi, dimensionlessArea, gammaShapeForPeakRateFactor } from './nrcs';
export { TRIANGULAR_BASE_OVER_TP } from './triangular';
export { nashIuh, nashSCurve } from './nash';
export { lagFromTimeOfConcentration, nrcsTimeToPeakH } from './lag';
export { logGamma, gammaP, gammaQ } from './gamma';
export { convolve, convolveDirect, convolveFft } from './convolve';
export { fft, fftPlan, nextPowerOfTwo, type FftPlan } from './fft';
export { compareHydrographs, nashSutcliffe, type HydrographComparison } from './compare';
export {
  fitTransform,
  peakTimeBetweenSamples,
  type ObservedDirectRunoff,
  type TransformFitOptions,
  type TransformFitResult,
  type TransformFitFailure,
} from './fit';
export { brentMinimize, type MinimizeOptions } from './brent-min';
