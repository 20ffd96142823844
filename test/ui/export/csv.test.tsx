// @vitest-environment jsdom
import { act, screen, waitFor } from '@testing-library/react';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { barEdgesH, computeLosses, convertDepth, runoffVolumeM3 } from '../../../src/core';
import { CAUTION_TEXT } from '../../../src/scenario';
import type { Scenario } from '../../../src/scenario/types';
import { barTableCsv } from '../../../src/ui/export';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';
import { LAZY_LOAD_MS } from '../../helpers/render';
import { SHARED, renderTools } from '../../helpers/render-tools';

const MESSAGE = 'Scenario tools message';

function bytesOf(blob: Blob): Promise<Uint8Array> {
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(new Uint8Array(reader.result as ArrayBuffer));
    reader.onerror = () => reject(reader.error ?? new Error('the blob could not be read'));
    reader.readAsArrayBuffer(blob);
  });
}

/** A double to 12 significant figures, as the rows are written (JavaScript's own toPrecision). */
const sig12 = (x: number): number => Number(x.toPrecision(12));

/** Reads the CSV as a spreadsheet-minded program would: UTF-8, '#' lines as comments, first row the header. */
function parse(text: string) {
  const parsed = Papa.parse<Record<string, string>>(text, { header: true, comments: '#', skipEmptyLines: true });
  expect(parsed.errors).toEqual([]);
  return parsed;
}

async function exportedCsv(scenario: Scenario) {
  const view = renderTools({ fallback: scenario });
  await view.user.click(screen.getByRole('button', { name: 'Export CSV' }));
  // The export code loads on the first export, so the file arrives a moment after the click.
  const file = await waitFor(
    () => {
      const saved = view.saved.at(-1);
      if (!saved) throw new Error('no CSV was saved');
      return saved;
    },
    { timeout: LAZY_LOAD_MS },
  );
  const bytes = await bytesOf(file.blob);
  return { ...view, name: file.name, bytes, text: new TextDecoder('utf-8').decode(bytes) };
}

describe('bar table CSV', () => {
  it('carries the name and caution as note lines, units in the header, and reads back with papaparse to the same bars', async () => {
    const { text, bytes, name } = await exportedCsv(FOUR_BARS);
    expect(name).toBe('four-bars-bars.csv');
    // UTF-8 with a byte-order mark, so spreadsheet programs show φ and ³.
    expect([...bytes.slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
    const lines = text.replace(/^\ufeff/, '').split('\r\n');
    expect(lines[0]).toBe('#,"Raincut bar table: Four bars"');
    expect(lines[1]).toBe(`#,"Caution: ${CAUTION_TEXT}"`);
    expect(lines).toContain('#,"Loss method: Constant loss rate (φ-index); Loss rate φ = 8 mm/h"');

    const parsed = parse(text);
    expect(parsed.meta.fields).toEqual([
      'Bar',
      'Start (min from storm start)',
      'Duration (min)',
      'Rainfall depth (mm)',
      'Rainfall intensity (mm/h)',
      'Loss (mm)',
      'Rainfall excess (mm)',
      'Cumulative rainfall (mm)',
      'Cumulative loss (mm)',
      'Cumulative excess (mm)',
    ]);
    const rows = parsed.data;
    // Bars of 0.5 h: 30 minutes each.
    expect(rows.map((r) => Number(r['Duration (min)']))).toEqual([30, 30, 30, 30]);
    expect(rows.map((r) => Number(r['Rainfall depth (mm)']))).toEqual(FOUR_BARS.storm.depthsMm);
    const core = computeLosses(FOUR_BARS.storm, FOUR_BARS.method);
    expect(rows.map((r) => Number(r['Loss (mm)']))).toEqual([...core.lossMm].map(sig12));
    expect(rows.map((r) => Number(r['Rainfall excess (mm)']))).toEqual([...core.excessMm].map(sig12));
    expect(rows.map((r) => Number(r['Rainfall intensity (mm/h)']))).toEqual([4, 12, 20, 4]);
    expect(rows.map((r) => Number(r['Start (min from storm start)']))).toEqual([0, 30, 60, 90]);
    expect(barEdgesH(FOUR_BARS.storm)).toHaveLength(5);
    expect(screen.getByRole('status', { name: MESSAGE })).toHaveTextContent(
      'Exported four-bars-bars.csv: 4 bars with loss and excess.',
    );
  });

  it('in US units the depths are inches, exactly the stored millimetres converted, with a clock column for a storm with a start', async () => {
    const { text } = await exportedCsv(SHARED);
    const parsed = parse(text);
    expect(parsed.meta.fields).toEqual([
      'Bar',
      'Start (clock)',
      'Start (min from storm start)',
      'Duration (min)',
      'Rainfall depth (in)',
      'Rainfall intensity (in/h)',
      'Loss (in)',
      'Rainfall excess (in)',
      'Cumulative rainfall (in)',
      'Cumulative loss (in)',
      'Cumulative excess (in)',
    ]);
    const rows = parsed.data;
    expect(rows.map((r) => r['Start (clock)'])).toEqual([
      '2026-02-12 21:45',
      '2026-02-12 22:00',
      '2026-02-12 22:15',
      '2026-02-12 22:45',
      '2026-02-12 23:45',
      '2026-02-13 00:15',
    ]);
    expect(rows.map((r) => Number(r['Rainfall depth (in)']))).toEqual(
      SHARED.storm.depthsMm.map((mm) => sig12(convertDepth(mm, 'mm', 'in'))),
    );
    // Back to millimetres: the same bars, to the last few bits of a double.
    rows.forEach((r, k) => {
      const mm = convertDepth(Number(r['Rainfall depth (in)']), 'in', 'mm');
      expect(Math.abs(mm - (SHARED.storm.depthsMm[k] as number))).toBeLessThanOrEqual(
        1e-11 * (SHARED.storm.depthsMm[k] as number),
      );
    });
    const core = computeLosses(SHARED.storm, SHARED.method);
    expect(rows.map((r) => Number(r['Rainfall excess (in)']))).toEqual(
      [...core.excessMm].map((mm) => sig12(convertDepth(mm, 'mm', 'in'))),
    );
  });

  it('the cumulative columns are the mass curve, worked by hand for four bars at φ = 8 mm/h', async () => {
    const { text } = await exportedCsv(FOUR_BARS);
    const rows = parse(text).data;
    // Bars of 0.5 h with 2, 6, 10 and 2 mm; φ = 8 mm/h loses at most 8 × 0.5 = 4 mm a bar:
    // loss 2, 4, 4, 2 mm and excess 0, 2, 6, 0 mm. Running sums to each bar's end:
    // rain 2, 2 + 6 = 8, 8 + 10 = 18, 18 + 2 = 20; loss 2, 6, 10, 12; excess 0, 2, 8, 8 (and 20 = 12 + 8).
    expect(rows.map((r) => Number(r['Cumulative rainfall (mm)']))).toEqual([2, 8, 18, 20]);
    expect(rows.map((r) => Number(r['Cumulative loss (mm)']))).toEqual([2, 6, 10, 12]);
    expect(rows.map((r) => Number(r['Cumulative excess (mm)']))).toEqual([0, 2, 8, 8]);
  });

  it('rows carry no binary residue: bars of 0.8 h start at 0, 48, 96 and 144 min, not 144.00000000000003', () => {
    // Start of bar 4 = 0.8 + 0.8 + 0.8 = 2.4000000000000004 h in doubles; × 60 = 144.00000000000003.
    const storm = { durationsH: [0.8, 0.8, 0.8, 0.8], depthsMm: [0.1, 0.2, 0.3, 0.4] };
    const scenario: Scenario = { ...FOUR_BARS, storm };
    const result = computeLosses(storm, { kind: 'constant', rateMmH: 0.2 });
    const text = barTableCsv({ scenario, method: { kind: 'constant', rateMmH: 0.2 }, result, volumeM3: null });
    const rows = parse(text).data;
    expect(rows.map((r) => r['Start (min from storm start)'])).toEqual(['0', '48', '96', '144']);
    expect(rows.map((r) => r['Duration (min)'])).toEqual(['48', '48', '48', '48']);
    expect(text).not.toMatch(/\d\.\d*0000000\d/);
    expect(text).not.toMatch(/\d\.\d*9999999\d/);
  });

  it('while kept matched, the table is computed with the fitted value the screen shows', async () => {
    const observed = { as: 'depth' as const, value: 6, parameter: 'rateMmH', locked: true };
    const matched: Scenario = { ...FOUR_BARS, observed };
    const { text, store } = await exportedCsv(matched);
    const method = store.derived.effectiveMethod(store.getState().scenario);
    expect(method).not.toEqual(FOUR_BARS.method);
    const rows = parse(text).data;
    const excess = rows.reduce((sum, r) => sum + Number(r['Rainfall excess (mm)']), 0);
    expect(excess).toBeCloseTo(6, 9);
    expect(text).toContain(`Loss rate φ = `);
  });

  it('a name with commas, quotes and a line break stays one note line, so the rows still read back', () => {
    const odd: Scenario = { ...FOUR_BARS, name: 'Pond 3, "east" arm\nsecond try' };
    const result = computeLosses(odd.storm, odd.method);
    const text = barTableCsv({ scenario: odd, method: odd.method, result, volumeM3: null });
    expect(text.split('\r\n')[0]).toBe('\ufeff#,"Raincut bar table: Pond 3, ""east"" arm second try"');
    expect(parse(text).data.map((r) => Number(r['Rainfall depth (mm)']))).toEqual(odd.storm.depthsMm);
  });

  it('a scenario with a blank name is titled "Unnamed scenario", not left at a colon', () => {
    const blank: Scenario = { ...FOUR_BARS, name: '  ' };
    const result = computeLosses(blank.storm, blank.method);
    const text = barTableCsv({ scenario: blank, method: blank.method, result, volumeM3: null });
    expect(text.split('\r\n')[0]).toBe('\ufeff#,"Raincut bar table: Unnamed scenario"');
  });

  it('note lines carry no thousands commas, so a spreadsheet keeps each number in one cell', () => {
    const big: Scenario = { ...FOUR_BARS, catchment: { name: 'Wide plain (invented)', areaM2: 2.5e9 } };
    const result = computeLosses(big.storm, big.method);
    const volume = runoffVolumeM3(result.totalExcessMm, big.catchment.areaM2);
    const notes = barTableCsv({ scenario: big, method: big.method, result, volumeM3: volume })
      .split('\r\n')
      .filter((l) => l.replace(/^\ufeff/, '').startsWith('#'));
    expect(notes).toContain('#,"Catchment: Wide plain (invented); 250000 ha"');
    expect(notes.find((l) => l.startsWith('#,"Totals:'))).toBe(
      `#,"Totals: rainfall 20 mm; loss 12 mm; rainfall excess 8 mm; runoff fraction 40 %; runoff volume ${Math.round(volume)} m³"`,
    );
    for (const line of notes.slice(2)) expect(line).not.toMatch(/\d,\d/);
  });

  it('when the losses cannot be worked out, nothing is exported and the core’s reason is shown', async () => {
    const view = renderTools({ fallback: FOUR_BARS });
    act(() => view.actions.setMethodKind('green-ampt'));
    // A hand-made bad parameter in the document (as an old file might carry) is refused by the core, not by the export.
    act(() =>
      view.store.setState((s) => {
        const scenario = {
          ...s.scenario,
          method: { kind: 'green-ampt' as const, ksMmH: -1, suctionMm: 100, moistureDeficit: 0.3 },
        };
        return { scenario, history: { ...s.history, present: scenario } };
      }),
    );
    await view.user.click(screen.getByRole('button', { name: 'Export CSV' }));
    expect(screen.getByRole('alert', { name: MESSAGE })).toHaveTextContent(
      'No table was exported: the losses cannot be worked out.',
    );
    expect(view.saved).toEqual([]);
  });
});
