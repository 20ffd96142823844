import { nashWeights } from './nash';
import { nrcsWeights } from './nrcs';
import { triangularWeights } from './triangular';
import type { TransformKind, TransformOf } from './types';
import { unitHydrographWeights } from './unit-hydrograph';

/**
 * The unit response of each transform for an output step Δ: weights w_j ≥ 0
 * proportional to the discharge at the instant j·Δ after the start of 1 mm of
 * excess spread evenly over [0, Δ] (the Δ-hour unit hydrograph). Rescaled to
 * sum to 1 by the caller, which makes the volume exact. Apart from the
 * TRANSFORMS table (labels, parameters, bounds), so reading a scenario's
 * transform does not bring in the code that computes one.
 */
export const TRANSFORM_WEIGHTS: {
  readonly [K in TransformKind]: (transform: TransformOf<K>, stepH: number) => Float64Array;
} = {
  'nrcs-dimensionless': (t, stepH) => nrcsWeights(t.lagH, t.peakRateFactor, stepH),
  triangular: (t, stepH) => triangularWeights(t.lagH, stepH),
  nash: (t, stepH) => nashWeights(t.n, t.kH, stepH),
  'unit-hydrograph': unitHydrographWeights,
};
