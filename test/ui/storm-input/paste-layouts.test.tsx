// @vitest-environment jsdom
// Issue 16, "Pasting and opening rainfall", as a person meets it in the paste dialog.
// FOUR_BARS (invented) has 30-min bars. Expected values are worked by hand.
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { lazyPartsLoaded, renderWorkbench } from '../../helpers/render';
import { FOUR_BARS } from '../../helpers/scenario-fixtures';

async function openPaste(user: ReturnType<typeof renderWorkbench>['user']) {
  await user.click(screen.getByRole('button', { name: 'Paste rainfall…' }));
  await lazyPartsLoaded();
  return screen.getByRole('dialog', { name: 'Paste rainfall' });
}

async function pasteText(user: ReturnType<typeof renderWorkbench>['user'], text: string) {
  await user.click(screen.getByRole('textbox', { name: 'Rainfall text' }));
  await user.paste(text);
}

describe('the paste dialog', () => {
  it('reads a spreadsheet row as bars across it, at the storm’s own step', async () => {
    const { user, scenario } = renderWorkbench();
    await lazyPartsLoaded();
    const dialog = await openPaste(user);
    await pasteText(user, '1.2\t3.4\t5.6');
    // 1.2 + 3.4 + 5.6 = 10.2 mm in three 30-min bars (the storm on screen has 30-min bars).
    await waitFor(() =>
      expect(within(dialog).getByRole('status')).toHaveTextContent(
        '3 bars of 30 min, depths in mm, total 10.2 mm; values read along each line; no times, so bars are 30 min apart as set.',
      ),
    );
    expect(within(dialog).getByRole('combobox', { name: 'Values run' })).toHaveValue('line');
    await user.click(within(dialog).getByRole('button', { name: 'Use these bars' }));
    expect(scenario().storm).toEqual({ durationsH: [0.5, 0.5, 0.5], depthsMm: [1.2, 3.4, 5.6] });
  });

  it('takes the storm’s step for a column without times, not 60 min', async () => {
    const { user } = renderWorkbench();
    await lazyPartsLoaded();
    const dialog = await openPaste(user);
    await pasteText(user, '1\n2\n3\n');
    await waitFor(() => expect(within(dialog).getByRole('textbox', { name: 'Time step (min)' })).toHaveValue('30'));
  });

  it('a cancelled paste leaves nothing behind for the next opening', async () => {
    const { user, scenario } = renderWorkbench();
    await lazyPartsLoaded();
    let dialog = await openPaste(user);
    await pasteText(user, '1\n2\n3\n');
    await user.selectOptions(within(dialog).getByRole('combobox', { name: 'Unit' }), 'in');
    await user.click(within(dialog).getByRole('button', { name: 'Cancel' }));
    expect(scenario().storm).toBe(FOUR_BARS.storm);
    dialog = await openPaste(user);
    expect(within(dialog).getByRole('textbox', { name: 'Rainfall text' })).toHaveValue('');
    expect(within(dialog).getByText('Nothing pasted yet.')).toBeInTheDocument();
    await pasteText(user, '1\n2\n3\n');
    // The unit chosen in the cancelled paste is not carried over.
    await waitFor(() => expect(within(dialog).getByRole('combobox', { name: 'Unit' })).toHaveValue('mm'));
  });

  it('"1,200 / 3,500" is a column of grouped numbers, written back as the screen writes them', async () => {
    const { user } = renderWorkbench();
    await lazyPartsLoaded();
    const dialog = await openPaste(user);
    await pasteText(user, '1,200\n3,500\n');
    // 1,200 + 3,500 = 4,700 mm: whole and grouped, as the screen writes a result.
    await waitFor(() =>
      expect(within(dialog).getByRole('status')).toHaveTextContent(/^2 bars of 30 min, depths in mm, total 4,700 mm/),
    );
    expect(within(dialog).getByRole('combobox', { name: 'Time column' })).toHaveValue('');
    expect(within(dialog).getByRole('combobox', { name: 'Thousands separator' })).toHaveValue('comma');
    expect(within(dialog).getByRole('combobox', { name: 'Separator' })).toHaveValue('none');
  });

  it('offers spaces and aligned columns as separators, and skipping blank lines with their count', async () => {
    const { user } = renderWorkbench();
    await lazyPartsLoaded();
    const dialog = await openPaste(user);
    await pasteText(user, '0:30 1.5\n\n1:00 2.5\n');
    const separator = within(dialog).getByRole('combobox', { name: 'Separator' });
    await waitFor(() => expect(separator).toHaveValue('space'));
    expect(within(separator).getByRole('option', { name: 'Aligned columns (fixed width)' })).toBeInTheDocument();
    expect(within(dialog).getByRole('table', { name: /problem/ })).toHaveTextContent(/The line is empty/);
    await user.click(within(dialog).getByRole('checkbox', { name: 'Skip blank lines inside the data' }));
    await waitFor(() =>
      expect(within(dialog).getByRole('status')).toHaveTextContent(/; 1 blank line inside the data skipped\.$/),
    );
  });
});

describe('counts are written one way everywhere', () => {
  it('a storm of 50,000 bars reads "50,000 bars of 1 h" beside "50,000 h"', () => {
    const n = 50_000;
    renderWorkbench({
      ...FOUR_BARS,
      storm: { durationsH: new Array<number>(n).fill(1), depthsMm: new Array<number>(n).fill(0.1) },
    });
    expect(screen.getByRole('region', { name: 'Rainfall' })).toHaveTextContent(
      // 50,000 × 0.1 mm = 5,000 mm over 50,000 h.
      /^Rainfall50,000 bars of 1 h, 5,000 mm in 50,000 h/,
    );
  }, 30_000);
});
