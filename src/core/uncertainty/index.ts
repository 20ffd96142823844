// How sure a loss fit is (issue 13, "How sure is the fit"). Pure functions.
export { calibrationInterval, type CalibrationInterval, type CalibrationEnd } from './interval';
export { runoffCurve, parameterSearchRange, type RunoffCurve, type RunoffCurveOptions } from './curve';
