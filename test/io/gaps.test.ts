import { describe, expect, test } from 'vitest';
import { applyRainImport, guessRainSettings, previewRainImport, type RainImportSettings } from '../../src/io';

// Gaps in a timed record (issue 11): a reading after a step longer than the
// record's own step. Every bar list below is worked by hand from the text.

function read(text: string, patch: Partial<RainImportSettings> = {}) {
  const settings = { ...guessRainSettings(text), ...patch };
  const result = applyRainImport(text, settings);
  if (!result.ok) throw new Error(result.problems.map((p) => p.reason).join('; '));
  return { settings, storm: result.storm, summary: result.summary };
}

const close = (actual: readonly number[], expected: readonly number[]): void => {
  expect(actual.length).toBe(expected.length);
  actual.forEach((v, k) => expect(v).toBeCloseTo(expected[k] as number, 12));
};

// 15-min depths; 0.6 mm two hours after the reading before it.
const TWO_HOUR_GAP = '10:15\t0.2\n10:30\t0.4\n12:30\t0.6\n12:45\t0.2';

describe('a gap in a timed record', () => {
  test('is filled by default: the reading keeps one step, the rest of the gap is dry bars of the step', () => {
    const { settings, storm } = read(TWO_HOUR_GAP);
    expect(settings.gaps).toBe('fill');
    // Steps 15, 120, 15 min: the record's step is 15 min. The 120-min gap is 105 min dry (7 bars of 15 min)
    // and the 0.6 mm in the last 15 min before 12:30. 2 + 7 + 1 + 1 = 11 bars of 0.25 h, 10:00 to 12:45.
    close(storm.durationsH, new Array(11).fill(0.25));
    close(storm.depthsMm, [0.2, 0.4, 0, 0, 0, 0, 0, 0, 0, 0.6, 0.2]);
  });

  test('"keep" leaves one long bar over the gap, as before', () => {
    const { storm } = read(TWO_HOUR_GAP, { gaps: 'keep' });
    close(storm.durationsH, [0.25, 0.25, 2, 0.25]);
    close(storm.depthsMm, [0.2, 0.4, 0.6, 0.2]);
  });

  test('the preview says how many gaps, the longest and between which lines, and what was done', () => {
    const { summary } = read(TWO_HOUR_GAP);
    expect(summary).toMatch(/1 gap longer than the record’s 15 min step \(the longest 2 h between lines 2 and 3\)/);
    expect(summary).toMatch(/dry 15 min bars/);
    expect(read(TWO_HOUR_GAP, { gaps: 'keep' }).summary).toMatch(/one long bar over the whole gap/);
  });

  test('a gap of no whole number of steps gets a shorter dry bar first', () => {
    // Steps 15, 50, 15, 15 min. The 50-min gap: 35 min dry = a 5-min bar and two 15-min bars, then 2 mm in 15 min.
    const { storm, summary } = read('0:15\t1\n0:30\t1\n1:20\t2\n1:35\t1\n1:50\t1');
    close(storm.durationsH, [0.25, 0.25, 5 / 60, 0.25, 0.25, 0.25, 0.25, 0.25]);
    close(storm.depthsMm, [1, 1, 0, 0, 0, 2, 1, 1]);
    // 7 × 15 + 5 = 110 min = 0:00 to 1:50
    expect(summary).toMatch(/between lines 2 and 3/);
  });

  test('stamps rounded in their last digit are no gaps: elapsed hours to 4 decimals at a 5-min step', () => {
    // The defect: 5 min written as hours to 4 decimals (0.0833, 0.1667, …) steps by 0.0834 or 0.0833 h. The
    // 0.0834 h steps, 0.36 s longer than the record's 0.0833 h, were taken for gaps and given dry bars of 0.36 s,
    // and the paste was refused as "not valid: Bar 2: duration must be at least 1 second", at line 0, column 0.
    // Read as written: end stamps, the first bar takes the first step. Durations 0.0834, 0.0834, 0.0833, 0.0833,
    // 0.0834, 0.0833 h (sum 0.5001 h = 0.0834 + 0.5 − 0.0833); depths as typed, total 10 mm.
    const { storm, summary } = read('hours\train\n0.0833\t1\n0.1667\t2\n0.25\t3\n0.3333\t1\n0.4167\t1\n0.5\t2');
    close(storm.durationsH, [0.0834, 0.0834, 0.0833, 0.0833, 0.0834, 0.0833]);
    close(storm.depthsMm, [1, 2, 3, 1, 1, 2]);
    expect(summary).not.toMatch(/gap/);
  });

  test('a missed reading between rounded stamps is one dry step, its rounding kept by the wet bar', () => {
    // 10-min steps written as hours to 4 decimals, the reading at 0.5 missing: steps 0.1666, 0.3334, 0.1666,
    // 0.1667 h. The record's step is the most frequent: 0.1666 h. The last step, 0.0001 h (0.36 s, 0.06 % of the
    // step) longer, is rounding, no gap. The 0.3334 h gap: 0.1668 h dry = one dry step of 0.1666 h and 0.0002 h
    // (0.72 s) over, too short for a bar: the wet bar keeps it, 0.1666 + 0.0002 = 0.1668 h. Bars (end stamps; the
    // first takes its step, 0.1666): 0.1666, 0.1666, dry 0.1666, wet 0.1668, 0.1666, 0.1667; sum 0.9999 h =
    // 0.1666 + (1 − 0.1667), the stamps' span and the first bar.
    const { storm, summary } = read('hours\train\n0.1667\t1\n0.3333\t2\n0.6667\t3\n0.8333\t1\n1\t2');
    close(storm.durationsH, [0.1666, 0.1666, 0.1666, 0.1668, 0.1666, 0.1667]);
    close(storm.depthsMm, [1, 2, 0, 3, 1, 2]);
    expect(summary).toMatch(/1 gap longer than the record’s/);
  });

  test('stamps that mark the start of their bar keep the rain at the start of the gap', () => {
    // Steps 15, 45, 15 min. 10:15 opens a 45-min bar: 0.3 mm in 10:15–10:30, then 30 min dry (2 bars); 10:00 to 11:30.
    const { storm } = read('10:00\t0.5\n10:15\t0.3\n11:00\t0.4\n11:15\t0.1', { timeMarks: 'start' });
    close(storm.durationsH, new Array(6).fill(0.25));
    close(storm.depthsMm, [0.5, 0.3, 0, 0, 0.4, 0.1]);
  });

  test('an intensity keeps its rate over one step rather than over the whole gap', () => {
    // Steps 15 and 60 min (a tie: the shorter, 15 min, is the step). 4 mm/h × 0.25 h = 1 mm; 8 × 0.25 = 2 mm;
    // after the 60-min gap 45 min dry (3 bars), then 6 mm/h × 0.25 h = 1.5 mm.
    const filled = read('10:15\t4\n10:30\t8\n11:30\t6', { valueKind: 'intensity' }).storm;
    close(filled.durationsH, new Array(6).fill(0.25));
    close(filled.depthsMm, [1, 2, 0, 0, 0, 1.5]);
    // Kept: 6 mm/h over the whole hour is 6 mm.
    const kept = read('10:15\t4\n10:30\t8\n11:30\t6', { valueKind: 'intensity', gaps: 'keep' }).storm;
    close(kept.durationsH, [0.25, 0.25, 1]);
    close(kept.depthsMm, [1, 2, 6]);
  });

  test('cumulative readings put the gap’s rise in its last step', () => {
    // Readings 0, 0.4, 0.6, 1.5, 1.5 from the first: bars 0.4, 0.2, 0.9, 0 over 15, 15, 90, 15 min.
    // Filled: the 90-min gap is 75 min dry (5 bars) then 0.9 mm; 9 bars of 15 min, 10:00 to 12:15.
    const { storm } = read('10:00\t0\n10:15\t0.4\n10:30\t0.6\n12:00\t1.5\n12:15\t1.5', {
      valueKind: 'cumulative',
      cumulativeFrom: 'first-value',
    });
    close(storm.durationsH, new Array(9).fill(0.25));
    close(storm.depthsMm, [0.4, 0.2, 0, 0, 0, 0, 0, 0.9, 0]);
  });

  test('a first bar of end stamps that follows a gap takes the record’s step', () => {
    // Steps 60, 15, 15 min: the step is 15 min. The first reading has no stamp before it; its bar is
    // as long as the first step, 60 min, unless the gap is filled: then 15 min, starting at 9:45.
    const { storm } = read('10:00\t1\n11:00\t2\n11:15\t3\n11:30\t4');
    close(storm.durationsH, new Array(7).fill(0.25));
    close(storm.depthsMm, [1, 0, 0, 0, 2, 3, 4]);
  });

  test('a regular record has no gaps and says nothing of them', () => {
    const { storm, summary } = read('10:15\t0.2\n10:30\t0.4\n10:45\t0.6');
    close(storm.depthsMm, [0.2, 0.4, 0.6]);
    expect(summary).not.toMatch(/gap/);
  });

  test('an unknown choice is a problem naming the setting', () => {
    const settings = { ...guessRainSettings(TWO_HOUR_GAP), gaps: 'spread' as never };
    const preview = previewRainImport(TWO_HOUR_GAP, settings);
    expect(preview.problems.map((p) => [p.field, p.reason])).toEqual([['gaps', 'must be fill or keep.']]);
  });
});
