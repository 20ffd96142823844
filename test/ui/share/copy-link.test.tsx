// @vitest-environment jsdom
import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { MAX_LINK_CHARS, decodeScenarioLink } from '../../../src/scenario';
import { STORAGE_KEY } from '../../../src/store';
import { LONG_LINK_CHARS, linkLengthText } from '../../../src/ui/share/copy-link-run';
import { memoryStorage } from '../../helpers/scenario-fixtures';
import { PAGE, SHARED, renderTools } from '../../helpers/render-tools';

const MESSAGE = 'Scenario tools message';

const fragmentOf = (url: string): string => {
  expect(url.startsWith(`${PAGE}#`)).toBe(true);
  return url.slice(PAGE.length + 1);
};

describe('Copy link', () => {
  it('puts a link on the clipboard that opens exactly the scenario on screen, and says how long it is', async () => {
    const { user, copied } = renderTools({ fallback: SHARED });
    await user.click(screen.getByRole('button', { name: 'Copy link' }));
    const status = await screen.findByRole('status', { name: MESSAGE });
    expect(status).toHaveTextContent('Link copied.');
    expect(copied).toHaveLength(1);
    const url = copied[0] as string;
    expect(status).toHaveTextContent(`The link is ${url.length} characters long`);
    const decoded = decodeScenarioLink(fragmentOf(url));
    expect(decoded.ok && decoded.scenario).toEqual(SHARED);
  });

  it('links the scenario as edited, not as it was saved', async () => {
    const { user, copied, actions } = renderTools({ fallback: SHARED });
    actions.setBarDepth(2, 20.5);
    actions.setUnits('si');
    await user.click(screen.getByRole('button', { name: 'Copy link' }));
    // Copy link's work loads on the first click: wait for its answer before reading the clipboard.
    await screen.findByRole('status', { name: MESSAGE });
    const decoded = decodeScenarioLink(fragmentOf(copied[0] as string));
    expect(decoded.ok && decoded.scenario.storm.depthsMm[2]).toBe(20.5);
    expect(decoded.ok && decoded.scenario.units).toBe('si');
  });

  it('when the browser refuses the clipboard, shows the link in a box to copy by hand, with the reason', async () => {
    const refusing = {
      writeText: async () => {
        throw new DOMException('Write permission denied.', 'NotAllowedError');
      },
    };
    const { user } = renderTools({ fallback: SHARED, clipboard: refusing });
    await user.click(screen.getByRole('button', { name: 'Copy link' }));
    const alert = await screen.findByRole('alert', { name: MESSAGE });
    expect(alert).toHaveTextContent('The link could not be put on the clipboard (Write permission denied.)');
    const box = within(alert).getByRole('textbox', { name: 'Share link' });
    expect(box).toHaveAttribute('readonly');
    const url = (box as HTMLInputElement).value;
    const decoded = decodeScenarioLink(fragmentOf(url));
    expect(decoded.ok && decoded.scenario).toEqual(SHARED);
    // Ready to copy: focused, with the whole link selected.
    await waitFor(() => expect(box).toHaveFocus());
    expect((box as HTMLInputElement).selectionStart).toBe(0);
    expect((box as HTMLInputElement).selectionEnd).toBe(url.length);
    expect(alert).toHaveTextContent(`The link is ${url.length} characters long`);
  });

  it('where the page has no clipboard at all, the box shows as well', async () => {
    const { user } = renderTools({ fallback: SHARED, clipboard: null });
    await user.click(screen.getByRole('button', { name: 'Copy link' }));
    const alert = await screen.findByRole('alert', { name: MESSAGE });
    expect(alert).toHaveTextContent('this browser gives the page no clipboard');
    const box = within(alert).getByRole('textbox', { name: 'Share link' }) as HTMLInputElement;
    expect(box.value.startsWith(`${PAGE}#rc1.`)).toBe(true);
  });

  it('a scenario too large for a link is refused with the reason and the advice to save a file, and nothing is copied', async () => {
    // 20,000 bars of unrounded depths compress poorly: far past the link limit.
    let seed = 7;
    const random = (): number => {
      seed = (seed * 16807) % 2147483647;
      return seed / 2147483647;
    };
    const depthsMm = Array.from({ length: 20_000 }, () => random() * 9);
    const big = { ...SHARED, storm: { durationsH: depthsMm.map(() => 0.1), depthsMm } };
    const storage = memoryStorage({ [STORAGE_KEY]: JSON.stringify(big) });
    const { user, copied } = renderTools({ storage });
    await user.click(screen.getByRole('button', { name: 'Copy link' }));
    const alert = await screen.findByRole('alert', { name: MESSAGE });
    expect(alert).toHaveTextContent('No link was made.');
    expect(alert).toHaveTextContent(`more than the ${MAX_LINK_CHARS} a link may have`);
    expect(alert).toHaveTextContent('Save it as a file to share it.');
    expect(copied).toEqual([]);
  });

  it('the length note warns when a link is long enough for mail programs to cut', () => {
    expect(linkLengthText(535)).toBe(
      'The link is 535 characters long and holds the whole scenario; nothing is sent to a server.',
    );
    expect(linkLengthText(LONG_LINK_CHARS + 1)).toMatch(
      /^The link is 2,001 characters long .* cut links longer than about 2,000 characters/,
    );
  });
});
