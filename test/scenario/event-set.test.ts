import { describe, expect, it } from 'vitest';
import {
  CURRENT_SCENARIO_VERSION,
  DEMO_SCENARIO,
  MIGRATIONS,
  decodeScenarioLink,
  encodeScenarioLink,
  makeShareLink,
  migrate,
  parseScenario,
  scenarioFromFileText,
  scenarioToFileText,
} from '../../src/scenario';
import type { Scenario } from '../../src/scenario/types';
import { inventedEvents, withSet } from '../helpers/event-set-fixtures';

/** The demo as a version 2 document: what every link and file made before the event set holds. */
function versionTwo(): Record<string, unknown> {
  const { eventSet: _set, ...rest } = DEMO_SCENARIO;
  return JSON.parse(JSON.stringify({ ...rest, version: 2 }));
}

const messages = (r: ReturnType<typeof parseScenario>): string[] => (r.ok ? [] : r.problems.map((p) => p.message));

describe('scenario version 3: the event set', () => {
  it('is the current version, reached by one step from version 2', () => {
    expect(CURRENT_SCENARIO_VERSION).toBeGreaterThanOrEqual(3);
    expect(MIGRATIONS.map((m) => [m.from, m.to])).toContainEqual([2, 3]);
  });

  it('upgrades a version 2 document with an empty set and its storm left on the workbench, nothing else changed', () => {
    const v2 = versionTwo();
    const before = JSON.stringify(v2);
    const migrated = migrate(v2, MIGRATIONS, 3);
    expect(migrated).toEqual({
      ok: true,
      doc: { ...v2, version: 3, eventSet: { events: [], activeId: null, parameter: null, designPick: 'median' } },
      fromVersion: 2,
    });
    expect(JSON.stringify(v2)).toBe(before);
    expect(parseScenario(v2)).toEqual({ ok: true, scenario: DEMO_SCENARIO });
  });

  it('opens a version 2 file and a version 2 link to the same scenario', () => {
    const v2 = versionTwo();
    const file = scenarioToFileText(DEMO_SCENARIO)
      .replace(`"version": ${CURRENT_SCENARIO_VERSION},`, '"version": 2,')
      .replace(/,\n\s*"eventSet": \{[\s\S]*?\n {2}\}/, '');
    expect(file).not.toContain('eventSet');
    expect(scenarioFromFileText(file)).toEqual({ ok: true, scenario: DEMO_SCENARIO });
    expect(decodeScenarioLink(encodeScenarioLink(v2 as unknown as Scenario))).toEqual({
      ok: true,
      scenario: DEMO_SCENARIO,
    });
  });

  it('round-trips a set of events through a share link and a file, every double included', () => {
    const events = inventedEvents(3, 40, null);
    const scenario: Scenario = {
      ...withSet(events),
      eventSet: { ...withSet(events).eventSet, parameter: 'rateMmH', designPick: { value: 2.5 } },
    };
    expect(parseScenario(scenario)).toEqual({ ok: true, scenario });
    expect(decodeScenarioLink(encodeScenarioLink(scenario))).toStrictEqual({ ok: true, scenario });
    expect(scenarioFromFileText(scenarioToFileText(scenario))).toStrictEqual({ ok: true, scenario });
  });

  it('names the event, the field and the bar of a bad event', () => {
    const events = inventedEvents(2, 4);
    const bad = JSON.parse(JSON.stringify(withSet(events)));
    bad.eventSet.events[1].storm.depthsMm[2] = -1;
    bad.eventSet.events[1].observed = { as: 'depth', value: 'lots' };
    expect(messages(parseScenario(bad))).toEqual([
      'eventSet.events[1].storm.depthsMm[2] (event 2, bar 3): must be a number ≥ 0 (rain depth, mm) (got -1).',
      'eventSet.events[1].observed.value (event 2): must be a number ≥ 0 (mm for a depth, m³ for a volume) (got "lots").',
    ]);
  });

  it('refuses repeated ids, an active id that names no event, an odd design pick and unknown fields', () => {
    const events = inventedEvents(2, 4);
    const doc = JSON.parse(JSON.stringify(withSet(events)));
    doc.eventSet.events[1].id = 'e1';
    doc.eventSet.activeId = 'e9';
    expect(messages(parseScenario(doc))).toEqual([
      'eventSet.events[1].id (event 2): "e1" is already the id of event 1; ids must be unique.',
      'eventSet.activeId: "e9" is not the id of any event in the set; use one of them or null.',
    ]);
    const odd = JSON.parse(JSON.stringify(withSet(events)));
    odd.eventSet.designPick = 'mode';
    odd.eventSet.events[0].colour = 'red';
    expect(messages(parseScenario(odd))).toEqual([
      'eventSet.designPick: must be "median", "mean", "min", "max" or an object { "value": number } (got "mode").',
      'eventSet.events[0].colour (event 1): is not a field of event 1.',
    ]);
  });

  it('says a missing event set field is missing, with what it holds', () => {
    const doc = JSON.parse(JSON.stringify(DEMO_SCENARIO));
    delete doc.eventSet.designPick;
    expect(messages(parseScenario(doc))).toEqual([
      'eventSet.designPick: is missing (the design value: "median", "mean", "min", "max" or { "value": number }).',
    ]);
  });
});

describe('share link length with an event set', () => {
  // Measured sizes, not timings: a change to the document or the link format
  // that makes these links longer fails here and is seen.
  it('ten events of 100 bars at gauge resolution make a link of 2,186 characters, under the 8,000 kept practical', () => {
    const made = makeShareLink(withSet(inventedEvents(10, 100)));
    expect(made.ok).toBe(true);
    const length = made.ok ? made.fragment.length : 0;
    expect(length).toBe(2186);
  });

  it('ten events of 100 unrounded bars (scaled or design storms) make a link of 14,432 characters, over 8,000', () => {
    const made = makeShareLink(withSet(inventedEvents(10, 100, null)));
    expect(made.ok).toBe(true);
    const length = made.ok ? made.fragment.length : 0;
    expect(length).toBe(14432);
  });
});
