// @vitest-environment jsdom
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { LIBRARY_KEY, createScenarioLibrary } from '../../../src/scenario';
import { FOUR_BARS, memoryStorage, scenarioOf } from '../../helpers/scenario-fixtures';
import { lazyPartsLoaded } from '../../helpers/render';
import { NOW, SHARED, renderTools } from '../../helpers/render-tools';

const names = (storage: ReturnType<typeof memoryStorage>) =>
  createScenarioLibrary(storage)
    .list()
    .entries.map((e) => scenarioOf(e).name);

async function openPanel(user: ReturnType<typeof renderTools>['user']) {
  const toggle = screen.getByRole('button', { name: 'Saved scenarios' });
  expect(toggle).toHaveAttribute('aria-expanded', 'false');
  await user.click(toggle);
  expect(toggle).toHaveAttribute('aria-expanded', 'true');
  await lazyPartsLoaded();
  return screen.getByRole('region', { name: 'Saved scenarios' });
}

describe('the saved list in this browser', () => {
  it('saves the current scenario, renames, duplicates, and deletes with Undo', async () => {
    const storage = memoryStorage();
    const { user, actions } = renderTools({ storage });
    const panel = await openPanel(user);
    expect(panel).toHaveTextContent('Nothing is saved in the list yet.');

    await user.click(within(panel).getByRole('button', { name: 'Save current scenario to list' }));
    expect(names(storage)).toEqual(['Four bars']);
    const list = within(panel).getByRole('list', { name: 'Scenarios saved in this browser' });
    expect(within(list).getAllByRole('listitem')).toHaveLength(1);

    // Rename: an empty name is refused with a message, and nothing changes.
    await user.click(within(panel).getByRole('button', { name: 'Rename Four bars' }));
    const field = within(panel).getByRole('textbox', { name: 'New name for Four bars' });
    await user.clear(field);
    await user.type(field, '   {Enter}');
    expect(within(panel).getByRole('alert')).toHaveTextContent('A saved scenario needs a name; the new name is empty.');
    expect(names(storage)).toEqual(['Four bars']);
    await user.click(within(panel).getByRole('button', { name: 'Rename Four bars' }));
    const again = within(panel).getByRole('textbox', { name: 'New name for Four bars' });
    await user.clear(again);
    await user.type(again, 'Base case, φ 8{Enter}');
    expect(names(storage)).toEqual(['Base case, φ 8']);
    expect(within(panel).getByRole('status')).toHaveTextContent('Renamed to “Base case, φ 8”.');

    // Escape leaves a rename without changing anything.
    await user.click(within(panel).getByRole('button', { name: 'Rename Base case, φ 8' }));
    await user.type(within(panel).getByRole('textbox', { name: 'New name for Base case, φ 8' }), ' extra{Escape}');
    expect(names(storage)).toEqual(['Base case, φ 8']);

    await user.click(within(panel).getByRole('button', { name: 'Duplicate Base case, φ 8' }));
    expect(names(storage)).toEqual(['Base case, φ 8', 'Base case, φ 8 (copy)']);

    // Saving again after an edit adds a second entry of its own.
    actions.setName('Wetter soil');
    actions.setParam('rateMmH', 3);
    await user.click(within(panel).getByRole('button', { name: 'Save current scenario to list' }));
    expect(names(storage)).toEqual(['Base case, φ 8', 'Base case, φ 8 (copy)', 'Wetter soil']);

    await user.click(within(panel).getByRole('button', { name: 'Delete Base case, φ 8 (copy)' }));
    expect(names(storage)).toEqual(['Base case, φ 8', 'Wetter soil']);
    const status = within(panel).getByRole('status');
    expect(status).toHaveTextContent('Deleted “Base case, φ 8 (copy)” — Undo');
    await user.click(within(status).getByRole('button', { name: 'Undo' }));
    // Back where it stood.
    expect(names(storage)).toEqual(['Base case, φ 8', 'Base case, φ 8 (copy)', 'Wetter soil']);
    expect(within(panel).getByRole('status')).toHaveTextContent('Brought back “Base case, φ 8 (copy)”.');
  });

  it('opens a saved scenario as one undoable step, and Update writes edits back to it', async () => {
    const storage = memoryStorage();
    const library = createScenarioLibrary(storage, { now: () => new Date(NOW) });
    library.save(SHARED);
    const { user, scenario, actions } = renderTools({ storage });
    const panel = await openPanel(user);
    await user.click(within(panel).getByRole('button', { name: `Open ${SHARED.name}` }));
    expect(scenario()).toEqual(SHARED);
    expect(within(panel).getByRole('status')).toHaveTextContent(
      `Opened “${SHARED.name}”. Undo brings back the scenario you had before.`,
    );

    actions.setBarDepth(0, 9.75);
    await user.click(within(panel).getByRole('button', { name: `Update “${SHARED.name}”` }));
    const entry = library.list().entries[0];
    expect((entry && scenarioOf(entry))?.storm.depthsMm[0]).toBe(9.75);
    expect(library.list().entries).toHaveLength(1);

    await user.click(screen.getByRole('button', { name: 'Undo' }));
    await user.click(screen.getByRole('button', { name: 'Undo' }));
    expect(scenario()).toEqual(FOUR_BARS);
  });

  it('a damaged saved list is reported, kept aside, and the panel still works', async () => {
    const storage = memoryStorage({ [LIBRARY_KEY]: '{"$format":"raincut-library","version":1,"entries":[{"id":"s1"' });
    const { user } = renderTools({ storage });
    const panel = await openPanel(user);
    expect(within(panel).getByRole('alert')).toHaveTextContent(
      /The saved list of scenarios was damaged and could not be read\. It is kept as it was under browser storage key "raincut\.library\.damaged\./,
    );
    const aside = [...storage.data.keys()].find((k) => k.startsWith(`${LIBRARY_KEY}.damaged.`));
    expect(aside && storage.data.get(aside)).toBe('{"$format":"raincut-library","version":1,"entries":[{"id":"s1"');
    await user.click(within(panel).getByRole('button', { name: 'Save current scenario to list' }));
    expect(names(storage)).toEqual(['Four bars']);
  });

  it('where the browser allows no storage, the panel says to save files instead', async () => {
    const { user } = renderTools({ storage: null });
    const panel = await openPanel(user);
    expect(panel).toHaveTextContent('This browser does not allow saving here. Use “Save as file” to keep scenarios.');
  });
});
