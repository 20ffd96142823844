// @vitest-environment jsdom
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { LIBRARY_KEY, createScenarioLibrary } from '../../../src/scenario';
import { FOUR_BARS, memoryStorage, scenarioOf } from '../../helpers/scenario-fixtures';
import { lazyPartsLoaded } from '../../helpers/render';
import { renderTools } from '../../helpers/render-tools';

// The saved list open in this tab while another tab (a second library on the
// same storage) changes it. The browser announces the other tab's write with
// a "storage" event, dispatched here by hand.

const announce = (key: string | null) => window.dispatchEvent(new StorageEvent('storage', { key }));

async function openPanel(user: ReturnType<typeof renderTools>['user']) {
  await user.click(screen.getByRole('button', { name: 'Saved scenarios' }));
  await lazyPartsLoaded();
  return screen.getByRole('region', { name: 'Saved scenarios' });
}

describe('the saved list with another tab open', () => {
  it('shows a scenario saved in another tab once that tab’s write is announced', async () => {
    const storage = memoryStorage();
    const { user } = renderTools({ storage });
    const panel = await openPanel(user);
    expect(panel).toHaveTextContent('Nothing is saved in the list yet.');
    createScenarioLibrary(storage).save({ ...FOUR_BARS, name: 'Saved in the other tab' });
    announce(LIBRARY_KEY);
    const list = await within(panel).findByRole('list', { name: 'Scenarios saved in this browser' });
    expect(within(list).getByText('Saved in the other tab')).toBeInTheDocument();
  });

  it('refuses to delete an entry the other tab renamed unheard, and shows the other tab’s version', async () => {
    const storage = memoryStorage();
    const other = createScenarioLibrary(storage);
    const saved = other.save({ ...FOUR_BARS, name: 'Base case' });
    if (!saved.ok) throw new Error('could not save');
    const { user } = renderTools({ storage });
    const panel = await openPanel(user);
    other.rename(saved.value.id, 'Base case, renamed elsewhere');
    // No event heard yet: this tab still shows the old name.
    await user.click(within(panel).getByRole('button', { name: 'Delete Base case' }));
    expect(within(panel).getByRole('alert')).toHaveTextContent(
      '“Base case” was changed in another tab since this list was shown; nothing was written over it.',
    );
    await waitFor(() =>
      expect(within(panel).getByRole('button', { name: 'Delete Base case, renamed elsewhere' })).toBeInTheDocument(),
    );
    expect(
      createScenarioLibrary(storage)
        .list()
        .entries.map((e) => scenarioOf(e).name),
    ).toEqual(['Base case, renamed elsewhere']);
  });
});
