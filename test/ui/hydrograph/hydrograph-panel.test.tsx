// @vitest-environment jsdom
// The runoff hydrograph panel (issue 13): the picker beside the loss method,
// its fields through the one number reader, the results worked by hand, and
// the fit to a record.
import { fireEvent, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { TRANSFORMS, TRANSFORM_KINDS } from '../../../src/core';
import type { Scenario } from '../../../src/scenario/types';
import { LAZY_LOAD_MS, lazyPartsLoaded, renderWorkbench } from '../../helpers/render';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

/**
 * One bar of 1 h and 12 mm under φ = 2 mm/h: 10 mm of excess over 1 km²
 * (10,000 m³), routed through the NRCS triangular unit hydrograph with lag
 * 2.5 h. Worked by hand: the output step Δ is the bar, 1 h; Tp = Δ/2 + lag =
 * 0.5 + 2.5 = 3 h; the base is 8/3·Tp = 8 h. Sampled at whole hours the
 * triangle is 0, 1/3, 2/3, 1, 0.8, 0.6, 0.4, 0.2, 0 of its peak, which sum to
 * 4 = Tb/(2Δ), so the samples hold the volume exactly and the peak weight is
 * 1/4. Peak q = ¼ × 1e6 m² × 0.010 m / 3600 s = 2500/3600 = 0.69444 m³/s, at
 * 3 h; the same as the textbook qp = 0.2083·A·Q/Tp = 0.2083 × 1 km² × 10 mm /
 * 3 h = 0.6944 m³/s (NEH-630 ch. 16, SI form, from memory).
 */
const ONE_BAR: Scenario = {
  ...FOUR_BARS,
  storm: { durationsH: [1], depthsMm: [12] },
  method: { kind: 'constant', rateMmH: 2 },
  hydrograph: {
    transform: { kind: 'triangular', lagH: 2.5 },
    transformMemory: {},
    fitParameter: null,
    objective: 'nse',
  },
};

/**
 * An invented record (no gauge) of the same event: hourly, no baseflow, a
 * straight rise to 1 m³/s at 4 h and a straight fall to 0 at 9 h. Separated
 * by a constant baseflow from its first sample (0 m³/s), its direct runoff is
 * the record itself: 4.5 m³/s·h = 16,200 m³ by the trapezoidal rule.
 */
const RECORD = {
  timesH: [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10],
  dischargeM3s: [0, 0.25, 0.5, 0.75, 1, 0.8, 0.6, 0.4, 0.2, 0, 0],
};

const WITH_RECORD: Scenario = {
  ...ONE_BAR,
  streamflow: {
    ...RECORD,
    offsetH: 0,
    baseflow: { kind: 'constant', riseIndex: 0 },
    baseflowMemory: {},
    useAsObserved: false,
  },
};

const result = (id: string): string => document.querySelector(`[data-result="${id}"]`)?.textContent ?? '';

/** The workbench with its parts loaded on first use (the hydrograph panel and plot among them). */
async function open(scenario?: Scenario) {
  const view = renderWorkbench(scenario);
  await lazyPartsLoaded();
  return view;
}

describe('the runoff hydrograph panel', () => {
  it('sits beside the loss method and offers none and every transform of the core', async () => {
    await open();
    const panel = screen.getByRole('region', { name: 'Runoff hydrograph' });
    const picker = within(panel).getByRole('combobox', { name: 'Unit hydrograph' });
    expect(picker).toHaveValue('none');
    expect(
      within(picker)
        .getAllByRole('option')
        .map((o) => o.textContent),
    ).toEqual(['None (no hydrograph)', ...TRANSFORM_KINDS.map((k) => TRANSFORMS[k].label)]);
    // None: no results, and the hydrograph region still asks for a record.
    expect(document.querySelector('[data-result="peak-discharge"]')).toBeNull();
  });

  it('picking a unit hydrograph stores it with its defaults, and None takes it away again (one undo step each)', async () => {
    const { user, scenario, actions } = await open();
    await user.selectOptions(screen.getByRole('combobox', { name: 'Unit hydrograph' }), 'nash');
    expect(scenario().hydrograph.transform).toEqual({ kind: 'nash', n: 3, kH: 0.5 });
    expect(screen.getByRole('textbox', { name: 'Number of reservoirs n' })).toHaveValue('3');
    expect(screen.getByRole('textbox', { name: 'Storage constant k (h)' })).toHaveValue('0.5');
    await user.selectOptions(screen.getByRole('combobox', { name: 'Unit hydrograph' }), 'none');
    expect(scenario().hydrograph.transform).toBeNull();
    actions.undo();
    expect(scenario().hydrograph.transform).toEqual({ kind: 'nash', n: 3, kH: 0.5 });
  });

  it('shows the peak and time to peak worked by hand for a triangular unit hydrograph on one bar of excess', async () => {
    await open(ONE_BAR);
    expect(result('peak-discharge')).toBe('0.6944 m³/s');
    expect(result('time-to-peak')).toBe('3:00 after the storm start');
    // No record: no errors to show.
    expect(document.querySelector('[data-result="peak-error"]')).toBeNull();
  });

  it('with no excess there is no peak to time: it says so instead of a peak at the storm start', async () => {
    // φ = 20 mm/h takes all 12 mm of the 1-h bar (20 × 1 = 20 ≥ 12): no excess, no direct runoff.
    await open({ ...ONE_BAR, method: { kind: 'constant', rateMmH: 20 } });
    expect(result('peak-discharge')).toBe('0 m³/s');
    expect(result('time-to-peak')).toBe('none: no direct runoff');
  });

  it('against the record: peak, timing and volume errors and the efficiency, worked by hand', async () => {
    await open(WITH_RECORD);
    // Peak: (0.69444 − 1)/1 = −30.56 %. Timing: 3 h − 4 h = −1:00, early.
    expect(result('peak-error')).toBe('−30.56 %');
    expect(result('timing-error')).toBe('−1:00 (early)');
    // Volume: computed 10,000 m³ against 16,200 m³: (10000 − 16200)/16200 = −38.27 %.
    expect(result('volume-error')).toBe('−38.27 %');
    // Efficiency at the observed hours: computed c = (25/36)·(0, 1/3, 2/3, 1, 0.8, 0.6, 0.4, 0.2, 0, 0, 0)
    // m³/s, residuals o − c = 0, 1/54, 1/27, 1/18, 4/9, 0.38333, 0.32222, 0.26111, 0.2, 0, 0 whose squares
    // sum to 0.56128; observed mean 4.5/11 = 0.40909, Σ(o − ō)² = 3.075 − 4.5²/11 = 1.23409;
    // NSE = 1 − 0.56128/1.23409 = 0.5452.
    expect(result('nse')).toBe('0.545');
  });

  it('refuses a lag that is not a number, negative or beyond what a lag can mean, keeping the one in use', async () => {
    const { user, scenario } = await open(ONE_BAR);
    const lag = screen.getByRole('textbox', { name: 'Lag (h)' });
    await user.clear(lag);
    await user.type(lag, 'abc');
    expect(lag.closest('.field')).toHaveTextContent(/Not applied; still 2.5 h/);
    expect(scenario().hydrograph.transform).toEqual({ kind: 'triangular', lagH: 2.5 });
    await user.clear(lag);
    await user.type(lag, '-1');
    expect(lag.closest('.field')).toHaveTextContent(/Not applied; still 2.5 h/);
    await user.clear(lag);
    await user.type(lag, '100000');
    // The core's own bound is the narrower here, so its words come first.
    expect(lag.closest('.field')).toHaveTextContent(
      /Lag must be greater than 0 and at most 1000 h \(got 100000\)\. Not applied; still 2.5 h/,
    );
    expect(scenario().hydrograph.transform).toEqual({ kind: 'triangular', lagH: 2.5 });
    expect(result('peak-discharge')).toBe('0.6944 m³/s');
    await user.clear(lag);
    await user.type(lag, '1.5');
    expect(scenario().hydrograph.transform).toEqual({ kind: 'triangular', lagH: 1.5 });
  });

  it('sets the lag from a time of concentration as 0.6 Tc', async () => {
    const { user, scenario } = await open(ONE_BAR);
    const tc = screen.getByRole('textbox', { name: 'Time of concentration Tc (h)' });
    await user.clear(tc);
    await user.type(tc, '5');
    // lag = 0.6 × 5 h = 3 h.
    expect(scenario().hydrograph.transform).toEqual({ kind: 'triangular', lagH: 3 });
  });

  it('offers Tc beside a lag only: for the triangular and NRCS unit hydrographs, not for the Nash cascade', async () => {
    const { user } = await open(ONE_BAR);
    const picker = screen.getByRole('combobox', { name: 'Unit hydrograph' });
    const tc = () => screen.queryByRole('textbox', { name: 'Time of concentration Tc (h)' });
    expect(tc()).not.toBeNull();
    await user.selectOptions(picker, 'nrcs-dimensionless');
    expect(tc()).not.toBeNull();
    await user.selectOptions(picker, 'nash');
    expect(tc()).toBeNull();
  });

  it("fits the Nash cascade's k with n held unless n is chosen, and says which one each choice holds", async () => {
    const { user } = await open(WITH_RECORD);
    await user.selectOptions(screen.getByRole('combobox', { name: 'Unit hydrograph' }), 'nash');
    const fitPicker = screen.getByRole('combobox', { name: 'Hydrograph parameter to fit' });
    expect(
      within(fitPicker)
        .getAllByRole('option')
        .map((o) => o.textContent),
    ).toEqual(['Number of reservoirs n (k held)', 'Storage constant k (n held)']);
    expect(fitPicker).toHaveValue('kH');
  });

  it('reads pasted ordinates with the number reader, says how far their volume is from 1 mm, and refuses a bad one by number', async () => {
    const { user, scenario } = await open(ONE_BAR);
    await user.selectOptions(screen.getByRole('combobox', { name: 'Unit hydrograph' }), 'unit-hydrograph');
    const box = screen.getByRole('textbox', { name: 'Unit hydrograph ordinates (m³/s per mm)' });
    // 1-hour ordinates 0, 0.2, 0.1, 0 (m³/s per mm) hold, by the trapezoidal rule, 0.3 m³/s·h = 1080 m³,
    // 1.08 mm over 1 km²: 8 % too much.
    fireEvent.change(box, { target: { value: '0\n0.2\n0.1\n0' } });
    expect(scenario().hydrograph.transform).toEqual({
      kind: 'unit-hydrograph',
      durationH: 1,
      stepH: 1,
      ordinatesM3sPerMm: [0, 0.2, 0.1, 0],
    });
    expect(document.querySelector('[data-note="uh-volume"]')).toHaveTextContent(
      'These ordinates hold 1.08 mm over the catchment, not 1 mm (8 % too much); the hydrograph scales them to 1 mm.',
    );
    fireEvent.change(box, { target: { value: '0\n0.2\nx\n0' } });
    expect(box.closest('.field')).toHaveTextContent(/Ordinate 3: .*Not applied; still the 4 ordinates in use/);
    fireEvent.change(box, { target: { value: '0\n0.2\n-0.1\n0' } });
    expect(box.closest('.field')).toHaveTextContent(/Ordinate 3: .*cannot be negative.*Not applied/);
    expect(scenario().hydrograph.transform).toMatchObject({ ordinatesM3sPerMm: [0, 0.2, 0.1, 0] });
  });

  it('draws the computed hydrograph alone when there is no record', async () => {
    await open(ONE_BAR);
    const path = await screen.findByRole(
      'img',
      { name: /^Computed direct runoff: peak 0.6944 m³\/s 3:00/ },
      {
        timeout: LAZY_LOAD_MS,
      },
    );
    expect(path.querySelector('[data-layer="computed-direct"]')?.getAttribute('d')).toMatch(/^M/);
  });

  it('fits the lag to the observed peak, matching the loss to the observed volume first', async () => {
    // An invented record holding exactly what 8 mm of excess gives through lag 2.5 h (worked as above:
    // peak ¼ × 1e6 m² × 0.008 m / 3600 s = 0.5556 m³/s at 3 h; 4 × 0.5556 m³/s × 3600 s = 8000 m³ = 8 mm).
    // The loss that leaves 8 mm of the 12 mm bar is φ = (12 − 8)/1 h = 4 mm/h; starting from lag 1 h,
    // the lag whose peak matches is 2.5 h (the peak falls steadily as the lag grows, so there is one).
    const peak = (0.25 * 1e6 * 0.008) / 3600;
    const { user, scenario } = await open({
      ...WITH_RECORD,
      hydrograph: { ...WITH_RECORD.hydrograph, transform: { kind: 'triangular', lagH: 1 } },
      observed: { as: 'depth', value: 0, parameter: 'rateMmH', locked: false },
      streamflow: {
        ...(WITH_RECORD.streamflow as NonNullable<Scenario['streamflow']>),
        dischargeM3s: [0, 1 / 3, 2 / 3, 1, 0.8, 0.6, 0.4, 0.2, 0, 0, 0].map((x) => x * peak),
        useAsObserved: true,
      },
    });
    await user.selectOptions(screen.getByRole('combobox', { name: 'Fit to' }), 'peak');
    await user.click(screen.getByRole('button', { name: 'Fit the hydrograph' }));
    const s = scenario();
    expect(s.method.kind === 'constant' && s.method.rateMmH).toBeCloseTo(4, 9);
    const t = s.hydrograph.transform;
    expect(t?.kind === 'triangular' && t.lagH).toBeCloseTo(2.5, 6);
    expect(document.querySelector('[data-answer="hydro-fit"]')).toHaveTextContent(
      'Fitted: Lag 2.5 h matching the observed peak discharge; the loss was matched to the observed volume first.',
    );
    expect(result('peak-error')).toBe('0 %');
    expect(result('volume-error')).toBe('0 %');
  });
});
