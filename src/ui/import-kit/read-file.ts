import { formatValue } from '../format';

/**
 * Reads a chosen rainfall or streamflow file as text for the paste preview.
 * Never throws: a file that is too large, unreadable or not text gives a
 * message naming it.
 */
export type FileText =
  | { readonly ok: true; readonly text: string; readonly name: string }
  | { readonly ok: false; readonly message: string };

/**
 * Texts from this length on are held beside the import dialog, never put in
 * its text area (a browser lays out every line of a text area, and 20 MB of
 * text there holds the page for seconds), and read off the page's thread.
 * About 10,000 lines of a gauge record (20 characters a line). A file of at
 * least this many bytes is held unread: the reader decodes it (UTF-8 gives
 * at most one character a byte, so a shorter file is a short text).
 */
export const LONG_TEXT_CHARS = 200_000;

export const isLongText = (text: string): boolean => text.length >= LONG_TEXT_CHARS;

/** Larger files are refused before reading: a rainfall record of a million lines is about 30 MB. */
const MAX_FILE_BYTES = 50 * 1024 * 1024;

/** Files longer than this are decoded in slices (./decode-slices.ts, loaded when first needed). */
const SLICED_FROM = 1 << 20;

/** The file's text, through FileReader where Blob.text is missing. Rejects when the file cannot be read. */
export async function readAsText(file: Blob): Promise<string> {
  if (file.size > SLICED_FROM) return (await import('./decode-slices')).decodeInSlices(file);
  if (typeof file.text === 'function') return file.text();
  return new Promise((resolve, reject) => {
    const reader = new FileReader();
    reader.onload = () => resolve(typeof reader.result === 'string' ? reader.result : '');
    reader.onerror = () => reject(reader.error ?? new Error('the file could not be read'));
    reader.readAsText(file);
  });
}

/** Why a file is refused before it is read (too large), or null. */
export function sizeRefusal(file: Blob, name: string): string | null {
  if (file.size <= MAX_FILE_BYTES) return null;
  const mb = formatValue(file.size / (1024 * 1024));
  return `${name} is ${mb} MB; files up to ${MAX_FILE_BYTES / (1024 * 1024)} MB can be read. Open a shorter record.`;
}

/** Why a file's text cannot be used (not text, or empty), or null; on whichever thread read it. */
export function textRefusal(text: string, name: string, what: string): string | null {
  if (text.includes('\u0000')) return `${name} is not a text file; save ${what} as .csv or .txt and open that.`;
  return text.trim() === '' ? `${name} is empty.` : null;
}

/** What to say when reading the file failed. */
export const readFailure = (name: string, error: unknown): string =>
  `${name} could not be read (${error instanceof Error ? error.message : String(error)}).`;

/** `what` names the record in the messages ("the rainfall", "the streamflow record"). */
export async function readTextFile(file: File, what = 'the rainfall'): Promise<FileText> {
  const name = file.name || 'the file';
  const tooLarge = sizeRefusal(file, name);
  if (tooLarge !== null) return { ok: false, message: tooLarge };
  let text: string;
  try {
    text = await readAsText(file);
  } catch (error) {
    return { ok: false, message: readFailure(name, error) };
  }
  const refused = textRefusal(text, name, what);
  return refused === null ? { ok: true, text, name } : { ok: false, message: refused };
}
