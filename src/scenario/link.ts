import { decodeBase64Url } from './base64url';
import { crc32 } from './crc32';
import type { InflateResult } from './inflate-capped';
import { failure, problem, type ScenarioResult } from './problems';
import { parseScenario } from './schema';

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
const LINK_FORMAT_VERSION = 1;

// The decompressor (fflate's inflate) is fetched only when a link is opened, not with the first screen:
// main.tsx loads it before opening a link in the address, and before each one pasted into it later.
let inflateRawCapped: ((data: Uint8Array, maxBytes: number) => InflateResult) | null = null;

/** Fetches the link reader's decompressor once; resolves when decodeScenarioLink can unpack a link. */
export function loadLinkReader(): Promise<void> {
  if (inflateRawCapped) return Promise.resolve();
  return import('./inflate-capped').then((m) => {
    inflateRawCapped = m.inflateRawCapped;
  });
}
export const LINK_PREFIX = `rc${LINK_FORMAT_VERSION}.`;

/**
 * Longest fragment read. Browsers keep far longer URLs, but mail and chat
 * programs cut long ones; a link this long should be a file instead.
 * `encodeScenarioLink` may return longer text: compare with this before
 * offering the link, and offer the file when it is over.
 */
export const MAX_LINK_CHARS = 200_000;

/** Largest JSON text a link may unpack to (2 MiB). */
export const MAX_LINK_JSON_BYTES = 2 * 1024 * 1024;

const PREFIX_PATTERN = /^rc(\d{1,6})\./;

function formatBytes(n: number): string {
  if (n < 1024) return `${n} bytes`;
  if (n < 1024 * 1024) return `${(n / 1024).toFixed(1)} kB`;
  if (n < 1024 ** 3) return `${(n / 1024 ** 2).toFixed(1)} MB`;
  return `${(n / 1024 ** 3).toFixed(1)} GB`;
}

/** Reads an unsigned LEB128 varint of at most 5 bytes, or undefined. */
function readVarint(bytes: Uint8Array): { value: number; size: number } | undefined {
  let value = 0;
  let scale = 1;
  for (let i = 0; i < 5 && i < bytes.length; i++) {
    const b = bytes[i] as number;
    value += (b & 0x7f) * scale;
    if ((b & 0x80) === 0) return { value, size: i + 1 };
    scale *= 0x80;
  }
  return undefined;
}

/** True when the fragment (with or without '#') looks like a scenario link of any format. */
export function isScenarioLink(fragment: string): boolean {
  return typeof fragment === 'string' && PREFIX_PATTERN.test(fragment.replace(/^#/, '').trim());
}

const damaged = (why: string): ScenarioResult =>
  failure([problem(`The link is damaged: ${why}. Copy the whole link again from where it was sent.`)]);

function decode(fragment: string): ScenarioResult {
  const text = fragment.replace(/^#/, '').trim();
  if (text === '') return failure([problem('The link carries no scenario: there is nothing after the "#".')]);

  const prefix = PREFIX_PATTERN.exec(text);
  if (!prefix) {
    return failure([
      problem(`This is not a Raincut scenario link: the part after "#" should start with "${LINK_PREFIX}".`),
    ]);
  }
  const format = Number(prefix[1]);
  if (format !== LINK_FORMAT_VERSION) {
    return failure([
      problem(
        format > LINK_FORMAT_VERSION
          ? `This link was made by a newer version of Raincut (link format ${format}); this version reads format ${LINK_FORMAT_VERSION}. Open it in an up-to-date Raincut.`
          : `This link uses link format ${format}, which Raincut never wrote; it reads format ${LINK_FORMAT_VERSION}.`,
      ),
    ]);
  }
  if (text.length > MAX_LINK_CHARS) {
    return failure([
      problem(
        `The link is ${text.length} characters long; a scenario link may have at most ${MAX_LINK_CHARS}. ` +
          'Share a scenario this large as a file.',
      ),
    ]);
  }

  const base64 = decodeBase64Url(text.slice(prefix[0].length));
  if (!base64.ok) return damaged(base64.reason);
  const bytes = base64.bytes;

  // The smallest link: 1 byte of length, 2 of DEFLATE, 4 of check sum.
  if (bytes.length < 7) return damaged('it is cut short');
  const packed = bytes.subarray(0, bytes.length - 4);
  const expected = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength).getUint32(bytes.length - 4, false);
  if (crc32(packed) !== expected) return damaged('its check sum does not match (it was cut short or changed)');

  const head = readVarint(packed);
  if (!head || packed.length < head.size + 2) return damaged('its header is unreadable');
  if (head.value > MAX_LINK_JSON_BYTES) {
    return failure([
      problem(
        `The link says it holds ${formatBytes(head.value)} of scenario data; a link may hold at most ` +
          `${formatBytes(MAX_LINK_JSON_BYTES)}. It was damaged or made by something other than Raincut.`,
      ),
    ]);
  }

  const body = packed.subarray(head.size);
  if (!inflateRawCapped) {
    return failure([
      problem('The link reader could not be loaded (no connection?); reload the page to open the link.'),
    ]);
  }
  const inflated = inflateRawCapped(body, head.value);
  if (!inflated.ok) {
    return inflated.tooLarge
      ? damaged(`it unpacks to more than the ${formatBytes(head.value)} it says it holds`)
      : damaged(inflated.reason);
  }
  const json = inflated.bytes;
  if (json.length !== head.value) {
    return damaged(`it unpacks to ${formatBytes(json.length)}, not the ${formatBytes(head.value)} it says it holds`);
  }

  let textJson: string;
  try {
    textJson = new TextDecoder('utf-8', { fatal: true }).decode(json);
  } catch {
    return damaged('its contents are not UTF-8 text');
  }
  let doc: unknown;
  try {
    doc = JSON.parse(textJson);
  } catch (error) {
    const why = error instanceof Error ? error.message : String(error);
    return failure([problem(`The link's scenario is not valid JSON (${why}).`)]);
  }
  return parseScenario(doc);
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
  try {
    return decode(fragment);
  } catch (error) {
    // A safety net only; the fuzz tests check it is never reached.
    const why = error instanceof Error ? error.message : String(error);
    return failure([problem(`The link could not be read (unexpected error: ${why}).`)]);
  }
}
