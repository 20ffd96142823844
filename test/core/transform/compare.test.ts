// Goodness of fit of a computed against an observed hydrograph, on different grids.
import { describe, expect, it } from 'vitest';
import { compareHydrographs, nashSutcliffe } from '../../../src/core';
import { expectInputError } from '../../helpers/input-error';
import { expectClose } from '../../helpers/tolerance';

describe('compareHydrographs', () => {
  it('works a triangle against a later, lower triangle by hand', () => {
    // Computed: 0 → 10 m³/s at 1 h → 0 at 3 h, every 0.5 h. Volume ½·10·3 h·3600 = 54,000 m³.
    const computed = { timesH: [0, 0.5, 1, 1.5, 2, 2.5, 3], dischargeM3s: [0, 5, 10, 7.5, 5, 2.5, 0] };
    // Observed: 0 → 8 m³/s at 1.5 h → 0 at 4 h, sampled on its own grid at 0, 1, 1.5,
    // 2, 3, 4 h: 0, 16/3, 8, 6.4, 3.2, 0.
    const observed = { timesH: [0, 1, 1.5, 2, 3, 4], dischargeM3s: [0, 16 / 3, 8, 6.4, 3.2, 0] };
    const r = compareHydrographs(computed, observed);
    // Peak error (10 − 8)/8 = +25 %; timing 1 − 1.5 = −0.5 h (computed early).
    expectClose(r.peakErrorPct as number, 25, 1e-13);
    expectClose(r.timingErrorH, -0.5, 1e-15);
    // Observed volume: ½·8·4 h·3600 = 57,600 m³ (the samples trace the triangle
    // exactly); computed 54,000: (54,000 − 57,600)/57,600 = −6.25 %.
    expectClose(r.computedVolumeM3, 54_000, 1e-13);
    expectClose(r.observedVolumeM3, 57_600, 1e-13);
    expectClose(r.volumeErrorPct as number, -6.25, 1e-12);
    // Efficiency at the observed times: computed there 0, 10, 7.5, 5, 0, 0 (zero past
    // its last sample at 3 h); errors 0, −14/3, 0.5, 1.4, 3.2, 0, so Σe² = 21.7778 +
    // 0.25 + 1.96 + 10.24 = 34.2278; observed mean 22.9333/6 = 3.82222, Σ(o − ō)² =
    // Σo² − 6ō² = 143.6444 − 87.6563 = 55.9881: NSE = 1 − 34.2278/55.9881 = 0.38866.
    const o = observed.dischargeM3s;
    const mean = o.reduce((a, b) => a + b, 0) / o.length;
    const spread = o.reduce((a, b) => a + (b - mean) ** 2, 0);
    const residual = (16 / 3 - 10) ** 2 + 0.5 ** 2 + 1.4 ** 2 + 3.2 ** 2;
    expectClose(r.nse as number, 1 - residual / spread, 1e-13);
    expectClose(r.nse as number, 0.38866, 1e-4);
  });

  it('gives a perfect match efficiency 1 and no errors', () => {
    const h = { timesH: [0, 1, 2, 3], dischargeM3s: [0, 4, 2, 0] };
    const r = compareHydrographs(h, h);
    expect(r).toMatchObject({ peakErrorPct: 0, timingErrorH: 0, volumeErrorPct: 0, nse: 1 });
  });

  it('says null, not NaN, where an observed value gives nothing to divide by', () => {
    const flat = { timesH: [0, 1, 2], dischargeM3s: [0, 0, 0] };
    const r = compareHydrographs({ timesH: [0, 1], dischargeM3s: [0, 1] }, flat);
    expect(r.peakErrorPct).toBeNull();
    expect(r.volumeErrorPct).toBeNull();
    expect(r.nse).toBeNull();
    expect(
      nashSutcliffe({ timesH: [0, 1], dischargeM3s: [1, 1] }, { timesH: [0, 1], dischargeM3s: [2, 2] }),
    ).toBeNull();
  });

  it('names the series and the sample of bad input', () => {
    const ok = { timesH: [0, 1], dischargeM3s: [0, 1] };
    expectInputError(
      () => compareHydrographs(ok, { timesH: [0, 1, 1], dischargeM3s: [0, 1, 2] }),
      'observed.timesH',
      /observed hydrograph, sample 3/,
    );
    expectInputError(
      () => compareHydrographs({ timesH: [0, 1], dischargeM3s: [0, -1] }, ok),
      'computed.dischargeM3s',
      /computed hydrograph, sample 2/,
    );
    expectInputError(
      () => compareHydrographs({ timesH: [0], dischargeM3s: [0] }, ok),
      'computed.timesH',
      /two samples/,
    );
  });
});
