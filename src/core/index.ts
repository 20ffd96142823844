// The public surface of the hydrology core. Everything outside src/core imports
// from here. Pure TypeScript: no React, no DOM.
export { InputError, isInputError } from './errors';
export {
  validateStorm,
  totalDepthMm,
  totalDurationH,
  peakIntensityMmH,
  barEdgesH,
  type Storm,
} from './storm';
export type {
  LossMethod,
  LossKind,
  MethodOf,
  LossResult,
  MethodSpec,
  NumericParam,
  ChoiceParam,
  ParamUnit,
  ConstantLoss,
  InitialContinuingLoss,
  ProportionalLoss,
} from './loss/types';
export {
  METHODS,
  METHOD_KINDS,
  isLossKind,
  methodSpec,
  numericParam,
  defaultMethod,
  describeRange,
  validateMethod,
} from './loss/methods';
export { computeLosses, computeLossesUnchecked, totalExcessMm, type LossBuffers } from './loss/compute';
export { calibrate, type CalibrationResult, type CalibrationFailure } from './calibrate/calibrate';
export { exactPhi } from './calibrate/phi';
export { brentRoot } from './calibrate/brent';
export { solveMonotone, PARAMETER_REL_TOL } from './calibrate/monotone';
export * from './units';
export * from './baseflow';
export * from './design';
export * from './events';
