import { describe, expect, it } from 'vitest';
import { InputError, defaultMethod } from '../../src/core';
import {
  withAreaM2,
  withBarDeleted,
  withBarDepth,
  withBarDuration,
  withBarInserted,
  withMethodKind,
  withObserved,
  withParam,
  withStartIso,
  withStorm,
} from '../../src/store/edits';
import { FOUR_BARS } from '../helpers/scenario-fixtures';

const catchError = (fn: () => unknown): InputError => {
  try {
    fn();
  } catch (error) {
    if (error instanceof InputError) return error;
    throw error;
  }
  throw new Error('expected an InputError');
};

describe('scenario edits', () => {
  it('setting a bar depth changes that bar only and shares the rest of the document', () => {
    const s = withBarDepth(FOUR_BARS, 2, 12);
    expect(s.storm.depthsMm).toEqual([2, 6, 12, 2]);
    expect(s.storm.durationsH).toBe(FOUR_BARS.storm.durationsH);
    expect(s.method).toBe(FOUR_BARS.method);
    expect(FOUR_BARS.storm.depthsMm).toEqual([2, 6, 10, 2]);
  });

  it('a bad bar value is refused with the bar named, and nothing changes', () => {
    const e = catchError(() => withBarDepth(FOUR_BARS, 1, -3));
    expect(e.field).toBe('depthsMm');
    expect(e.index).toBe(1);
    expect(e.message).toMatch(/^Bar 2: /);
    expect(catchError(() => withBarDuration(FOUR_BARS, 0, 0)).message).toMatch(/^Bar 1: duration/);
    expect(catchError(() => withBarDepth(FOUR_BARS, 9, 1)).message).toBe('There is no bar 10 (bars are 1 to 4).');
  });

  it('inserting a bar copies its neighbour’s duration, dry unless told', () => {
    const s = withBarInserted(withBarDuration(FOUR_BARS, 1, 0.25), 1);
    expect(s.storm.durationsH).toEqual([0.5, 0.25, 0.25, 0.5, 0.5]);
    expect(s.storm.depthsMm).toEqual([2, 0, 6, 10, 2]);
    const appended = withBarInserted(FOUR_BARS, 4, { durationH: 1, depthMm: 3 });
    expect(appended.storm.depthsMm).toEqual([2, 6, 10, 2, 3]);
    expect(catchError(() => withBarInserted(FOUR_BARS, 0, { durationH: -1, depthMm: 0 })).field).toBe('durationsH');
  });

  it('deleting bars down to none leaves an empty storm', () => {
    let s = FOUR_BARS;
    for (let i = 0; i < 4; i++) s = withBarDeleted(s, 0);
    expect(s.storm.depthsMm).toEqual([]);
    expect(catchError(() => withBarDeleted(s, 0)).message).toBe('There is no bar 1 (the storm has no bars).');
  });

  it('a whole storm from typed arrays is stored as plain lists, checked by the core', () => {
    const s = withStorm(FOUR_BARS, {
      durationsH: new Float64Array([1, 1]),
      depthsMm: new Float64Array([3, 4]),
      startIso: '2026-01-02T03:04',
    });
    expect(s.storm).toEqual({ durationsH: [1, 1], depthsMm: [3, 4], startIso: '2026-01-02T03:04' });
    expect(Array.isArray(s.storm.depthsMm)).toBe(true);
    expect(catchError(() => withStorm(FOUR_BARS, { durationsH: [1], depthsMm: [1, 2] })).field).toBe('depthsMm');
  });

  it('the storm start can be set and cleared', () => {
    const s = withStartIso(FOUR_BARS, '2026-07-14T15:00');
    expect(s.storm.startIso).toBe('2026-07-14T15:00');
    expect('startIso' in withStartIso(s, undefined).storm).toBe(false);
    expect(catchError(() => withStartIso(FOUR_BARS, 'soon')).field).toBe('startIso');
  });

  it('the catchment area must be a number of m², zero or more', () => {
    expect(withAreaM2(FOUR_BARS, 5).catchment.areaM2).toBe(5);
    expect(catchError(() => withAreaM2(FOUR_BARS, Number.NaN)).field).toBe('areaM2');
  });

  it('switching method keeps the storm and remembers each method’s last parameters', () => {
    const tuned = withParam(FOUR_BARS, 'rateMmH', 6.5);
    const ic = withMethodKind(tuned, 'initial-continuing');
    expect(ic.storm).toBe(FOUR_BARS.storm);
    expect(ic.method).toEqual(defaultMethod('initial-continuing'));
    expect(ic.methodMemory.constant).toEqual({ kind: 'constant', rateMmH: 6.5 });
    const icTuned = withParam(ic, 'initialMm', 4);
    const back = withMethodKind(icTuned, 'constant');
    expect(back.method).toEqual({ kind: 'constant', rateMmH: 6.5 });
    expect(withMethodKind(back, 'initial-continuing').method).toEqual({
      kind: 'initial-continuing',
      initialMm: 4,
      rateMmH: 2.5,
    });
  });

  it('switching method moves the fitted parameter to one the new method has', () => {
    const s = withObserved(FOUR_BARS, { value: 5, parameter: 'rateMmH' });
    expect(withMethodKind(s, 'proportional').observed?.parameter).toBe('coefficient');
    expect(withMethodKind(s, 'initial-continuing').observed?.parameter).toBe('rateMmH');
  });

  it('a parameter out of range is refused with the core’s message', () => {
    const e = catchError(() => withParam(FOUR_BARS, 'rateMmH', -1));
    expect(e.field).toBe('rateMmH');
    expect(e.message).toContain('Loss rate φ must be at least 0');
    expect(catchError(() => withParam(FOUR_BARS, 'nonsense', 1)).message).toContain('has no parameter "nonsense"');
  });

  it('observed runoff is checked: finite, not negative, a parameter the method has', () => {
    expect(withObserved(FOUR_BARS, { value: 3 }).observed).toEqual({
      as: 'depth',
      value: 3,
      parameter: 'rateMmH',
      locked: false,
    });
    expect(catchError(() => withObserved(FOUR_BARS, { value: -1 })).field).toBe('observed.value');
    expect(catchError(() => withObserved(FOUR_BARS, { parameter: 'coefficient' })).field).toBe('observed.parameter');
    expect(withObserved(FOUR_BARS, null)).toBe(FOUR_BARS);
  });
});
