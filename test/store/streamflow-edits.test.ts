import { describe, expect, it } from 'vitest';
import { calibrate, isInputError, separateBaseflow } from '../../src/core';
import { parseScenario } from '../../src/scenario';
import type { Scenario } from '../../src/scenario/types';
import {
  alignRecord,
  createWorkbenchStore,
  withBaseflowKind,
  withBaseflowParam,
  withRecordOffsetH,
  withSeparationAsObserved,
  withStreamflowRecord,
  withoutStreamflow,
} from '../../src/store';
import { withAreaM2, withObserved } from '../../src/store/edits';
import { expectClose } from '../helpers/tolerance';
import { FOUR_BARS } from '../helpers/scenario-fixtures';
import { TRIANGLE, TRIANGLE_DIRECT_M3, WITH_TRIANGLE } from '../helpers/flow-fixtures';

const flow = (s: Scenario) => {
  if (!s.streamflow) throw new Error('expected a streamflow record');
  return s.streamflow;
};

function thrown(fn: () => unknown): { field: string; message: string } {
  try {
    fn();
  } catch (error) {
    if (isInputError(error)) return { field: error.field, message: error.message };
    throw error;
  }
  throw new Error('expected an InputError');
}

describe('streamflow edits', () => {
  it('a new record starts with a straight line whose end is N = A^0.2 days after the peak', () => {
    const s = withStreamflowRecord(FOUR_BARS, TRIANGLE);
    expect(flow(s).baseflow).toEqual({ kind: 'straight-line' });
    expect(flow(s).offsetH).toBe(0);
    expect(flow(s).useAsObserved).toBe(false);
    expect(parseScenario(s)).toEqual({ ok: true, scenario: s });
  });

  it('refuses a record the core refuses, changing nothing', () => {
    const e = thrown(() => withStreamflowRecord(FOUR_BARS, { timesH: [0, 1, 1], dischargeM3s: [1, 2, 3] }));
    expect(e.field).toBe('timesH');
    expect(e.message).toMatch(/^Sample 3: time 1 h must be later than the time of sample 2/);
  });

  it('a record with a clock beside a storm with one is lined up by the clocks', () => {
    const storm = { ...FOUR_BARS, storm: { ...FOUR_BARS.storm, startIso: '2026-07-14T15:00' } };
    const s = withStreamflowRecord(storm, { ...TRIANGLE, startIso: '2026-07-14T14:30:00' });
    expect(flow(s).offsetH).toBe(-0.5);
    expect(flow(s).startIso).toBe('2026-07-14T14:30:00');
  });

  it('a new record keeps the separation chosen, and puts an end point it cannot take back to automatic', () => {
    const shorter = { timesH: [0, 1, 2, 3, 4, 5, 6], dischargeM3s: [0.5, 0.5, 1.125, 1.75, 1.4375, 1.125, 0.8125] };
    const kept = withStreamflowRecord(WITH_TRIANGLE, TRIANGLE);
    expect(flow(kept).baseflow).toEqual({ kind: 'straight-line', endTimeH: 7 });
    const reset = withStreamflowRecord(WITH_TRIANGLE, shorter);
    expect(flow(reset).baseflow).toEqual({ kind: 'straight-line' });
  });

  it('sets the end point, and refuses one outside the record or before the start of rise with the core’s message', () => {
    const s = withBaseflowParam(WITH_TRIANGLE, 'endTimeH', 5.5);
    expect(flow(s).baseflow).toEqual({ kind: 'straight-line', endTimeH: 5.5 });
    expect(thrown(() => withBaseflowParam(WITH_TRIANGLE, 'endTimeH', 12.5))).toEqual({
      field: 'endTimeH',
      message: 'The end point (12.5 h) is after the last sample of the record (12 h).',
    });
    expect(thrown(() => withBaseflowParam(WITH_TRIANGLE, 'endTimeH', 0.5)).message).toBe(
      'The end point (0.5 h) must be later than the start of rise (sample 2, 1 h).',
    );
    expect(thrown(() => withBaseflowParam(WITH_TRIANGLE, 'riseIndex', 20)).field).toBe('riseIndex');
  });

  it('puts an optional parameter back to automatic, but never a required one', () => {
    const auto = withBaseflowParam(WITH_TRIANGLE, 'endTimeH', undefined);
    expect(flow(auto).baseflow).toEqual({ kind: 'straight-line' });
    const filter = withBaseflowKind(WITH_TRIANGLE, 'lyne-hollick');
    expect(thrown(() => withBaseflowParam(filter, 'alpha', undefined)).message).toBe(
      'Filter parameter α cannot be left empty (Lyne & Hollick filter).',
    );
    expect(thrown(() => withBaseflowParam(filter, 'alpha', 1)).message).toBe(
      'Filter parameter α must be a number at least 0 and less than 1 (got 1).',
    );
  });

  it('an automatic end point past the record is kept (it waits for a longer record or a smaller area), and the separation ends at the last sample meanwhile and says so', () => {
    const big = withAreaM2(withBaseflowParam(WITH_TRIANGLE, 'endTimeH', undefined), 500e6);
    expect(flow(big).baseflow).toEqual({ kind: 'straight-line' });
    const store = createWorkbenchStore(big);
    const sep = store.derived.separation(big);
    expect(sep?.ok).toBe(true);
    if (!sep?.ok) return;
    expect(sep.result.endTimeH).toBe(12);
    expect(sep.result.notice).toMatch(
      /^N = A\^0\.2 = .* days puts the end .* h after the first sample, past the record's last sample \(12 h\)/,
    );
  });

  it('switching methods remembers each one’s parameters', () => {
    const eck = withBaseflowParam(withBaseflowKind(WITH_TRIANGLE, 'eckhardt'), 'bfiMax', 0.5);
    const back = withBaseflowKind(eck, 'straight-line');
    expect(flow(back).baseflow).toEqual({ kind: 'straight-line', endTimeH: 7 });
    expect(flow(withBaseflowKind(back, 'eckhardt')).baseflow).toEqual({
      kind: 'eckhardt',
      a: 0.98,
      bfiMax: 0.5,
      stepH: 24,
    });
  });

  it('the offset must be a finite number of hours, within 500 years either way', () => {
    expect(flow(withRecordOffsetH(WITH_TRIANGLE, -1.25)).offsetH).toBe(-1.25);
    expect(thrown(() => withRecordOffsetH(WITH_TRIANGLE, Number.NaN)).message).toBe(
      'The offset from the storm start to the first sample must be a finite number of hours (got NaN).',
    );
    // 500 years of 365.25 days = 4,383,000 h: allowed at the limit, refused past it.
    expect(flow(withRecordOffsetH(WITH_TRIANGLE, -4_383_000)).offsetH).toBe(-4_383_000);
    const far = thrown(() => withRecordOffsetH(WITH_TRIANGLE, 4_383_001));
    expect(far.field).toBe('offsetH');
    expect(far.message).toBe(
      'The offset from the storm start to the first sample must be within 500 years, 4,383,000 h, either way (got 4,383,001 h, 500 years).',
    );
  });
});

describe('the separated depth as the observed runoff', () => {
  it('is the core’s direct-runoff depth, and the matched loss rate is the core’s fit to it', () => {
    const s = withSeparationAsObserved(WITH_TRIANGLE, true, 0);
    const store = createWorkbenchStore(s);
    const core = separateBaseflow(TRIANGLE, { kind: 'straight-line', endTimeH: 7 }, { areaM2: 1e6 });
    expectClose(core.directVolumeM3, TRIANGLE_DIRECT_M3, 1e-12);
    expect(store.derived.target(s)).toEqual({ ok: true, mm: core.directDepthMm });
    const fit = calibrate(s.storm, s.method, 'rateMmH', core.directDepthMm as number);
    expect(store.derived.fit(s)).toEqual(fit);
    expect(store.derived.isMatched(s)).toBe(true);
    expect(store.derived.effectiveMethod(s)).toEqual(fit.ok ? fit.method : null);
  });

  it('follows the end point and the area with no stored copy', () => {
    const store = createWorkbenchStore(withSeparationAsObserved(WITH_TRIANGLE, true, 0));
    const { actions } = store.getState();
    const { derived } = store;
    const before = derived.target(store.getState().scenario);
    actions.edit('Move end', (s) => withBaseflowParam(s, 'endTimeH', 5));
    const moved = derived.target(store.getState().scenario);
    const core = separateBaseflow(TRIANGLE, { kind: 'straight-line', endTimeH: 5 }, { areaM2: 1e6 });
    expect(moved).toEqual({ ok: true, mm: core.directDepthMm });
    expect(moved).not.toEqual(before);
    actions.setAreaM2(2e6);
    expect(derived.target(store.getState().scenario)).toEqual({ ok: true, mm: (core.directDepthMm as number) / 2 });
    const rate = (derived.effectiveMethod(store.getState().scenario) as { rateMmH: number }).rateMmH;
    const fit = calibrate(
      store.getState().scenario.storm,
      FOUR_BARS.method,
      'rateMmH',
      (core.directDepthMm as number) / 2,
    );
    expect(fit.ok && rate).toBe(fit.ok ? (fit.method as { rateMmH: number }).rateMmH : null);
    // The typed-in value is never rewritten while the link lasts.
    expect(store.getState().scenario.observed?.value).toBe(0);
  });

  it('says why there is no target: no area, or a separation the core refuses', () => {
    const noArea = withSeparationAsObserved(withAreaM2(WITH_TRIANGLE, 0), true, 0);
    expect(createWorkbenchStore(noArea).derived.target(noArea)).toEqual({
      ok: false,
      message: 'Enter the catchment area to turn the separated direct runoff into a depth over the catchment.',
    });
    const auto = withSeparationAsObserved(
      withAreaM2(withBaseflowParam(WITH_TRIANGLE, 'endTimeH', undefined), 0),
      true,
      0,
    );
    const t = createWorkbenchStore(auto).derived.target(auto);
    expect(t).toEqual({
      ok: false,
      message:
        'The streamflow record cannot be separated: The straight-line end point needs an end time or the catchment area (for N = A^0.2 days after the peak).',
    });
  });

  it('keeps an observed runoff typed before, and turns on keep matched', () => {
    const typed = withObserved(WITH_TRIANGLE, { as: 'volume', value: 2500 });
    const s = withSeparationAsObserved(typed, true, 12);
    expect(s.observed).toEqual({ as: 'volume', value: 2500, parameter: 'rateMmH', locked: true });
    expect(flow(s).useAsObserved).toBe(true);
  });

  it('stopping keeps the depth shown as the typed-in value', () => {
    const s = withSeparationAsObserved(withSeparationAsObserved(WITH_TRIANGLE, true, 0), false, 13.5);
    expect(s.observed).toEqual({ as: 'depth', value: 13.5, parameter: 'rateMmH', locked: true });
    expect(flow(s).useAsObserved).toBe(false);
  });

  it('typing an observed value or choosing depth or volume takes the observed runoff back from the record', () => {
    const linked = withSeparationAsObserved(WITH_TRIANGLE, true, 0);
    const typed = withObserved(linked, { value: 9 });
    expect(flow(typed).useAsObserved).toBe(false);
    expect(typed.observed?.value).toBe(9);
    expect(flow(withObserved(linked, { as: 'depth' })).useAsObserved).toBe(false);
    // Choosing the parameter to fit, or keep matched, does not.
    expect(flow(withObserved(linked, { locked: false })).useAsObserved).toBe(true);
    expect(withObserved(linked, null).streamflow?.useAsObserved).toBe(false);
  });

  it('removing the record keeps the last depth as the typed-in observed runoff', () => {
    const linked = withSeparationAsObserved(WITH_TRIANGLE, true, 0);
    const gone = withoutStreamflow(linked, 13.5);
    expect(gone.streamflow).toBeNull();
    expect(gone.observed).toEqual({ as: 'depth', value: 13.5, parameter: 'rateMmH', locked: true });
    expect(parseScenario(gone).ok).toBe(true);
  });
});

describe('lining the record up with the storm', () => {
  it('uses the clocks when both have one, compared as written unless both name a zone', () => {
    expect(alignRecord('2026-07-14T15:00', '2026-07-14T13:45:00', 9)).toEqual({
      offsetH: -1.25,
      source: 'clocks',
      note: null,
    });
    expect(alignRecord('2026-07-14T15:00Z', '2026-07-15T01:00+10:00', 0).offsetH).toBe(0);
    const one = alignRecord('2026-07-14T15:00', '2026-07-14T16:00Z', 0);
    expect(one.offsetH).toBe(1);
    expect(one.note).toMatch(/^Only one of the two start times names its time zone/);
  });

  it('uses the stored offset when either has no clock', () => {
    expect(alignRecord(undefined, '2026-07-14T13:45:00', 2.5)).toEqual({ offsetH: 2.5, source: 'offset', note: null });
    expect(alignRecord('2026-07-14T15:00', undefined, -1)).toEqual({ offsetH: -1, source: 'offset', note: null });
  });
});
