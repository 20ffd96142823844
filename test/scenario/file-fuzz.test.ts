// Fuzzing the file reader with damaged, random and crafted file texts, all
// drawn from fixed seeds so that a failure names an input to replay.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEMO_SCENARIO, FILE_FORMAT_TAG, scenarioFromFileText, scenarioToFileText } from '../../src/scenario';
import { gaugeStorm24h, scenarioArb } from './arbitraries';
import { expectContract, seeded } from './fuzz-helpers';

const corpus: string[] = [
  scenarioToFileText(DEMO_SCENARIO),
  scenarioToFileText({ ...DEMO_SCENARIO, storm: gaugeStorm24h(9) }),
  ...fc.sample(scenarioArb, { numRuns: 20, seed: 777 }).map(scenarioToFileText),
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

  it('survives one field of a valid file replaced by any JSON value', () => {
    const tally = { ok: 0, refused: 0 };
    fc.assert(
      fc.property(
        fc.constantFrom(...corpus.slice(0, 6)),
        fc.constantFrom(
          'version',
          'name',
          'storm',
          'catchment',
          'units',
          'method',
          'methodMemory',
          'observed',
          'caution',
          'other',
        ),
        fc.jsonValue({ maxDepth: 3 }),
        (text, field, value) => {
          expectContract(scenarioFromFileText, JSON.stringify({ ...JSON.parse(text), [field]: value }), tally);
        },
      ),
      { numRuns: 2_000, seed: 25 },
    );
    expect(tally.refused).toBeGreaterThan(1_500);
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
