// The browser runner's count: a spec file with no test, or a run shorter than
// the specs declare, fails it.
import { describe, expect, it } from 'vitest';
import { tallyBrowser } from '../browser/tally.mjs';

const spec = (file: string, declared: number, passed = declared, failed = 0) => ({
  file,
  declared,
  ran: passed + failed,
  passed,
  failed,
});

describe('the browser runner’s count', () => {
  it('passes when every declared test ran and passed, and prints the declared count for the gate', () => {
    const t = tallyBrowser([spec('a.spec.mjs', 2), spec('b.spec.mjs', 1)]);
    expect(t.exitCode).toBe(0);
    expect(t.lines).toEqual(['browser: 2 spec files, 3 tests declared, 3 run', 'browser: 3 passed, 0 failed']);
  });

  it('fails a spec file that declares no test, even when the others pass', () => {
    const t = tallyBrowser([spec('a.spec.mjs', 2), spec('empty.spec.mjs', 0)]);
    expect(t.exitCode).toBe(1);
    expect(t.lines[0]).toBe('browser: FAIL empty.spec.mjs declares no test (export const tests = [...])');
    expect(t.lines.at(-1)).toBe('browser: 2 passed, 1 failed');
  });

  it('fails a spec file that did not load', () => {
    const t = tallyBrowser([spec('a.spec.mjs', 2), { ...spec('bad.spec.mjs', 0), loadError: 'SyntaxError: x' }]);
    expect(t.exitCode).toBe(1);
    expect(t.lines[0]).toBe('browser: FAIL bad.spec.mjs did not load: SyntaxError: x');
  });

  it('fails when fewer tests ran than a spec declares', () => {
    const t = tallyBrowser([{ file: 'a.spec.mjs', declared: 3, ran: 2, passed: 2, failed: 0 }]);
    expect(t.exitCode).toBe(1);
    expect(t.lines).toContain('browser: FAIL a.spec.mjs: 2 of its 3 tests ran');
  });

  it('fails a run that matched no spec file', () => {
    const t = tallyBrowser([]);
    expect(t.exitCode).toBe(1);
    expect(t.lines.at(-1)).toBe('browser: 0 passed, 1 failed');
  });

  it('fails on a failed test', () => {
    expect(tallyBrowser([spec('a.spec.mjs', 2, 1, 1)]).exitCode).toBe(1);
  });
});
