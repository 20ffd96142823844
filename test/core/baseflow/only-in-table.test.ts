// DEVELOPERS.md: adding a baseflow method touches its own file and its table
// entries only. That holds while nothing outside src/core/baseflow names a
// baseflow kind: no `x.baseflow.kind === 'straight-line'`, no `case
// 'eckhardt':`, no object keyed by kind. This test reads every source file
// with TypeScript's parser (test/helpers/kind-namings.ts) and fails on such a
// place; the kinds come from the table itself, so a method added to it is
// covered with no change here.
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { BASEFLOW_KINDS, METHOD_KINDS, TRANSFORM_KINDS } from '../../../src/core';
import { SRC, kindNamings, namingsIn, sourceFiles, type KindGuard } from '../../helpers/kind-namings';

/**
 * Kinds of another table too (the loss method 'constant') are named freely,
 * unless compared with an expression that mentions baseflow.
 */
const BASEFLOW: KindGuard = {
  kinds: BASEFLOW_KINDS,
  shared: new Set<string>([...METHOD_KINDS, ...TRANSFORM_KINDS]),
  isOurs: (expression) => /baseflow/i.test(expression),
};

describe('a baseflow kind is named only in its table (src/core/baseflow)', () => {
  it('finds the kinds of a switch written outside the table (so the check below can fail)', () => {
    const switched = [
      "const a = flow.baseflow.kind === 'straight-line' ? 1 : 0;",
      "if ('eckhardt' !== s.streamflow.baseflow.kind) go();",
      'switch (flow.baseflow.kind) {',
      "  case 'constant':",
      '    break;',
      '}',
      "const labels = { 'lyne-hollick': 'LH', eckhardt: 'E' };",
      "const loss = method.kind === 'constant';",
      "const first: Scenario = { method: { kind: 'constant', rateMmH: 8 } };",
    ].join('\n');
    expect(kindNamings('switched.ts', switched, BASEFLOW)).toEqual([
      "1: flow.baseflow.kind === 'straight-line'",
      "2: 'eckhardt' !== s.streamflow.baseflow.kind",
      "4: case 'constant':",
      "7: 'lyne-hollick': 'LH'",
      "7: eckhardt: 'E'",
    ]);
  });

  it('finds none in src/ outside src/core/baseflow', () => {
    const files = sourceFiles(SRC, join(SRC, 'core/baseflow'));
    expect(files.length).toBeGreaterThan(100);
    expect(namingsIn(files, BASEFLOW)).toEqual([]);
  });
});
