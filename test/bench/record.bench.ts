// Splitting long records into events (issue 14): the public splitEvents (with
// validation) on records of 10⁴ to 10⁶ five-minute bars. Target (issue 14,
// median on the 2-core reference machine): 10⁶ bars < 50 ms.
import { afterAll, test } from 'vitest';
import { splitEvents } from '../../src/core';
import { measure, printTable, seededRandom } from './measure';

/**
 * A gauge-like record of 5-minute bars (invented): dry spells of 0–48 h
 * between wet spells of 10 min to 12 h, within which 20 % of bars are dry.
 */
function gaugeRecord(n: number, seed: number): { durationsH: number[]; depthsMm: number[] } {
  const rand = seededRandom(seed);
  const durationsH: number[] = [];
  const depthsMm: number[] = [];
  while (depthsMm.length < n) {
    const dry = Math.floor(rand() * 576);
    for (let k = 0; k < dry && depthsMm.length < n; k++) {
      durationsH.push(1 / 12);
      depthsMm.push(0);
    }
    const wet = 2 + Math.floor(rand() * 142);
    for (let k = 0; k < wet && depthsMm.length < n; k++) {
      durationsH.push(1 / 12);
      depthsMm.push(rand() < 0.2 ? 0 : 0.2 * Math.ceil(rand() * 20));
    }
  }
  return { durationsH, depthsMm };
}

test('event splitting', () => {
  for (const n of [1e4, 1e5, 1e6]) {
    const record = gaugeRecord(n, 3);
    const events = splitEvents(record, { minDryH: 6 }).length;
    measure('splitEvents', `min dry 6 h (${events} events)`, () => splitEvents(record, { minDryH: 6 }), {
      bars: n,
      ...(n === 1e6 ? { targetMs: 50 } : {}),
    });
    measure(
      'splitEvents',
      'min dry 1 h, min depth 2.5 mm',
      () => splitEvents(record, { minDryH: 1, minDepthMm: 2.5 }),
      {
        bars: n,
      },
    );
  }
});

afterAll(() => printTable('Raincut record benchmark (medians of repeated runs)'));
