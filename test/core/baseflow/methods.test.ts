import { describe, expect, it } from 'vitest';
import {
  BASEFLOW_KINDS,
  BASEFLOW_METHODS,
  baseflowMethodSpec,
  defaultBaseflowMethod,
  describeBaseflowRange,
  isBaseflowKind,
  separateBaseflow,
  validateBaseflowMethod,
  type BaseflowMethod,
  type BaseflowParam,
} from '../../../src/core/baseflow';
import { inputErrorOf } from '../../helpers/input-error';

const record = {
  timesH: [0, 6, 12, 18, 24, 36, 48, 72, 96, 120, 144, 168],
  dischargeM3s: [3, 3, 12, 40, 30, 20, 12, 7, 5, 4, 3.5, 3.2],
};

describe('the table of baseflow methods', () => {
  it('lists the four methods in picker order', () => {
    expect(BASEFLOW_KINDS).toEqual(['constant', 'straight-line', 'lyne-hollick', 'eckhardt']);
  });

  it('gives every method a label, a summary and a published source', () => {
    for (const kind of BASEFLOW_KINDS) {
      const spec = BASEFLOW_METHODS[kind];
      expect(spec.kind).toBe(kind);
      expect(spec.label.length).toBeGreaterThan(0);
      expect(spec.summary.length).toBeGreaterThan(0);
      expect(spec.source).toMatch(/\d{4}|Linsley/);
    }
  });

  it('has defaults that pass its own validation and lie within its bounds', () => {
    for (const kind of BASEFLOW_KINDS) {
      const defaults = defaultBaseflowMethod(kind);
      expect(() => validateBaseflowMethod(defaults)).not.toThrow();
      const values = defaults as unknown as Record<string, unknown>;
      for (const param of BASEFLOW_METHODS[kind].params as readonly BaseflowParam[]) {
        expect(param.min).toBeLessThan(param.max);
        if (values[param.key] === undefined) expect(param.optional, `${kind}.${param.key}`).toBeDefined();
      }
    }
  });

  it('uses the common-practice daily filter defaults, scaled to the record’s step: α = 0.925 with 3 passes; a = 0.98, BFImax = 0.80; each per 24 h', () => {
    expect(defaultBaseflowMethod('lyne-hollick')).toEqual({ kind: 'lyne-hollick', alpha: 0.925, passes: 3, stepH: 24 });
    expect(defaultBaseflowMethod('eckhardt')).toEqual({ kind: 'eckhardt', a: 0.98, bfiMax: 0.8, stepH: 24 });
  });

  it('runs every method with its defaults on a daily-scale flood', () => {
    for (const kind of BASEFLOW_KINDS) {
      const method = defaultBaseflowMethod(kind);
      const areaM2 = BASEFLOW_METHODS[kind].needsArea(method as never) ? 50e6 : undefined;
      const result = separateBaseflow(record, method, { areaM2 });
      expect(result.directVolumeM3, kind).toBeGreaterThan(0);
      expect(result.directVolumeM3, kind).toBeLessThan(result.totalVolumeM3);
    }
  });

  it('says which settings need the catchment area', () => {
    expect(BASEFLOW_METHODS['straight-line'].needsArea({ kind: 'straight-line' })).toBe(true);
    expect(BASEFLOW_METHODS['straight-line'].needsArea({ kind: 'straight-line', endTimeH: 60 })).toBe(false);
    expect(BASEFLOW_METHODS.constant.needsArea({ kind: 'constant' })).toBe(false);
  });

  it('hands out fresh default objects', () => {
    expect(defaultBaseflowMethod('eckhardt')).not.toBe(defaultBaseflowMethod('eckhardt'));
  });

  it('recognises its kinds and nothing else', () => {
    expect(isBaseflowKind('eckhardt')).toBe(true);
    expect(isBaseflowKind('toString')).toBe(false);
    expect(isBaseflowKind(3)).toBe(false);
    expect(inputErrorOf(() => baseflowMethodSpec('nope' as 'constant')).field).toBe('kind');
  });

  it('describes ranges in words', () => {
    const [alpha, passes] = BASEFLOW_METHODS['lyne-hollick'].params;
    expect(describeBaseflowRange(alpha as BaseflowParam)).toBe('a number at least 0 and less than 1');
    expect(describeBaseflowRange(passes as BaseflowParam)).toBe('a whole number at least 1 and at most 9');
  });
});

describe('validateBaseflowMethod', () => {
  it('rejects an unknown kind or a missing method', () => {
    expect(inputErrorOf(() => validateBaseflowMethod({ kind: 'nope' } as unknown as BaseflowMethod)).field).toBe(
      'kind',
    );
    expect(inputErrorOf(() => validateBaseflowMethod(null as unknown as BaseflowMethod)).field).toBe('method');
  });

  it('lets optional settings be left out but not set to a bad value', () => {
    expect(() => validateBaseflowMethod({ kind: 'straight-line', riseIndex: undefined })).not.toThrow();
    const error = inputErrorOf(() => validateBaseflowMethod({ kind: 'straight-line', endTimeH: Number.NaN }));
    expect(error.field).toBe('endTimeH');
    expect(error.message).toMatch(/hours/);
  });
});
