import { describe, expect, it } from 'vitest';
import {
  PLAUSIBLE,
  breachMessage,
  checkPlausible,
  recordDepthMm,
  stormBeyondRecords,
  type PlausibleQuantity,
} from '../../src/io/plausible';
import { MAX_RECORD_H, MIN_STEP_H } from '../../src/core';
import { expectClose } from '../helpers/tolerance';

describe('the plausible range of each quantity', () => {
  it('states both bounds and where each comes from, for every quantity', () => {
    for (const [q, range] of Object.entries(PLAUSIBLE)) {
      expect(range.min, q).toBeLessThan(range.max);
      expect(Number.isFinite(range.max), q).toBe(true);
      expect(range.why.min.length, q).toBeGreaterThan(10);
      expect(range.why.max.length, q).toBeGreaterThan(10);
      // Each bound names its kind of source: a physical limit, a record, a rule of thumb, or this table.
      expect(`${range.why.min} ${range.why.max}`, q).toMatch(
        /physical limit|from memory|no source|MAX_TOOL_BARS|table|needs/,
      );
    }
  });

  it('refuses a depth of 10³⁰⁰ mm and 99,999,999 mm, and anything not finite, and passes real ones', () => {
    expect(checkPlausible('depth', 1e300)).toEqual({ quantity: 'depth', side: 'above', limit: 30_000 });
    expect(checkPlausible('depth', 99_999_999)?.side).toBe('above');
    expect(checkPlausible('depth', Number.NaN)?.side).toBe('above');
    expect(checkPlausible('depth', -0.1)).toEqual({ quantity: 'depth', side: 'below', limit: 0 });
    // The wettest day on record, about 1,825 mm (Foc-Foc, Réunion, 1966; from memory), is a plausible depth.
    expect(checkPlausible('depth', 1825)).toBeNull();
    expect(checkPlausible('depth', 0)).toBeNull();
    expect(checkPlausible('barDuration', 0)).toEqual({ quantity: 'barDuration', side: 'below', limit: 1 / 3600 });
    expect(checkPlausible('offset', -24)).toBeNull();
  });

  it('is the first gate for typed times, the core’s limits of time the last: never wider, the shortest bar shared', () => {
    // One second (1/3600 h) is the core's shortest bar; the table reads it rather than restating it.
    expect(PLAUSIBLE.barDuration.min).toBe(MIN_STEP_H);
    expect(PLAUSIBLE.stormDuration.min).toBe(MIN_STEP_H);
    // A year of 366 days (8,784 h) per bar, storm or offset lies inside 500 years (4,383,000 h) either way.
    for (const q of ['barDuration', 'stormDuration', 'offset'] as const) {
      expect(PLAUSIBLE[q].max, q).toBeLessThanOrEqual(MAX_RECORD_H);
      expect(PLAUSIBLE[q].min, q).toBeGreaterThanOrEqual(-MAX_RECORD_H);
    }
  });

  it('says what and why in plain words', () => {
    const breach = checkPlausible('depth', 1e300);
    if (!breach) throw new Error('no breach');
    expect(breachMessage(breach, '“1e300” mm', '30,000 mm')).toMatch(
      /^“1e300” mm is more than a rainfall or runoff depth can be \(at most 30,000 mm\): no storm, bar or runoff can hold more than the wettest 12 months on record/,
    );
    const negative = checkPlausible('area', -1);
    if (!negative) throw new Error('no breach');
    expect(breachMessage(negative, '“-1” ha', '0 ha')).toBe('“-1” ha: a catchment area cannot be negative.');
    const quantities: PlausibleQuantity[] = ['barDuration', 'barCount'];
    for (const q of quantities) {
      const low = checkPlausible(q, -5);
      if (!low) throw new Error('no breach');
      expect(breachMessage(low, '“-5”', 'x')).toMatch(/is less than .* \(at least x\): /);
    }
  });
});

describe('the world-record envelope of rainfall depth (Jennings 1950, P = 422·D^0.475, from memory)', () => {
  it('gives the depths worked by hand', () => {
    // 1 h: 422 mm. 24 h: 24^0.475 = e^(0.475 × ln 24) = e^(0.475 × 3.178054) = e^1.509576 = 4.481689 × e^0.009576
    // = 4.481689 × 1.009622 = 4.524811 → 422 × 4.524811 = 1,909.47 mm.
    expect(recordDepthMm(1)).toBe(422);
    expectClose(recordDepthMm(24), 1909.47, 1e-5);
    // 1 min: (1/60)^0.475 = e^(−0.475 × 4.094345) = e^(−1.944814) = e^−2 × e^0.055186 = 0.135335 × 1.056737
    // = 0.143014 → 422 × 0.143014 = 60.352 mm (the record is about 38 mm).
    expectClose(recordDepthMm(1 / 60), 60.352, 1e-5);
  });

  it('flags bars beyond the envelope, counting them and naming the first', () => {
    // 10-min bars: (1/6)^0.475 = e^(−0.475 × 1.79176) = e^(−0.851086) = 0.426944 → 180.17 mm.
    const storm = { durationsH: [1 / 6, 1 / 6, 1 / 6], depthsMm: [12, 200, 500] };
    const flagged = stormBeyondRecords(storm);
    expect(flagged.count).toBe(2);
    expect(flagged.first?.bar).toBe(1);
    expectClose(flagged.first?.recordMm ?? 0, 180.17, 1e-4);
    expect(stormBeyondRecords({ durationsH: [1, 1], depthsMm: [30, 60] })).toEqual({ count: 0, first: null });
  });
});
