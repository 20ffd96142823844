import type { Scenario, SetEvent } from '../../src/scenario/types';
import { FOUR_BARS } from './scenario-fixtures';

/**
 * Four invented events on the FOUR_BARS storm (bars of 30 min, 2/6/10/2 mm,
 * intensities 4, 12, 20, 4 mm/h). Exact φ by hand (bars above φ: R = D − φT):
 * 4 mm → only the 20 mm/h bar runs off, φ = (10 − 4)/0.5 = 12 mm/h;
 * 8 mm → the 20 and 12 mm/h bars, φ = (16 − 8)/1 = 8 mm/h;
 * 2 mm → φ = (10 − 2)/0.5 = 16 mm/h;
 * 25 mm is more than the 20 mm of rain: no answer.
 */
export const HAND_FITS = { mean: 12, median: 12, min: 8, max: 16 } as const;

const event = (id: string, name: string, mm: number): SetEvent => ({
  id,
  name,
  storm: FOUR_BARS.storm,
  observed: { as: 'depth', value: mm },
  streamflow: null,
});

export const FOUR_EVENTS: Scenario = {
  ...FOUR_BARS,
  eventSet: {
    events: [
      event('e1', 'Small (invented)', 4),
      event('e2', 'Middle (invented)', 8),
      event('e3', 'Dry (invented)', 2),
      event('e4', 'Too wet (invented)', 25),
    ],
    activeId: null,
    parameter: null,
    designPick: 'median',
  },
};
