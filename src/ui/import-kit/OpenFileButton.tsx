import { useRef, type ReactNode } from 'react';

/** What a text import opens: spreadsheet exports and plain text. */
const TEXT_FILE_TYPES = '.csv,.txt,.tsv,.dat,text/csv,text/plain';

export interface OpenFileButtonProps {
  /** The button's text, e.g. "Open rainfall file…". */
  readonly children: ReactNode;
  /** Accessible name of the hidden file input. */
  readonly inputLabel: string;
  /** The input's `accept` list; text files unless told. */
  readonly accept?: string;
  /** Set when choosing a file leads on to a dialog. */
  readonly opensDialog?: boolean;
  /** Called with the chosen file; the input is cleared once it settles, so the same file can be chosen again. */
  readonly onFile: (file: File) => Promise<void>;
}

/** A button that opens the browser's file chooser through a hidden file input. */
export function OpenFileButton({
  children,
  inputLabel,
  accept = TEXT_FILE_TYPES,
  opensDialog = false,
  onFile,
}: OpenFileButtonProps) {
  const inputRef = useRef<HTMLInputElement | null>(null);
  return (
    <>
      <button
        type="button"
        onClick={() => inputRef.current?.click()}
        aria-haspopup={opensDialog ? 'dialog' : undefined}
      >
        {children}
      </button>
      <input
        ref={inputRef}
        type="file"
        accept={accept}
        // Out of the accessibility tree altogether (not merely out of sight): the button above is the one control;
        // a visually hidden input was read out as a second, unnamed-looking button. The button's click still opens it.
        hidden
        tabIndex={-1}
        aria-label={inputLabel}
        onChange={(e) => {
          const input = e.currentTarget;
          const file = input.files?.[0];
          void (file ? onFile(file) : Promise.resolve()).finally(() => {
            input.value = '';
          });
        }}
      />
    </>
  );
}
