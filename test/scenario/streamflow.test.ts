import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import {
  CURRENT_SCENARIO_VERSION,
  DEMO_SCENARIO,
  MIGRATIONS,
  decodeScenarioLink,
  encodeScenarioLink,
  migrate,
  parseScenario,
  scenarioFromFileText,
  scenarioToFileText,
  type Scenario,
  type ScenarioResult,
} from '../../src/scenario';
import type { Streamflow } from '../../src/scenario/types';
import { scenarioArb } from '../helpers/scenario-arbitraries';

/** An invented event record: a rise from 0.4 m³/s to a 5.1 m³/s peak and a recession. */
const RECORD: Streamflow = {
  timesH: [0, 1, 2, 3, 4.5, 6, 9, 12],
  dischargeM3s: [0.4, 0.4, 2.9, 5.1, 3.2, 1.9, 0.9, 0.5],
  startIso: '2026-07-14T14:00:00',
  offsetH: 0,
  baseflow: { kind: 'straight-line', endTimeH: 9 },
  baseflowMemory: { eckhardt: { kind: 'eckhardt', a: 0.98, bfiMax: 0.8 } },
  useAsObserved: false,
};

const WITH_RECORD: Scenario = { ...DEMO_SCENARIO, streamflow: RECORD };

/** A version 1 document as Raincut 1 wrote it: no streamflow field at all. */
function versionOne(): Record<string, unknown> {
  const { streamflow: _none, eventSet: _set, ...rest } = DEMO_SCENARIO;
  return { ...rest, version: 1 };
}

function messages(result: ScenarioResult): string[] {
  if (result.ok) expect.fail('expected the document to be refused');
  return result.problems.map((p) => p.message);
}

function paths(result: ScenarioResult): string[] {
  if (result.ok) expect.fail('expected the document to be refused');
  return result.problems.map((p) => p.path);
}

/** The record with some fields replaced (may be made invalid on purpose). */
const withFlow = (patch: Record<string, unknown>): Record<string, unknown> => ({
  ...WITH_RECORD,
  streamflow: { ...RECORD, ...patch },
});

describe('scenario version 2: the streamflow record', () => {
  it('is in the upgrade chain, and the current version is at least 2', () => {
    expect(CURRENT_SCENARIO_VERSION).toBeGreaterThanOrEqual(2);
    expect(MIGRATIONS.map((m) => [m.from, m.to])).toContainEqual([1, 2]);
  });

  it('upgrades a version 1 document to version 2 with no record and nothing else changed', () => {
    const v1 = versionOne();
    const migrated = migrate(v1, MIGRATIONS, 2);
    expect(migrated).toEqual({ ok: true, doc: { ...v1, version: 2, streamflow: null }, fromVersion: 1 });
    expect(parseScenario(v1)).toEqual({ ok: true, scenario: DEMO_SCENARIO });
  });

  it('leaves the version 1 document it upgrades untouched', () => {
    const v1 = versionOne();
    const before = JSON.stringify(v1);
    migrate(v1);
    expect(JSON.stringify(v1)).toBe(before);
  });

  it('opens a version 1 file and a version 1 link with no record', () => {
    const file = scenarioToFileText(DEMO_SCENARIO)
      .replace(`"version": ${CURRENT_SCENARIO_VERSION},`, '"version": 1,')
      .replace(/,\n\s*"streamflow": null/, '')
      .replace(/,\n\s*"eventSet": \{[\s\S]*?\n {2}\}/, '');
    expect(file).not.toContain('streamflow');
    expect(scenarioFromFileText(file)).toEqual({ ok: true, scenario: DEMO_SCENARIO });
    const link = encodeScenarioLink(versionOne() as unknown as Scenario);
    expect(decodeScenarioLink(link)).toEqual({ ok: true, scenario: DEMO_SCENARIO });
  });

  it('checks a streamflow field found in a version 1 document as a version 2 record rather than dropping it', () => {
    const good = parseScenario({ ...versionOne(), streamflow: RECORD });
    expect(good).toEqual({ ok: true, scenario: WITH_RECORD });
    const bad = parseScenario({ ...versionOne(), streamflow: { ...RECORD, offsetH: 'soon' } });
    expect(messages(bad)).toEqual([
      'streamflow.offsetH: must be a number of hours from the storm start to the first sample, within 500 years either way (got "soon").',
    ]);
  });

  it('reads a record with its separation, end point and link to the observed runoff', () => {
    const doc = { ...WITH_RECORD, streamflow: { ...RECORD, useAsObserved: true } };
    expect(parseScenario(doc)).toEqual({ ok: true, scenario: doc });
  });

  it('reads a record without a clock and with automatic parameters left out', () => {
    const { startIso: _clock, ...noClock } = RECORD;
    const doc = { ...WITH_RECORD, streamflow: { ...noClock, offsetH: -1.5, baseflow: { kind: 'straight-line' } } };
    expect(parseScenario(doc)).toEqual({ ok: true, scenario: doc });
  });

  it('carries a record through a share link bit for bit', () => {
    const record = fc.record({
      steps: fc.array(fc.double({ min: 1 / 60, max: 24, noNaN: true }), { minLength: 1, maxLength: 300 }),
      flows: fc.array(fc.double({ min: 0, max: 5000, noNaN: true }), { minLength: 301, maxLength: 301 }),
      offsetH: fc.double({ min: -48, max: 48, noNaN: true }),
      alpha: fc.double({ min: 0, max: 0.999, noNaN: true }),
      passes: fc.integer({ min: 1, max: 9 }),
      linked: fc.boolean(),
    });
    fc.assert(
      fc.property(scenarioArb, record, (scenario, r) => {
        const timesH = [0];
        for (const step of r.steps) timesH.push((timesH[timesH.length - 1] as number) + step);
        // Skip the rare case where rounding makes two sums equal; the schema would rightly refuse it.
        fc.pre(timesH.every((t, k) => k === 0 || t > (timesH[k - 1] as number)));
        const dischargeM3s = r.flows.slice(0, timesH.length).map((q) => (q === 0 ? 0 : q));
        const observed = scenario.observed;
        const doc: Scenario = {
          ...scenario,
          streamflow: {
            timesH,
            dischargeM3s,
            offsetH: r.offsetH === 0 ? 0 : r.offsetH,
            baseflow: { kind: 'lyne-hollick', alpha: r.alpha === 0 ? 0 : r.alpha, passes: r.passes },
            baseflowMemory: {
              'straight-line': { kind: 'straight-line', endTimeH: timesH[timesH.length - 1] as number },
            },
            useAsObserved: r.linked && observed !== null,
          },
        };
        const back = decodeScenarioLink(encodeScenarioLink(doc));
        expect(back).toEqual({ ok: true, scenario: doc });
        expect(scenarioFromFileText(scenarioToFileText(doc))).toEqual({ ok: true, scenario: doc });
      }),
      { numRuns: 60 },
    );
  });

  it('refuses times that do not increase, naming the sample', () => {
    const result = parseScenario(withFlow({ timesH: [0, 1, 2, 3, 2, 6, 9, 12] }));
    expect(messages(result)).toEqual([
      'streamflow.timesH[4] (sample 5): Sample 5: time 2 h must be later than the time of sample 4 (3 h); times must strictly increase.',
    ]);
  });

  it('refuses a negative or missing discharge, naming each sample', () => {
    const result = parseScenario(withFlow({ dischargeM3s: [0.4, -1, 2.9, 5.1, 'x', 1.9, 0.9, 0.5] }));
    expect(messages(result)).toEqual([
      'streamflow.dischargeM3s[1] (sample 2): must be a number ≥ 0 (discharge, m³/s) (got -1).',
      'streamflow.dischargeM3s[4] (sample 5): must be a number ≥ 0 (discharge, m³/s) (got "x").',
    ]);
  });

  it('refuses lists of different lengths and a record of one sample', () => {
    expect(messages(parseScenario(withFlow({ dischargeM3s: [1, 2] })))).toEqual([
      'streamflow.dischargeM3s: has 2 samples but streamflow.timesH has 8; every sample needs both a time and a discharge.',
    ]);
    expect(messages(parseScenario(withFlow({ timesH: [0], dischargeM3s: [1] })))).toEqual([
      'streamflow.timesH: The streamflow record needs at least two samples to hold a volume (got 1).',
    ]);
  });

  it('refuses a baseflow method the core does not know, or a parameter it does not have', () => {
    expect(messages(parseScenario(withFlow({ baseflow: { kind: 'sponge' } })))[0]).toMatch(
      /^streamflow\.baseflow\.kind: "sponge" is not a baseflow method this version of Raincut knows \("constant", "straight-line"/,
    );
    expect(
      messages(parseScenario(withFlow({ baseflow: { kind: 'eckhardt', a: 0.98, bfiMax: 0.8, beta: 1 } }))),
    ).toEqual([
      'streamflow.baseflow.beta: is not a parameter of the "eckhardt" baseflow method (its parameters are a, bfiMax, stepH, warmUpSamples).',
    ]);
    expect(messages(parseScenario(withFlow({ baseflow: { kind: 'eckhardt', a: 1, bfiMax: 0.8 } })))).toEqual([
      'streamflow.baseflow.a: Recession constant a must be a number at least 0 and less than 1 (got 1).',
    ]);
    expect(messages(parseScenario(withFlow({ baseflow: { kind: 'lyne-hollick', alpha: 0.9 } })))).toEqual([
      'streamflow.baseflow.passes: is missing (Passes).',
    ]);
  });

  it('refuses an end point or a start of rise outside the record, with the core’s message', () => {
    expect(messages(parseScenario(withFlow({ baseflow: { kind: 'straight-line', endTimeH: 13 } })))).toEqual([
      'streamflow.baseflow.endTimeH: The end point (13 h) is after the last sample of the record (12 h).',
    ]);
    expect(paths(parseScenario(withFlow({ baseflow: { kind: 'constant', riseIndex: 8 } })))).toEqual([
      'streamflow.baseflow.riseIndex',
    ]);
    expect(
      paths(
        parseScenario(
          withFlow({ baseflowMemory: { 'straight-line': { kind: 'straight-line', endTimeH: 0.5, riseIndex: 1 } } }),
        ),
      ),
    ).toEqual(['streamflow.baseflowMemory["straight-line"].endTimeH']);
  });

  it('does not judge an end point that waits for the catchment area', () => {
    const doc = { ...withFlow({ baseflow: { kind: 'straight-line' } }), catchment: { name: '', areaM2: 0 } };
    expect(parseScenario(doc).ok).toBe(true);
  });

  it('refuses a link to an observed runoff that is not there', () => {
    expect(messages(parseScenario({ ...withFlow({ useAsObserved: true }), observed: null }))).toEqual([
      'streamflow.useAsObserved: is true, but there is no observed runoff to follow the separation (observed is null); set observed or make this false.',
    ]);
  });

  it('names missing and unknown fields of the record', () => {
    const { offsetH: _gone, ...rest } = RECORD;
    expect(messages(parseScenario({ ...WITH_RECORD, streamflow: rest }))).toEqual([
      'streamflow.offsetH: is missing (hours from the storm start to the first sample (negative when the record starts first)).',
    ]);
    expect(messages(parseScenario(withFlow({ gauge: 'G1' })))).toEqual([
      'streamflow.gauge: is not a field of the streamflow record.',
    ]);
    expect(messages(parseScenario({ ...WITH_RECORD, streamflow: [1, 2] }))[0]).toMatch(
      /^streamflow: must be an object with timesH/,
    );
  });

  it('requires the field in a version 2 document', () => {
    const { streamflow: _gone, ...rest } = WITH_RECORD;
    expect(messages(parseScenario(rest))).toEqual([
      'streamflow: is missing (the streamflow record of the event and its baseflow separation, or null).',
    ]);
  });

  it('matches the example in docs/scenario-schema.md', () => {
    const page = readFileSync(join(import.meta.dirname, '../../docs/scenario-schema.md'), 'utf8');
    const example = /## Example \(version \d+\)\s+```json\n([\s\S]*?)```/.exec(page)?.[1];
    expect(example).toBeDefined();
    const doc = JSON.parse(example as string);
    expect(parseScenario(doc)).toEqual({ ok: true, scenario: doc });
    expect(doc.streamflow).toEqual({ ...RECORD, useAsObserved: true });
  });
});
