// Baseflow separation of an observed streamflow record. Pure functions; no
// React, no DOM. Re-exported from src/core/index.ts.
export type {
  Hydrograph,
  BaseflowMethod,
  BaseflowKind,
  BaseflowMethodOf,
  BaseflowOptions,
  BaseflowResult,
  BaseflowMethodSpec,
  BaseflowParam,
  BaseflowParamUnit,
  BaseflowEndPoint,
  ConstantBaseflow,
  StraightLineBaseflow,
  LyneHollickBaseflow,
  EckhardtBaseflow,
} from './types';
export {
  BASEFLOW_METHODS,
  BASEFLOW_KINDS,
  isBaseflowKind,
  baseflowMethodSpec,
  defaultBaseflowMethod,
  describeBaseflowRange,
  validateBaseflowMethod,
  baseflowNumber,
  withoutBaseflowParam,
  withBaseflowValue,
  withBaseflowSpec,
  baseflowEndPoint,
  FIRST_BASEFLOW_KIND,
  type EndPointFacts,
} from './methods';
export { separateBaseflow } from './separate';
export { validateHydrograph, dischargeAtH } from './hydrograph';
export { findPeakIndex, findStartOfRise } from './peak';
export { recessionDays } from './recession-days';
