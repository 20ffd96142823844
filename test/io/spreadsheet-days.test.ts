import { describe, expect, it } from 'vitest';
import { guessFlowImport } from '../../src/io/flow-import';
import { guessRainImport } from '../../src/io/rain-import';

// A spreadsheet's date column copied while formatted as "General" pastes as day
// numbers: days since 1899-12-30 in the 1900 date system (the epoch that makes
// 1 Mar 1900 day 61). Worked by hand: from 1899-12-30 to 2026-07-14 is 46,217
// days, and 15:10 is 910/1440 = 0.631944… of a day, so 14 Jul 2026 15:10 is
// 46,217.631944. The defect: such a column was read as elapsed hours, giving
// bars of 0.006944 h = 25 s with no word of why.
const RAIN = ['time\train', '46217.631944\t1', '46217.638889\t2', '46217.645833\t3'].join('\n');
const FLOW = ['time,discharge', '46217.625,0.3', '46217.635417,0.8', '46217.645833,1.2', '46217.65625,0.9'].join('\n');

describe('times that look like spreadsheet day numbers', () => {
  it('a rainfall paste says the times look like day numbers, with the date the first would be', () => {
    const preview = guessRainImport(RAIN);
    expect(preview.problems).toEqual([]);
    expect(preview.summary).toMatch(
      /the times are plain numbers \(“46217\.631944” on line 2\), read as elapsed hours; if they are a spreadsheet’s dates \(that one is 2026-07-14 15:10 in the 1900 date system\), format that column as dates in the spreadsheet and copy again/,
    );
  });

  it('a streamflow paste says so too (46,217.625 is 2026-07-14 15:00: 0.625 of a day is 15 h)', () => {
    const preview = guessFlowImport(FLOW);
    expect(preview.problems).toEqual([]);
    expect(preview.summary).toMatch(
      /\(“46217\.625” on line 2\), read as elapsed hours; if they are a spreadsheet’s dates \(that one is 2026-07-14 15:00 in the 1900 date system\)/,
    );
  });

  it('elapsed hours and minutes of an ordinary record say nothing of the kind', () => {
    expect(guessRainImport('hours\train\n0.5\t1\n1\t2\n1.5\t3').summary).not.toMatch(/spreadsheet/);
    expect(guessRainImport('min\train\n10\t1\n20\t2\n30\t3').summary).not.toMatch(/spreadsheet/);
    // Whole hours counted far from zero step by 1 or more: not day numbers.
    expect(guessFlowImport('hours,q\n30000,1\n30001,2\n30002,1').summary).not.toMatch(/spreadsheet/);
  });
});
