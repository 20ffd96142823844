// The public surface of the hydrology core. Everything outside src/core imports
// from here. Pure TypeScript: no React, no DOM.
export { InputError, isInputError, attempt, type Attempt } from './errors';
export { validateStorm, totalDepthMm, totalDurationH, peakIntensityMmH, barEdgesH, type Storm } from './storm';
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
  DrySpellRecovery,
  RetentionConversion,
  CapacityFn,
  LossPart,
  MethodValue,
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
  paramApplies,
  withSpec,
  methodValue,
  methodNumber,
  withMethodValue,
} from './loss/methods';
export { infiltrationCapacity } from './loss/capacity';
export { DEFAULT_RECOVERY_PER_H, RECOVERY_CEILING_PER_H } from './loss/recovery';
export { computeLosses, computeLossesUnchecked, totalExcessMm, scratchBuffers, type LossBuffers } from './loss/compute';
export { calibrate, calibrateUnchecked, type CalibrationResult, type CalibrationFailure } from './calibrate/calibrate';
export { exactPhi } from './calibrate/phi';
export { brentRoot } from './calibrate/brent';
export { solveMonotone, PARAMETER_REL_TOL } from './calibrate/monotone';
// Infiltration loss methods (issue 3): Horton, Green–Ampt, curve number.
export type { HortonLoss, GreenAmptLoss, CurveNumberLoss } from './loss/types';
export { hortonCumulativeMm, hortonCapacityMmH, HORTON_F0_CEILING_MMH, HORTON_K_CEILING_PER_H } from './loss/horton';
export {
  greenAmptPondedDepthMm,
  greenAmptPondedIncrementMm,
  greenAmptPondingDepthMm,
  greenAmptRateMmH,
} from './loss/green-ampt';
export {
  curveNumberRetentionMm,
  curveNumberRunoffMm,
  retention005Mm,
  retention02Mm,
  RETENTION_RATIO_005,
  RETENTION_POWER_005,
  DEFAULT_RETENTION_CONVERSION,
} from './loss/curve-number';
export { curveNumberForCondition, type AntecedentCondition } from './loss/antecedent-condition';
export { curveNumberFromRunoff } from './calibrate/curve-number';
export {
  SOIL_TEXTURES,
  soilTexture,
  moistureDeficitFromSaturation,
  greenAmptForTexture,
  type SoilTexture,
  type SoilTextureName,
} from './soils';
export * from './units';
export * from './baseflow';
export * from './design';
export * from './events';
export * from './storm-tools';
// Runoff hydrograph: the transform of rainfall excess (issue 13).
export * from './transform';
// Long records split into events (issue 14).
export * from './record';
// How sure a loss fit is: the fit at the ends of the observed runoff's uncertainty, and the curve it sits on (issue 13).
export * from './uncertainty';
// Limits of time: how long a record may span, how short a bar may be, which years a start clock may name.
export * from './time-limits';
export {
  wallClockMs,
  wallClockParts,
  hoursBetweenClocks,
  namesZone,
  readIsoDateTime,
  instantMs,
  daysInMonth,
  daysFromCivil,
  isLeapYear,
  type IsoReading,
  type WallClockParts,
} from './wall-clock';
export { writeIsoDateTime, zoneSuffix, zoneText } from './iso-write';
// Cumulative rainfall, loss and excess at each bar end (issue 16).
export { massCurve, type MassCurve } from './mass-curve';
