import { useState } from 'react';
import type { ImportDraft } from './ImportDialog';
import { useTextFile } from './use-text-file';

export interface ImportLauncher<S> {
  /** The draft the dialog opened with, or null while it is closed. */
  readonly dialog: ImportDraft<Partial<S>> | null;
  /** Opens the dialog empty. */
  readonly openPaste: () => void;
  /** Reads a chosen file and opens the dialog on its text. */
  readonly openFile: (file: File) => Promise<void>;
  /** Why the last file was refused, or null. */
  readonly fileMessage: string | null;
  /** The dialog's onClose, cancelled or used alike: nothing of it is kept. */
  readonly close: () => void;
}

export interface ImportLauncherOptions<S> {
  /** The draft every paste opens on (default: no text, no corrections). */
  readonly empty?: ImportDraft<Partial<S>>;
  /** Names the record in file messages ("the rainfall"). */
  readonly fileWhat: string;
  /** Runs each time the dialog opens. */
  readonly beforeOpen?: () => void;
}

const BLANK = { text: '', file: null, fileName: null, corrections: {} } as const;

/**
 * The buttons that lead to an import dialog ("Paste …", "Open … file…") and
 * which draft the dialog opens on. A cancelled paste leaves nothing behind:
 * the next opening is empty, so text and corrections of an abandoned paste
 * are never applied to the next one by surprise.
 */

export function useImportLauncher<S>({
  empty = BLANK,
  fileWhat,
  beforeOpen,
}: ImportLauncherOptions<S>): ImportLauncher<S> {
  const [dialog, setDialog] = useState<ImportDraft<Partial<S>> | null>(null);

  const file = useTextFile(fileWhat, (chosen, name) => openWith({ ...chosen, fileName: name, corrections: {} }));

  const openWith = (draft: ImportDraft<Partial<S>>): void => {
    beforeOpen?.();
    file.setMessage(null);
    setDialog(draft);
  };

  return {
    dialog,
    openPaste: () => openWith(empty),
    openFile: file.open,
    fileMessage: file.message,
    close: () => setDialog(null),
  };
}
