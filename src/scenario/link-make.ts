import { deflateSync } from 'fflate';
import { encodeBase64Url } from './base64url';
import { crc32 } from './crc32';
import { LINK_PREFIX, MAX_LINK_CHARS } from './link';
import { failure, problem, type Problem } from './problems';
import { parseScenario } from './schema';
import type { Scenario } from './types';

// Making a share link; link.ts holds the format and the reader. Apart from the
// reader because only "Copy link" makes one: the compressor (fflate's deflate)
// is fetched on that click, not with the first screen.

function writeVarint(n: number): number[] {
  const out: number[] = [];
  let rest = n;
  while (rest >= 0x80) {
    out.push((rest % 0x80) | 0x80);
    rest = Math.floor(rest / 0x80);
  }
  out.push(rest);
  return out;
}

/** Link text (without '#') that opens exactly this scenario. */
export function encodeScenarioLink(scenario: Scenario): string {
  const json = new TextEncoder().encode(JSON.stringify(scenario));
  const packed = deflateSync(json, { level: 9 });
  const head = writeVarint(json.length);
  const bytes = new Uint8Array(head.length + packed.length + 4);
  bytes.set(head, 0);
  bytes.set(packed, head.length);
  const sum = crc32(bytes.subarray(0, bytes.length - 4));
  new DataView(bytes.buffer).setUint32(bytes.length - 4, sum, false);
  return LINK_PREFIX + encodeBase64Url(bytes);
}

export type ShareLinkResult =
  { readonly ok: true; readonly fragment: string } | { readonly ok: false; readonly problems: readonly Problem[] };

/**
 * What "Copy link" should call: checks the scenario as a reader will, makes
 * the link, and refuses one that readers would refuse as too long (the
 * scenario should then be shared as a file). Never throws.
 */
export function makeShareLink(scenario: Scenario): ShareLinkResult {
  const checked = parseScenario(scenario);
  if (!checked.ok) return checked;
  const fragment = encodeScenarioLink(checked.scenario);
  if (fragment.length > MAX_LINK_CHARS) {
    return failure([
      problem(
        `This scenario makes a link of ${fragment.length} characters, more than the ${MAX_LINK_CHARS} a link may have. ` +
          'Save it as a file to share it.',
      ),
    ]);
  }
  return { ok: true, fragment };
}
