// @vitest-environment jsdom
import { act, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { createUpdateChannel, type RegisterCallbacks } from '../../../src/offline/updates';
import { createWorkbenchStore } from '../../../src/store';
import { App } from '../../../src/ui/App';
import { browserServices } from '../../../src/ui/services';
import { FOUR_BARS, memoryStorage } from '../../helpers/scenario-fixtures';

function renderWithUpdates(storage: ReturnType<typeof memoryStorage> | null) {
  let worker: RegisterCallbacks = {};
  const log: string[] = [];
  const updates = createUpdateChannel({
    register: (cb) => {
      worker = cb;
      return async () => {
        log.push('take waiting version');
      };
    },
    beforeReload: () => log.push('flush saves'),
    reloadPage: () => log.push('reload'),
    setInterval: () => 0,
    setTimeout: () => 0,
  });
  const store = createWorkbenchStore(FOUR_BARS);
  render(<App store={store} updates={updates} services={browserServices({ storage, now: () => new Date(0) })} />);
  return { user: userEvent.setup(), log, newVersion: () => act(() => worker.onNeedRefresh?.()) };
}

describe('the new-version notice', () => {
  it('is not there until a new version waits; then it says so and reloads only on the user’s word', async () => {
    const { user, log, newVersion } = renderWithUpdates(memoryStorage());
    expect(screen.queryByRole('region', { name: 'New version' })).toBeNull();
    newVersion();
    const notice = await screen.findByRole('region', { name: 'New version' });
    expect(notice).toHaveTextContent(
      'A new version of Raincut is ready. Reload when convenient to use it. Your scenario is saved in this browser and opens as you left it.',
    );
    expect(log).toEqual([]);
    await user.click(within(notice).getByRole('button', { name: 'Reload now' }));
    expect(log).toEqual(['take waiting version']);
    expect(screen.getByRole('region', { name: 'New version' })).toHaveTextContent('Reloading with the new version…');
  });

  it('warns before a reload would lose a scenario the browser cannot save', async () => {
    const { user, log, newVersion } = renderWithUpdates(null);
    newVersion();
    const notice = await screen.findByRole('region', { name: 'New version' });
    expect(notice).toHaveTextContent(
      'This browser does not let Raincut save here, so a reload would lose the scenario on screen. Save it as a file first.',
    );
    expect(within(notice).queryByRole('button', { name: 'Reload now' })).toBeNull();
    await user.click(within(notice).getByRole('button', { name: 'Later' }));
    expect(screen.queryByRole('region', { name: 'New version' })).toBeNull();
    expect(log).toEqual([]);
  });
});
