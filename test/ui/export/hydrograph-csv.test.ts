// The hydrograph CSV (issue 13): units in the headings, the caution, the
// transform and peak in the notes, through the one CSV writer.
import { describe, expect, it } from 'vitest';
import { runoffHydrograph } from '../../../src/core';
import { CAUTION_TEXT } from '../../../src/scenario';
import type { Scenario } from '../../../src/scenario/types';
import { hydrographCsv } from '../../../src/ui/export/hydrograph-csv';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

const TRANSFORM = { kind: 'triangular', lagH: 2.5 } as const;
const SCENARIO: Scenario = {
  ...FOUR_BARS,
  name: '=HYPERLINK("x")',
  storm: { durationsH: [1], depthsMm: [12] },
  method: { kind: 'constant', rateMmH: 2 },
  hydrograph: { transform: TRANSFORM, transformMemory: {}, fitParameter: null, objective: 'nse' },
};

describe('the hydrograph CSV', () => {
  // 10 mm of excess in one 1-hour bar on 1 km² through the triangular unit hydrograph with lag 2.5 h:
  // Tp = 0.5 + 2.5 = 3 h, base 8 h, hourly samples 0, 1/3, 2/3, 1, 0.8, 0.6, 0.4, 0.2, 0 of the peak,
  // which sum to 4, so the peak is ¼ × 1e6 m² × 0.010 m / 3600 s = 25/36 = 0.69444 m³/s at 3 h.
  const hydrograph = runoffHydrograph({ durationsH: [1], excessMm: [10] }, TRANSFORM, 1e6);
  const text = hydrographCsv({
    scenario: SCENARIO,
    method: SCENARIO.method,
    transform: TRANSFORM,
    hydrograph,
    comparison: null,
    areaUnit: 'km2',
  });
  const lines = text
    .replace(/^\ufeff/, '')
    .trimEnd()
    .split('\r\n');

  it('carries the caution, the transform and the peak worked by hand in its notes, quotes in the name doubled', () => {
    // The name is inside the note's text cell, which starts with "Raincut": no formula can start there.
    expect(lines[0]).toBe('#,"Raincut runoff hydrograph: =HYPERLINK(""x"")"');
    expect(lines).toContain(`#,"Caution: ${CAUTION_TEXT}"`);
    expect(lines).toContain('#,"Unit hydrograph: NRCS triangular unit hydrograph; Lag = 2.5 h"');
    expect(lines).toContain(
      '#,"Peak discharge 0.6944 m³/s at 3 h after the storm start; direct runoff volume 10000 m³"',
    );
  });

  it('names what the discharge rests on: the loss method that made the excess, and the catchment and its area', () => {
    // The same excess over another area, or from another loss, is another hydrograph: a colleague reading
    // the file alone must see both. FOUR_BARS's catchment is 1e6 m² = 1 km², shown in the km² chosen on screen.
    expect(lines).toContain('#,"Loss method: Constant loss rate (φ-index); Loss rate φ = 2 mm/h"');
    expect(lines).toContain('#,"Catchment: Test catchment; 1 km²"');
  });

  it('gives no time of peak to a hydrograph with no flow', () => {
    // No excess at all: every sample 0 m³/s, so there is no peak to put at 0 h.
    const dry = runoffHydrograph({ durationsH: [1], excessMm: [0] }, TRANSFORM, 1e6);
    const csv = hydrographCsv({
      scenario: SCENARIO,
      method: SCENARIO.method,
      transform: TRANSFORM,
      hydrograph: dry,
      comparison: null,
    });
    expect(csv).toContain('#,"Peak discharge 0 m³/s (no direct runoff); direct runoff volume 0 m³"');
  });

  it('writes the volume as the screen does: whole from 1000, in the screen’s volume unit', () => {
    // The defect: 7.157 mm of excess over 3.2 km² = 22,902 m³ on screen was written "22900 m³" (four significant
    // figures, which the screen keeps only below 1000). 10 mm over 2.3456 km² = 0.010 m × 2.3456e6 m² = 23,456 m³,
    // written 23456 (no thousands comma in a CSV note), not 23460.
    const big = runoffHydrograph({ durationsH: [1], excessMm: [10] }, TRANSFORM, 2.3456e6);
    const si = hydrographCsv({
      scenario: SCENARIO,
      method: SCENARIO.method,
      transform: TRANSFORM,
      hydrograph: big,
      comparison: null,
    });
    expect(si).toMatch(/direct runoff volume 23456 m³"/);
    // In US units, acre-ft as on screen: 23,456 m³ / 1233.48183754752 m³ per acre-ft (43,560 ft² × 0.3048³ m³/ft³,
    // NIST SP 811) = 19.016… acre-ft, written 19.02.
    const us = hydrographCsv({
      scenario: { ...SCENARIO, units: 'us' },
      method: SCENARIO.method,
      transform: TRANSFORM,
      hydrograph: big,
      comparison: null,
    });
    expect(us).toMatch(/direct runoff volume 19\.02 acre-ft"/);
  });

  it('has a heading with units and one row per sample, the triangle worked by hand', () => {
    const head = lines.findIndex((l) => l.startsWith('"Time'));
    expect(lines[head]).toBe('"Time (h from storm start)","Computed direct runoff (m³/s)"');
    const rows = lines.slice(head + 1).map((l) => l.split(',').map((c) => Number(c.replace(/"/g, ''))));
    const peak = 25 / 36;
    const want = [0, 1 / 3, 2 / 3, 1, 0.8, 0.6, 0.4, 0.2, 0].map((x) => x * peak);
    expect(rows.map((r) => r[0])).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8]);
    rows.forEach((r, i) => expect(r[1]).toBeCloseTo(want[i] as number, 12));
  });
});
