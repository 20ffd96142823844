// @vitest-environment jsdom
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { LIBRARY_FORMAT_TAG, LIBRARY_KEY, LIBRARY_VERSION, createScenarioLibrary } from '../../../src/scenario';
import { SET_ASIDE_PREFIX, STORAGE_KEY } from '../../../src/store';
import { FOUR_BARS, memoryStorage, scenarioOf } from '../../helpers/scenario-fixtures';
import { SHARED, renderTools, savedText } from '../../helpers/render-tools';
import { lazyPartsLoaded } from '../../helpers/render';

// Saved data Raincut set aside (damaged, past the limits this version reads,
// or the scenario that stopped the screen) is listed under Saved scenarios,
// with Restore, Download and Delete. Before, it sat under a storage key the
// user was told about once and could not reach from the screen.

const AT = '2026-02-20T08:30:00.000Z';
/** Written before the limits of time: a bar of 3·10⁹ h. */
const PAST_LIMITS = JSON.stringify({ ...FOUR_BARS, name: 'Too long ago', storm: { durationsH: [3e9], depthsMm: [5] } });

function browserWithCopies() {
  const listText = JSON.stringify({
    $format: LIBRARY_FORMAT_TAG,
    version: LIBRARY_VERSION,
    nextId: 3,
    entries: [
      { id: 's1', savedAt: AT, scenario: SHARED },
      { id: 's2', savedAt: AT, scenario: { ...FOUR_BARS, storm: 'gone' } },
    ],
    deleted: [],
    setAside: [],
  });
  return memoryStorage({
    [STORAGE_KEY]: JSON.stringify(FOUR_BARS),
    [`${SET_ASIDE_PREFIX}${AT}`]: JSON.stringify({ ...FOUR_BARS, name: 'Set aside after a crash' }),
    [`${SET_ASIDE_PREFIX}2026-02-21T09:00:00.000Z`]: PAST_LIMITS,
    [`${LIBRARY_KEY}.damaged.2026-02-22T10:00:00.000Z`]: listText,
  });
}

async function openCopies(user: ReturnType<typeof renderTools>['user']) {
  await user.click(screen.getByRole('button', { name: 'Saved scenarios' }));
  await lazyPartsLoaded();
  const panel = screen.getByRole('region', { name: 'Saved scenarios' });
  return { panel, copies: () => within(panel).getByRole('list', { name: 'Set-aside copies' }) };
}

const savedNames = (storage: ReturnType<typeof memoryStorage>) =>
  createScenarioLibrary(storage)
    .list()
    .entries.map((e) => scenarioOf(e).name);

// A generous time limit: the whole workbench renders in each test, on a shared, busy machine.
describe('set-aside copies in Saved scenarios', { timeout: 20_000 }, () => {
  it('are listed oldest first, each with what it held and when', async () => {
    const { user } = renderTools({ storage: browserWithCopies() });
    await lazyPartsLoaded();
    const { copies } = await openCopies(user);
    const items = within(copies()).getAllByRole('listitem');
    expect(items).toHaveLength(3);
    expect(items[0]).toHaveTextContent(/^Saved scenario set aside/);
    expect(items[1]).toHaveTextContent(/^Saved scenario set aside/);
    expect(items[2]).toHaveTextContent(/^Saved list of scenarios set aside/);
    expect(items[0]).toHaveTextContent(`browser storage key “${SET_ASIDE_PREFIX}${AT}”`);
  });

  it('Restore puts what this version reads into the saved list, and says why the rest cannot be', async () => {
    const storage = browserWithCopies();
    const { user, scenario } = renderTools({ storage });
    await lazyPartsLoaded();
    const { panel, copies } = await openCopies(user);
    const [first, second, list] = within(copies()).getAllByRole('listitem') as [HTMLElement, HTMLElement, HTMLElement];

    await user.click(within(first).getByRole('button', { name: /^Restore Saved scenario set aside/ }));
    expect(savedNames(storage)).toEqual(['Set aside after a crash']);
    expect(within(panel).getAllByRole('status')[1]).toHaveTextContent(
      'Restored “Set aside after a crash” to the saved list; open it from there.',
    );
    // The workbench is not touched by a restore.
    expect(scenario()).toEqual(FOUR_BARS);

    await user.click(within(second).getByRole('button', { name: /^Restore Saved scenario set aside/ }));
    const alert = within(panel).getByRole('alert');
    expect(alert).toHaveTextContent('can be opened by this version of Raincut; it is kept as it was.');
    expect(alert).toHaveTextContent('storm.durationsH[0] (bar 1): must be a number of hours from 1 second');

    await user.click(within(list).getByRole('button', { name: /^Restore Saved list of scenarios set aside/ }));
    expect(savedNames(storage)).toEqual(['Set aside after a crash', SHARED.name]);
    expect(within(panel).getByRole('alert')).toHaveTextContent('entries[1]: storm: must be an object');
    // Every copy is still there until it is deleted.
    expect(within(copies()).getAllByRole('listitem')).toHaveLength(3);
  });

  it('Download gives the text exactly as it was kept', async () => {
    const { user, saved } = renderTools({ storage: browserWithCopies() });
    await lazyPartsLoaded();
    const { copies } = await openCopies(user);
    const second = within(copies()).getAllByRole('listitem')[1] as HTMLElement;
    await user.click(within(second).getByRole('button', { name: /^Download/ }));
    expect(saved.at(-1)?.name).toBe('raincut-set-aside-scenario-2026-02-21T09-00-00-000Z.json');
    expect(await savedText(saved)).toBe(PAST_LIMITS);
  });

  it('Delete removes the copy, and Undo brings it back', async () => {
    const storage = browserWithCopies();
    const { user } = renderTools({ storage });
    await lazyPartsLoaded();
    const { panel, copies } = await openCopies(user);
    const first = within(copies()).getAllByRole('listitem')[0] as HTMLElement;
    await user.click(within(first).getByRole('button', { name: /^Delete/ }));
    expect(storage.data.has(`${SET_ASIDE_PREFIX}${AT}`)).toBe(false);
    expect(within(copies()).getAllByRole('listitem')).toHaveLength(2);
    await user.click(within(panel).getByRole('button', { name: 'Undo' }));
    expect(storage.data.get(`${SET_ASIDE_PREFIX}${AT}`)).toContain('Set aside after a crash');
    expect(within(copies()).getAllByRole('listitem')).toHaveLength(3);
  });

  it('a saved scenario refused at start-up is listed at once', async () => {
    const storage = memoryStorage({ [STORAGE_KEY]: PAST_LIMITS });
    const { user } = renderTools({ storage });
    await lazyPartsLoaded();
    expect(screen.getByRole('alert')).toHaveTextContent('Set-aside copies');
    const { copies } = await openCopies(user);
    expect(within(copies()).getAllByRole('listitem')).toHaveLength(1);
  });

  it('with nothing set aside, the section is not shown', async () => {
    const { user } = renderTools({ storage: memoryStorage() });
    await lazyPartsLoaded();
    const { panel } = await openCopies(user);
    expect(within(panel).queryByRole('heading', { name: 'Set-aside copies' })).toBeNull();
  });
});
