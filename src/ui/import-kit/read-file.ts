import { formatValue } from '../format';

/**
 * Reads a chosen rainfall or streamflow file as text for the paste preview.
 * Never throws: a file that is too large, unreadable or not text gives a
 * message naming it.
 */
export type FileText =
  | { readonly ok: true; readonly text: string; readonly name: string }
  | { readonly ok: false; readonly message: string };

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

/** `what` names the record in the messages ("the rainfall", "the streamflow record"). */
export async function readTextFile(file: File, what = 'the rainfall'): Promise<FileText> {
  const name = file.name || 'the file';
  if (file.size > MAX_FILE_BYTES) {
    const mb = formatValue(file.size / (1024 * 1024));
    return {
      ok: false,
      message: `${name} is ${mb} MB; files up to ${MAX_FILE_BYTES / (1024 * 1024)} MB can be read. Open a shorter record.`,
    };
  }
  let text: string;
  try {
    text = await readAsText(file);
  } catch (error) {
    return {
      ok: false,
      message: `${name} could not be read (${error instanceof Error ? error.message : String(error)}).`,
    };
  }
  if (text.includes('\u0000')) {
    return { ok: false, message: `${name} is not a text file; save ${what} as .csv or .txt and open that.` };
  }
  if (text.trim() === '') return { ok: false, message: `${name} is empty.` };
  return { ok: true, text, name };
}
