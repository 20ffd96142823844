// @vitest-environment jsdom
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { makeShareLink } from '../../../src/scenario';
import { createWorkbenchStore } from '../../../src/store';
import { App } from '../../../src/ui/App';
import { PRACTICAL_LINK_CHARS } from '../../../src/ui/events/LongLinkOffer';
import { browserServices } from '../../../src/ui/services';
import { inventedEvents, withSet } from '../../helpers/event-set-fixtures';
import { memoryStorage } from '../../helpers/scenario-fixtures';

function renderWith(scenario: ReturnType<typeof withSet>) {
  const writeText = vi.fn(async (_text: string) => {});
  const saveFile = vi.fn((_blob: Blob, _name: string) => {});
  const services = browserServices({
    storage: memoryStorage(),
    clipboard: { writeText },
    saveFile,
    pageAddress: () => 'https://example.invalid/raincut/',
  });
  render(<App store={createWorkbenchStore(scenario)} services={services} />);
  return { writeText, saveFile, user: userEvent.setup() };
}

describe('Copy link with a large event set', () => {
  it('offers a file instead of a link over 8,000 characters, and says why', async () => {
    const scenario = withSet(inventedEvents(10, 100, null));
    const made = makeShareLink(scenario);
    expect(made.ok && made.fragment.length).toBeGreaterThan(PRACTICAL_LINK_CHARS);
    const { writeText, saveFile, user } = renderWith(scenario);
    await user.click(screen.getByRole('button', { name: 'Copy link' }));
    // Copy link's work loads on the first click (src/ui/share/copy-link-run.tsx): wait for its answer.
    expect(
      await screen.findByText(
        /most of it the 10 events of the event set: more than the 8,000 that can be sent reliably/,
      ),
    ).toBeInTheDocument();
    expect(writeText).not.toHaveBeenCalled();
    await user.click(screen.getByRole('button', { name: 'Save as file instead' }));
    expect(saveFile).toHaveBeenCalledTimes(1);
    await user.click(screen.getByRole('button', { name: 'Copy the long link anyway' }));
    expect(writeText).toHaveBeenCalledTimes(1);
  });

  it('copies a link of ten events at gauge resolution straight away', async () => {
    const { writeText, user } = renderWith(withSet(inventedEvents(10, 100)));
    await user.click(screen.getByRole('button', { name: 'Copy link' }));
    expect(await screen.findByText('Link copied.')).toBeInTheDocument();
    expect(writeText).toHaveBeenCalledTimes(1);
  });
});
