import { describe, expect, it } from 'vitest';
import { calibrate, computeLosses, InputError } from '../../src/core';
import { createWorkbenchStore } from '../../src/store';
import { FOUR_BARS } from '../helpers/scenario-fixtures';

const make = (scenario = FOUR_BARS) => {
  let t = 0;
  const store = createWorkbenchStore(scenario, { now: () => (t += 10_000) });
  return { store, a: store.getState().actions, s: () => store.getState().scenario };
};

describe('workbench store', () => {
  it('every edit is one undo step, undone and redone in order', () => {
    const { store, a, s } = make();
    a.setBarDepth(0, 5);
    a.setParam('rateMmH', 3);
    a.setUnits('us');
    expect(store.getState().undoLabel).toBe('Show US customary units');
    a.undo();
    expect(s().units).toBe('si');
    a.undo();
    expect((s().method as { rateMmH: number }).rateMmH).toBe(8);
    a.undo();
    expect(s()).toBe(FOUR_BARS);
    expect(store.getState().undoLabel).toBeNull();
    a.redo();
    expect(s().storm.depthsMm[0]).toBe(5);
  });

  it('a drag is one undo step taken on release; its frames record nothing', () => {
    const { store, a, s } = make();
    a.beginGesture('Drag loss rate φ');
    for (const v of [7, 6, 5.5, 5]) a.setParam('rateMmH', v);
    expect((s().method as { rateMmH: number }).rateMmH).toBe(5);
    expect(store.getState().history.past).toHaveLength(0);
    a.endGesture();
    expect(store.getState().history.past).toHaveLength(1);
    expect(store.getState().undoLabel).toBe('Drag loss rate φ');
    a.undo();
    expect((s().method as { rateMmH: number }).rateMmH).toBe(8);
  });

  it('a cancelled drag puts the start back and records nothing; an idle one records nothing', () => {
    const { store, a, s } = make();
    a.beginGesture('Drag');
    a.setParam('rateMmH', 2);
    a.cancelGesture();
    expect(s()).toBe(FOUR_BARS);
    a.beginGesture('Drag');
    a.endGesture();
    expect(store.getState().history.past).toHaveLength(0);
  });

  it('setStorm replaces the storm as one edit named by the caller', () => {
    const { store, a, s } = make();
    a.setStorm({ durationsH: [1, 1, 1], depthsMm: [1, 2, 3] }, 'Paste 3 bars');
    expect(s().storm.depthsMm).toEqual([1, 2, 3]);
    expect(store.getState().undoLabel).toBe('Paste 3 bars');
    a.undo();
    expect(s().storm).toBe(FOUR_BARS.storm);
  });

  it('a storm tool that leaves every bar as it was is no undo step', () => {
    // The defect: "Scale bars" by 1, or "Resample" to the storm's own step, recorded a step that changed nothing,
    // so the next Ctrl+Z seemed to do nothing at all.
    const { store, a, s } = make();
    const { durationsH, depthsMm, startIso } = FOUR_BARS.storm;
    a.setStorm(
      startIso === undefined
        ? { durationsH: [...durationsH], depthsMm: [...depthsMm] }
        : { durationsH: [...durationsH], depthsMm: [...depthsMm], startIso },
      'Scale storm by 1',
    );
    expect(s()).toBe(FOUR_BARS);
    expect(store.getState().history.past).toHaveLength(0);
    // Resampled to its own step, 0.4 mm may come back as 0.39999999999999997: the same bars, kept as they were.
    a.setStorm(
      { durationsH: durationsH.map((h) => (h * 6) / 6), depthsMm: depthsMm.map((d) => d * (1 + 2e-16)) },
      'Resample',
    );
    expect(s()).toBe(FOUR_BARS);
    // Another start time, or one depth changed, is a change.
    a.setStorm({ durationsH: [...durationsH], depthsMm: depthsMm.map((d, k) => (k === 0 ? d + 1 : d)) }, 'Edit');
    expect(store.getState().history.past).toHaveLength(1);
  });

  it('refuses bad input with an InputError and keeps the document as it was', () => {
    const { store, a, s } = make();
    expect(() => a.setBarDepth(1, Number.NaN)).toThrow(InputError);
    expect(() => a.insertBar(99)).toThrow(/There is no bar 100/);
    expect(s()).toBe(FOUR_BARS);
    expect(store.getState().history.past).toHaveLength(0);
  });

  it('results are the core’s, and the same object while the inputs are the same', () => {
    const { store, a, s } = make();
    const first = store.derived.results(s());
    expect(first.ok && first.result.totalExcessMm).toBe(computeLosses(FOUR_BARS.storm, FOUR_BARS.method).totalExcessMm);
    a.setName('Renamed');
    expect(store.derived.results(s())).toBe(first);
    a.setParam('rateMmH', 4);
    expect(store.derived.results(s())).not.toBe(first);
  });

  it('Fit sets the parameter to exactly the core’s calibration', () => {
    const { a, s } = make();
    a.setObserved({ as: 'depth', value: 4.5, parameter: 'rateMmH' });
    const result = a.fitObserved();
    const expected = calibrate(FOUR_BARS.storm, FOUR_BARS.method, 'rateMmH', 4.5);
    expect(result?.ok).toBe(true);
    expect(expected.ok && (s().method as { rateMmH: number }).rateMmH).toBe(expected.ok && expected.value);
  });

  it('an observed volume is matched as a depth over the catchment', () => {
    const { store, a, s } = make();
    a.setObserved({ as: 'volume', value: 4500, parameter: 'rateMmH' }); // 4500 m³ over 1 km² = 4.5 mm
    const target = store.derived.target(s());
    expect(target).toEqual({ ok: true, mm: 4.5 });
    a.setAreaM2(0);
    const t = store.derived.target(s());
    expect(t?.ok).toBe(false);
    expect(store.derived.fit(s())).toBeNull();
  });

  it('kept matched, the fitted value follows the observed runoff as bars change', () => {
    const { store, a, s } = make();
    a.setObserved({ value: 4.5, parameter: 'rateMmH' });
    a.setKeepMatched(true);
    const excess = () => {
      const r = store.derived.results(s());
      return r.ok ? r.result.totalExcessMm : NaN;
    };
    expect(excess()).toBeCloseTo(4.5, 12);
    a.setBarDepth(2, 16);
    expect(excess()).toBeCloseTo(4.5, 12);
    const fitted = store.derived.effectiveMethod(s());
    const expected = calibrate(s().storm, s().method, 'rateMmH', 4.5);
    expect(expected.ok && fitted).toEqual(expected.ok && expected.method);
    // Moving the fitted parameter by hand while matched is refused, plainly.
    expect(() => a.setParam('rateMmH', 1)).toThrow(/kept matched/);
    // Turning the lock off keeps the value the screen showed.
    a.setKeepMatched(false);
    expect(s().method).toEqual(fitted);
  });

  it('kept matched with no answer, the stored value stands and the core says why', () => {
    const { store, a, s } = make();
    a.setObserved({ value: 25, parameter: 'rateMmH' }); // more than the 20 mm of rain
    a.setKeepMatched(true);
    expect(store.derived.isMatched(s())).toBe(false);
    expect(store.derived.effectiveMethod(s())).toBe(s().method);
    const fit = store.derived.fit(s());
    expect(fit?.ok).toBe(false);
    expect(fit && !fit.ok && fit.message).toMatch(/more than the storm's rainfall/);
  });

  it('switching method while matched remembers the fitted value', () => {
    const { store, a, s } = make();
    a.setObserved({ value: 4.5, parameter: 'rateMmH' });
    a.setKeepMatched(true);
    const fitted = store.derived.effectiveMethod(s());
    a.setMethodKind('proportional');
    expect(s().methodMemory.constant).toEqual(fitted);
  });
});
