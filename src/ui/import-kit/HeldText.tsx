import { useId } from 'react';
import { formatCount, formatValue } from '../format';
import { HELD_LINES, type HeldSummary } from './reader-messages';

export interface HeldTextProps {
  /** The first lines and the size of the text, from its reader; null while a file is being opened. */
  readonly summary: HeldSummary | null;
  /** What the text area would have been called ("Rainfall text"). */
  readonly label: string;
  readonly fileName: string | null;
  /** Lets the text go, back to an empty text area. */
  readonly onClear: () => void;
}

/**
 * The first lines of a long text and how long it is, in place of the text
 * area (texts of LONG_TEXT_CHARS and more, read-file.ts). The page never
 * holds a long file's text: its reader sends these.
 */
export function HeldText({ summary, label, fileName, onClear }: HeldTextProps) {
  const id = useId();
  const from = fileName ? ` from ${fileName}` : ', pasted';
  return (
    <div className="field paste__held" role="group" aria-labelledby={`${id}-label`}>
      <span id={`${id}-label`} className="paste__held-label">
        {label}
      </span>
      <p className="paste__held-size">
        {summary === null
          ? `Opening ${fileName ?? 'the pasted text'}…`
          : `${formatCount(summary.lines)} lines (${formatValue(summary.chars / 1e6)} million characters)${from}; too long to edit here. The first ${HELD_LINES} lines:`}
      </p>
      {summary === null ? null : (
        <pre className="paste__held-head" tabIndex={0} aria-label={`First ${HELD_LINES} lines of the text`}>
          {summary.head}
        </pre>
      )}
      <button type="button" className="button--small" onClick={onClear}>
        Clear the text
      </button>
    </div>
  );
}
