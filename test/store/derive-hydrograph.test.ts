// The runoff hydrograph derived in the store (issue 13): recomputed on a loss
// drag where it must be, and kept where it need not be.
import { beforeAll, describe, expect, it } from 'vitest';
import type { Scenario } from '../../src/scenario/types';
import { createDerived, loadHydrographSide } from '../../src/store';
import { withTransformKind } from '../../src/store/hydrograph-edits';
import { FOUR_BARS } from '../helpers/scenario-fixtures';

const BASE: Scenario = {
  ...FOUR_BARS,
  observed: { as: 'depth', value: 10, parameter: 'rateMmH', locked: false },
  hydrograph: { ...FOUR_BARS.hydrograph, transform: { kind: 'triangular', lagH: 1 } },
  observedUncertaintyPct: 10,
};
const moved = (s: Scenario, rateMmH: number): Scenario => ({ ...s, method: { kind: 'constant', rateMmH } });

describe('the derived runoff hydrograph', () => {
  // The hydrograph side of the derived values loads on first use (src/store/derive.ts), as on the page.
  beforeAll(() => loadHydrographSide());
  it('follows the loss: a new rate routes a new excess, the same scenario gives the same object', () => {
    const d = createDerived();
    const a = d.hydrograph(BASE);
    expect(a?.ok).toBe(true);
    expect(d.hydrograph(BASE)).toBe(a);
    const b = d.hydrograph(moved(BASE, 4));
    expect(b).not.toBe(a);
    // FOUR_BARS (2, 6, 10, 2 mm in half hours) on 1 km². At φ = 8 each bar loses up to 4 mm:
    // excess 0 + 2 + 6 + 0 = 8 mm; at φ = 4 up to 2 mm: 0 + 4 + 8 + 0 = 12 mm.
    expect(a?.ok && a.hydrograph.volumeM3).toBeCloseTo(8000, 6);
    expect(b?.ok && b.hydrograph.volumeM3).toBeCloseTo(12000, 6);
  });

  it('keeps the axis end, the loss interval and the runoff curve while only the fitted loss rate moves', () => {
    const d = createDerived();
    const end = d.hydrographEndH(BASE);
    const interval = d.lossInterval(BASE);
    const curve = d.lossCurve(BASE);
    const next = moved(BASE, 5);
    expect(d.hydrographEndH(next)).toBe(end);
    expect(d.lossInterval(next)).toBe(interval);
    expect(d.lossCurve(next)).toBe(curve);
    // φ = 16 − R for 4 < φ < 12 (the 6 and 10 mm bars, 1 h together): 7 and 5 mm/h at 9 and 11 mm.
    expect(interval?.ok && interval.value.range).toEqual({ min: 5, max: 7 });
  });

  it('computes no hydrograph with no transform, and says so without a catchment area', () => {
    const d = createDerived();
    expect(d.hydrograph(withTransformKind(BASE, null))).toBeNull();
    const noArea = { ...BASE, catchment: { ...BASE.catchment, areaM2: 0 } };
    expect(d.hydrograph(noArea)).toEqual({
      ok: false,
      field: 'areaM2',
      message: 'Enter the catchment area to turn the rainfall excess into discharge.',
    });
  });
});

describe('the hydrograph side before its code arrives', () => {
  it('gives null, and tells the store once it can be worked out', async () => {
    // In this file the code is loaded by the block above; whenHydrographReady then answers at once.
    const d = createDerived();
    let told = 0;
    d.whenHydrographReady(() => told++);
    await loadHydrographSide();
    expect(told).toBe(1);
    expect(d.hydrograph({ ...FOUR_BARS, hydrograph: { ...FOUR_BARS.hydrograph, transform: null } })).toBeNull();
  });
});

describe('the computed total flow', () => {
  beforeAll(() => loadHydrographSide());
  it('is the separated baseflow plus the computed direct runoff at each sample of the record, worked by hand', () => {
    // One 1-hour bar of 12 mm under φ = 2 mm/h: 10 mm of excess on 1 km². Triangular, lag 2.5 h: Tp = 3 h,
    // base 8 h; hourly samples 0, 1/3, 2/3, 1, 0.8, 0.6, 0.4, 0.2, 0 of the peak, which sum to 4, so the peak
    // is ¼ × (1e6 m² × 0.010 m) / 3600 s = 0.69444 m³/s (as in design-peak.test.tsx).
    // The record: hourly from the storm start, 1 m³/s but for a bump at hours 2–4; constant separation from
    // the start of rise keeps 1 m³/s under it, and is the flow itself elsewhere.
    const scenario: Scenario = {
      ...FOUR_BARS,
      storm: { durationsH: [1], depthsMm: [12] },
      method: { kind: 'constant', rateMmH: 2 },
      hydrograph: { ...FOUR_BARS.hydrograph, transform: { kind: 'triangular', lagH: 2.5 } },
      streamflow: {
        timesH: [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10],
        dischargeM3s: [1, 1, 2, 3, 2, 1, 1, 1, 1, 1, 1],
        offsetH: 0,
        baseflow: { kind: 'constant' },
        baseflowMemory: {},
        useAsObserved: false,
      },
    };
    const total = createDerived().totalFlow(scenario);
    expect(total).not.toBeNull();
    const peak = 1e4 / 3600 / 4;
    const shares = [0, 1 / 3, 2 / 3, 1, 0.8, 0.6, 0.4, 0.2, 0, 0, 0];
    const expected = shares.map((share) => 1 + share * peak);
    Array.from(total?.dischargeM3s ?? []).forEach((q, i) => expect(q).toBeCloseTo(expected[i] as number, 9));
    expect(Array.from(total?.timesH ?? [])).toEqual(scenario.streamflow?.timesH);
  });
});
