// Fuzzing the file reader with damaged, random and crafted file texts, all
// drawn from fixed seeds so that a failure names an input to replay.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO, FILE_FORMAT_TAG, scenarioFromFileText, scenarioToFileText } from '../../src/scenario';
import { gaugeStorm24h, scenarioArb } from '../helpers/scenario-arbitraries';
import { SCENARIO_FIELDS, expectContract, pathName, pickFieldPath, seeded, withField } from '../helpers/fuzz';

// The corpus holds every part of the document: notes, a streamflow record, an event set with records.
const sampled = fc.sample(scenarioArb, { numRuns: 20, seed: 777 });
const corpus: string[] = [
  scenarioToFileText(DEMO_SCENARIO),
  scenarioToFileText({ ...DEMO_SCENARIO, storm: gaugeStorm24h(9) }),
  ...sampled.map(scenarioToFileText),
];

const PIECES = [
  '{',
  '}',
  '[',
  ']',
  ',',
  ':',
  '"',
  '\\',
  '-',
  '.',
  'e',
  '0',
  '1e999',
  '-1',
  'null',
  'true',
  ' ',
  '\n',
  'é',
  '\ud800',
];

describe('the file reader under fuzzing never throws and always says why it refuses', { timeout: 60_000 }, () => {
  it('survives characters changed, added and removed, and files cut short', () => {
    const random = seeded(21);
    const pick = <T>(list: readonly T[]): T => list[Math.floor(random() * list.length)] as T;
    const tally = { ok: 0, refused: 0 };
    for (let n = 0; n < 12_000; n++) {
      const text = pick(corpus);
      const at = Math.floor(random() * text.length);
      let mutated: string;
      switch (n % 5) {
        case 0:
          mutated = text.slice(0, at) + pick(PIECES) + text.slice(at + 1);
          break;
        case 1:
          mutated = text.slice(0, at) + pick(PIECES) + text.slice(at);
          break;
        case 2:
          mutated = text.slice(0, at) + text.slice(at + 1 + Math.floor(random() * 30));
          break;
        case 3:
          mutated = text.slice(0, at);
          break;
        default: {
          // A number somewhere replaced by an awkward one.
          mutated = text.replace(/-?\d+(\.\d+)?(e[-+]?\d+)?/g, (m) =>
            random() < 0.02 ? pick(['-1', '1e999', '"7"', 'null', '-0', '0']) : m,
          );
        }
      }
      expectContract(scenarioFromFileText, mutated, tally);
    }
    expect(tally.refused).toBeGreaterThan(8_000);
  });

  it('survives any JSON text, with and without our tag', () => {
    const tally = { ok: 0, refused: 0 };
    fc.assert(
      fc.property(fc.json({ maxDepth: 5 }), (text) => expectContract(scenarioFromFileText, text, tally)),
      { numRuns: 3_000, seed: 22 },
    );
    fc.assert(
      fc.property(fc.dictionary(fc.string({ maxLength: 12 }), fc.jsonValue({ maxDepth: 3 })), (fields) => {
        expectContract(scenarioFromFileText, JSON.stringify({ ...fields, $format: FILE_FORMAT_TAG }), tally);
      }),
      { numRuns: 3_000, seed: 23 },
    );
    fc.assert(
      fc.property(fc.string({ unit: 'binary', maxLength: 200 }), (text) =>
        expectContract(scenarioFromFileText, text, tally),
      ),
      { numRuns: 2_000, seed: 24 },
    );
    expect(tally.ok).toBe(0);
  });

  it('starts from files that carry every part of a scenario', () => {
    expect(sampled.some((s) => s.notes.length > 100)).toBe(true);
    expect(sampled.some((s) => s.streamflow !== null && s.streamflow.useAsObserved)).toBe(true);
    expect(sampled.some((s) => s.eventSet.activeId !== null)).toBe(true);
    expect(sampled.some((s) => s.eventSet.events.some((e) => e.streamflow !== null))).toBe(true);
    expect(Math.max(...sampled.map((s) => s.storm.depthsMm.length))).toBeGreaterThan(200);
  });

  it('survives one field of a valid file, at any depth, replaced by any JSON value', () => {
    const tally = { ok: 0, refused: 0 };
    const reached = new Set<string>();
    const docs = corpus.map((text) => JSON.parse(text) as unknown);
    fc.assert(
      fc.property(fc.nat({ max: docs.length - 1 }), fc.nat(), fc.jsonValue({ maxDepth: 3 }), (which, pick, value) => {
        const doc = docs[which] as Record<string, unknown>;
        // The file's own fields ($format, caution) are fields too.
        const path = pickFieldPath(doc, pick);
        reached.add(pathName(path));
        expectContract(scenarioFromFileText, JSON.stringify(withField(doc, path, value)), tally);
      }),
      { numRuns: 3_000, seed: 25 },
    );
    expect(SCENARIO_FIELDS.filter((name) => !reached.has(name))).toEqual([]);
    expect(['$format', 'caution'].filter((name) => !reached.has(name))).toEqual([]);
    expect(tally.refused).toBeGreaterThan(2_000);
  });

  it('survives very deep nesting and very long lists', () => {
    const tally = { ok: 0, refused: 0 };
    const deep = '['.repeat(100_000) + ']'.repeat(100_000);
    expectContract(scenarioFromFileText, deep, tally);
    expectContract(scenarioFromFileText, `{"$format":"${FILE_FORMAT_TAG}","storm":${deep}}`, tally);
    const good = corpus[0] as string;
    expect(good).toContain('"methodMemory": {}');
    const deepMemory = '{"constant":'.repeat(50_000) + '1' + '}'.repeat(50_000);
    expectContract(scenarioFromFileText, good.replace('"methodMemory": {}', `"methodMemory": ${deepMemory}`), tally);
    const doc = JSON.parse(good);
    doc.storm = { durationsH: Array.from({ length: 200_000 }, () => 'x'), depthsMm: [] };
    expectContract(scenarioFromFileText, JSON.stringify(doc), tally);
    expect(tally).toEqual({ ok: 0, refused: 4 });
  });
});
