import { useState } from 'react';
import { readTextFile } from './read-file';

export interface TextFileOpener {
  /** Why the last file was refused, or null. */
  readonly message: string | null;
  readonly setMessage: (message: string | null) => void;
  /** Reads the file; a refusal becomes `message`, a text goes to `onText` and clears it. */
  readonly open: (file: File) => Promise<void>;
}

/** Reading a chosen text file for an import, with the message to show when it cannot be used. */
export function useTextFile(what: string, onText: (text: string, name: string) => void): TextFileOpener {
  const [message, setMessage] = useState<string | null>(null);
  const open = async (file: File): Promise<void> => {
    const read = await readTextFile(file, what);
    if (!read.ok) {
      setMessage(read.message);
      return;
    }
    setMessage(null);
    onText(read.text, read.name);
  };
  return { message, setMessage, open };
}
