import type { Scenario } from '../../scenario/types';
import { formatCount } from '../format';
import './events.css';

/**
 * Above this many characters a link is not practical to send: mail and chat
 * programs cut or wrap far shorter ones, and people cannot check it by eye.
 * Ten events of 100 unrounded bars make about 14,000 (test/scenario/event-set.test.ts).
 */
export const PRACTICAL_LINK_CHARS = 8000;

/** Why a link this long should be a file, and a button that saves the file instead. */
export function LongLinkOffer({
  chars,
  scenario,
  saveFile,
  onCopyAnyway,
}: {
  chars: number;
  scenario: Scenario;
  saveFile: (blob: Blob, fileName: string) => void;
  onCopyAnyway: () => void;
}) {
  const events = scenario.eventSet.events.length;
  return (
    <>
      <p>
        The link would be {formatCount(chars)} characters long
        {events > 0 ? `, most of it the ${events} event${events === 1 ? '' : 's'} of the event set` : ''}: more than the{' '}
        {formatCount(PRACTICAL_LINK_CHARS)} that can be sent reliably. Save the scenario as a file and send the file
        instead; it opens to exactly the same scenario.
      </p>
      <p>
        <button
          type="button"
          className="button--primary"
          onClick={() =>
            // The file writer loads on this click: it is not part of the first screen.
            void import('../../scenario/file').then(({ scenarioFileName, scenarioToFileText }) =>
              saveFile(
                new Blob([scenarioToFileText(scenario)], { type: 'application/json' }),
                scenarioFileName(scenario),
              ),
            )
          }
        >
          Save as file instead
        </button>{' '}
        <button type="button" onClick={onCopyAnyway}>
          Copy the long link anyway
        </button>
      </p>
    </>
  );
}
