import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { barStartsH, eventBandsPath } from '../../../src/ui/record/bands';
import { columnsPath, recordColumns } from '../../../src/ui/record/columns';
import { expectAllClose, expectClose } from '../../helpers/tolerance';

describe('a record reduced to pixel columns', () => {
  it('sums the rain and keeps the highest intensity of the bars in each column', () => {
    // Bars 1 h, 1 h, 2 h of 2, 0, 4 mm over 4 h in 2 columns of 2 h each:
    // column 0 holds bars 0 and 1: 2 + 0 = 2 mm, peak 2/1 = 2 mm/h;
    // column 1 holds bar 2: 4 mm, peak 4/2 = 2 mm/h.
    const c = recordColumns({ durationsH: [1, 1, 2], depthsMm: [2, 0, 4] }, 2);
    expect(c.spanH).toBe(4);
    expectAllClose(c.depthMm, [2, 4]);
    expectAllClose(c.peakMmH, [2, 2]);
    expect(c.maxPeakMmH).toBe(2);
  });

  it('shares a bar across a column edge by time, and lends each column its intensity', () => {
    // Bars 3 h of 6 mm (2 mm/h) and 1 h of 1 mm (1 mm/h), 2 columns of 2 h:
    // bar 0 puts 2 h × 2 mm/h = 4 mm in column 0 and 1 h × 2 = 2 mm in column 1;
    // bar 1 adds 1 mm to column 1: depths 4 and 3 mm; peaks 2 and max(2, 1) = 2 mm/h.
    const c = recordColumns({ durationsH: [3, 1], depthsMm: [6, 1] }, 2);
    expectAllClose(c.depthMm, [4, 3]);
    expectAllClose(c.peakMmH, [2, 2]);
  });

  it('keeps every drop of rain: column depths add up to the record', () => {
    const bar = fc.record({
      d: fc.double({ min: 0.01, max: 5, noNaN: true }),
      p: fc.double({ min: 0, max: 50, noNaN: true }),
    });
    fc.assert(
      fc.property(
        fc.array(bar, { minLength: 1, maxLength: 400, size: 'max' }),
        fc.integer({ min: 1, max: 900 }),
        (bars, n) => {
          const storm = { durationsH: bars.map((b) => b.d), depthsMm: bars.map((b) => b.p) };
          const c = recordColumns(storm, n);
          let total = 0;
          for (const b of bars) total += b.p;
          let sum = 0;
          for (const v of c.depthMm) sum += v;
          expectClose(sum, total, 1e-9, 1e-9);
        },
      ),
    );
  });

  it('draws one bar per wet column, however many bars share it', () => {
    // 1000 bars of 0.1 h, every tenth wet with 1 mm (10 mm/h), in 4 columns: all four wet, each 10 mm/h tall.
    const depthsMm = Array.from({ length: 1000 }, (_, k) => (k % 10 === 0 ? 1 : 0));
    const c = recordColumns({ durationsH: new Array(1000).fill(0.1), depthsMm }, 4);
    const d = columnsPath(c, 0, 400, 100, (v) => 100 - v * 5);
    expect(d.match(/M/g)).toHaveLength(4);
    // Column 2 starts at x = 2 × 100 px; its top at 100 − 10 × 5 = 50.
    expect(d).toContain('M200.0,100V50.0h100.00V100Z');
  });
});

describe('the bands over events', () => {
  it('merges events that meet on screen into one band', () => {
    // Bars of 1 h: starts 0, 1, …, 10; at 10 px per hour event 0 spans 0–10 px, event 4–5 40–60 px,
    // event 6 60–70 px (it touches the last: one band 40–70 px).
    const starts = barStartsH({ durationsH: new Array(10).fill(1), depthsMm: new Array(10).fill(1) });
    expect(starts[10]).toBe(10);
    const ev = (firstBar: number, lastBar: number) => ({ firstBar, lastBar, depthMm: 1, durationH: 1 });
    const d = eventBandsPath([ev(0, 0), ev(4, 5), ev(6, 6)], starts, (h) => h * 10, 0, 50);
    expect(d).toBe('M0.0,0H10.0V50H0.0ZM40.0,0H70.0V50H40.0Z');
  });
});
