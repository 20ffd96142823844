import type { Scenario } from '../../src/scenario/types';
import { FOUR_BARS } from './scenario-fixtures';

/**
 * An invented event record (not from any gauge): hourly samples for 12 h, a
 * baseflow of 0.5 m³/s, a straight rise from 1 h to a 1.75 m³/s peak at 3 h
 * and a straight fall back to 0.5 m³/s at 7 h. Over constant baseflow the
 * direct runoff is the triangle: ½ × 6 h × 3600 s/h × 1.25 m³/s = 13,500 m³,
 * 13.5 mm over FOUR_BARS' 1 km².
 */
export const TRIANGLE = {
  timesH: [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12],
  dischargeM3s: [0.5, 0.5, 1.125, 1.75, 1.4375, 1.125, 0.8125, 0.5, 0.5, 0.5, 0.5, 0.5, 0.5],
} as const;

export const TRIANGLE_DIRECT_M3 = 0.5 * 6 * 3600 * 1.25;

/** The same record as a gauge export might give it, pasted as text: elapsed hours and m³/s. */
export const TRIANGLE_TEXT = [
  'Hours\tQ (m3/s)',
  ...TRIANGLE.timesH.map((t, k) => `${t}\t${TRIANGLE.dischargeM3s[k]}`),
].join('\n');

/** FOUR_BARS with the triangle record under a straight-line separation ending at 7 h. */
export const WITH_TRIANGLE: Scenario = {
  ...FOUR_BARS,
  streamflow: {
    timesH: [...TRIANGLE.timesH],
    dischargeM3s: [...TRIANGLE.dischargeM3s],
    offsetH: 0,
    baseflow: { kind: 'straight-line', endTimeH: 7 },
    baseflowMemory: {},
    useAsObserved: false,
  },
};
