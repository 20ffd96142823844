// The invented sample files shipped in public/samples/ (for trying the paste
// and open dialogs) read back as the demo storm and a usable gauge record.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { separateBaseflow } from '../../src/core';
import { applyFlowImport, applyRainImport, guessFlowImport, guessRainImport } from '../../src/io';
import { DEMO_SCENARIO } from '../../src/scenario/demo';
import { expectAllClose } from '../helpers/tolerance';

const read = (name: string): string => readFileSync(join(import.meta.dirname, '../../public/samples', name), 'utf8');

describe('invented sample files', () => {
  it('the rainfall sample reads as the demo storm, on the same clock', () => {
    const text = read('fenmoor-brook-rain-invented.tsv');
    const result = applyRainImport(text, guessRainImport(text).settings);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expectAllClose(result.storm.depthsMm, DEMO_SCENARIO.storm.depthsMm, 1e-12);
    expectAllClose(result.storm.durationsH, DEMO_SCENARIO.storm.durationsH, 1e-9);
    expect(result.storm.startIso).toBe('2026-07-14T15:00:00');
  });

  it('the streamflow sample reads as a 10-hour record whose direct runoff is a plausible match target', () => {
    const text = read('fenmoor-brook-flow-invented.csv');
    const result = applyFlowImport(text, guessFlowImport(text).settings);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.record.timesH.length).toBe(41);
    expect(result.record.timesH.at(-1)).toBeCloseTo(10, 9);
    const split = separateBaseflow(result.record, { kind: 'constant' }, { areaM2: DEMO_SCENARIO.catchment.areaM2 });
    // Direct runoff between 10 and 20 mm of the 41.6 mm storm: a runoff fraction an invented
    // suburban catchment could give (common practice range, no source).
    expect(split.directDepthMm).toBeGreaterThan(10);
    expect(split.directDepthMm).toBeLessThan(20);
  });
});
