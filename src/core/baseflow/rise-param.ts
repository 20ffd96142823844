import type { BaseflowParam } from './types';

/**
 * The start-of-rise parameter, shared by the graphical separations that begin
 * their line at a sample of the record (constant discharge, straight line).
 * Each spec adds its own `key: 'riseIndex'`, so the key stays typed to its method.
 */
export const START_OF_RISE_PARAM: Omit<BaseflowParam, 'key'> = {
  label: 'Start of rise',
  unit: 'sample',
  min: 0,
  max: Infinity,
  integer: true,
  optional: { auto: 'the lowest discharge at or before the peak' },
  step: 1,
  help: 'Sample (0-based) where the direct runoff begins; leave empty to take the lowest point before the peak.',
};
