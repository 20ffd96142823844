// Design storms: IDF relations, the alternating block method, uniform storms
// and scaling a storm to a chosen depth. Re-exported from src/core/index.ts.
export {
  validateIdf,
  idfIntensityMmH,
  idfDepthMm,
  idfRangeH,
  idfCovers,
  idfIntensityEvaluator,
  IDF_KINDS,
  type Idf,
  type IdfKind,
  type IdfDurationUnit,
  type IdfShiftedPower,
  type IdfPowerSum,
  type IdfTable,
} from './idf';
export { alternatingPositions } from './alternation';
export { alternatingBlockStorm, type AlternatingBlockOptions } from './alternating-block';
export { uniformStorm, type UniformStormOptions } from './uniform';
export { scaleStormToDepth } from './scale';
export { stepCount, MAX_DESIGN_BARS } from './steps';
