import type { Scenario } from '../../../src/scenario/types';

/** A small test scenario: four bars of 30 min, 2/6/10/2 mm (intensities 4, 12, 20, 4 mm/h), 1 km². */
export const FOUR_BARS: Scenario = {
  version: 1,
  name: 'Four bars',
  notes: '',
  storm: { durationsH: [0.5, 0.5, 0.5, 0.5], depthsMm: [2, 6, 10, 2] },
  catchment: { name: 'Test catchment', areaM2: 1e6 },
  units: 'si',
  method: { kind: 'constant', rateMmH: 8 },
  methodMemory: {},
  observed: null,
};

/** A memory-backed Storage double that can be told to fail. */
export function memoryStorage(initial: Record<string, string> = {}) {
  const data = new Map(Object.entries(initial));
  let failWith: Error | null = null;
  return {
    data,
    failNextWrites(error: Error | null) {
      failWith = error;
    },
    getItem: (key: string) => data.get(key) ?? null,
    setItem: (key: string, value: string) => {
      if (failWith) throw failWith;
      data.set(key, value);
    },
    removeItem: (key: string) => {
      data.delete(key);
    },
  };
}
