// From rainfall excess to a direct runoff hydrograph (issue 13). Pure
// functions; no React, no DOM. Re-exported from src/core/index.ts.
export { logGamma, gammaP, gammaQ } from './gamma';
export { convolve, convolveDirect, convolveFft } from './convolve';
export { fft, fftPlan, nextPowerOfTwo, type FftPlan } from './fft';
