// Splitting a long rainfall record into events at dry spells (minimum inter-event time).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { splitEvents, totalDepthMm, type RecordEvent } from '../../../src/core';
import { expectInputError } from '../../helpers/input-error';
import { expectClose } from '../../helpers/tolerance';

const hourly = (depths: number[]) => ({ durationsH: depths.map(() => 1), depthsMm: depths });

describe('splitEvents', () => {
  it('joins rain across a short dry spell and splits at a long one', () => {
    // Dry 1 h, rain, dry 2 h (< 3 h: same event), rain, dry 4 h (≥ 3 h: split), rain, dry.
    const record = hourly([0, 2, 0, 0, 3, 0, 0, 0, 0, 1, 0]);
    expect(splitEvents(record, { minDryH: 3 })).toEqual([
      { firstBar: 1, lastBar: 4, depthMm: 5, durationH: 4 },
      { firstBar: 9, lastBar: 9, depthMm: 1, durationH: 1 },
    ]);
  });

  it('counts a dry spell of exactly the minimum as separating, on bars of unequal length', () => {
    // Dry bars of 0.5 h and 2.5 h between the wet ones: 3 h, the minimum.
    const record = { durationsH: [0.25, 0.5, 2.5, 0.25], depthsMm: [4, 0, 0, 1] };
    expect(splitEvents(record, { minDryH: 3 })).toHaveLength(2);
    const joined = splitEvents(record, { minDryH: 3.01 });
    expect(joined).toEqual([{ firstBar: 0, lastBar: 3, depthMm: 5, durationH: 3.5 }]);
  });

  it('drops events below the minimum depth', () => {
    const record = hourly([0, 2, 0, 0, 3, 0, 0, 0, 0, 1, 0]);
    expect(splitEvents(record, { minDryH: 3, minDepthMm: 2 })).toEqual([
      { firstBar: 1, lastBar: 4, depthMm: 5, durationH: 4 },
    ]);
    // Exactly the minimum is kept.
    expect(splitEvents(record, { minDryH: 3, minDepthMm: 1 })).toHaveLength(2);
  });

  it('with no minimum dry spell splits at every dry bar, never between wet bars', () => {
    expect(splitEvents(hourly([1, 2, 0, 3, 3]), { minDryH: 0 }).map((e) => [e.firstBar, e.lastBar])).toEqual([
      [0, 1],
      [3, 4],
    ]);
  });

  it('finds nothing in a dry or empty record', () => {
    expect(splitEvents(hourly([0, 0, 0]), { minDryH: 6 })).toEqual([]);
    expect(splitEvents({ durationsH: [], depthsMm: [] }, { minDryH: 6 })).toEqual([]);
  });

  it('names the field of bad input', () => {
    const record = hourly([1, 0, 2]);
    expectInputError(() => splitEvents(record, { minDryH: -1 }), 'minDryH', /dry spell/);
    expectInputError(() => splitEvents(record, { minDryH: NaN }), 'minDryH', /dry spell/);
    expectInputError(() => splitEvents(record, { minDryH: 6, minDepthMm: -0.1 }), 'minDepthMm', /depth/);
    expectInputError(() => splitEvents(record, undefined as never), 'minDryH', /not given/);
    expectInputError(
      () => splitEvents({ durationsH: [1, 0], depthsMm: [1, 1] }, { minDryH: 6 }),
      'durationsH',
      /Bar 2/,
    );
  });
});

/** Records of 1–200 bars, 5 min to 3 h long, most of them dry, in runs. */
const recordArb = fc
  .array(
    fc.record({
      durationH: fc.oneof(fc.constantFrom(1 / 12, 0.25, 1), fc.double({ min: 1 / 12, max: 3, noNaN: true })),
      depthMm: fc.oneof(
        { weight: 3, arbitrary: fc.constant(0) },
        { weight: 2, arbitrary: fc.double({ min: 1e-3, max: 40, noNaN: true }) },
      ),
      run: fc.integer({ min: 1, max: 6 }),
    }),
    { minLength: 1, maxLength: 60 },
  )
  .map((runs) => {
    const durationsH: number[] = [];
    const depthsMm: number[] = [];
    for (const r of runs) {
      for (let i = 0; i < r.run && durationsH.length < 200; i++) {
        durationsH.push(r.durationH);
        depthsMm.push(r.depthMm);
      }
    }
    return { durationsH, depthsMm };
  });

const minDryArb = fc.oneof(fc.constantFrom(0, 1, 6), fc.double({ min: 0, max: 12, noNaN: true }));

describe('splitEvents properties (fast-check)', () => {
  it('partitions the rain: every wet bar in exactly one event, events bounded by wet bars and long dry spells', () => {
    fc.assert(
      fc.property(recordArb, minDryArb, (record, minDryH) => {
        const events = splitEvents(record, { minDryH });
        const owner = new Array<number>(record.depthsMm.length).fill(-1);
        events.forEach((e, i) => {
          expect(record.depthsMm[e.firstBar]).toBeGreaterThan(0);
          expect(record.depthsMm[e.lastBar]).toBeGreaterThan(0);
          for (let k = e.firstBar; k <= e.lastBar; k++) {
            expect(owner[k]).toBe(-1);
            owner[k] = i;
          }
          // Inside an event, every dry spell is shorter than the minimum…
          let dry = 0;
          for (let k = e.firstBar; k <= e.lastBar; k++) {
            if ((record.depthsMm[k] as number) > 0) {
              if (dry > 0) expect(dry).toBeLessThan(minDryH);
              dry = 0;
            } else dry += record.durationsH[k] as number;
          }
          // …and between events the spell reaches it.
          const next = events[i + 1];
          if (next) {
            let gap = 0;
            for (let k = e.lastBar + 1; k < next.firstBar; k++) gap += record.durationsH[k] as number;
            expect(gap).toBeGreaterThan(0);
            expect(gap).toBeGreaterThanOrEqual(minDryH * (1 - 1e-9));
          }
        });
        record.depthsMm.forEach((p, k) => {
          if (p > 0) expect(owner[k], `bar ${k}`).toBeGreaterThanOrEqual(0);
        });
        const sum = events.reduce((a, e) => a + e.depthMm, 0);
        expectClose(sum, totalDepthMm(record), 1e-12, 1e-12);
      }),
      { numRuns: 300 },
    );
  });

  it('drops exactly the events below the minimum depth, and the depths add up to the total above them', () => {
    fc.assert(
      fc.property(recordArb, minDryArb, fc.double({ min: 0, max: 60, noNaN: true }), (record, minDryH, minDepthMm) => {
        const all = splitEvents(record, { minDryH });
        const kept = splitEvents(record, { minDryH, minDepthMm });
        expect(kept).toEqual(all.filter((e) => e.depthMm >= minDepthMm));
        const dropped = all.filter((e) => e.depthMm < minDepthMm).reduce((a, e) => a + e.depthMm, 0);
        const sum = kept.reduce((a, e) => a + e.depthMm, 0);
        expectClose(sum + dropped, totalDepthMm(record), 1e-12, 1e-12);
      }),
      { numRuns: 300 },
    );
  });

  it('is unchanged by cutting a bar in two at the same intensity (indices mapped to the parts)', () => {
    // "Unchanged": the same number of events, each with the same depth and duration
    // (to 1e-12), its first bar the first part of the old first bar and its last bar
    // the second part of the old last bar. Cutting bar j shifts every later index by one.
    fc.assert(
      fc.property(
        recordArb,
        minDryArb,
        fc.nat(),
        fc.double({ min: 0.01, max: 0.99, noNaN: true }),
        (record, minDryH, pick, f) => {
          const j = pick % record.durationsH.length;
          const d = record.durationsH[j] as number;
          const p = record.depthsMm[j] as number;
          const cut = {
            durationsH: [...record.durationsH.slice(0, j), d * f, d * (1 - f), ...record.durationsH.slice(j + 1)],
            depthsMm: [...record.depthsMm.slice(0, j), p * f, p * (1 - f), ...record.depthsMm.slice(j + 1)],
          };
          const firstPart = (k: number): number => (k <= j ? k : k + 1);
          const lastPart = (k: number): number => (k < j ? k : k + 1);
          const before = splitEvents(record, { minDryH });
          const after = splitEvents(cut, { minDryH });
          expect(after.length).toBe(before.length);
          before.forEach((e: RecordEvent, i) => {
            const a = after[i] as RecordEvent;
            expect(a.firstBar).toBe(firstPart(e.firstBar));
            expect(a.lastBar).toBe(lastPart(e.lastBar));
            expectClose(a.depthMm, e.depthMm, 1e-12, 1e-12);
            expectClose(a.durationH, e.durationH, 1e-12, 1e-12);
          });
        },
      ),
      { numRuns: 300 },
    );
  });
});
