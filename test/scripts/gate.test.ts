// The verdict of `npm test`: every listed failure fails the run, a browser run
// that ran fewer tests than its specs declare fails it, and the type check is
// reported on its own line, never counted as a test.
import { describe, expect, it } from 'vitest';
import { verdict } from '../../scripts/gate.mjs';

/** A vitest JSON report with these counts (the fields the gate reads). */
const report = (passed: number, failed = 0, skipped = 0, files: { name: string; status: string }[] = []) => ({
  numTotalTests: passed + failed + skipped,
  numPassedTests: passed,
  numFailedTests: failed,
  numPendingTests: skipped,
  numTodoTests: 0,
  testResults: files.map((f) => ({ ...f, assertionResults: [] })),
});

const browserOut = (passed: number, failed: number, declared = passed + failed, files = 6) =>
  `  ok   …\nbrowser: ${files} spec files, ${declared} tests declared, ${passed + failed} run\nbrowser: ${passed} passed, ${failed} failed\n`;

const good = {
  typecheck: { status: 0 },
  lint: { status: 0 },
  format: { status: 0 },
  vitest: { status: 0, report: report(100) },
  build: { status: 0 },
  browser: { status: 0, stdout: browserOut(21, 0) },
  specFiles: 6,
};

describe('the verdict of npm test', () => {
  it('passes a clean run and counts only tests: the type check has its own line', () => {
    const v = verdict(good);
    expect(v.exitCode).toBe(0);
    expect(v.lines).toContain('type check: passed');
    expect(v.lines.at(-1)).toBe('121 passed, 0 failed');
  });

  it('fails when the browser runner ran no test, even though it printed a count', () => {
    const v = verdict({ ...good, browser: { status: 1, stdout: browserOut(0, 0, 0, 0) } });
    expect(v.exitCode).toBe(1);
    expect(v.lines.at(-1)).not.toMatch(/ 0 failed$/);
  });

  it('fails when fewer browser tests ran than the specs declare', () => {
    const v = verdict({ ...good, browser: { status: 0, stdout: browserOut(20, 0, 21) } });
    expect(v.exitCode).toBe(1);
    expect(v.lines.join('\n')).toMatch(/20 browser tests ran of 21 declared/);
  });

  it('fails when the runner saw fewer spec files than lie on disk', () => {
    const v = verdict({ ...good, specFiles: 7 });
    expect(v.exitCode).toBe(1);
    expect(v.lines.join('\n')).toMatch(/6 of 7 spec files/);
  });

  it('fails when the browser runner exits non-zero, whatever it counted', () => {
    const v = verdict({ ...good, browser: { status: 1, stdout: browserOut(21, 0) } });
    expect(v.exitCode).toBe(1);
    expect(v.lines.at(-1)).not.toMatch(/ 0 failed$/);
  });

  it('fails on a type error without counting it as a failed test', () => {
    const v = verdict({ ...good, typecheck: { status: 2 } });
    expect(v.exitCode).toBe(1);
    expect(v.lines).toContain('type check: FAILED (see the messages above)');
    expect(v.lines.at(-1)).toBe('121 passed, 0 failed');
  });

  it('fails on a lint error (a layer rule, an import cycle) or an unformatted file, each on its own line', () => {
    const lint = verdict({ ...good, lint: { status: 1 } });
    expect(lint.exitCode).toBe(1);
    expect(lint.lines).toContain('lint: FAILED (see the messages above)');
    expect(lint.lines).toContain('format: passed');
    const format = verdict({ ...good, format: { status: 1 } });
    expect(format.exitCode).toBe(1);
    expect(format.lines).toContain('lint: passed');
    expect(format.lines).toContain('format: FAILED (npm run format rewrites the files listed above)');
    expect(verdict(good).lines).toEqual(expect.arrayContaining(['lint: passed', 'format: passed']));
  });

  it('fails when vitest exits non-zero with every test passed (an unhandled error, a file that did not load)', () => {
    const v = verdict({ ...good, vitest: { status: 1, report: report(100) } });
    expect(v.exitCode).toBe(1);
    expect(v.lines.at(-1)).not.toMatch(/ 0 failed$/);
  });

  it('fails on a test file that failed without a failed test (it did not load, or holds no test)', () => {
    const v = verdict({
      ...good,
      vitest: { status: 1, report: report(100, 0, 0, [{ name: '/x/test/empty.test.ts', status: 'failed' }]) },
    });
    expect(v.exitCode).toBe(1);
    expect(v.lines.join('\n')).toMatch(/empty\.test\.ts/);
  });

  it('fails on skipped tests: a skipped check is a defect', () => {
    const v = verdict({ ...good, vitest: { status: 0, report: report(100, 0, 2) } });
    expect(v.exitCode).toBe(1);
    expect(v.lines.at(-1)).toBe('121 passed, 0 failed, 2 skipped');
  });

  it('fails when vitest wrote no report or ran no test, or the build failed', () => {
    expect(verdict({ ...good, vitest: { status: 0, report: null } }).exitCode).toBe(1);
    expect(verdict({ ...good, vitest: { status: 0, report: report(0) } }).exitCode).toBe(1);
    const noBuild = verdict({ ...good, build: { status: 1 }, browser: null });
    expect(noBuild.exitCode).toBe(1);
    expect(noBuild.lines.at(-1)).not.toMatch(/ 0 failed$/);
  });

  it('counts failed tests from both runners', () => {
    const v = verdict({
      ...good,
      vitest: { status: 1, report: report(98, 2) },
      browser: { status: 1, stdout: browserOut(20, 1) },
    });
    expect(v.exitCode).toBe(1);
    expect(v.lines.at(-1)).toBe('118 passed, 3 failed');
  });
});
