import { describe, expect, it } from 'vitest';
import { computeLosses, defaultMethod, InputError } from '../../src/core';
import { checkMethod, knownClean, methodProblem, stormProblem } from '../../src/store/checked';

describe('checks made once per object', () => {
  it('gives the core’s own refusal of a storm, the one computeLosses throws', () => {
    const storm = { durationsH: [0.5, 0.5], depthsMm: [2, -1] };
    let thrown: unknown = null;
    try {
      computeLosses(storm, defaultMethod('constant'));
    } catch (error) {
      thrown = error;
    }
    expect(thrown).toBeInstanceOf(InputError);
    expect(stormProblem(storm)?.message).toBe((thrown as InputError).message);
    expect(stormProblem(storm)?.index).toBe(1);
    expect(stormProblem({ durationsH: [0.5], depthsMm: [2] })).toBeNull();
  });

  it('answers again from memory for the same object, afresh for a new one', () => {
    const method = { ...defaultMethod('constant'), rateMmH: -1 };
    const first = methodProblem(method);
    expect(first).toBeInstanceOf(InputError);
    expect(methodProblem(method)).toBe(first);
    expect(methodProblem({ ...method })).not.toBe(first);
    expect(() => checkMethod(method)).toThrow(first?.message as string);
  });

  it('takes a copy the core has just accepted as clean without reading it', () => {
    // Never true of this storm if read: the depth is negative. Marked clean on purpose, to show no read happens.
    const copy = knownClean({ durationsH: [1], depthsMm: [-1] });
    expect(stormProblem(copy)).toBeNull();
  });
});
