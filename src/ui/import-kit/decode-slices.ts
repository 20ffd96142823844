import { nextTask } from '../../store/next-task';

/** Bytes decoded in one task of the page: about 10 ms of UTF-8 decoding on a loaded laptop. */
const DECODE_SLICE = 1 << 20;

/**
 * A long file's text decoded a slice at a time, with `pause` between slices
 * (on the page, a pause for input and drawing: Blob.text decodes the whole
 * file in one task, which held the page 150–300 ms for a 21 MB record, issue
 * 11; in the reader's worker, none is needed). The same text as
 * Blob.text: UTF-8 with a leading byte-order mark dropped and bad bytes
 * replaced (TextDecoder's defaults, as the File API's "UTF-8 decode");
 * `stream` keeps a character split between two slices whole.
 */
export async function decodeInSlices(file: Blob, pause: () => Promise<void> = nextTask): Promise<string> {
  if (typeof file.arrayBuffer !== 'function' || typeof TextDecoder !== 'function') return file.text();
  const bytes = new Uint8Array(await file.arrayBuffer());
  const decoder = new TextDecoder();
  const parts: string[] = [];
  for (let at = 0; at < bytes.length; at += DECODE_SLICE) {
    if (at > 0) await pause();
    parts.push(decoder.decode(bytes.subarray(at, at + DECODE_SLICE), { stream: true }));
  }
  parts.push(decoder.decode());
  return parts.join('');
}
