// The long-record view's overview (issue 14): the level-of-detail pass that
// reduces a record to one mark per pixel column, and the path drawn from it,
// on 10⁵ and 10⁶ bars at a 1300-px plot. The first draw of a 10⁶-bar record
// must come within 300 ms in the browser (npm run bench:ui prints that); this
// is its computing share, without the page.
import { afterAll, test } from 'vitest';
import { splitEvents } from '../../src/core';
import { barStartsH, eventBandsPath } from '../../src/ui/record/bands';
import { columnsPath, recordColumns } from '../../src/ui/record/columns';
import { measure, printTable, syntheticStorm } from './measure';

const COLUMNS = 1300;

test('overview of a long record', () => {
  for (const n of [1e5, 1e6]) {
    const storm = syntheticStorm(n, 13);
    measure('overview', `recordColumns (${COLUMNS} columns)`, () => recordColumns(storm, COLUMNS), { bars: n });
    measure(
      'overview',
      'first draw: columns, path, bar starts, events and their bands',
      () => {
        const columns = recordColumns(storm, COLUMNS);
        const y = (v: number) => 200 - v;
        columnsPath(columns, 60, COLUMNS, 200, y);
        const starts = barStartsH(storm);
        const events = splitEvents(storm, { minDryH: 6 });
        eventBandsPath(events, starts, (h) => 60 + (h / columns.spanH) * COLUMNS, 0, 200);
      },
      { bars: n, ...(n === 1e6 ? { targetMs: 300 } : {}) },
    );
  }
});

afterAll(() => printTable('Raincut overview benchmark (medians of repeated runs)'));
