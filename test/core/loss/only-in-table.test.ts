// DEVELOPERS.md: adding a loss method touches its own file and its entry in
// METHODS only. That holds while nothing outside src/core/loss names a loss
// kind: no `method.kind === 'green-ampt'` to show a panel, no `case
// 'horton':`, no object keyed by kind; a screen asks the spec instead
// (`spec.soilPresets`). This test reads every source file with TypeScript's
// parser (test/helpers/kind-namings.ts) and fails on such a place; the kinds
// come from the table itself, so a method added to it is covered with no
// change here.
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { BASEFLOW_KINDS, METHOD_KINDS, TRANSFORM_KINDS } from '../../../src/core';
import { SRC, kindNamings, namingsIn, sourceFiles, type KindGuard } from '../../helpers/kind-namings';

/**
 * Kinds of another table too (the baseflow method 'constant') are named
 * freely, unless compared with an expression that is not about baseflow.
 */
const LOSS: KindGuard = {
  kinds: METHOD_KINDS,
  shared: new Set<string>([...BASEFLOW_KINDS, ...TRANSFORM_KINDS]),
  isOurs: (expression) => !/baseflow/i.test(expression),
};

/** In the baseflow table's own folder a shared kind is a baseflow kind. */
const guardOf = (path: string): KindGuard =>
  path.startsWith('src/core/baseflow/') ? { ...LOSS, isOurs: () => false } : LOSS;

/** Files that may name a loss kind, and why. Nothing else may. */
const ALLOWED: Readonly<Record<string, string>> = {
  // Stored data: a migration says what an old document held, kind by kind, and
  // must keep saying it after the table changes (a version 3 Horton method).
  'src/scenario/migrate.ts': 'migrates the stored methods of old versions, which name their kinds',
  // The published table of Green–Ampt soil values builds a Green–Ampt method;
  // screens reach it only through the spec's `soilPresets`.
  'src/core/soils.ts': 'the soil table of Rawls, Brakensiek & Miller (1983) builds a Green–Ampt method',
};

const inFile = (at: string): string => at.slice(0, at.indexOf(':'));

describe('a loss kind is named only in its table (src/core/loss)', () => {
  it('finds the kinds of a switch written outside the table (so the check below can fail)', () => {
    const switched = [
      "const presets = method.kind === 'green-ampt' ? 1 : 0;",
      "if ('horton' !== s.method.kind) go();",
      'switch (s.method.kind) {',
      "  case 'constant':",
      '    break;',
      '}',
      "const legends = { 'curve-number': 'CN', proportional: 'C' };",
      "const flat = s.streamflow.baseflow.kind === 'constant';",
      "const first: Scenario = { method: { kind: 'constant', rateMmH: 8 } };",
      "type Soil = MethodOf<'green-ampt'>;",
    ].join('\n');
    expect(kindNamings('switched.ts', switched, LOSS)).toEqual([
      "1: method.kind === 'green-ampt'",
      "2: 'horton' !== s.method.kind",
      "4: case 'constant':",
      "7: 'curve-number': 'CN'",
      "7: proportional: 'C'",
      "10: 'green-ampt'",
    ]);
  });

  it('finds none in src/ outside src/core/loss but in the files allowed, each of which still names one', () => {
    const files = sourceFiles(SRC, join(SRC, 'core/loss'));
    expect(files.length).toBeGreaterThan(100);
    const found = namingsIn(files, guardOf);
    expect(found.filter((at) => !Object.hasOwn(ALLOWED, inFile(at)))).toEqual([]);
    // An entry whose file no longer names a kind comes off the list.
    expect([...new Set(found.map(inFile))].sort()).toEqual(Object.keys(ALLOWED).sort());
  });
});
