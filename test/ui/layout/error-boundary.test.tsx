// @vitest-environment jsdom
import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO } from '../../../src/scenario';
import { STORAGE_KEY } from '../../../src/store';
import { createCrashRecovery } from '../../../src/store/crash';
import { listSetAside } from '../../../src/store/set-aside';
import { startWorkbench } from '../../../src/store/start';
import { ErrorBoundary } from '../../../src/ui/layout/ErrorBoundary';
import { quietConsoleErrors, showErrorScreen } from '../../helpers/error-screen';
import { FOUR_BARS, memoryStorage } from '../../helpers/scenario-fixtures';

const NOW = new Date('2026-03-01T10:00:00.000Z');

/** The page as main.tsx starts it, with the scenario saved in storage (so it is the one that breaks). */
function page(storage: ReturnType<typeof memoryStorage>) {
  const { store, link } = startWorkbench({
    storage,
    fragment: '',
    fallback: DEMO_SCENARIO,
    nowIso: NOW.toISOString(),
    clearFragment: () => {},
  });
  const tab = memoryStorage();
  return { recovery: createCrashRecovery({ store, link, storage, now: () => NOW, tabStorage: tab }), tab };
}

describe('when drawing fails', () => {
  quietConsoleErrors();

  it('the screen says so plainly instead of going blank, and offers a reload', async () => {
    const { reload, user } = showErrorScreen(undefined);
    expect(screen.getByRole('alert')).toHaveTextContent('Something went wrong on this screen: bar 3 has no depth.');
    await user.click(screen.getByRole('button', { name: 'Reload' }));
    expect(reload).toHaveBeenCalledOnce();
    // Without knowing what was saved, it claims nothing about it.
    expect(screen.queryByText(/has not been changed/)).toBeNull();
  });

  it('says the saved scenario is the one that broke, and sets it aside (listed, not lost) before reloading', async () => {
    const saved = JSON.stringify(FOUR_BARS);
    const storage = memoryStorage({ [STORAGE_KEY]: saved });
    const { reload, user } = showErrorScreen(page(storage).recovery);
    expect(
      screen.getByText(
        /^The scenario that stopped the screen is the one saved in this browser, so reloading would stop it again\./,
      ),
    ).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Set the saved scenario aside and start from the demo' }));
    expect(reload).toHaveBeenCalledOnce();
    expect(storage.data.has(STORAGE_KEY)).toBe(false);
    expect(listSetAside(storage).copies.map((c) => storage.data.get(c.key))).toEqual([saved]);
  });

  it('with storage full, does not throw: it says so, offers the download, and starts without the saved scenario', async () => {
    const saved = JSON.stringify(FOUR_BARS);
    const storage = memoryStorage({ [STORAGE_KEY]: saved });
    const { recovery, tab } = page(storage);
    storage.failNextWrites(new DOMException('The quota has been exceeded.', 'QuotaExceededError'));
    const { reload, download, user } = showErrorScreen(recovery);
    await user.click(screen.getByRole('button', { name: 'Set the saved scenario aside and start from the demo' }));
    expect(reload).not.toHaveBeenCalled();
    expect(screen.getByRole('status')).toHaveTextContent(
      'The saved scenario could not be set aside (QuotaExceededError: The quota has been exceeded.); it is still saved, unchanged.',
    );
    expect(storage.data.get(STORAGE_KEY)).toBe(saved);
    await user.click(screen.getByRole('button', { name: 'Download the saved scenario' }));
    expect(download).toHaveBeenCalledWith(saved);
    await user.click(screen.getByRole('button', { name: 'Start from the demo without opening it' }));
    expect(tab.data.size).toBe(1);
    expect(reload).toHaveBeenCalledOnce();
  });

  it('draws its children when nothing fails', () => {
    render(
      <ErrorBoundary>
        <p>fine</p>
      </ErrorBoundary>,
    );
    expect(screen.getByText('fine')).toBeInTheDocument();
  });

  it('with its code loaded on failure (as main.tsx gives it), says the same and sets aside the same', async () => {
    const saved = JSON.stringify(FOUR_BARS);
    const storage = memoryStorage({ [STORAGE_KEY]: saved });
    const { recovery } = page(storage);
    const { reload, user } = showErrorScreen(() => Promise.resolve(recovery));
    expect(
      await screen.findByText(
        /^The scenario that stopped the screen is the one saved in this browser, so reloading would stop it again\./,
      ),
    ).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Set the saved scenario aside and start from the demo' }));
    expect(reload).toHaveBeenCalledOnce();
    expect(storage.data.has(STORAGE_KEY)).toBe(false);
  });

  it('when that code cannot load, says so, claims nothing about what is saved, and still offers a reload', async () => {
    showErrorScreen(() => Promise.reject(new Error('offline')));
    expect(await screen.findByRole('status')).toHaveTextContent(
      'What is saved could not be checked: the code for it did not load (Error: offline).',
    );
    expect(screen.queryByText(/has not been changed/)).toBeNull();
    expect(screen.queryByRole('button', { name: /Set the saved scenario aside/ })).toBeNull();
    expect(screen.getByRole('button', { name: 'Reload' })).toBeInTheDocument();
  });
});
