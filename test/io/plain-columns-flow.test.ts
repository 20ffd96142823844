import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { DEFAULT_NUMBER_FORMAT } from '../../src/io';
import { applyFlowImport, guessFlowSettings, readPlainFlow, type FlowImportSettings } from '../../src/io/flow-import';
import { previewFlowImport } from '../../src/io/flow-import';
import { plainArray } from '../../src/io/plain-columns';
import { FLOW_READER } from '../../src/io/readers';
import { recordArbitrary, recordText } from '../helpers/plain-records';

// The streamflow import's columnar reader (readPlainFlow) must give exactly
// what the general reader gives (applyFlowImport), or nothing: null leaves
// the text to the general reader, which words its problems with line and
// column. Each check reads the same input both ways.

describe('the columnar streamflow reader gives what the general reader gives, or leaves the text to it', () => {
  test('random records, clean and flawed, in each unit, with and without times and a step', () => {
    let accepted = 0;
    let runs = 0;
    fc.assert(
      fc.property(
        recordArbitrary,
        fc.constantFrom<FlowImportSettings['unit']>('m3/s', 'L/s', 'ft3/s'),
        // A step of 0 min is a problem (checkStep) the general reader words.
        fc.constantFrom(5, 15, 0, 1440),
        (record, unit, step) => {
          runs++;
          const text = recordText(record, 'Flow (m3/s)');
          const settings: FlowImportSettings = { ...guessFlowSettings(text), unit, stepMinutesIfNoTime: step };
          const plain = readPlainFlow(text, settings, DEFAULT_NUMBER_FORMAT, 50);
          const general = applyFlowImport(text, settings, DEFAULT_NUMBER_FORMAT);
          if (plain === null) return;
          accepted++;
          expect(general.ok).toBe(true);
          if (!general.ok) return;
          const preview = previewFlowImport(text, settings, DEFAULT_NUMBER_FORMAT);
          expect(plainArray(plain.record.timesH)).toEqual(general.record.timesH);
          expect(plainArray(plain.record.dischargeM3s)).toEqual(general.record.dischargeM3s);
          expect(plain.record.startIso).toBe(general.record.startIso);
          expect(plain.summary).toBe(general.summary);
          expect(plain.header).toEqual(preview.header);
          expect(plain.rows).toEqual(preview.rows.slice(0, 50));
          expect(plain.rowCount).toBe(preview.rows.length);
          expect(plain.columnCount).toBe(preview.columnCount);
        },
      ),
      { numRuns: 1200 },
    );
    expect(runs).toBe(1200);
    // Most clean records are for the columnar reader; a test that never used it would prove nothing.
    expect(accepted).toBeGreaterThan(300);
  });

  test('one line, or a flaw anywhere, leaves the text to the general reader, which names its line and column', () => {
    const lines = ['Time,Flow (L/s)'];
    for (let k = 1; k <= 500; k++)
      lines.push(
        `2024-03-01 ${String(Math.floor(k / 60) % 24).padStart(2, '0')}:${String(k % 60).padStart(2, '0')},12.5`,
      );
    const clean = lines.join('\n');
    const settings = guessFlowSettings(clean);
    expect(settings.unit).toBe('L/s');
    // 500 samples of 12.5 L/s = 0.0125 m³/s each, one minute apart (the record is read by columns).
    const read = readPlainFlow(clean, settings, DEFAULT_NUMBER_FORMAT, 50);
    expect(read?.rowCount).toBe(500);
    expect(read?.record.dischargeM3s[499]).toBe(12.5 * 0.001);
    expect(read?.record.timesH[499]).toBe(499 / 60);

    lines[321] = '2024-03-01 05:21,12.5 L/s';
    const flawed = lines.join('\n');
    expect(readPlainFlow(flawed, settings, DEFAULT_NUMBER_FORMAT, 50)).toBeNull();
    const general = applyFlowImport(flawed, settings, DEFAULT_NUMBER_FORMAT);
    expect(general.ok).toBe(false);
    // lines[321] is line 322 of the text (line 1 is the header), column 2
    if (!general.ok) expect(general.problems[0]).toMatchObject({ row: 322, column: 2, value: '12.5 L/s' });
    // Through the reader a worker runs: the same problem, worded by the general reader.
    const outcome = FLOW_READER.read(flawed, settings, { numberFormat: DEFAULT_NUMBER_FORMAT, units: 'si' });
    expect(outcome.imported).toBeNull();
    expect(outcome.problems[0]).toMatchObject({ row: 322, column: 2, value: '12.5 L/s' });

    const one = 'Time,Flow (m3/s)\n2024-03-01 00:00,1.5\n';
    expect(readPlainFlow(one, guessFlowSettings(one), DEFAULT_NUMBER_FORMAT, 50)).toBeNull();
  });

  test('the reader a worker runs hands a long plain record over as columns of doubles', () => {
    const text = `Time,Q (m3/s)\n${Array.from({ length: 300 }, (_, k) => `2024-03-01 ${String(Math.floor(k / 60)).padStart(2, '0')}:${String(k % 60).padStart(2, '0')},${(k % 9) / 4}`).join('\n')}\n`;
    const outcome = FLOW_READER.read(
      text,
      FLOW_READER.guess(text, { numberFormat: DEFAULT_NUMBER_FORMAT, units: 'si' }),
      {
        numberFormat: DEFAULT_NUMBER_FORMAT,
        units: 'si',
      },
    );
    expect(outcome.problems).toEqual([]);
    expect(outcome.rowCount).toBe(300);
    expect(outcome.imported?.dischargeM3s).toBeInstanceOf(Float64Array);
    // Line 2 + 299 is 04:59: 299 min after the first sample; 299 mod 9 = 2, so 2 / 4 = 0.5 m³/s.
    expect(outcome.imported?.timesH[299]).toBe(299 / 60);
    expect(outcome.imported?.dischargeM3s[299]).toBe(0.5);
  });
});
