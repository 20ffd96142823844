// The scenario generator reaches what its tests claim: storms and records of
// hundreds of entries, full event sets, long notes, every baseflow method, and
// documents the schema accepts.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { BASEFLOW_KINDS, FIRST_CLOCK_YEAR, LAST_CLOCK_YEAR, MAX_RECORD_H, hoursBetweenClocks } from '../../src/core';
import { parseScenario } from '../../src/scenario';
import { MAX_BARS, MAX_SAMPLES, MAX_SET_EVENTS, scenarioArb } from './scenario-arbitraries';

describe('the scenario generator', () => {
  const docs = fc.sample(scenarioArb, { numRuns: 150, seed: 20261204 });
  const records = docs
    .flatMap((d) => [d.streamflow, ...d.eventSet.events.map((e) => e.streamflow)])
    .filter((r) => r !== null);

  it('reaches its maximum storm length and gives storms of hundreds of bars often', () => {
    const bars = docs.map((d) => d.storm.depthsMm.length);
    expect(Math.max(...bars)).toBeGreaterThanOrEqual(0.9 * MAX_BARS);
    expect(bars.filter((n) => n >= 100).length).toBeGreaterThanOrEqual(docs.length / 3);
  });

  it('reaches its maximum record length, full event sets and long notes', () => {
    expect(Math.max(...records.map((r) => r.timesH.length))).toBeGreaterThanOrEqual(0.9 * MAX_SAMPLES);
    expect(docs.some((d) => d.eventSet.events.length === MAX_SET_EVENTS)).toBe(true);
    expect(Math.max(...docs.map((d) => d.notes.length))).toBeGreaterThan(200);
  });

  it('gives records linked to the observed runoff, active events and every baseflow method', () => {
    expect(docs.filter((d) => d.streamflow?.useAsObserved).length).toBeGreaterThan(10);
    expect(docs.filter((d) => d.eventSet.activeId !== null).length).toBeGreaterThan(10);
    expect(new Set(records.map((r) => r.baseflow.kind))).toEqual(new Set(BASEFLOW_KINDS));
  });

  it('reaches the limits of time: start clocks in the first and last years, a record exactly 500 years from its storm', () => {
    const clocks = docs.flatMap((d) => [d.storm.startIso, d.streamflow?.startIso]).filter((c) => c !== undefined);
    expect(clocks.some((c) => c.startsWith(`${FIRST_CLOCK_YEAR}-`))).toBe(true);
    expect(clocks.some((c) => c.startsWith(`${LAST_CLOCK_YEAR}-`))).toBe(true);
    const apart = docs.map((d) =>
      d.storm.startIso && d.streamflow?.startIso
        ? Math.abs(hoursBetweenClocks(d.storm.startIso, d.streamflow.startIso)?.hours ?? Number.NaN)
        : Number.NaN,
    );
    // 500 years of 365.25 days = 4,383,000 h, the most a record's clock may lie from its storm's.
    expect(apart.some((h) => h === MAX_RECORD_H)).toBe(true);
  });

  it('gives only documents the schema accepts as they are', () => {
    for (const doc of docs.slice(0, 60)) expect(parseScenario(doc)).toStrictEqual({ ok: true, scenario: doc });
  });
});
