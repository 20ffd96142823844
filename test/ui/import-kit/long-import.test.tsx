// @vitest-environment jsdom
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { LONG_TEXT_CHARS } from '../../../src/ui/import-kit/read-file';
import { LAZY_LOAD_MS, renderWorkbench } from '../../helpers/render';
import { gaugeRecordText } from '../../helpers/plain-records';

// Invented gauge records for these tests (no real gauge or storm).

async function openPaste(user: ReturnType<typeof renderWorkbench>['user']) {
  await user.click(screen.getByRole('button', { name: 'Paste rainfall…' }));
  return screen.findByRole('dialog', { name: 'Paste rainfall' }, { timeout: LAZY_LOAD_MS });
}

describe('a long paste', () => {
  it('is held beside the dialog (first lines and the count), never put in the text area, and read into bars', async () => {
    const { user, store } = renderWorkbench();
    const dialog = await openPaste(user);
    // 10,000 readings of 21 characters (with the line break): 210,014 characters, over the limit.
    const text = gaugeRecordText(10_000);
    expect(text.length).toBeGreaterThanOrEqual(LONG_TEXT_CHARS);
    const box = within(dialog).getByRole('textbox', { name: 'Rainfall text' });
    fireEvent.paste(box, { clipboardData: { getData: () => text } });
    // 1 header + 10,000 readings = 10,001 lines
    await waitFor(() => expect(within(dialog).getByText(/^10,001 lines \(/)).toBeInTheDocument());
    expect(within(dialog).queryByRole('textbox', { name: 'Rainfall text' })).toBeNull();
    expect(within(dialog).getByLabelText(/First 12 lines/)).toHaveTextContent('2024-01-01 00:15,0');
    const use = within(dialog).getByRole('button', { name: 'Use these bars' });
    await waitFor(() => expect(use).toBeEnabled(), { timeout: 20_000 });
    await user.click(use);
    // The first reading, 00:15, ends the first 15-min bar: the storm starts at midnight, one bar per reading.
    const storm = store.getState().scenario.storm;
    expect(storm.startIso).toBe('2024-01-01T00:00:00');
    expect(storm.depthsMm.length).toBe(10_000);
    // every third reading holds 0.2 mm: 3,333 × 0.2 = 666.6 mm
    let total = 0;
    for (const p of storm.depthsMm) total += p;
    expect(total).toBeCloseTo(666.6, 9);
  }, 60_000);

  it('"Clear the text" lets it go and gives the text area back', async () => {
    const { user } = renderWorkbench();
    const dialog = await openPaste(user);
    const text = 'x'.repeat(LONG_TEXT_CHARS);
    fireEvent.paste(within(dialog).getByRole('textbox', { name: 'Rainfall text' }), {
      clipboardData: { getData: () => text },
    });
    await user.click(await within(dialog).findByRole('button', { name: 'Clear the text' }));
    expect(within(dialog).getByRole('textbox', { name: 'Rainfall text' })).toHaveValue('');
  });
});

describe('a gap in a pasted record', () => {
  it('is named in the summary and filled unless the user keeps the long bar', async () => {
    const { user, store } = renderWorkbench();
    const dialog = await openPaste(user);
    await user.click(within(dialog).getByRole('textbox', { name: 'Rainfall text' }));
    await user.paste('10:15\t0.2\n10:30\t0.4\n12:30\t0.6\n12:45\t0.2');
    await waitFor(() =>
      expect(within(dialog).getByRole('status')).toHaveTextContent(
        /1 gap longer than the record’s 15 min step \(the longest 2 h between lines 2 and 3\)/,
      ),
    );
    const choice = within(dialog).getByRole('combobox', { name: 'Steps longer than the record’s' });
    expect(choice).toHaveValue('fill');
    await user.selectOptions(choice, 'keep');
    await waitFor(() =>
      expect(within(dialog).getByRole('status')).toHaveTextContent(/one long bar over the whole gap/),
    );
    await user.click(within(dialog).getByRole('button', { name: 'Use these bars' }));
    // Kept: 15, 15, 120, 15 min
    expect(store.getState().scenario.storm.durationsH).toEqual([0.25, 0.25, 2, 0.25]);
  });
});
