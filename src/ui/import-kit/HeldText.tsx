import { useId, useMemo } from 'react';
import { formatCount, formatValue } from '../format';
import { countLines } from './reader-messages';

/**
 * Texts from this length on are held beside the dialog, never put in its
 * text area: a browser lays out every line of a text area, and 20 MB of
 * text there holds the page for seconds. About 10,000 lines of a gauge
 * record (20 characters a line).
 */
export const LONG_TEXT_CHARS = 200_000;

export const isLongText = (text: string): boolean => text.length >= LONG_TEXT_CHARS;

/** Lines of a held text shown, so the reader sees what was pasted or opened. */
export const HELD_LINES = 12;

export interface HeldTextProps {
  readonly text: string;
  /** What the text area would have been called ("Rainfall text"). */
  readonly label: string;
  readonly fileName: string | null;
  /** Lets the text go, back to an empty text area. */
  readonly onClear: () => void;
}

/** The first lines of a long text and how long it is, in place of the text area. */
export function HeldText({ text, label, fileName, onClear }: HeldTextProps) {
  const id = useId();
  const { head, lines } = useMemo(() => {
    let end = -1;
    for (let k = 0; k < HELD_LINES; k++) {
      const next = text.indexOf('\n', end + 1);
      if (next === -1) {
        end = text.length;
        break;
      }
      end = next;
    }
    return { head: text.slice(0, end), lines: countLines(text) };
  }, [text]);
  const mb = formatValue(text.length / 1e6);
  return (
    <div className="field paste__held" role="group" aria-labelledby={`${id}-label`}>
      <span id={`${id}-label`} className="paste__held-label">
        {label}
      </span>
      <p className="paste__held-size">
        {`${formatCount(lines)} lines (${mb} million characters)${fileName ? ` from ${fileName}` : ', pasted'}; too long to edit here. The first ${HELD_LINES} lines:`}
      </p>
      <pre className="paste__held-head" tabIndex={0} aria-label={`First ${HELD_LINES} lines of the text`}>
        {head}
      </pre>
      <button type="button" className="button--small" onClick={onClear}>
        Clear the text
      </button>
    </div>
  );
}
