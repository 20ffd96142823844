// Scenario version 5: the runoff hydrograph of issue 13 (the transform from
// excess to direct runoff, its fit objective) and the uncertainty of the
// observed runoff, with the pure step that brings a version 4 document up
// so that it opens to the same screen and numbers.
import { describe, expect, it } from 'vitest';
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
} from '../../src/scenario';
import type { Scenario } from '../../src/scenario/types';
import { deepFreeze } from '../helpers/scenario-fixtures';

/** A version 4 document as Raincut wrote it before issue 13. */
function versionFour(): Record<string, unknown> {
  const { hydrograph: _h, observedUncertaintyPct: _u, ...rest } = JSON.parse(JSON.stringify(DEMO_SCENARIO));
  return { ...rest, version: 4 };
}

const messages = (doc: unknown): string[] => {
  const r = parseScenario(doc);
  return r.ok ? [] : r.problems.map((p) => p.message);
};

const withHydrograph = (patch: Record<string, unknown>): Record<string, unknown> => ({
  ...JSON.parse(JSON.stringify(DEMO_SCENARIO)),
  hydrograph: { ...DEMO_SCENARIO.hydrograph, ...patch },
});

describe('scenario version 5: the runoff hydrograph', () => {
  it('is the current version, one step up from version 4', () => {
    expect(CURRENT_SCENARIO_VERSION).toBe(5);
    expect(MIGRATIONS.map((m) => [m.from, m.to])).toContainEqual([4, 5]);
    expect(DEMO_SCENARIO.version).toBe(5);
  });

  it('gives a version 4 document no transform and no uncertainty, and changes nothing else', () => {
    const v4 = deepFreeze(versionFour());
    const before = JSON.stringify(v4);
    const migrated = migrate(v4);
    expect(migrated).toEqual({
      ok: true,
      fromVersion: 4,
      doc: {
        ...v4,
        version: 5,
        hydrograph: { transform: null, transformMemory: {}, fitParameter: null, objective: 'nse' },
        observedUncertaintyPct: 0,
      },
    });
    // Pure: the input is untouched (it is frozen, and its text is the same).
    expect(JSON.stringify(v4)).toBe(before);
    // And it opens to the demo itself: the same screen as before the step.
    expect(parseScenario(v4)).toEqual({ ok: true, scenario: DEMO_SCENARIO });
  });

  it('opens a version 1 document all the way up, with no hydrograph', () => {
    const { streamflow: _s, eventSet: _e, ...v1 } = versionFour();
    const opened = parseScenario({ ...v1, version: 1 });
    expect(opened.ok && opened.scenario.hydrograph.transform).toBe(null);
    expect(opened.ok && opened.scenario.observedUncertaintyPct).toBe(0);
  });

  it('passes fields a version 4 document already had on to the schema', () => {
    const odd = parseScenario({ ...versionFour(), hydrograph: 'lag 2 h', observedUncertaintyPct: -5 });
    expect(odd.ok).toBe(false);
    if (!odd.ok) expect(odd.problems.map((p) => p.path)).toEqual(['hydrograph', 'observedUncertaintyPct']);
  });

  it('carries every transform kind, its memory and the fit settings through a link and a file unchanged', () => {
    const scenario: Scenario = {
      ...DEMO_SCENARIO,
      hydrograph: {
        transform: { kind: 'nash', n: 2.5, kH: 0.35 },
        transformMemory: {
          'nrcs-dimensionless': { kind: 'nrcs-dimensionless', lagH: 0.75, peakRateFactor: 300 },
          triangular: { kind: 'triangular', lagH: 1.2 },
          nash: { kind: 'nash', n: 2.5, kH: 0.35 },
          'unit-hydrograph': {
            kind: 'unit-hydrograph',
            durationH: 0.5,
            stepH: 0.25,
            ordinatesM3sPerMm: [0, 0.4, 0.9, 0.5, 0.2, 0],
          },
        },
        fitParameter: 'n',
        objective: 'time-of-peak',
      },
      observedUncertaintyPct: 12.5,
    };
    const link = encodeScenarioLink(scenario);
    expect(decodeScenarioLink(link)).toEqual({ ok: true, scenario });
    expect(scenarioFromFileText(scenarioToFileText(scenario))).toEqual({ ok: true, scenario });
  });

  it('refuses a bad transform with the core’s message at its path', () => {
    expect(messages(withHydrograph({ transform: { kind: 'triangular', lagH: -1 } }))).toEqual([
      'hydrograph.transform.lagH: Lag must be greater than 0 and at most 1000 h (got -1).',
    ]);
    expect(messages(withHydrograph({ transform: { kind: 'kinematic-wave', lagH: 1 } }))).toEqual([
      'hydrograph.transform.kind: "kinematic-wave" is not a transform this version of Raincut knows ' +
        '("nrcs-dimensionless", "triangular", "nash", "unit-hydrograph").',
    ]);
    expect(
      messages(
        withHydrograph({
          transform: { kind: 'unit-hydrograph', durationH: 1, stepH: 1, ordinatesM3sPerMm: [0, 2, -1, 0] },
        }),
      ),
    ).toEqual([
      'hydrograph.transform.ordinatesM3sPerMm[2]: Ordinate 3: discharge must be a finite number of m³/s per mm, zero or more (got -1).',
    ]);
    expect(messages(withHydrograph({ transform: { kind: 'nash', n: 3, kH: 1, lagH: 2 } }))).toEqual([
      'hydrograph.transform.lagH: is not a parameter of the nash cascade.',
    ]);
  });

  it('refuses a memory entry stored under another kind, a parameter that cannot be fitted, an unknown objective', () => {
    expect(messages(withHydrograph({ transformMemory: { nash: { kind: 'triangular', lagH: 1 } } }))).toEqual([
      'hydrograph.transformMemory.nash.kind: must be "nash", the key it is stored under (got "triangular").',
    ]);
    expect(messages(withHydrograph({ transform: { kind: 'triangular', lagH: 1 }, fitParameter: 'kH' }))).toEqual([
      'hydrograph.fitParameter: "kH" is not a parameter of the transform "triangular" that can be fitted (it can fit lagH; or null).',
    ]);
    expect(messages(withHydrograph({ objective: 'volume' }))[0]).toMatch(
      /^hydrograph\.objective: must be "peak", "time-of-peak" or "nse"/,
    );
  });

  it('refuses an uncertainty of 100 % or more, or below 0, and an unknown field of the settings by name', () => {
    const doc = JSON.parse(JSON.stringify(DEMO_SCENARIO));
    expect(messages({ ...doc, observedUncertaintyPct: 100 })).toEqual([
      'observedUncertaintyPct: must be a number of per cent from 0 to below 100 (uncertainty of the observed runoff; 0 for none) (got 100).',
    ]);
    expect(messages({ ...doc, observedUncertaintyPct: 99.5 })).toEqual([]);
    expect(messages(withHydrograph({ colour: 'teal' }))).toEqual([
      'hydrograph.colour: is not a field of the runoff hydrograph settings.',
    ]);
    const { objective: _o, ...noObjective } = DEMO_SCENARIO.hydrograph;
    expect(messages({ ...doc, hydrograph: noObjective })).toEqual([
      'hydrograph.objective: is missing (what the transform fit matches: "peak", "time-of-peak" or "nse").',
    ]);
  });
});
