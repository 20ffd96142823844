import { describe, expect, it } from 'vitest';
import { TRANSFORMS, TRANSFORM_KINDS, transformValue, withTransformValue, type Transform } from '../../../src/core';

// The typed accessors of the transform table (issue 12): a parameter is read
// and set by its table key, with no cast at the caller. Values are invented.

describe('transformValue and withTransformValue', () => {
  it('read each parameter the table names, and nothing else', () => {
    const nrcs: Transform = { kind: 'nrcs-dimensionless', lagH: 0.75 };
    expect(transformValue(nrcs, 'lagH')).toBe(0.75);
    // Optional and left out: no value (the default is the spec's to say).
    expect(transformValue(nrcs, 'peakRateFactor')).toBeUndefined();
    // Not a number: the kind, the ordinates, a key no transform has.
    expect(transformValue(nrcs, 'kind')).toBeUndefined();
    const uh: Transform = { kind: 'unit-hydrograph', durationH: 1, stepH: 0.5, ordinatesM3sPerMm: [0, 2, 1, 0] };
    expect(transformValue(uh, 'ordinatesM3sPerMm')).toBeUndefined();
    expect(transformValue(uh, 'stepH')).toBe(0.5);
    expect(transformValue(uh, 'nothing')).toBeUndefined();
  });

  it('set and clear a parameter on a copy, keeping the kind and the other parameters', () => {
    const nash: Transform = { kind: 'nash', n: 3, kH: 0.5 };
    const set = withTransformValue(nash, 'kH', 0.8);
    expect(set).toEqual({ kind: 'nash', n: 3, kH: 0.8 });
    expect(nash).toEqual({ kind: 'nash', n: 3, kH: 0.5 });
    const nrcs = withTransformValue({ kind: 'nrcs-dimensionless', lagH: 1 } as Transform, 'peakRateFactor', 300);
    expect(nrcs).toEqual({ kind: 'nrcs-dimensionless', lagH: 1, peakRateFactor: 300 });
    const cleared = withTransformValue(nrcs, 'peakRateFactor', undefined);
    expect(cleared).toEqual({ kind: 'nrcs-dimensionless', lagH: 1 });
    expect('peakRateFactor' in cleared).toBe(false);
  });

  it('find a number under every required parameter key in every default: the table keys name real fields', () => {
    for (const kind of TRANSFORM_KINDS) {
      const spec = TRANSFORMS[kind];
      for (const p of spec.params) {
        if (p.optional === true) continue;
        expect(typeof transformValue(spec.defaults, p.key), `${kind}.${p.key}`).toBe('number');
      }
    }
  });
});
