import { PREFIX_PATTERN } from './link-format';
import { failure, problem, type ScenarioResult } from './problems';

/**
 * Share links put the whole scenario in the URL fragment (after '#'), which
 * browsers never send to a server. Layout of link format 1:
 *
 *   "rc1." + base64url( length ‖ deflate ‖ crc )
 *
 * - length: byte length of the scenario's JSON text (UTF-8), as an unsigned
 *   LEB128 varint (7 bits a byte, low first; at most 5 bytes);
 * - deflate: that JSON text compressed as raw DEFLATE (RFC 1951, fflate);
 * - crc: CRC-32 of everything before it (length and deflate), 4 bytes,
 *   most significant first.
 *
 * The JSON text is the scenario document itself; JSON numbers written by
 * JavaScript read back to the identical double, so every value survives.
 * The check sum covers the packed bytes, so any changed or lost character
 * is caught before anything is inflated (CRC-32 catches every error burst
 * of up to 32 bits, and one base64 character is 6). The declared length lets
 * a reader refuse an oversized link before inflating and stop inflating the
 * moment the output passes it, which defeats deflate bombs even in links
 * made on purpose with a correct check sum.
 */
// Only what the first screen needs stays here (the prefix test, the limits). The reader itself (base64url,
// check sum, header, the capped decompressor, ./link-read.ts) is fetched when a link is opened: main.tsx
// loads it before opening a link in the address, and before each one pasted into it later.
let readLink: ((fragment: string) => ScenarioResult) | null = null;

/** Fetches the link reader once; resolves when decodeScenarioLink can read a link. */
export function loadLinkReader(): Promise<void> {
  if (readLink) return Promise.resolve();
  return import('./link-read').then((m) => {
    readLink = m.readScenarioLink;
  });
}

export { LINK_PREFIX, MAX_LINK_CHARS, MAX_LINK_JSON_BYTES } from './link-format';

/** True when the fragment (with or without '#') looks like a scenario link of any format. */
export function isScenarioLink(fragment: string): boolean {
  return typeof fragment === 'string' && PREFIX_PATTERN.test(fragment.replace(/^#/, '').trim());
}

/**
 * Reads a share link's fragment (with or without the leading '#'). Never
 * throws: a damaged, cut, oversized, tampered or foreign link comes back as
 * `ok: false` with messages, and nothing in it is run.
 */
export function decodeScenarioLink(fragment: string): ScenarioResult {
  if (typeof fragment !== 'string') {
    return failure([problem('The link could not be read: it is not text.')]);
  }
  if (!readLink) {
    return failure([
      problem('The link reader could not be loaded (no connection?); reload the page to open the link.'),
    ]);
  }
  try {
    return readLink(fragment);
  } catch (error) {
    // A safety net only; the fuzz tests check it is never reached.
    const why = error instanceof Error ? error.message : String(error);
    return failure([problem(`The link could not be read (unexpected error: ${why}).`)]);
  }
}
