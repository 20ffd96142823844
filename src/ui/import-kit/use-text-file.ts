import { useState } from 'react';
import { LONG_TEXT_CHARS, readTextFile, sizeRefusal } from './read-file';

/** A file chosen for an import: its text, or (a long file) the file itself, held unread for the reader to decode. */
export type ChosenText = { readonly text: string; readonly file: null } | { readonly text: ''; readonly file: File };

export interface TextFileOpener {
  /** Why the last file was refused, or null. */
  readonly message: string | null;
  readonly setMessage: (message: string | null) => void;
  /** Reads the file; a refusal becomes `message`, a text (or a long file) goes to `onText` and clears it. */
  readonly open: (file: File) => Promise<void>;
}

/**
 * Reading a chosen text file for an import, with the message to show when it
 * cannot be used. A long file is not read here: decoding megabytes on the
 * page's thread holds it for hundreds of milliseconds (issue 11), so it goes
 * on to the import's reader as it is, and the reader refuses it if it is not text.
 */
export function useTextFile(what: string, onText: (chosen: ChosenText, name: string) => void): TextFileOpener {
  const [message, setMessage] = useState<string | null>(null);
  const open = async (file: File): Promise<void> => {
    const name = file.name || 'the file';
    if (file.size >= LONG_TEXT_CHARS) {
      const refused = sizeRefusal(file, name);
      setMessage(refused);
      if (refused === null) onText({ text: '', file }, name);
      return;
    }
    const read = await readTextFile(file, what);
    if (!read.ok) {
      setMessage(read.message);
      return;
    }
    setMessage(null);
    onText({ text: read.text, file: null }, read.name);
  };
  return { message, setMessage, open };
}
