import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { METHODS, METHOD_KINDS, defaultMethod, type MethodSpec } from '../../src/core';
import { LISTED_BARS } from '../../src/scenario/schema';
import {
  CURRENT_SCENARIO_VERSION,
  DEMO_SCENARIO,
  MAX_LISTED_PROBLEMS,
  parseScenario,
  type Problem,
  type Scenario,
  type ScenarioResult,
} from '../../src/scenario';
import { scenarioArb } from '../helpers/scenario-arbitraries';

/** A document broken on purpose, field by field: any field may be set to anything. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- these tests write wrong types into the document
type Breakable = Record<string, any>;

/** A deep, plain, mutable copy of the demo to break in one place. */
function demo(): Breakable {
  return structuredClone(DEMO_SCENARIO) as unknown as Breakable;
}

function problemsOf(result: ScenarioResult): readonly Problem[] {
  if (result.ok) expect.fail('expected the scenario to be refused');
  return result.problems;
}

/** The one problem at `path`, which must exist. */
function problemAt(result: ScenarioResult, path: string): Problem {
  const found = problemsOf(result).find((p) => p.path === path);
  if (!found) expect.fail(`no problem at ${path}; got ${JSON.stringify(problemsOf(result))}`);
  return found;
}

describe('parseScenario accepts good documents', () => {
  it('reads the demo scenario back unchanged', () => {
    expect(parseScenario(DEMO_SCENARIO)).toStrictEqual({ ok: true, scenario: DEMO_SCENARIO });
  });

  it('reads every random valid scenario back unchanged', () => {
    fc.assert(
      fc.property(scenarioArb, (scenario) => {
        expect(parseScenario(scenario)).toStrictEqual({ ok: true, scenario });
      }),
      { numRuns: 200, seed: 20260714 },
    );
  }, 60_000); // documents of hundreds of bars, records and events: generous on a busy machine

  it('accepts the default parameters of every method in the core table', () => {
    for (const kind of METHOD_KINDS) {
      const doc = { ...DEMO_SCENARIO, method: defaultMethod(kind), observed: null };
      expect(parseScenario(doc).ok, kind).toBe(true);
    }
  });

  it('returns new lists, so later changes to the input do not reach the scenario', () => {
    const input = demo();
    const result = parseScenario(input);
    input['storm'].depthsMm[0] = 99;
    expect(result.ok && result.scenario.storm.depthsMm[0]).toBe(0.4);
  });

  it('reads a negative zero as zero', () => {
    const input = demo();
    input['storm'].depthsMm[0] = -0;
    input['catchment'].areaM2 = -0;
    input['method'] = { kind: 'constant', rateMmH: -0 };
    const result = parseScenario(input);
    if (!result.ok) expect.fail(JSON.stringify(result.problems));
    expect(Object.is(result.scenario.storm.depthsMm[0], 0)).toBe(true);
    expect(Object.is(result.scenario.catchment.areaM2, 0)).toBe(true);
    expect(Object.is((result.scenario.method as { rateMmH: number }).rateMmH, 0)).toBe(true);
  });

  it('accepts an empty storm, a storm with no start, and no observed runoff', () => {
    const input = demo();
    input['storm'] = { durationsH: [], depthsMm: [] };
    input['observed'] = null;
    expect(parseScenario(input).ok).toBe(true);
  });

  it.each([
    '2026-07-14T15:00',
    '2026-07-14T15:00:59',
    '2026-07-14T15:00:00.125Z',
    '2024-02-29T23:59+10:00',
    '2026-07-14T15:00:00-05:30',
  ])('accepts the storm start %s', (startIso) => {
    const input = demo();
    input['storm'].startIso = startIso;
    expect(parseScenario(input).ok).toBe(true);
  });
});

describe('parseScenario names the field of every problem', () => {
  it('names the bar of a negative depth, counting bars from 1 for people', () => {
    const input = demo();
    input['storm'].depthsMm[12] = -1;
    expect(problemAt(parseScenario(input), 'storm.depthsMm[12]').message).toBe(
      'storm.depthsMm[12] (bar 13): must be a number ≥ 0 (rain depth, mm) (got -1).',
    );
  });

  it.each([
    ['a text depth', 'depthsMm', '1.2', '(got "1.2")'],
    ['a null depth', 'depthsMm', null, '(got null)'],
    ['an infinite depth', 'depthsMm', Infinity, '(got Infinity)'],
    ['a NaN depth', 'depthsMm', NaN, '(got NaN)'],
    [
      'a zero duration',
      'durationsH',
      0,
      'must be a number of hours from 1 second (0.000278) to 500 years (bar duration) (got 0)',
    ],
    ['a negative duration', 'durationsH', -0.5, '(got -0.5)'],
    ['a duration of half a second', 'durationsH', 0.5 / 3600, '(got 0.000138'],
    // 10¹² min typed as a bar duration: 1.67·10¹⁰ h, far past 500 years (4,383,000 h).
    ['a duration of 10¹² min', 'durationsH', 1e12 / 60, '(got 16666666666.666666)'],
  ])('refuses %s', (_what, field, value, expected) => {
    const input = demo();
    input['storm'][field][3] = value;
    const found = problemAt(parseScenario(input), `storm.${field}[3]`);
    expect(found.message.startsWith(`storm.${field}[3] (bar 4): must be`)).toBe(true);
    expect(found.message).toContain(expected);
  });

  it('refuses bar lists of different lengths, saying both counts', () => {
    const input = demo();
    input['storm'].depthsMm.push(1);
    expect(problemAt(parseScenario(input), 'storm.depthsMm').message).toBe(
      'storm.depthsMm: has 19 bars but storm.durationsH has 18; every bar needs both a duration and a depth.',
    );
  });

  it('reports every bad bar at once, not only the first', () => {
    const input = demo();
    input['storm'].depthsMm[2] = -1;
    input['storm'].durationsH[5] = 0;
    input['storm'].depthsMm.push(2);
    const paths = problemsOf(parseScenario(input)).map((p) => p.path);
    expect(paths).toEqual(expect.arrayContaining(['storm.depthsMm[2]', 'storm.durationsH[5]', 'storm.depthsMm']));
  });

  it('lists at most a set number of problems and counts the rest', () => {
    const input = demo();
    input['storm'].depthsMm = input['storm'].depthsMm.map(() => -1); // 10 listed + 1 count
    input['storm'].durationsH = Array.from({ length: 18 }, () => 0); // 10 listed + 1 count
    input['units'] = 'metric';
    input['name'] = 1;
    const problems = problemsOf(parseScenario(input));
    expect(problems).toHaveLength(MAX_LISTED_PROBLEMS + 1);
    expect(problems[MAX_LISTED_PROBLEMS]?.message).toBe(`… and ${24 - MAX_LISTED_PROBLEMS} more problems.`);
  });

  it('counts, rather than lists, the bad bars of a long storm past the first few', () => {
    const input = demo();
    input['storm'] = {
      durationsH: Array.from({ length: 5000 }, () => 'x'),
      depthsMm: Array.from({ length: 5000 }, () => 1),
    };
    const problems = problemsOf(parseScenario(input));
    expect(problems).toHaveLength(LISTED_BARS + 1);
    expect(problems.slice(0, LISTED_BARS).map((p) => p.path)).toEqual(
      Array.from({ length: LISTED_BARS }, (_, k) => `storm.durationsH[${k}]`),
    );
    expect(problems[LISTED_BARS]).toEqual({
      path: 'storm.durationsH',
      message: `storm.durationsH: ${5000 - LISTED_BARS} more bars are wrong too (only the first ${LISTED_BARS} are listed).`,
    });
  });

  it.each([
    ['2026-02-30T10:00', 'no 30 February'],
    ['2026-07-14', 'a date without a time'],
    ['14/07/2026 15:00', 'not ISO 8601'],
    ['2026-07-14T24:00', 'hour 24'],
    ['July 14, 2026', 'words'],
  ])('refuses the storm start %s (%s)', (startIso) => {
    const input = demo();
    input['storm'].startIso = startIso;
    expect(problemAt(parseScenario(input), 'storm.startIso').message).toContain('must be an ISO 8601 date-time');
  });

  it('says which field is missing and what it holds', () => {
    const input = demo();
    delete input['storm'].depthsMm;
    delete input['units'];
    const result = parseScenario(input);
    expect(problemAt(result, 'storm.depthsMm').message).toBe(
      'storm.depthsMm: is missing (the rain depth of each bar, mm).',
    );
    expect(problemAt(result, 'units').message).toBe('units: is missing (the display units, "si" or "us").');
  });

  it('reports fields the format does not have instead of dropping them', () => {
    const input = demo();
    input['colour'] = 'blue';
    input['storm'].gauge = 'A1';
    input['catchment'].slope = 0.02;
    const result = parseScenario(input);
    expect(problemAt(result, 'colour').message).toBe(
      `colour: is not a field of a version ${CURRENT_SCENARIO_VERSION} scenario.`,
    );
    expect(problemAt(result, 'storm.gauge').message).toBe('storm.gauge: is not a field of the storm.');
    expect(problemAt(result, 'catchment.slope').message).toBe('catchment.slope: is not a field of the catchment.');
  });

  it('reports odd keys such as __proto__ and toString as unknown fields too', () => {
    const input = JSON.parse(JSON.stringify(DEMO_SCENARIO).replace('{', '{"__proto__":{"x":1},"toString":1,'));
    const paths = problemsOf(parseScenario(input)).map((p) => p.path);
    expect(paths).toEqual(expect.arrayContaining(['__proto__', 'toString']));
  });

  it('quotes a key that is not a plain name', () => {
    const input = demo();
    input['storm']['bar size'] = 1;
    expect(problemAt(parseScenario(input), 'storm["bar size"]').message).toBe(
      'storm["bar size"]: is not a field of the storm.',
    );
  });

  it.each([
    ['units', 'metric', 'units: must be "si" or "us" (got "metric").'],
    ['name', 7, 'name: must be text (got 7).'],
    ['storm', [1, 2], 'storm: must be an object with durationsH and depthsMm (got a list of 2 items).'],
    ['observed', 12.5, 'observed: must be an object with as, value, parameter and locked, or null (got 12.5).'],
  ])('refuses a wrong %s', (field, value, message) => {
    const input = demo();
    input[field] = value;
    expect(problemAt(parseScenario(input), field).message).toBe(message);
  });

  it('refuses a negative catchment area', () => {
    const input = demo();
    input['catchment'].areaM2 = -5;
    expect(problemAt(parseScenario(input), 'catchment.areaM2').message).toContain(
      'must be a number ≥ 0 (catchment area, m²',
    );
  });

  it('refuses a bad observed runoff, field by field', () => {
    const input = demo();
    input['observed'] = { as: 'flow', value: -1, parameter: 'rateMmH', locked: 'yes' };
    const result = parseScenario(input);
    expect(problemAt(result, 'observed.as').message).toBe('observed.as: must be "depth" or "volume" (got "flow").');
    expect(problemAt(result, 'observed.value').message).toContain('must be a number ≥ 0');
    expect(problemAt(result, 'observed.locked').message).toBe('observed.locked: must be true or false (got "yes").');
  });

  it('refuses a fitted parameter that the active method does not have', () => {
    const input = demo();
    input['observed'].parameter = 'coefficient';
    expect(problemAt(parseScenario(input), 'observed.parameter').message).toBe(
      'observed.parameter: "coefficient" is not a parameter of the active method "constant" (it can fit rateMmH).',
    );
  });

  it('refuses input that is not an object at all', () => {
    for (const input of [null, 3, 'scenario', [DEMO_SCENARIO], undefined]) {
      const problems = problemsOf(parseScenario(input));
      expect(problems).toHaveLength(1);
      expect(problems[0]?.path).toBe('');
      expect(problems[0]?.message).toMatch(/^A scenario must be a JSON object/);
    }
  });

  it('starts every message with its field path', () => {
    // Random damage to random fields of random scenarios.
    const damage = fc.constantFrom<unknown>(-1, 'x', null, [], {}, true, Infinity, NaN);
    fc.assert(
      fc.property(
        scenarioArb,
        fc.array(fc.tuple(fc.nat(), damage), { minLength: 1, maxLength: 4 }),
        (scenario, hits) => {
          const doc = structuredClone(scenario) as unknown as Record<string, unknown>;
          const slots = [
            (v: unknown) => (doc['name'] = v),
            (v: unknown) => (doc['units'] = v),
            (v: unknown) => (doc['catchment'] = { ...(doc['catchment'] as object), areaM2: v }),
            (v: unknown) => (doc['storm'] = { ...(doc['storm'] as object), durationsH: [v] }),
            (v: unknown) => (doc['method'] = { ...(doc['method'] as object), kind: v }),
            (v: unknown) =>
              (doc['observed'] = v === null ? 'none' : { as: 'depth', value: v, parameter: 'p', locked: false }),
          ];
          for (const [slot, value] of hits) slots[slot % slots.length]?.(value);
          const result = parseScenario(doc);
          if (result.ok) return; // some damage happens to be valid (e.g. observed: null)
          for (const p of result.problems) {
            expect(p.message.length).toBeGreaterThan(p.path.length + 2);
            if (p.path !== '') expect(p.message.startsWith(p.path)).toBe(true);
          }
        },
      ),
      { numRuns: 300, seed: 7 },
    );
  });
});

describe('parseScenario checks the method through the core table', () => {
  it('refuses a kind the core does not know, listing the kinds it does', () => {
    const input = demo();
    input['method'] = { kind: 'sponge', rateMmH: 3 };
    const message = problemAt(parseScenario(input), 'method.kind').message;
    expect(message.startsWith('method.kind: "sponge" is not a loss method this version of Raincut knows')).toBe(true);
    for (const kind of METHOD_KINDS) expect(message).toContain(`"${kind}"`);
  });

  it('refuses a method with no kind', () => {
    const input = demo();
    input['method'] = { rateMmH: 3 };
    expect(problemAt(parseScenario(input), 'method.kind').message).toMatch(/^method\.kind: is missing/);
  });

  it('refuses a parameter another method has', () => {
    const input = demo();
    input['method'] = { kind: 'constant', rateMmH: 3, coefficient: 0.5 };
    expect(problemAt(parseScenario(input), 'method.coefficient').message).toBe(
      'method.coefficient: is not a parameter of the "constant" method (its parameters are rateMmH).',
    );
  });

  for (const kind of METHOD_KINDS) {
    const spec = METHODS[kind] as MethodSpec;
    for (const param of spec.params) {
      it(`${kind}: refuses ${param.key} below its lower bound and names it`, () => {
        const input = demo();
        input['method'] = { ...defaultMethod(kind), [param.key]: param.min - 1 };
        input['observed'] = null;
        const message = problemAt(parseScenario(input), `method.${param.key}`).message;
        expect(message.startsWith(`method.${param.key}: ${param.label} must be`)).toBe(true);
      });

      it(`${kind}: refuses a missing ${param.key}`, () => {
        const input = demo();
        const method: Record<string, unknown> = { ...defaultMethod(kind) };
        delete method[param.key];
        input['method'] = method;
        input['observed'] = null;
        expect(problemAt(parseScenario(input), `method.${param.key}`).message).toMatch(
          new RegExp(`^method\\.${param.key}: is missing \\(`),
        );
      });

      if (Number.isFinite(param.max)) {
        it(`${kind}: refuses ${param.key} above its upper bound`, () => {
          const input = demo();
          input['method'] = { ...defaultMethod(kind), [param.key]: param.max + 1 };
          input['observed'] = null;
          expect(problemAt(parseScenario(input), `method.${param.key}`).message).toContain(param.label);
        });
      }
    }
  }

  for (const kind of METHOD_KINDS) {
    for (const choice of (METHODS[kind] as MethodSpec).choices ?? []) {
      it(`${kind}: refuses a ${choice.key} that is not one of its choices, and a missing one`, () => {
        const input = demo();
        input['observed'] = null;
        input['method'] = { ...defaultMethod(kind), [choice.key]: 'none of these' };
        expect(problemAt(parseScenario(input), `method.${choice.key}`).message).toBe(
          `method.${choice.key}: ${choice.label} must be ${choice.choices.map((c) => JSON.stringify(c.value)).join(' or ')} (got "none of these").`,
        );
        const method: Record<string, unknown> = { ...defaultMethod(kind) };
        delete method[choice.key];
        input['method'] = method;
        expect(problemAt(parseScenario(input), `method.${choice.key}`).message).toBe(
          `method.${choice.key}: is missing (${choice.label}).`,
        );
      });
    }
  }

  it('checks remembered methods too, each under its own kind', () => {
    const input = demo();
    input['methodMemory'] = {
      proportional: { kind: 'proportional', coefficient: 2 },
      constant: { kind: 'proportional', coefficient: 0.5 },
      sponge: { kind: 'sponge' },
    };
    const result = parseScenario(input);
    expect(problemAt(result, 'methodMemory.proportional.coefficient').message).toContain('Runoff coefficient must be');
    expect(problemAt(result, 'methodMemory.constant.kind').message).toBe(
      'methodMemory.constant.kind: must be "constant", the key it is stored under (got "proportional").',
    );
    expect(problemAt(result, 'methodMemory.sponge').message).toBe(
      'methodMemory.sponge: is not a loss method kind this version of Raincut knows.',
    );
  });

  it('keeps a valid memory of methods', () => {
    const input = demo();
    input['methodMemory'] = { proportional: { kind: 'proportional', coefficient: 0.25 } };
    const result = parseScenario(input);
    expect(result.ok && (result.scenario as Scenario).methodMemory).toEqual(input['methodMemory']);
  });
});
