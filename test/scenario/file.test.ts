import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  CAUTION_TEXT,
  CURRENT_SCENARIO_VERSION,
  DEMO_SCENARIO,
  FILE_FORMAT_TAG,
  MAX_FILE_CHARS,
  scenarioFileName,
  scenarioFromFileText,
  scenarioToFileText,
  type ScenarioResult,
} from '../../src/scenario';
import { prettyJson } from '../../src/scenario/pretty-json';
import { gaugeStorm24h, scenarioArb } from '../helpers/scenario-arbitraries';

function messages(result: ScenarioResult): string[] {
  if (result.ok) expect.fail('expected the file to be refused');
  return result.problems.map((p) => p.message);
}

describe('a scenario file', () => {
  it('opens as exactly the scenario it was saved from', () => {
    expect(scenarioFromFileText(scenarioToFileText(DEMO_SCENARIO))).toStrictEqual({
      ok: true,
      scenario: DEMO_SCENARIO,
    });
  });

  it('round-trips random scenarios exactly', () => {
    fc.assert(
      fc.property(scenarioArb, (scenario) => {
        expect(scenarioFromFileText(scenarioToFileText(scenario))).toStrictEqual({ ok: true, scenario });
      }),
      { numRuns: 200, seed: 1983 },
    );
  }, 60_000); // documents of hundreds of bars, records and events: generous on a busy machine

  it('starts with our format tag and carries the caution text', () => {
    const text = scenarioToFileText(DEMO_SCENARIO);
    const json = JSON.parse(text);
    expect(Object.keys(json).slice(0, 3)).toEqual(['$format', 'caution', 'version']);
    expect(json.$format).toBe(FILE_FORMAT_TAG);
    expect(json.caution).toBe(CAUTION_TEXT);
    expect(text.startsWith(`{\n  "$format": "${FILE_FORMAT_TAG}",\n  "caution": `)).toBe(true);
    expect(text.endsWith('}\n')).toBe(true);
  });

  it('packs a storm of 288 bars into lines of about 100 columns', () => {
    const text = scenarioToFileText({ ...DEMO_SCENARIO, storm: gaugeStorm24h() });
    const lines = text.split('\n');
    // One number a line would take over 576 lines; 5-minute durations
    // (0.08333333333333333) are long, so about 80 lines go to them.
    expect(lines.length).toBeLessThan(150);
    const numberLines = lines.filter((l) => /^\s+[-\d.e+, ]+$/.test(l));
    expect(numberLines.length).toBeGreaterThan(50);
    expect(numberLines.filter((l) => l.length > 100)).toEqual([]);
  });

  it('reads a file that an editor saved with a byte-order mark', () => {
    expect(scenarioFromFileText(`\ufeff${scenarioToFileText(DEMO_SCENARIO)}`).ok).toBe(true);
  });

  it('reads back a file whose caution a person edited', () => {
    const json = JSON.parse(scenarioToFileText(DEMO_SCENARIO));
    json.caution = 'Checked by J. for the 2026 review.';
    expect(scenarioFromFileText(JSON.stringify(json))).toStrictEqual({ ok: true, scenario: DEMO_SCENARIO });
  });

  it('suggests a file name made from the scenario name', () => {
    expect(scenarioFileName(DEMO_SCENARIO)).toBe('demo-fenmoor-brook-storm-invented.json');
    expect(scenarioFileName({ ...DEMO_SCENARIO, name: 'Crue d’été / 2026' })).toBe('crue-d-ete-2026.json');
    expect(scenarioFileName({ ...DEMO_SCENARIO, name: '***' })).toBe('scenario.json');
  });
});

describe('a file that is not right is refused with a message saying where', () => {
  const good = scenarioToFileText(DEMO_SCENARIO);

  it('gives the line and column of a JSON syntax error', () => {
    const broken = good.replace('"units": "si",', '"units": "si"');
    const [message] = messages(scenarioFromFileText(broken));
    const line = broken.split('\n').findIndex((l) => l.includes('"method"')) + 1;
    expect(message).toMatch(new RegExp(`^The file is not valid JSON: .*line ${line}, column 3`));
  });

  it('refuses an empty file and a file that is not a JSON object', () => {
    expect(messages(scenarioFromFileText(''))).toEqual(['The file is empty.']);
    expect(messages(scenarioFromFileText('  \n'))).toEqual(['The file is empty.']);
    expect(messages(scenarioFromFileText('[1, 2]'))).toEqual([
      'The file does not hold a Raincut scenario: its JSON is a list of 2 items, not an object.',
    ]);
  });

  it('refuses JSON without our format tag, or with another tag', () => {
    const { $format: _tag, ...rest } = JSON.parse(good);
    expect(messages(scenarioFromFileText(JSON.stringify(rest)))).toEqual([
      `$format: is missing, so this JSON file is not a Raincut scenario (a scenario file has "$format": "${FILE_FORMAT_TAG}").`,
    ]);
    expect(messages(scenarioFromFileText(JSON.stringify({ ...rest, $format: 'rainfall-table' })))).toEqual([
      `$format: is "rainfall-table"; a Raincut scenario file has "${FILE_FORMAT_TAG}".`,
    ]);
  });

  it('names the field of a bad value with the same path as in the document', () => {
    const broken = good.replace('"areaM2": 3200000', '"areaM2": "3.2 km²"');
    const result = scenarioFromFileText(broken);
    expect(!result.ok && result.problems.map((p) => p.path)).toEqual(['catchment.areaM2']);
  });

  it('reports a caution that is not text together with the scenario problems', () => {
    const json = JSON.parse(good);
    json.caution = 42;
    json.units = 'metric';
    const result = scenarioFromFileText(JSON.stringify(json));
    expect(!result.ok && result.problems.map((p) => p.path)).toEqual(['caution', 'units']);
  });

  it('refuses a file from a newer Raincut, saying so', () => {
    const newer = good.replace(
      `"version": ${CURRENT_SCENARIO_VERSION},`,
      `"version": ${CURRENT_SCENARIO_VERSION + 1},`,
    );
    expect(messages(scenarioFromFileText(newer))[0]).toMatch(
      new RegExp(`^version: is ${CURRENT_SCENARIO_VERSION + 1}, newer than this version of Raincut can read`),
    );
  });

  it('refuses a file longer than the limit without parsing it', () => {
    expect(messages(scenarioFromFileText(' '.repeat(MAX_FILE_CHARS + 1)))).toEqual([
      `The file is ${MAX_FILE_CHARS + 1} characters long; a scenario file may have at most ${MAX_FILE_CHARS}.`,
    ]);
  });

  it('refuses a value that is not text at all', () => {
    expect(messages(scenarioFromFileText(null as unknown as string))).toEqual([
      'The file could not be read: it is not text.',
    ]);
  });
});

describe('prettyJson', () => {
  it('parses back to what JSON.stringify gives, for any JSON value', () => {
    fc.assert(
      fc.property(fc.jsonValue(), fc.integer({ min: 10, max: 120 }), (value, width) => {
        expect(JSON.parse(prettyJson(value, '  ', width))).toStrictEqual(JSON.parse(JSON.stringify(value)));
      }),
      { numRuns: 500, seed: 5 },
    );
  });

  it('follows JSON.stringify for values JSON cannot hold', () => {
    const value = { a: undefined, b: [undefined, NaN, -0], c: () => 1 };
    expect(JSON.parse(prettyJson(value))).toStrictEqual(JSON.parse(JSON.stringify(value)));
  });

  it('writes short lists on one line and objects one key a line', () => {
    expect(prettyJson({ a: [1, 2], b: {}, c: [], d: [{ e: 1 }] })).toBe(
      '{\n  "a": [1, 2],\n  "b": {},\n  "c": [],\n  "d": [\n    {\n      "e": 1\n    }\n  ]\n}',
    );
  });
});
