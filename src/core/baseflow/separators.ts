import { separateConstant } from './constant';
import { separateEckhardt } from './eckhardt';
import { separateLyneHollick } from './lyne-hollick';
import { separateStraightLine } from './straight-line';
import type { BaseflowKind, SeparateFn } from './types';

/**
 * The separation of each baseflow method, apart from the BASEFLOW_METHODS
 * table (labels, parameters, bounds), so reading a scenario's method does not
 * bring in the code that separates. separateBaseflow reaches these through
 * the core's one dispatch (`byKind`).
 */
export const BASEFLOW_SEPARATORS: { readonly [K in BaseflowKind]: SeparateFn<K> } = {
  constant: separateConstant,
  'straight-line': separateStraightLine,
  'lyne-hollick': separateLyneHollick,
  eckhardt: separateEckhardt,
};
