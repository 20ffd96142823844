// The browser runner's count: what each spec file declared and what ran.
// A spec file that declares no test (no `tests` array, an empty one, or one
// that failed to load) fails the run; so does a run that ran fewer tests than
// were declared. Pure, so the rule is tested (test/scripts/tally.test.ts).

/**
 * @param {{ file: string, declared: number, ran: number, passed: number, failed: number, loadError?: string }[]} specs
 * @returns {{ lines: string[], exitCode: number }}
 */
export function tallyBrowser(specs) {
  const declared = specs.reduce((n, s) => n + s.declared, 0);
  const ran = specs.reduce((n, s) => n + s.ran, 0);
  const passed = specs.reduce((n, s) => n + s.passed, 0);
  const failed = specs.reduce((n, s) => n + s.failed, 0);
  const problems = [];
  if (specs.length === 0) problems.push('no spec file matched');
  for (const s of specs) {
    if (s.loadError) problems.push(`${s.file} did not load: ${s.loadError}`);
    else if (s.declared === 0) problems.push(`${s.file} declares no test (export const tests = [...])`);
    if (s.ran < s.declared) problems.push(`${s.file}: ${s.ran} of its ${s.declared} tests ran`);
  }
  const lines = problems.map((p) => `browser: FAIL ${p}`);
  lines.push(`browser: ${specs.length} spec files, ${declared} tests declared, ${ran} run`);
  // Problems without a failed test of their own count as failed, so the line never reads "0 failed" then.
  lines.push(`browser: ${passed} passed, ${failed + problems.length} failed`);
  return { lines, exitCode: failed > 0 || problems.length > 0 ? 1 : 0 };
}
