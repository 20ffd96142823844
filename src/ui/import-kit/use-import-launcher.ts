import { useState } from 'react';
import type { ImportDraft } from './ImportDialog';
import { useTextFile } from './use-text-file';

export interface ImportLauncher<S> {
  /** The draft the dialog opened with, or null while it is closed. */
  readonly dialog: ImportDraft<Partial<S>> | null;
  /** Opens the dialog on what was kept from the last time it was cancelled. */
  readonly openPaste: () => void;
  /** Reads a chosen file and opens the dialog on its text. */
  readonly openFile: (file: File) => Promise<void>;
  /** Why the last file was refused, or null. */
  readonly fileMessage: string | null;
  /** The dialog's onClose: keeps the draft on cancel, forgets it on accept. */
  readonly close: (keep: ImportDraft<Partial<S>> | null) => void;
}

export interface ImportLauncherOptions<S> {
  /** The draft of a first paste, and of the next one after a record is used (default: no text, no corrections). */
  readonly empty?: ImportDraft<Partial<S>>;
  /** Names the record in file messages ("the rainfall"). */
  readonly fileWhat: string;
  /** Runs each time the dialog opens. */
  readonly beforeOpen?: () => void;
}

/**
 * The buttons that lead to an import dialog ("Paste …", "Open … file…"):
 * which draft the dialog opens on, and what is kept when it is cancelled.
 */
const BLANK = { text: '', fileName: null, corrections: {} } as const;

export function useImportLauncher<S>({
  empty = BLANK,
  fileWhat,
  beforeOpen,
}: ImportLauncherOptions<S>): ImportLauncher<S> {
  const [dialog, setDialog] = useState<ImportDraft<Partial<S>> | null>(null);
  const [kept, setKept] = useState(empty);

  const file = useTextFile(fileWhat, (text, name) => openWith({ text, fileName: name, corrections: {} }));

  const openWith = (draft: ImportDraft<Partial<S>>): void => {
    beforeOpen?.();
    file.setMessage(null);
    setDialog(draft);
  };

  return {
    dialog,
    openPaste: () => openWith(kept),
    openFile: file.open,
    fileMessage: file.message,
    close: (keep) => {
      setKept(keep ?? empty);
      setDialog(null);
    },
  };
}
