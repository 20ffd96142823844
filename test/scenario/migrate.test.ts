import { describe, expect, it } from 'vitest';
import {
  CURRENT_SCENARIO_VERSION,
  DEMO_SCENARIO,
  MIGRATIONS,
  migrate,
  parseScenario,
  type Migration,
  type RawDocument,
} from '../../src/scenario';
import { deepFreeze } from '../helpers/scenario-fixtures';

const versionMessage = (doc: RawDocument): string => {
  const result = migrate(doc);
  if (result.ok) expect.fail('expected the version to be refused');
  expect(result.problems).toHaveLength(1);
  expect(result.problems[0]?.path).toBe('version');
  return result.problems[0]?.message ?? '';
};

describe('the real upgrade chain', () => {
  it('is contiguous and ends at the current version', () => {
    // Each step goes up by one, no version has two steps, and the last step
    // lands on the version this build writes.
    const froms = MIGRATIONS.map((m) => m.from);
    expect(new Set(froms).size).toBe(froms.length);
    for (const step of MIGRATIONS) {
      expect(step.to).toBe(step.from + 1);
      expect(step.summary.length).toBeGreaterThan(10);
    }
    const sorted = [...MIGRATIONS].sort((a, b) => a.from - b.from);
    sorted.forEach((step, i) => {
      if (i > 0) expect(step.from).toBe((sorted[i - 1] as Migration).to);
    });
    const last = sorted[sorted.length - 1];
    expect(last ? last.to : CURRENT_SCENARIO_VERSION).toBe(CURRENT_SCENARIO_VERSION);
  });

  it('leaves a current document as it is', () => {
    const result = migrate(DEMO_SCENARIO as unknown as RawDocument);
    expect(result).toEqual({ ok: true, doc: DEMO_SCENARIO, fromVersion: CURRENT_SCENARIO_VERSION });
  });
});

describe('migrate refuses versions it cannot read', () => {
  it('refuses a version newer than this build, saying what to do', () => {
    expect(versionMessage({ ...DEMO_SCENARIO, version: CURRENT_SCENARIO_VERSION + 1 })).toBe(
      `version: is ${CURRENT_SCENARIO_VERSION + 1}, newer than this version of Raincut can read ` +
        `(it reads up to ${CURRENT_SCENARIO_VERSION}). Open the scenario in an up-to-date Raincut.`,
    );
  });

  it('refuses a document with no version', () => {
    const { version: _dropped, ...rest } = DEMO_SCENARIO;
    expect(versionMessage(rest)).toMatch(/^version: is missing; every scenario says which version/);
  });

  it.each([
    ['1', '"1"'],
    [1.5, '1.5'],
    [null, 'null'],
    [Number.MAX_VALUE, String(Number.MAX_VALUE)],
  ])('refuses the version %s', (version, shown) => {
    expect(versionMessage({ ...DEMO_SCENARIO, version })).toBe(`version: must be a whole number (got ${shown}).`);
  });

  it('refuses a version older than the first one', () => {
    expect(versionMessage({ ...DEMO_SCENARIO, version: 0 })).toBe(
      'version: is 0, but the oldest scenario version this Raincut reads is 1.',
    );
  });

  it('passes the refusal on through parseScenario', () => {
    const result = parseScenario({ ...DEMO_SCENARIO, version: 99 });
    expect(result.ok).toBe(false);
    expect(!result.ok && result.problems.map((p) => p.path)).toEqual(['version']);
  });
});

describe('the chain mechanics (with a made-up chain, not a real format history)', () => {
  // Three made-up versions of a toy document: 1 → 2 renames a field,
  // 2 → 3 adds one. They only exercise the runner.
  const chain: Migration[] = [
    {
      from: 2,
      to: 3,
      summary: 'adds tags, empty',
      up: (doc) => ({ ...doc, version: 3, tags: [] }),
    },
    {
      from: 1,
      to: 2,
      summary: 'renames title to name',
      up: ({ title, ...rest }) => ({ ...rest, version: 2, name: title }),
    },
  ];

  it('runs every step from the document version up, in order, whatever the list order', () => {
    const input = deepFreeze({ version: 1, title: 'A' });
    expect(migrate(input, chain, 3)).toEqual({ ok: true, doc: { version: 3, name: 'A', tags: [] }, fromVersion: 1 });
    expect(input).toEqual({ version: 1, title: 'A' }); // steps are pure
  });

  it('starts part-way along the chain for a newer document', () => {
    expect(migrate({ version: 2, name: 'B' }, chain, 3)).toEqual({
      ok: true,
      doc: { version: 3, name: 'B', tags: [] },
      fromVersion: 2,
    });
  });

  it('stops with a message when a step is missing', () => {
    const result = migrate({ version: 1, title: 'A' }, [chain[1] as Migration], 3);
    expect(result).toEqual({
      ok: false,
      problems: [{ path: 'version', message: 'version: is 2, and this version of Raincut has no way to upgrade it.' }],
    });
  });

  it('stops with a message when a step throws or forgets the version', () => {
    const throwing: Migration = {
      from: 1,
      to: 2,
      summary: 'throws',
      up: () => {
        throw new Error('bad data');
      },
    };
    const forgetful: Migration = { from: 1, to: 2, summary: 'forgets', up: (doc) => ({ ...doc }) };
    const skipping: Migration = { from: 1, to: 3, summary: 'skips', up: (doc) => ({ ...doc, version: 3 }) };
    const message = (step: Migration): string => {
      const result = migrate({ version: 1 }, [step], 3);
      return result.ok ? '' : (result.problems[0]?.message ?? '');
    };
    expect(message(throwing)).toBe('version: upgrading from version 1 to 2 failed: bad data');
    expect(message(forgetful)).toBe('version: upgrading from version 1 to 2 did not give a version 2 document.');
    expect(message(skipping)).toBe('version: cannot be upgraded: the step from 1 leads to 3 instead of 2.');
  });
});
