// Fuzzing the share-link reader with tens of thousands of damaged, random
// and crafted links. Every input is drawn from fixed seeds, so a failure
// names an input that can be replayed.
import fc from 'fast-check';
import { deflateSync } from 'fflate';
import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO, LINK_PREFIX, decodeScenarioLink, encodeScenarioLink, type Scenario } from '../../src/scenario';
import { decodeBase64Url, encodeBase64Url } from '../../src/scenario/base64url';
import { crc32 } from '../../src/scenario/crc32';
import { gaugeStorm24h, scenarioArb } from '../helpers/scenario-arbitraries';
import {
  BASE64URL,
  SCENARIO_FIELDS,
  expectContract,
  pathName,
  pickFieldPath,
  seeded,
  withField,
  zeroBomb,
} from '../helpers/fuzz';

// The corpus holds every part of the document: notes, a streamflow record, an event set with records.
const sampled = fc.sample(scenarioArb, { numRuns: 30, seed: 424242 });

const corpus: string[] = [
  encodeScenarioLink(DEMO_SCENARIO),
  encodeScenarioLink({ ...DEMO_SCENARIO, storm: gaugeStorm24h(5) } satisfies Scenario),
  ...sampled.map(encodeScenarioLink),
];

const bytesOf = (link: string): Uint8Array => {
  const decoded = decodeBase64Url(link.slice(LINK_PREFIX.length));
  if (!decoded.ok) throw new Error('corpus link does not decode');
  return decoded.bytes;
};

/** Writes a fresh check sum over the packed bytes, so damage gets past it to the inflater and the schema. */
function resealed(packed: Uint8Array): string {
  const out = new Uint8Array(packed.length + 4);
  out.set(packed);
  new DataView(out.buffer).setUint32(packed.length, crc32(packed));
  return LINK_PREFIX + encodeBase64Url(out);
}

function varint(n: number): number[] {
  const out: number[] = [];
  while (n >= 0x80) {
    out.push((n % 0x80) | 0x80);
    n = Math.floor(n / 0x80);
  }
  out.push(n);
  return out;
}

// Generous time limits: the suite runs on shared, busy machines; the counts
// are what make it thorough, not speed.
describe('the link reader under fuzzing never throws and always says why it refuses', { timeout: 60_000 }, () => {
  it('starts from links that carry every part of a scenario', () => {
    expect(sampled.some((s) => s.notes.length > 100)).toBe(true);
    expect(sampled.some((s) => s.streamflow !== null && s.streamflow.useAsObserved)).toBe(true);
    expect(sampled.some((s) => s.eventSet.activeId !== null)).toBe(true);
    expect(sampled.some((s) => s.eventSet.events.some((e) => e.streamflow !== null))).toBe(true);
    expect(Math.max(...sampled.map((s) => s.storm.depthsMm.length))).toBeGreaterThan(200);
  });

  it('survives characters changed, added, removed and moved in real links', () => {
    const random = seeded(1);
    const pick = <T>(list: readonly T[]): T => list[Math.floor(random() * list.length)] as T;
    const tally = { ok: 0, refused: 0 };
    for (let n = 0; n < 12_000; n++) {
      const link = pick(corpus);
      const at = LINK_PREFIX.length + Math.floor(random() * (link.length - LINK_PREFIX.length));
      let mutated: string;
      switch (n % 6) {
        case 0:
          mutated = link.slice(0, at) + pick([...BASE64URL]) + link.slice(at + 1);
          break;
        case 1:
          mutated = link.slice(0, at) + pick([...BASE64URL, '=', '+', '/', '%', ' ', 'é', '\u0000']) + link.slice(at);
          break;
        case 2:
          mutated = link.slice(0, at) + link.slice(at + 1 + Math.floor(random() * 8));
          break;
        case 3:
          mutated = link.slice(0, at);
          break;
        case 4: {
          const len = 1 + Math.floor(random() * 40);
          mutated =
            link.slice(0, at) +
            link.slice(at + len, at + 2 * len) +
            link.slice(at, at + len) +
            link.slice(at + 2 * len);
          break;
        }
        default:
          mutated = link + link.slice(at, at + 1 + Math.floor(random() * 20));
      }
      if (mutated === link) continue;
      expectContract(decodeScenarioLink, mutated, tally);
    }
    // The check sum catches every one of these changes.
    expect(tally.ok).toBe(0);
    expect(tally.refused).toBeGreaterThan(11_000);
  });

  it('survives flipped bits, with and without a fresh check sum', () => {
    const random = seeded(2);
    const tally = { ok: 0, refused: 0 };
    const packedCorpus = corpus.map((link) => bytesOf(link).subarray(0, -4));
    for (let n = 0; n < 10_000; n++) {
      const original = packedCorpus[n % packedCorpus.length] as Uint8Array;
      const packed = original.slice();
      const flips = 1 + Math.floor(random() * 6);
      for (let f = 0; f < flips; f++) {
        const bit = Math.floor(random() * packed.length * 8);
        packed[bit >>> 3] = (packed[bit >>> 3] as number) ^ (1 << (bit & 7));
      }
      if (packed.every((b, i) => b === original[i])) continue; // two flips of one bit cancel
      if (n % 5 !== 0) {
        // Stale check sum: must be refused.
        const out = new Uint8Array(packed.length + 4);
        out.set(packed);
        out.set(bytesOf(corpus[n % corpus.length] as string).subarray(-4), packed.length);
        const before = tally.ok;
        expectContract(decodeScenarioLink, LINK_PREFIX + encodeBase64Url(out), tally);
        if (tally.ok !== before) expect.fail(`accepted bit flips under a stale check sum (input ${n})`);
      } else {
        // Fresh check sum: reaches the header, the inflater and the schema.
        expectContract(decodeScenarioLink, resealed(packed), tally);
      }
    }
    expect(tally.refused).toBeGreaterThan(8_000);
  });

  it('survives random base64, sealed and unsealed, and random text', () => {
    const tally = { ok: 0, refused: 0 };
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 600 }), fc.boolean(), (bytes, seal) => {
        expectContract(decodeScenarioLink, seal ? resealed(bytes) : LINK_PREFIX + encodeBase64Url(bytes), tally);
      }),
      { numRuns: 8_000, seed: 3 },
    );
    fc.assert(
      fc.property(
        fc.string({ unit: 'binary', maxLength: 300 }),
        fc.constantFrom('', '#', LINK_PREFIX, '#rc', 'rc999999.'),
        (text, lead) => {
          expectContract(decodeScenarioLink, lead + text, tally);
        },
      ),
      { numRuns: 4_000, seed: 4 },
    );
    expect(tally.ok).toBe(0);
  });

  it('refuses huge and malformed claimed sizes before inflating', () => {
    const random = seeded(5);
    const tally = { ok: 0, refused: 0 };
    const body = deflateSync(new TextEncoder().encode(JSON.stringify(DEMO_SCENARIO)));
    for (let n = 0; n < 2_000; n++) {
      const claimed =
        n % 4 === 0
          ? [0xff, 0xff, 0xff, 0xff, 0xff, 0xff] // a varint that never ends
          : varint(Math.floor(2 ** (21 + random() * 14))); // 2 MB to 32 GB
      const packed = new Uint8Array(claimed.length + body.length);
      packed.set(claimed);
      packed.set(body, claimed.length);
      const link = resealed(packed);
      expectContract(decodeScenarioLink, link, tally);
      const result = decodeScenarioLink(link);
      expect(!result.ok && result.problems[0]?.message).toMatch(/header is unreadable|says it holds|more than the/);
    }
    expect(tally.ok).toBe(0);
  });

  it('survives well-sealed links to any JSON value, naming fields where it can', () => {
    const tally = { ok: 0, refused: 0 };
    const seal = (json: string): string => {
      const bytes = new TextEncoder().encode(json);
      const body = deflateSync(bytes);
      const head = varint(bytes.length);
      const packed = new Uint8Array(head.length + body.length);
      packed.set(head);
      packed.set(body, head.length);
      return resealed(packed);
    };
    fc.assert(
      fc.property(fc.jsonValue({ maxDepth: 4 }), (value) =>
        expectContract(decodeScenarioLink, seal(JSON.stringify(value)), tally),
      ),
      { numRuns: 2_000, seed: 6 },
    );
    // Documents that are almost right: one field of a valid scenario, at any depth, replaced
    // (or one added), so every field of the document reaches the schema damaged.
    const reached = new Set<string>();
    fc.assert(
      fc.property(scenarioArb, fc.nat(), fc.jsonValue({ maxDepth: 2 }), (scenario, pick, value) => {
        const path = pickFieldPath(scenario, pick);
        reached.add(pathName(path));
        expectContract(decodeScenarioLink, seal(JSON.stringify(withField(scenario, path, value))), tally);
      }),
      { numRuns: 1_200, seed: 7 },
    );
    expect(SCENARIO_FIELDS.filter((name) => !reached.has(name))).toEqual([]);
    expect(tally.refused).toBeGreaterThan(2_800);
  });

  it('refuses deflate bombs of every claimed size up to the limit', () => {
    const tally = { ok: 0, refused: 0 };
    const bomb = zeroBomb(80_000); // about 20 MB of zeros in 127 kB
    for (const claimed of [1, 100, 65_536, 1_000_000, 2 * 1024 * 1024]) {
      const head = varint(claimed);
      const packed = new Uint8Array(head.length + bomb.length);
      packed.set(head);
      packed.set(bomb, head.length);
      const link = resealed(packed);
      expectContract(decodeScenarioLink, link, tally);
      // Refused for the bomb itself: it unpacks past the size it claims, and inflating stopped there.
      const result = decodeScenarioLink(link);
      expect(result.ok).toBe(false);
      if (!result.ok) {
        expect(result.problems.map((p) => p.message)).toEqual([
          expect.stringMatching(/^The link is damaged: it unpacks to more than the .+ it says it holds\./),
        ]);
      }
    }
    expect(tally.refused).toBe(5);
  });
});
