// @vitest-environment jsdom
import { act, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { LIBRARY_KEY, MAX_LINK_CHARS, createScenarioLibrary, encodeScenarioLink } from '../../../src/scenario';
import type { Scenario } from '../../../src/scenario/types';
import { STORAGE_KEY } from '../../../src/store';
import { FOUR_BARS, memoryStorage, scenarioOf } from '../../helpers/scenario-fixtures';
import { SHARED, renderTools } from '../../helpers/render-tools';

/** A browser that has been used: its own scenario saved. */
function usedBrowser() {
  const own: Scenario = { ...FOUR_BARS, name: 'My own work' };
  const text = JSON.stringify(own);
  return { own, text, storage: memoryStorage({ [STORAGE_KEY]: text }) };
}

const nameField = () => screen.getByRole('textbox', { name: 'Scenario name' });

/** A link whose one character in the middle was changed, as a mail program might. */
function damaged(link: string): string {
  const i = Math.floor(link.length / 2);
  return link.slice(0, i) + (link[i] === 'A' ? 'B' : 'A') + link.slice(i + 1);
}

describe('opening a share link', () => {
  it('shows exactly the shared scenario, and writes nothing to the browser until the user chooses', async () => {
    const { storage, text } = usedBrowser();
    const { scenario, link, actions } = renderTools({ storage, fragment: `#${encodeScenarioLink(SHARED)}` });
    expect(scenario()).toEqual(SHARED);
    expect(nameField()).toHaveValue(SHARED.name);
    expect(screen.getByRole('radio', { name: 'US customary' })).toBeChecked();
    expect(screen.getByRole('combobox', { name: 'Loss method' })).toHaveValue('horton');
    const notice = await screen.findByRole('region', { name: `Shared scenario: “${SHARED.name}”` });
    expect(notice).toHaveTextContent('Your own scenario “My own work” stays saved in this browser as it was.');
    // Editing the shared one saves nothing either.
    act(() => actions.setBarDepth(0, 2.5));
    link.flush();
    expect(storage.data.get(STORAGE_KEY)).toBe(text);
    expect(storage.data.has(LIBRARY_KEY)).toBe(false);
    // Undo cannot step back into a scenario the user never had on screen.
    expect(screen.getByRole('button', { name: 'Undo' })).toBeEnabled();
    act(() => actions.undo());
    expect(screen.getByRole('button', { name: 'Undo' })).toBeDisabled();
  });

  it('Keep puts the user’s own scenario in the saved list first, then saves the shared one as current', async () => {
    const { storage, own } = usedBrowser();
    const { user, scenario, calls, actions, link } = renderTools({
      storage,
      fragment: `#${encodeScenarioLink(SHARED)}`,
    });
    act(() => actions.setBarDepth(1, 5.5));
    await user.click(screen.getByRole('button', { name: 'Keep the shared scenario' }));
    expect(JSON.parse(storage.data.get(STORAGE_KEY) as string)).toEqual(scenario());
    expect(scenario().storm.depthsMm[1]).toBe(5.5);
    const listed = createScenarioLibrary(storage)
      .list()
      .entries.map((e) => scenarioOf(e));
    expect(listed).toEqual([own]);
    expect(
      screen.getByText(
        /is now your current scenario in this browser\. Your previous scenario “My own work” is in Saved scenarios\./,
      ),
    ).toBeInTheDocument();
    expect(calls.clearFragment).toBe(1);
    // From now on edits are saved as usual.
    act(() => actions.setName('Kept and edited'));
    link.flush();
    expect(JSON.parse(storage.data.get(STORAGE_KEY) as string).name).toBe('Kept and edited');
  });

  it('Back to my scenario shows the saved one again and saves nothing from the link', async () => {
    const { storage, own, text } = usedBrowser();
    const { user, scenario, calls } = renderTools({ storage, fragment: `#${encodeScenarioLink(SHARED)}` });
    await user.click(screen.getByRole('button', { name: 'Back to my scenario' }));
    expect(scenario()).toEqual(own);
    expect(nameField()).toHaveValue('My own work');
    expect(storage.data.get(STORAGE_KEY)).toBe(text);
    expect(storage.data.has(LIBRARY_KEY)).toBe(false);
    expect(screen.getByRole('button', { name: 'Undo' })).toBeDisabled();
    expect(
      screen.getByText(`Back to “My own work”. The shared scenario “${SHARED.name}” was not saved.`),
    ).toBeInTheDocument();
    expect(calls.clearFragment).toBe(1);
  });

  it('in a browser with nothing saved, says so, and keeping simply saves the shared scenario', async () => {
    const storage = memoryStorage();
    const { user } = renderTools({ storage, fragment: encodeScenarioLink(SHARED) });
    expect(screen.getByRole('region', { name: /^Shared scenario/ })).toHaveTextContent(
      'Nothing is saved in this browser yet',
    );
    await user.click(screen.getByRole('button', { name: 'Keep the shared scenario' }));
    expect(JSON.parse(storage.data.get(STORAGE_KEY) as string)).toEqual(SHARED);
    expect(storage.data.has(LIBRARY_KEY)).toBe(false);
  });

  const link = encodeScenarioLink(SHARED);
  const tampered = encodeScenarioLink({
    ...SHARED,
    storm: { ...SHARED.storm, depthsMm: [1, -4, 2, 2, 2, 2] },
  } as Scenario);
  it.each([
    ['a link with one character changed', damaged(link), 'its check sum does not match'],
    ['a truncated link', link.slice(0, Math.floor(link.length * 0.6)), 'The link is damaged'],
    [
      'a link over the length limit',
      `rc1.${'A'.repeat(MAX_LINK_CHARS + 10)}`,
      `a scenario link may have at most ${MAX_LINK_CHARS}`,
    ],
    [
      'a tampered link (correct check sum, impossible rain)',
      tampered,
      'storm.depthsMm[1] (bar 2): must be a number ≥ 0',
    ],
    ['a fragment that is not a scenario link', 'section-3', 'This is not a Raincut scenario link'],
    [
      // Before the limits of time this link opened, and drawing its clock threw "Invalid time value".
      'a link with one bar of 3·10⁹ h on a clock',
      encodeScenarioLink({ ...SHARED, storm: { durationsH: [3e9], depthsMm: [5], startIso: '2026-02-12T21:45:00' } }),
      'storm.durationsH[0] (bar 1): must be a number of hours from 1 second (0.000278) to 500 years',
    ],
  ])('%s says what was wrong and keeps the saved scenario', (_kind, fragment, why) => {
    const { storage, own, text } = usedBrowser();
    const { scenario, link: session, actions, calls } = renderTools({ storage, fragment: `#${fragment}` });
    const alert = screen.getByRole('alert');
    expect(alert).toHaveTextContent('The shared link could not be opened.');
    // Taken out of the address, so a reload does not refuse it again.
    expect(calls.clearFragment).toBe(1);
    expect(alert).toHaveTextContent(
      'Nothing was changed: “My own work” is on screen and your saved scenario is as it was.',
    );
    expect(within(alert).getByRole('list', { name: 'What is wrong with the link' })).toHaveTextContent(why);
    expect(scenario()).toEqual(own);
    expect(storage.data.get(STORAGE_KEY)).toBe(text);
    expect(storage.data.has(LIBRARY_KEY)).toBe(false);
    // The workbench carries on saving the user's own edits.
    act(() => actions.setName('Still mine'));
    session.flush();
    expect(JSON.parse(storage.data.get(STORAGE_KEY) as string).name).toBe('Still mine');
  });

  it('in a browser with nothing saved, a bad link says only that nothing changed', () => {
    renderTools({ storage: memoryStorage(), fragment: '#rc1.AAAAAAAAAAAA' });
    expect(screen.getByRole('alert')).toHaveTextContent('Nothing was changed: “Four bars” is on screen.');
    expect(screen.getByRole('alert')).not.toHaveTextContent('your saved scenario');
  });

  it('a link pasted into the address of an open page is opened the same way', async () => {
    const { storage, text } = usedBrowser();
    const { link, scenario, user } = renderTools({ storage });
    expect(screen.queryByRole('region', { name: /^Shared scenario/ })).toBeNull();
    act(() => link.open(`#${encodeScenarioLink(SHARED)}`));
    expect(scenario()).toEqual(SHARED);
    expect(screen.getByRole('region', { name: /^Shared scenario/ })).toBeInTheDocument();
    expect(storage.data.get(STORAGE_KEY)).toBe(text);
    // A damaged second link while the first still waits: the choice stays open, and the problem is said.
    act(() => link.open(`#${damaged(encodeScenarioLink(FOUR_BARS))}`));
    expect(scenario()).toEqual(SHARED);
    expect(screen.getByRole('alert')).toHaveTextContent('The new link could not be opened: The link is damaged');
    await user.click(screen.getByRole('button', { name: 'Back to my scenario' }));
    expect(scenario().name).toBe('My own work');
  });

  it('an edit not yet saved when a link arrives is saved first, and is what Back returns to', async () => {
    const { storage } = usedBrowser();
    const { link, actions, scenario, user } = renderTools({ storage });
    act(() => actions.setName('Edited just now'));
    // The save is still waiting for quiet time when the link comes in.
    act(() => link.open(`#${encodeScenarioLink(SHARED)}`));
    expect(JSON.parse(storage.data.get(STORAGE_KEY) as string).name).toBe('Edited just now');
    await user.click(screen.getByRole('button', { name: 'Back to my scenario' }));
    expect(scenario().name).toBe('Edited just now');
  });

  it('a link to what the browser already holds asks nothing', () => {
    const { storage, own } = usedBrowser();
    const { scenario } = renderTools({ storage, fragment: `#${encodeScenarioLink(own)}` });
    expect(scenario()).toEqual(own);
    expect(screen.queryByRole('region', { name: /^Shared scenario/ })).toBeNull();
    expect(
      screen.getByText('The link holds “My own work” exactly as it is already saved in this browser.'),
    ).toBeInTheDocument();
  });

  it('where the browser cannot save, keeping only ends the question and says to save a file', async () => {
    const { user } = renderTools({ storage: null, fragment: `#${encodeScenarioLink(SHARED)}` });
    expect(screen.getByRole('region', { name: /^Shared scenario/ })).toHaveTextContent('This browser cannot save here');
    await user.click(screen.getByRole('button', { name: 'Keep the shared scenario' }));
    expect(
      screen.getByText(/this browser does not allow saving here: save it as a file to keep it/),
    ).toBeInTheDocument();
  });
});
