// DEVELOPERS.md: adding a transform touches its own file and its entries in
// TRANSFORMS and TRANSFORM_WEIGHTS only. That holds while nothing outside
// src/core/transform names a transform kind: no `transform.kind === 'nash'`
// for a label, no `case 'unit-hydrograph':`, no object keyed by kind; the
// store, the schema, the screens and the exports ask the spec instead
// (`ordinates`, `fitFirst`, a parameter's `symbol` and
// `fromTimeOfConcentration`). This test reads every source file with
// TypeScript's parser (test/helpers/kind-namings.ts) and fails on such a
// place; the kinds come from the table itself, so a transform added to it is
// covered with no change here.
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { BASEFLOW_KINDS, METHOD_KINDS, TRANSFORM_KINDS } from '../../../src/core';
import { SRC, kindNamings, namingsIn, sourceFiles, type KindGuard } from '../../helpers/kind-namings';

/**
 * Kinds of another table too (none today) would be named freely, unless
 * compared with an expression that mentions a transform.
 */
const TRANSFORM: KindGuard = {
  kinds: TRANSFORM_KINDS,
  shared: new Set<string>([...METHOD_KINDS, ...BASEFLOW_KINDS]),
  isOurs: (expression) => /transform/i.test(expression),
};

describe('a transform kind is named only in its table (src/core/transform)', () => {
  it('finds the kinds of a switch written outside the table (so the check below can fail)', () => {
    const switched = [
      "const held = transform.kind === 'nash' ? ' (n held)' : '';",
      "if ('unit-hydrograph' !== s.hydrograph.transform?.kind) go();",
      'switch (t.kind) {',
      "  case 'triangular':",
      '    break;',
      '}',
      "const short = { 'nrcs-dimensionless': 'NRCS', nash: 'N' };",
      "const loss = method.kind === 'constant';",
      "type Ordinates = TransformOf<'unit-hydrograph'>;",
    ].join('\n');
    expect(kindNamings('switched.ts', switched, TRANSFORM)).toEqual([
      "1: transform.kind === 'nash'",
      "2: 'unit-hydrograph' !== s.hydrograph.transform?.kind",
      "4: case 'triangular':",
      "7: 'nrcs-dimensionless': 'NRCS'",
      "7: nash: 'N'",
      "9: 'unit-hydrograph'",
    ]);
  });

  it('finds none in src/ outside src/core/transform', () => {
    const files = sourceFiles(SRC, join(SRC, 'core/transform'));
    expect(files.length).toBeGreaterThan(100);
    expect(namingsIn(files, TRANSFORM)).toEqual([]);
  });
});
