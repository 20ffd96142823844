// Scenario version 4: the infiltration settings of issue 10 (recovery in dry
// spells, the curve number's S conversion), and the pure step that brings a
// version 3 document up so that it opens to the same numbers.
import { describe, expect, it } from 'vitest';
import { computeLosses, type LossMethod } from '../../src/core';
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

/** A version 3 document as Raincut wrote it before issue 10: the curve number on the 0.05 basis, two methods remembered. */
function versionThree(): Record<string, unknown> {
  return JSON.parse(
    JSON.stringify({
      ...DEMO_SCENARIO,
      version: 3,
      method: { kind: 'curve-number', cn: 80, iaRatio: 0.05 },
      methodMemory: {
        horton: { kind: 'horton', f0MmH: 75, fcMmH: 10, kPerH: 4, ponding: true },
        'green-ampt': { kind: 'green-ampt', ksMmH: 3.4, suctionMm: 88.9, moistureDeficit: 0.3038 },
        'curve-number': { kind: 'curve-number', cn: 80, iaRatio: 0.05 },
        constant: { kind: 'constant', rateMmH: 6 },
      },
      observed: { as: 'depth', value: 12.5, parameter: 'cn', locked: false },
    }),
  );
}

const opened = (doc: unknown): Scenario => {
  const r = parseScenario(doc);
  if (!r.ok) expect.fail(r.problems.map((p) => p.message).join('\n'));
  return r.scenario;
};

describe('scenario version 4: infiltration settings', () => {
  it('is one step up from version 3 (version 5 came after it)', () => {
    expect(CURRENT_SCENARIO_VERSION).toBeGreaterThanOrEqual(4);
    expect(MIGRATIONS.map((m) => [m.from, m.to])).toContainEqual([3, 4]);
    expect(DEMO_SCENARIO.version).toBe(CURRENT_SCENARIO_VERSION);
  });

  it('adds to the method and every remembered method the settings that compute what version 3 computed, and nothing else', () => {
    const v3 = deepFreeze(versionThree());
    const before = JSON.stringify(v3);
    // The chain up to version 4 only: the step to 5 is tested in runoff-hydrograph.test.ts.
    const migrated = migrate(v3, MIGRATIONS, 4);
    expect(migrated).toEqual({
      ok: true,
      fromVersion: 3,
      doc: {
        ...v3,
        version: 4,
        method: { kind: 'curve-number', cn: 80, iaRatio: 0.05, conversion: 'ratio' },
        methodMemory: {
          horton: {
            kind: 'horton',
            f0MmH: 75,
            fcMmH: 10,
            kPerH: 4,
            ponding: true,
            recovers: false,
            recoveryPerH: 0.05,
          },
          'green-ampt': {
            kind: 'green-ampt',
            ksMmH: 3.4,
            suctionMm: 88.9,
            moistureDeficit: 0.3038,
            recovers: false,
            initialSaturation: 0.3,
            poreSizeIndex: 0.22,
          },
          'curve-number': { kind: 'curve-number', cn: 80, iaRatio: 0.05, conversion: 'ratio' },
          constant: { kind: 'constant', rateMmH: 6 },
        },
      },
    });
    expect(JSON.stringify(v3)).toBe(before); // the step is pure
  });

  it('keeps the 0.05-basis curve number at the constant ratio it had: the same runoff as version 3', () => {
    // Version 3 computed S₀.₀₅ = 1.42·S₀.₂: CN 80 → S₀.₂ = 63.5 mm, S₀.₀₅ = 90.17 mm,
    // Iₐ = 4.5085 mm; the demo's 41.6 mm → Q = 37.0915²/(37.0915 + 90.17) = 10.8102 mm (by hand).
    const scenario = opened(versionThree());
    const q = computeLosses(scenario.storm, scenario.method).totalExcessMm;
    expect(q).toBeCloseTo((37.0915 * 37.0915) / (37.0915 + 90.17), 9);
  });

  it('gives the power relation to a curve number on the 0.2 basis, where it is not read', () => {
    const v3 = { ...versionThree(), method: { kind: 'curve-number', cn: 70, iaRatio: 0.2 } };
    expect(opened(v3).method).toEqual({ kind: 'curve-number', cn: 70, iaRatio: 0.2, conversion: 'power' });
  });

  it('opens a version 3 link and a version 3 file to the same scenario as the document', () => {
    const expected = opened(versionThree());
    expect(decodeScenarioLink(encodeScenarioLink(versionThree() as unknown as Scenario))).toEqual({
      ok: true,
      scenario: expected,
    });
    // The file as version 3 wrote it: the same writer, given the old document.
    const file = scenarioToFileText(versionThree() as unknown as Scenario);
    expect(file).toContain('"version": 3');
    expect(file).not.toMatch(/conversion|recover/);
    expect(scenarioFromFileText(file)).toEqual({ ok: true, scenario: expected });
  });

  it('keeps settings a version 3 document already had and passes odd input on for the schema to name', () => {
    const v3 = versionThree();
    const kept = migrate({
      ...v3,
      method: { kind: 'horton', f0MmH: 60, fcMmH: 8, kPerH: 3, ponding: false, recovers: true },
    });
    expect(kept.ok && kept.doc['method']).toEqual({
      kind: 'horton',
      f0MmH: 60,
      fcMmH: 8,
      kPerH: 3,
      ponding: false,
      recovers: true,
      recoveryPerH: 0.05,
    });
    const odd = parseScenario({ ...v3, method: null, methodMemory: [] });
    expect(odd.ok).toBe(false);
    if (!odd.ok) {
      expect(odd.problems.map((p) => p.path)).toEqual(['method', 'methodMemory']);
    }
  });

  it('refuses a version 4 document that leaves a setting out, naming it', () => {
    const doc = {
      ...DEMO_SCENARIO,
      method: { kind: 'green-ampt', ksMmH: 3.4, suctionMm: 88.9, moistureDeficit: 0.3, recovers: true },
      observed: null,
    };
    const r = parseScenario(doc);
    expect(r.ok).toBe(false);
    if (!r.ok)
      expect(r.problems.map((p) => p.message)).toEqual([
        'method.initialSaturation: is missing (Initial saturation Sᵢ).',
        'method.poreSizeIndex: is missing (Pore-size distribution index λ).',
      ]);
  });

  it('refuses a recovery rate on Green–Ampt, whose recovery follows the soil and has none', () => {
    const doc = {
      ...DEMO_SCENARIO,
      method: {
        kind: 'green-ampt',
        ksMmH: 3.4,
        suctionMm: 88.9,
        moistureDeficit: 0.3,
        recovers: true,
        initialSaturation: 0.3,
        poreSizeIndex: 0.22,
        recoveryPerH: 0.05,
      },
      observed: null,
    };
    const r = parseScenario(doc);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems.map((p) => p.path)).toEqual(['method.recoveryPerH']);
  });

  it('round-trips Green–Ampt recovery and its soil values through a link and a file, with the results they give', () => {
    const method: LossMethod = {
      kind: 'green-ampt',
      ksMmH: 6.5,
      suctionMm: 166.8,
      moistureDeficit: 0.34,
      recovers: true,
      initialSaturation: 0.3,
      poreSizeIndex: 0.211,
    };
    const scenario: Scenario = {
      ...DEMO_SCENARIO,
      storm: { durationsH: [0.5, 6, 0.5], depthsMm: [30, 0, 30] },
      method,
      observed: null,
    };
    for (const back of [
      decodeScenarioLink(encodeScenarioLink(scenario)),
      scenarioFromFileText(scenarioToFileText(scenario)),
    ]) {
      expect(back).toStrictEqual({ ok: true, scenario });
      if (back.ok)
        expect(computeLosses(back.scenario.storm, back.scenario.method).lossMm[2]).toBe(
          computeLosses(scenario.storm, method).lossMm[2],
        );
    }
  });

  it('round-trips recovery and the conversion through a link and a file, with the results they give', () => {
    const method: LossMethod = {
      kind: 'horton',
      f0MmH: 60,
      fcMmH: 8,
      kPerH: 3,
      ponding: false,
      recovers: true,
      recoveryPerH: 0.4,
    };
    const scenario: Scenario = {
      ...DEMO_SCENARIO,
      storm: { durationsH: [0.5, 2, 0.5], depthsMm: [40, 0, 40] },
      method,
      methodMemory: { 'curve-number': { kind: 'curve-number', cn: 62, iaRatio: 0.05, conversion: 'power' } },
      observed: null,
    };
    for (const back of [
      decodeScenarioLink(encodeScenarioLink(scenario)),
      scenarioFromFileText(scenarioToFileText(scenario)),
    ]) {
      expect(back).toStrictEqual({ ok: true, scenario });
      if (back.ok)
        expect(computeLosses(back.scenario.storm, back.scenario.method).lossMm[2]).toBe(
          computeLosses(scenario.storm, method).lossMm[2],
        );
    }
  });
});
