import { decodeBase64Url } from './base64url';
import { crc32 } from './crc32';
import { inflateRawCapped } from './inflate-capped';
import { LINK_FORMAT_VERSION, LINK_PREFIX, MAX_LINK_CHARS, MAX_LINK_JSON_BYTES, PREFIX_PATTERN } from './link-format';
import { failure, problem, type ScenarioResult } from './problems';
import { parseScenario } from './schema';

// The share link's reader, fetched only when a link is opened (./link.ts, loadLinkReader): the layout of
// link format 1 is described there.

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

const damaged = (why: string): ScenarioResult =>
  failure([problem(`The link is damaged: ${why}. Copy the whole link again from where it was sent.`)]);

/**
 * Reads a share link's fragment (see ./link.ts for its layout); called
 * through `decodeScenarioLink`, which catches anything thrown.
 */
export function readScenarioLink(fragment: string): ScenarioResult {
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
