import { describe, expect, it } from 'vitest';
import { chartFrame } from '../../../src/ui/chart/frame';
import { sharedTimeSpanH } from '../../../src/ui/chart/time-span';
import { hydrographFrame } from '../../../src/ui/observed/hydrograph-frame';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

const storm = FOUR_BARS.storm; // 2 h of rain

describe('the time axis the hyetograph and the hydrograph share', () => {
  it('is the storm alone when there is no record', () => {
    expect(sharedTimeSpanH(2, null)).toBeUndefined();
    expect(chartFrame(storm, 800, 300, 'si').x.domain()).toEqual([0, 2]);
  });

  it('holds the storm and the whole record, the record starting before the rain', () => {
    expect(sharedTimeSpanH(2, { firstH: -1, lastH: 11 })).toEqual({ startH: -1, endH: 11 });
    expect(sharedTimeSpanH(2, { firstH: 0.5, lastH: 1.5 })).toEqual({ startH: 0, endH: 2 });
    // An empty storm leaves the record alone on the axis.
    expect(sharedTimeSpanH(0, { firstH: 3, lastH: 9 })).toEqual({ startH: 3, endH: 9 });
  });

  it('puts a moment at the same pixel on both charts', () => {
    const span = { startH: -1, endH: 11 };
    const hyeto = chartFrame(storm, 900, 360, 'si', span);
    const hydro = hydrographFrame(storm, 1.75, -1, 900, 280, 'si', span);
    for (const t of [-1, 0, 0.5, 2, 7.25, 11]) expect(hydro.x(t)).toBe(hyeto.x(t));
    expect(hydro.xTicks).toEqual(hyeto.xTicks);
    expect(hydro.plot.left).toBe(hyeto.plot.left);
    expect(hydro.plot.right).toBe(hyeto.plot.right);
  });

  it('reads clock ticks from the start of the span, not the storm start', () => {
    const clocked = { ...storm, startIso: '2026-07-14T15:00' };
    const f = chartFrame(clocked, 900, 360, 'si', { startH: -2, endH: 10 });
    expect(f.xTicks[0]?.label).toBe('13:00');
    expect(f.xTicks[0]?.px).toBe(f.x(-2));
    expect(f.xTitle).toBe('Clock time, storm from 14 Jul 2026 15:00');
  });

  it('scales discharge to a round top above the peak, in the screen’s units', () => {
    const si = hydrographFrame(storm, 1.75, 0, 900, 280, 'si', undefined);
    expect(si.yTitle).toBe('Discharge (m³/s)');
    expect(si.yTicks.map((t) => t.label)).toEqual(['0', '0.5', '1', '1.5', '2']);
    const us = hydrographFrame(storm, 1.75, 0, 900, 280, 'us', undefined);
    expect(us.yTitle).toBe('Discharge (ft³/s)');
    // 1.75 m³/s is 61.8 ft³/s: the top is a round number of ft³/s.
    expect(us.yTicks[us.yTicks.length - 1]?.label).toBe('70');
  });
});
