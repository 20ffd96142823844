// @vitest-environment jsdom
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { applyRainImport, guessRainSettings } from '../../../src/io';
import { coreTotals, LAZY_LOAD_MS, mmText, renderWorkbench } from '../../helpers/render';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

// Invented gauge records for these tests (no real gauge or storm).
const TEN_MINUTE = 'Time\tRain (mm)\n10:10\t0.4\n10:20\t1.6\n10:30\t3.2\n10:40\t5.0\n10:50\t2.2\n11:00\t0.6\n';
const ONE_COLUMN = '1.5\n2.5\n4\n2\n';
const WITH_BAD_ROWS = 'Time,Rain mm\n0,0.2\n10,1.4\n20,abc\n30,-2\n40,0.8\n';

async function openPaste(user: ReturnType<typeof renderWorkbench>['user']) {
  await user.click(screen.getByRole('button', { name: 'Paste rainfall…' }));
  // The dialog's code loads when it is first opened.
  const dialog = await screen.findByRole('dialog', { name: 'Paste rainfall' }, { timeout: LAZY_LOAD_MS });
  return dialog;
}

async function pasteText(user: ReturnType<typeof renderWorkbench>['user'], text: string) {
  const box = screen.getByRole('textbox', { name: 'Rainfall text' });
  await user.click(box);
  await user.paste(text);
  return box;
}

describe('pasting rainfall', () => {
  it('opens a modal dialog named by its heading, with focus in the text area', async () => {
    const { user } = renderWorkbench();
    const dialog = await openPaste(user);
    expect(dialog).toHaveAttribute('aria-modal', 'true');
    expect(screen.getByRole('textbox', { name: 'Rainfall text' })).toHaveFocus();
    // The page behind is out of reach while it is open.
    expect(screen.queryByRole('button', { name: 'Paste rainfall…' })).toBeNull();
    expect(within(dialog).getByText('Nothing pasted yet.')).toBeInTheDocument();
    expect(within(dialog).getByRole('button', { name: 'Use these bars' })).toBeDisabled();
  });

  it('says what was understood as the text is pasted, with a sketch and the first bars', async () => {
    const { user } = renderWorkbench();
    const dialog = await openPaste(user);
    await pasteText(user, TEN_MINUTE);
    const expected = applyRainImport(TEN_MINUTE, guessRainSettings(TEN_MINUTE));
    expect(expected.ok).toBe(true);
    await waitFor(() => expect(within(dialog).getByText(expected.summary)).toBeInTheDocument());
    expect(expected.summary).toMatch(/^6 bars of 10 min from 10:00 .*depths in mm, total 13 mm/);
    expect(
      within(dialog).getByRole('img', { name: /Sketch of the 6 bars read, highest intensity 30 mm\/h/ }),
    ).toBeInTheDocument();
    const bars = within(dialog).getByRole('table', { name: 'Bars read' });
    const rows = within(bars).getAllByRole('row');
    expect(rows).toHaveLength(7);
    expect(rows[4]).toHaveTextContent(/4\s*0:30\s*10 min\s*5/);
  });

  it('shows each guess as a control, and a correction changes what is read', async () => {
    const { user } = renderWorkbench();
    const dialog = await openPaste(user);
    await pasteText(user, TEN_MINUTE);
    expect(within(dialog).getByRole('combobox', { name: 'Separator' })).toHaveValue('tab');
    expect(within(dialog).getByRole('combobox', { name: 'Decimal mark' })).toHaveValue('point');
    expect(within(dialog).getByRole('checkbox', { name: 'First line holds column names' })).toBeChecked();
    expect(within(dialog).getByRole('combobox', { name: 'Time column' })).toHaveValue('1');
    expect(within(dialog).getByRole('combobox', { name: 'Times are' })).toHaveValue('clock');
    expect(within(dialog).getByRole('combobox', { name: 'Rainfall column' })).toHaveValue('2');
    expect(within(dialog).getByRole('combobox', { name: 'Values are' })).toHaveValue('depth');
    expect(within(dialog).getByRole('combobox', { name: 'Unit' })).toHaveValue('mm');

    await user.selectOptions(within(dialog).getByRole('combobox', { name: 'Unit' }), 'in');
    await waitFor(() =>
      expect(within(dialog).getByText(/depths in in, total 13 in \(330\.2 mm\)/)).toBeInTheDocument(),
    );

    await user.selectOptions(within(dialog).getByRole('combobox', { name: 'Values are' }), 'intensity');
    expect(within(dialog).getByRole('combobox', { name: 'Unit' })).toHaveDisplayValue('in/h');
    await waitFor(() => expect(within(dialog).getByText(/intensities in in\/h/)).toBeInTheDocument());
  });

  it('on a US customary screen, values with no unit named are guessed to be inches; a named unit wins', async () => {
    const { user } = renderWorkbench({ ...FOUR_BARS, units: 'us' });
    const dialog = await openPaste(user);
    const box = await pasteText(user, '0.1\n0.3\n0.2\n');
    await waitFor(() => expect(within(dialog).getByRole('combobox', { name: 'Unit' })).toHaveValue('in'));
    expect(within(dialog).getByText(/depths in in, total 0\.6 in \(15\.24 mm\)/)).toBeInTheDocument();
    await user.clear(box);
    await user.paste(TEN_MINUTE);
    await waitFor(() => expect(within(dialog).getByRole('combobox', { name: 'Unit' })).toHaveValue('mm'));
  });

  it('without a time column, bars take the step the user sets', async () => {
    const { user } = renderWorkbench();
    const dialog = await openPaste(user);
    await pasteText(user, ONE_COLUMN);
    expect(within(dialog).getByRole('combobox', { name: 'Time column' })).toHaveValue('');
    const step = within(dialog).getByRole('textbox', { name: 'Time step (min)' });
    await user.clear(step);
    await user.type(step, '5');
    await waitFor(() =>
      expect(within(dialog).getByText(/^4 bars of 5 min, depths in mm, total 10 mm/)).toBeInTheDocument(),
    );
    await user.tab();
    // A step that cannot be used is refused beside the field and the last good one stays in force.
    await user.clear(step);
    await user.type(step, '0');
    expect(
      within(dialog).getByText('The time step must be more than 0 minutes. Not applied; still 5 min.'),
    ).toBeInTheDocument();
    expect(within(dialog).getByText(/^4 bars of 5 min/)).toBeInTheDocument();
  });

  it('lists bad rows by line and column with the reason, and will not use them', async () => {
    const { user, scenario } = renderWorkbench();
    const dialog = await openPaste(user);
    await pasteText(user, WITH_BAD_ROWS);
    const problems = await within(dialog).findByRole('table', { name: '2 problems to fix' });
    const rows = within(problems).getAllByRole('row').slice(1);
    expect(rows[0]).toHaveTextContent(/^42depthabc/);
    expect(rows[0]).toHaveTextContent('Not a number.');
    expect(rows[1]).toHaveTextContent(/^52depth-2/);
    expect(rows[1]).toHaveTextContent('Depth cannot be negative.');
    expect(within(dialog).getByText(/2 problems to fix before importing/)).toBeInTheDocument();
    const use = within(dialog).getByRole('button', { name: 'Use these bars' });
    expect(use).toBeDisabled();
    await user.click(use);
    expect(scenario().storm).toBe(FOUR_BARS.storm);
  });

  it('fixing the text in the box clears its problem', async () => {
    const { user } = renderWorkbench();
    const dialog = await openPaste(user);
    const box = await pasteText(user, 'Time,Rain mm\n0,0.2\n10,1.4\n20,abc\n');
    await within(dialog).findByRole('table', { name: '1 problem to fix' });
    await user.clear(box);
    await user.paste('Time,Rain mm\n0,0.2\n10,1.4\n20,0.9\n');
    await waitFor(() => expect(within(dialog).queryByRole('table', { name: /problem/ })).toBeNull());
    expect(within(dialog).getByRole('button', { name: 'Use these bars' })).toBeEnabled();
  });

  it('a wrong guess corrected by the user clears the problems it caused', async () => {
    const { user } = renderWorkbench();
    const dialog = await openPaste(user);
    // Decimal commas in a semicolon file: set the decimal mark wrong, then right again.
    await pasteText(user, 'Minute;Rain mm\n0;0,5\n10;1,5\n20;2,5\n');
    await waitFor(() => expect(within(dialog).getByRole('combobox', { name: 'Decimal mark' })).toHaveValue('comma'));
    await user.selectOptions(within(dialog).getByRole('combobox', { name: 'Decimal mark' }), 'point');
    await within(dialog).findByRole('table', { name: /problems? to fix/ });
    await user.selectOptions(within(dialog).getByRole('combobox', { name: 'Decimal mark' }), 'comma');
    await waitFor(() => expect(within(dialog).queryByRole('table', { name: /problems? to fix/ })).toBeNull());
    expect(within(dialog).getByText(/total 4\.5 mm/)).toBeInTheDocument();
  });

  it('“Use these bars” replaces the storm as one undoable step, and Undo brings the old storm back', async () => {
    const { user, scenario, store } = renderWorkbench();
    const before = scenario().storm;
    const dialog = await openPaste(user);
    await pasteText(user, TEN_MINUTE);
    const use = within(dialog).getByRole('button', { name: 'Use these bars' });
    await waitFor(() => expect(use).toBeEnabled());
    await user.click(use);
    expect(screen.queryByRole('dialog')).toBeNull();
    const storm = scenario().storm;
    expect(storm.depthsMm).toEqual([0.4, 1.6, 3.2, 5, 2.2, 0.6]);
    // Steps from clock times read as one step in the Rainfall summary, however their last bits fall.
    expect(screen.getByRole('region', { name: 'Rainfall' })).toHaveTextContent('6 bars of 10 min, 13 mm in 1 h');
    expect(store.getState().history.past).toHaveLength(1);
    expect(store.getState().undoLabel).toBe('Paste rainfall');
    // Results come from the core for the new storm.
    expect(screen.getByLabelText('Rainfall depth')).toHaveTextContent(
      mmText(coreTotals(storm, FOUR_BARS.method).rainMm),
    );
    expect(screen.getByLabelText('Excess depth')).toHaveTextContent(
      mmText(coreTotals(storm, FOUR_BARS.method).totalExcessMm),
    );
    // Focus is back on the button that opened the dialog.
    expect(screen.getByRole('button', { name: 'Paste rainfall…' })).toHaveFocus();
    await user.click(screen.getByRole('button', { name: 'Undo' }));
    expect(scenario().storm).toBe(before);
  });

  it('Cancel and Escape change nothing and leave nothing behind for the next opening', async () => {
    const { user, scenario, store } = renderWorkbench();
    let dialog = await openPaste(user);
    await pasteText(user, ONE_COLUMN);
    await user.click(within(dialog).getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByRole('dialog')).toBeNull();
    expect(scenario().storm).toBe(FOUR_BARS.storm);
    expect(store.getState().history.past).toHaveLength(0);

    dialog = await openPaste(user);
    expect(within(dialog).getByRole('textbox', { name: 'Rainfall text' })).toHaveValue('');
    await user.keyboard('{Escape}');
    expect(screen.queryByRole('dialog')).toBeNull();
    expect(scenario().storm).toBe(FOUR_BARS.storm);
    expect(screen.getByRole('button', { name: 'Paste rainfall…' })).toHaveFocus();
  });

  it('Ctrl+Z inside the dialog does not undo edits behind it', async () => {
    const { user, scenario, actions } = renderWorkbench();
    actions.setBarDepth(0, 3);
    const dialog = await openPaste(user);
    within(dialog).getByRole('button', { name: 'Cancel' }).focus();
    await user.keyboard('{Control>}z{/Control}');
    expect(scenario().storm.depthsMm[0]).toBe(3);
    await user.keyboard('{Escape}');
    await user.keyboard('{Control>}z{/Control}');
    expect(scenario().storm.depthsMm[0]).toBe(2);
  });

  it('keeps Tab inside the dialog', async () => {
    const { user } = renderWorkbench();
    const dialog = await openPaste(user);
    await pasteText(user, ONE_COLUMN);
    const cancel = within(dialog).getByRole('button', { name: 'Cancel' });
    const use = within(dialog).getByRole('button', { name: 'Use these bars' });
    await waitFor(() => expect(use).toBeEnabled());
    use.focus();
    await user.tab();
    expect(dialog.contains(document.activeElement)).toBe(true);
    expect(screen.getByRole('textbox', { name: 'Rainfall text' })).toHaveFocus();
    await user.tab({ shift: true });
    expect(use).toHaveFocus();
    await user.tab({ shift: true });
    expect(cancel).toHaveFocus();
  });

  it('“Open rainfall file…” reads a file into the same preview', async () => {
    const { user, scenario, store } = renderWorkbench();
    const file = new File(['minutes,depth mm\n0,1\n15,3\n30,2\n'], 'event-invented.csv', { type: 'text/csv' });
    await user.upload(screen.getByLabelText('Rainfall file to open'), file);
    const dialog = await screen.findByRole('dialog', { name: 'Paste rainfall' }, { timeout: LAZY_LOAD_MS });
    expect(within(dialog).getByRole('textbox', { name: 'Rainfall text' })).toHaveValue(
      'minutes,depth mm\n0,1\n15,3\n30,2\n',
    );
    expect(within(dialog).getByText('Read from event-invented.csv')).toBeInTheDocument();
    await waitFor(() =>
      expect(within(dialog).getByText(/^3 bars of 15 min, depths in mm, total 6 mm/)).toBeInTheDocument(),
    );
    await user.click(within(dialog).getByRole('button', { name: 'Use these bars' }));
    expect(scenario().storm.durationsH).toEqual([0.25, 0.25, 0.25]);
    expect(store.getState().undoLabel).toBe('Open rainfall file event-invented.csv');
  });

  it('“Open a file…” inside the dialog replaces the text with the file’s', async () => {
    const { user } = renderWorkbench();
    const dialog = await openPaste(user);
    await pasteText(user, ONE_COLUMN);
    expect(within(dialog).getByRole('button', { name: 'Open a file…' })).toBeInTheDocument();
    await user.upload(
      within(dialog).getByLabelText('Text file to read'),
      new File(['2\n4\n'], 'two-bars-invented.txt', { type: 'text/plain' }),
    );
    expect(await within(dialog).findByText('Read from two-bars-invented.txt')).toBeInTheDocument();
    expect(within(dialog).getByRole('textbox', { name: 'Rainfall text' })).toHaveValue('2\n4\n');
    await waitFor(() =>
      // Without times, bars take the storm on screen's step (FOUR_BARS: 30 min).
      expect(within(dialog).getByText(/^2 bars of 30 min, depths in mm, total 6 mm/)).toBeInTheDocument(),
    );
  });

  it('a file that is not text is refused with its name, and the storm is kept', async () => {
    const { user, scenario } = renderWorkbench();
    // A spreadsheet saved under a text name: zip bytes with NULs in them.
    const file = new File([new Uint8Array([0x50, 0x4b, 0x03, 0x04, 0x00, 0x00])], 'rain.txt', { type: 'text/plain' });
    await user.upload(screen.getByLabelText('Rainfall file to open'), file);
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'rain.txt is not a text file; save the rainfall as .csv or .txt and open that.',
    );
    expect(screen.queryByRole('dialog')).toBeNull();
    expect(scenario().storm).toBe(FOUR_BARS.storm);
  });
});
