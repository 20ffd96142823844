import { useEffect, useRef } from 'react';
import type { Scenario } from '../../scenario/types';
import { ProblemList, type ShowMessage } from '../services/bar-message';
import type { ScenarioServices } from '../services/services';
import { formatCount } from '../format';

/**
 * What "Copy link" does once clicked (CopyLink.tsx loads this then, with the
 * link maker and the long-link offer): the whole scenario, checked and
 * packed into the address's fragment (makeShareLink), on the clipboard;
 * when the browser refuses the clipboard, the link in a box to copy by hand.
 */

/** Mail and chat programs are known to cut or wrap links past about this length. */
export const LONG_LINK_CHARS = 2000;

/** "535 characters", with advice when the link is long enough to be cut on the way. */
export function linkLengthText(chars: number): string {
  const base = `The link is ${formatCount(chars)} characters long and holds the whole scenario; nothing is sent to a server.`;
  return chars > LONG_LINK_CHARS
    ? `${base} Some mail programs cut links longer than about ${formatCount(LONG_LINK_CHARS)} characters: if it does not open for your colleague, send the scenario as a file.`
    : base;
}

/** Said with a link made in a page opened from a file (the single-file build): the link names that file's place. */
export const FILE_PAGE_NOTE =
  'This page was opened from a file, so the link opens the scenario only where that file is at the same place (on this computer, for instance). To send the scenario to a colleague, use Save as file.';

/** The words of a refusal (a DOMException is not an Error in every realm). */
function reason(error: unknown): string {
  const message = typeof error === 'object' && error !== null && 'message' in error ? String(error.message) : '';
  return message !== '' ? message : 'the browser refused';
}

/** The link in a box to copy by hand, selected as soon as it shows. */
function ManualCopy({ url }: { url: string }) {
  const ref = useRef<HTMLInputElement | null>(null);
  useEffect(() => {
    ref.current?.focus();
    ref.current?.select();
  }, [url]);
  return (
    <div className="share-link__manual">
      <label htmlFor="share-link-text">Share link</label>
      <input
        id="share-link-text"
        ref={ref}
        type="text"
        readOnly
        value={url}
        onFocus={(e) => e.currentTarget.select()}
      />
    </div>
  );
}

export interface LinkServices {
  readonly clipboard: ScenarioServices['clipboard'];
  readonly pageAddress: () => string;
  readonly saveFile: ScenarioServices['saveFile'];
}

/** Makes the link of `scenario` and puts it on the clipboard, saying what happened in the bar's message line. */
export async function copyLink(
  scenario: Scenario,
  services: LinkServices,
  show: ShowMessage,
  anyway = false,
): Promise<void> {
  const { clipboard, pageAddress, saveFile } = services;
  // The link maker (and its compressor) and the long-link offer load on the first click, not with the first screen.
  let makeShareLink: (typeof import('../../scenario/link-make'))['makeShareLink'];
  let long: typeof import('../events/LongLinkOffer');
  try {
    [{ makeShareLink }, long] = await Promise.all([
      import('../../scenario/link-make'),
      import('../events/LongLinkOffer'),
    ]);
  } catch (error) {
    show({ tone: 'problem', title: `No link was made: ${reason(error)}.` });
    return;
  }
  const made = makeShareLink(scenario);
  if (!made.ok) {
    show({
      tone: 'problem',
      title: 'No link was made.',
      body: <ProblemList problems={made.problems} label="Why no link was made" />,
    });
    return;
  }
  const url = `${pageAddress()}#${made.fragment}`;
  // A link too long to send (an event set of long storms): offer the file instead, and say why.
  if (url.length > long.PRACTICAL_LINK_CHARS && !anyway) {
    show({
      tone: 'problem',
      title: 'This scenario is too large for a practical link.',
      body: (
        <long.LongLinkOffer
          chars={url.length}
          scenario={scenario}
          saveFile={saveFile}
          onCopyAnyway={() => void copyLink(scenario, services, show, true)}
        />
      ),
    });
    return;
  }
  const length = (
    <>
      <p>{linkLengthText(url.length)}</p>
      {url.startsWith('file:') ? <p>{FILE_PAGE_NOTE}</p> : null}
    </>
  );
  let refused: string | null = null;
  if (!clipboard) refused = 'this browser gives the page no clipboard';
  else {
    try {
      await clipboard.writeText(url);
    } catch (error) {
      refused = reason(error);
    }
  }
  if (refused === null) {
    show({ tone: 'done', title: 'Link copied.', body: length });
    return;
  }
  show({
    tone: 'problem',
    title: `The link could not be put on the clipboard (${refused}). Copy it from the box below (Ctrl+C).`,
    body: (
      <>
        <ManualCopy url={url} />
        {length}
      </>
    ),
  });
}
