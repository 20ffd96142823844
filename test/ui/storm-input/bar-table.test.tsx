// @vitest-environment jsdom
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { Scenario } from '../../../src/scenario/types';
import { formatValue } from '../../../src/ui/format';
import { coreTotals, lazyPartsLoaded, mmText, renderWorkbench } from '../../helpers/render';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

/** The workbench, once the bar table (loaded just after the first screen) is drawn. */
async function renderTable(...args: Parameters<typeof renderWorkbench>) {
  const view = renderWorkbench(...args);
  await lazyPartsLoaded();
  return view;
}

const grid = () => screen.getByRole('grid', { name: 'Bar table' });
/** Row of bar k (1-based), found by its ARIA row index (the header is row 1). */
const barRow = (k: number) => {
  const row = within(grid())
    .getAllByRole('row')
    .find((r) => r.getAttribute('aria-rowindex') === String(k + 1));
  if (!row) throw new Error(`bar ${k} is not drawn`);
  return row;
};
const COLUMN = { bar: 1, start: 2, duration: 3, depth: 4, intensity: 5, loss: 6, excess: 7, note: 8 } as const;
const cell = (k: number, column: keyof typeof COLUMN) => {
  const found = within(barRow(k))
    .getAllByRole(column === 'bar' ? 'rowheader' : 'gridcell')
    .find((c) => c.getAttribute('aria-colindex') === String(COLUMN[column]));
  if (!found) throw new Error(`no ${column} cell in bar ${k}`);
  return found;
};

// Invented: FOUR_BARS on the clock, for the start-time edits.
const CLOCKED: Scenario = { ...FOUR_BARS, storm: { ...FOUR_BARS.storm, startIso: '2026-07-14T15:00:00' } };

describe('the bar table', () => {
  it('lists every bar with its start, duration, depth and the core’s loss and excess', async () => {
    await renderTable();
    expect(grid()).toHaveAttribute('aria-rowcount', '5');
    const headers = within(grid())
      .getAllByRole('columnheader')
      .map((h) => h.textContent);
    expect(headers).toEqual([
      'Bar',
      'Start (h:mm from start)',
      'Duration (min)',
      'Depth (mm)',
      'Intensity (mm/h)',
      'Loss (mm)',
      'Excess (mm)',
      'Note',
    ]);
    const totals = coreTotals(FOUR_BARS.storm, FOUR_BARS.method);
    expect(cell(3, 'start')).toHaveTextContent('1:00');
    expect(cell(3, 'duration')).toHaveTextContent('30');
    expect(cell(3, 'depth')).toHaveTextContent('10');
    expect(cell(3, 'intensity')).toHaveTextContent('20');
    expect(cell(3, 'loss')).toHaveTextContent(formatValue(totals.lossMm[2] as number));
    expect(cell(3, 'excess')).toHaveTextContent(formatValue(totals.excessMm[2] as number));
    expect(cell(1, 'excess')).toHaveTextContent('0');
  });

  it('shows clock times when the storm has a start', async () => {
    await renderTable(CLOCKED);
    expect(within(grid()).getAllByRole('columnheader')[1]).toHaveTextContent('Start (clock)');
    expect(cell(1, 'start')).toHaveTextContent('15:00');
    expect(cell(4, 'start')).toHaveTextContent('16:30');
  });

  it('edits a depth from the keyboard: move with arrows, type, Enter applies and goes down', async () => {
    const { user, scenario, store } = await renderTable();
    await user.click(cell(1, 'depth'));
    expect(cell(1, 'depth')).toHaveFocus();
    await user.keyboard('{ArrowDown}');
    expect(cell(2, 'depth')).toHaveFocus();
    await user.keyboard('7.5');
    const editor = screen.getByRole('textbox', { name: 'Bar 2 depth' });
    expect(editor).toHaveValue('7.5');
    await user.keyboard('{Enter}');
    expect(scenario().storm.depthsMm).toEqual([2, 7.5, 10, 2]);
    expect(store.getState().undoLabel).toBe('Set bar 2 depth');
    expect(cell(3, 'depth')).toHaveFocus();
    // Loss and excess follow from the core, beside the bar and in the results.
    const totals = coreTotals(scenario().storm, FOUR_BARS.method);
    expect(cell(2, 'excess')).toHaveTextContent(formatValue(totals.excessMm[1] as number));
    expect(screen.getByLabelText('Excess depth')).toHaveTextContent(mmText(totals.totalExcessMm));
  });

  it('Enter opens the editor on the present value; Tab applies and moves to the next editable cell', async () => {
    const { user, scenario } = await renderTable();
    await user.click(cell(1, 'duration'));
    await user.keyboard('{Enter}');
    const editor = screen.getByRole('textbox', { name: 'Bar 1 duration' });
    expect(editor).toHaveValue('30');
    await user.keyboard('{Backspace}{Backspace}45{Tab}');
    expect(scenario().storm.durationsH).toEqual([0.75, 0.5, 0.5, 0.5]);
    expect(cell(1, 'depth')).toHaveFocus();
  });

  it('a bad value shows a message beside the cell naming the bar, keeps the typed text and applies nothing', async () => {
    const { user, scenario, store } = await renderTable();
    await user.click(cell(3, 'depth'));
    await user.keyboard('abc{Enter}');
    const editor = screen.getByRole('textbox', { name: 'Bar 3 depth' });
    expect(editor).toHaveValue('abc');
    expect(editor).toHaveAttribute('aria-invalid', 'true');
    expect(cell(3, 'note')).toHaveTextContent('Bar 3 depth: “abc” is not a number.');
    expect(editor).toHaveAccessibleDescription('Bar 3 depth: “abc” is not a number.');
    expect(scenario().storm).toBe(FOUR_BARS.storm);
    expect(store.getState().history.past).toHaveLength(0);

    // Leaving the cell keeps the text and the message; the bar keeps its depth.
    await user.click(cell(1, 'bar'));
    expect(screen.queryByRole('textbox', { name: 'Bar 3 depth' })).toBeNull();
    expect(cell(3, 'depth')).toHaveTextContent('abc');
    expect(cell(3, 'depth')).toHaveAttribute('aria-invalid', 'true');
    expect(cell(3, 'note')).toHaveTextContent('Bar 3 depth: “abc” is not a number.');

    // Back on it, Enter offers the typed text again; a good value clears the message.
    await user.click(cell(3, 'depth'));
    await user.keyboard('{Enter}');
    expect(screen.getByRole('textbox', { name: 'Bar 3 depth' })).toHaveValue('abc');
    await user.keyboard('{Control>}a{/Control}12{Enter}');
    expect(scenario().storm.depthsMm).toEqual([2, 6, 12, 2]);
    expect(cell(3, 'note')).toHaveTextContent('');
    expect(cell(3, 'depth')).not.toHaveAttribute('aria-invalid');
  });

  it('the selected bar’s problem is written out in full under the grid, not only in the one-line Note cell', async () => {
    const { user } = await renderTable();
    await user.click(cell(2, 'depth'));
    await user.keyboard('99999999999{Enter}');
    const note = cell(2, 'note').textContent ?? '';
    expect(note.length).toBeGreaterThan(40);
    const full = document.querySelector('.bars__problem');
    expect(full).toHaveTextContent(note);
    expect(full?.closest('[role="grid"]')).toBeNull();
    await user.keyboard('{Escape}');
    await user.click(cell(1, 'depth'));
    expect(document.querySelector('.bars__problem')).toBeNull();
  });

  it('a negative depth is refused by name, and Escape drops the typing', async () => {
    const { user, scenario } = await renderTable();
    await user.click(cell(2, 'depth'));
    await user.keyboard('-3{Enter}');
    expect(cell(2, 'note')).toHaveTextContent('Bar 2 depth: “-3” mm: a rainfall or runoff depth cannot be negative.');
    await user.keyboard('{Escape}');
    expect(screen.queryByRole('textbox', { name: 'Bar 2 depth' })).toBeNull();
    expect(cell(2, 'depth')).toHaveTextContent('6');
    expect(cell(2, 'note')).toHaveTextContent('');
    expect(scenario().storm).toBe(FOUR_BARS.storm);
  });

  it('depths are typed and shown in inches in US customary units', async () => {
    const { user, scenario } = await renderTable({ ...FOUR_BARS, units: 'us' });
    expect(within(grid()).getAllByRole('columnheader')[3]).toHaveTextContent('Depth (in)');
    await user.click(cell(1, 'depth'));
    await user.keyboard('0.5{Enter}');
    expect(scenario().storm.depthsMm[0]).toBe(12.7);
    expect(cell(1, 'depth')).toHaveTextContent('0.5');
  });

  it('a new start time moves the boundary with the bar before it; the first bar moves the clock start', async () => {
    const { user, scenario, store } = await renderTable(CLOCKED);
    await user.click(cell(3, 'start'));
    await user.keyboard('{Enter}{Control>}a{/Control}15:50{Enter}');
    expect(scenario().storm.durationsH.map((d) => Math.round(d * 600) / 10)).toEqual([30, 20, 40, 30]);
    expect(scenario().storm.depthsMm).toEqual([2, 6, 10, 2]);
    expect(store.getState().undoLabel).toBe('Set bar 3 start time');

    await user.click(cell(1, 'start'));
    await user.keyboard('{Enter}{Control>}a{/Control}14:30{Enter}');
    expect(scenario().storm.startIso).toBe('2026-07-14T14:30:00');
    // 30 + 20 + 40 min after the new start.
    expect(cell(4, 'start')).toHaveTextContent('16:00');
  });

  it('a start outside the neighbouring bars is refused with the times it must fall between', async () => {
    const { user, scenario } = await renderTable(CLOCKED);
    await user.click(cell(2, 'start'));
    await user.keyboard('{Enter}{Control>}a{/Control}16:20{Enter}');
    expect(cell(2, 'note')).toHaveTextContent(
      'Bar 2 start: must fall after bar 1 starts (15:00) and before bar 2 ends (16:00); change durations to move the later bars.',
    );
    expect(scenario().storm).toBe(CLOCKED.storm);
  });

  it('inserts, adds and deletes bars at the selected row, each one undo step', async () => {
    const { user, scenario, store } = await renderTable();
    await user.click(cell(2, 'depth'));
    expect(screen.getByText('Bar 2 of 4 selected.')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Insert bar' }));
    expect(scenario().storm.depthsMm).toEqual([2, 0, 6, 10, 2]);
    expect(store.getState().undoLabel).toBe('Insert bar 2');
    await user.click(screen.getByRole('button', { name: 'Add bar at end' }));
    expect(scenario().storm.depthsMm).toEqual([2, 0, 6, 10, 2, 0]);
    expect(scenario().storm.durationsH).toHaveLength(6);
    await user.click(screen.getByRole('button', { name: 'Delete bar' }));
    expect(scenario().storm.depthsMm).toEqual([2, 6, 10, 2, 0]);
    expect(store.getState().undoLabel).toBe('Delete bar 2');
    expect(store.getState().history.past).toHaveLength(3);
  });

  it('draws only the rows in view of a long record, and the keyboard still reaches every bar', async () => {
    const n = 5000;
    const long: Scenario = {
      ...FOUR_BARS,
      storm: { durationsH: Array(n).fill(0.1), depthsMm: Array.from({ length: n }, (_, k) => (k % 7) * 0.5) },
    };
    const { user, scenario } = await renderTable(long);
    expect(grid()).toHaveAttribute('aria-rowcount', String(n + 1));
    const drawn = within(grid()).getAllByRole('row').length - 1;
    expect(drawn).toBeGreaterThan(5);
    expect(drawn).toBeLessThan(40);
    await user.click(cell(1, 'depth'));
    await user.keyboard('{Control>}{End}{/Control}');
    expect(cell(n, 'depth')).toHaveFocus();
    // 4999 bars of 6 min before it.
    expect(cell(n, 'start')).toHaveTextContent('499:54');
    await user.keyboard('9{Enter}');
    expect(scenario().storm.depthsMm[n - 1]).toBe(9);
    // Page Up goes back a screenful less one row (12 rows in view without layout): bar 4989.
    await user.keyboard('{PageUp}');
    expect(document.activeElement?.closest('[role="row"]')?.getAttribute('aria-rowindex')).toBe(String(4989 + 1));
    expect(within(grid()).getAllByRole('row').length - 1).toBeLessThan(40);
  });

  it('says so when there are no bars, and Add bar at end starts one', async () => {
    const { user, scenario } = await renderTable({ ...FOUR_BARS, storm: { durationsH: [], depthsMm: [] } });
    expect(screen.getByText('No bars yet: add one, paste rainfall or draw.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Delete bar' })).toBeDisabled();
    await user.click(screen.getByRole('button', { name: 'Add bar at end' }));
    expect(scenario().storm).toEqual({ durationsH: [1], depthsMm: [0] });
  });
});
