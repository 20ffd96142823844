// The verdict of `npm test`, from what each stage reported. Pure, so its
// rules are tested (test/scripts/gate.test.ts). The rules:
// - any listed failure makes the exit code non-zero; a failed stage that has
//   no test count of its own (a build that broke, a runner that crashed, a
//   file that did not load) counts as one failed test, so the closing line
//   does not read "0 failed" when tests could not run;
// - a browser run fails unless it ran at least as many tests as the specs
//   declare and saw every spec file on disk (the runner fails a spec that
//   declares none);
// - skipped or to-do tests fail the run: a skipped check is a defect;
// - the type check, the lint rules and the format check are each reported on
//   a line of their own and not counted as tests; any of them failing fails
//   the run.

const BROWSER_COUNT = /^browser: (\d+) passed, (\d+) failed$/m;
const BROWSER_DECLARED = /^browser: (\d+) spec files, (\d+) tests declared, (\d+) run$/m;

/**
 * @param {{
 *   typecheck: { status: number | null },
 *   lint: { status: number | null },
 *   format: { status: number | null },
 *   vitest: { status: number | null, report: any },
 *   build: { status: number | null },
 *   browser: { status: number | null, stdout: string } | null,
 *   specFiles: number,
 * }} stages
 * @returns {{ lines: string[], exitCode: number }}
 */
export function verdict({ typecheck, lint, format, vitest, build, browser, specFiles }) {
  let passed = 0;
  let failed = 0;
  let skipped = 0;
  /** Failures that no failed test accounts for: each adds one to the failed count. */
  let uncounted = 0;
  const failures = [];
  const lines = [];

  lines.push(typecheck.status === 0 ? 'type check: passed' : 'type check: FAILED (see the messages above)');
  if (typecheck.status !== 0) failures.push('type check');
  lines.push(lint.status === 0 ? 'lint: passed' : 'lint: FAILED (see the messages above)');
  if (lint.status !== 0) failures.push('lint');
  lines.push(
    format.status === 0 ? 'format: passed' : 'format: FAILED (npm run format rewrites the files listed above)',
  );
  if (format.status !== 0) failures.push('format');

  const json = vitest.report;
  if (!json) {
    failures.push('vitest wrote no report');
    uncounted++;
  } else {
    passed += json.numPassedTests;
    failed += json.numFailedTests;
    skipped += (json.numPendingTests ?? 0) + (json.numTodoTests ?? 0);
    if (json.numTotalTests === 0) {
      failures.push('vitest ran no test');
      uncounted++;
    }
    // A file that did not load, or holds no test, fails with no failed test in it.
    const broken = (json.testResults ?? []).filter(
      (file) => file.status === 'failed' && !(file.assertionResults ?? []).some((a) => a.status === 'failed'),
    );
    for (const file of broken) {
      failures.push(`vitest: ${file.name} failed to run${file.message ? ` (${firstLine(file.message)})` : ''}`);
      uncounted++;
    }
    if (json.numFailedTests > 0) failures.push(`vitest: ${json.numFailedTests} failed`);
    if (vitest.status !== 0 && json.numFailedTests === 0 && broken.length === 0) {
      failures.push(`vitest exited with status ${vitest.status} (an unhandled error?)`);
      uncounted++;
    }
  }

  if (build.status !== 0 || !browser) {
    failures.push('vite build');
    uncounted++;
  } else {
    const count = BROWSER_COUNT.exec(browser.stdout ?? '');
    const declared = BROWSER_DECLARED.exec(browser.stdout ?? '');
    if (count) {
      passed += Number(count[1]);
      failed += Number(count[2]);
      if (Number(count[2]) > 0) failures.push(`browser: ${count[2]} failed`);
    }
    if (!count || !declared) {
      failures.push('the browser runner printed no count');
      uncounted++;
    } else {
      const [files, wanted, ran] = [Number(declared[1]), Number(declared[2]), Number(declared[3])];
      const problems = [];
      if (files < specFiles) problems.push(`it saw ${files} of ${specFiles} spec files`);
      if (wanted < files) problems.push(`${files} spec files declare only ${wanted} tests`);
      if (ran < wanted || Number(count[1]) + Number(count[2]) < wanted)
        problems.push(`${ran} browser tests ran of ${wanted} declared`);
      if (wanted === 0) problems.push('no browser test was declared');
      for (const p of problems) failures.push(`browser: ${p}`);
      uncounted += problems.length;
    }
    if (browser.status !== 0 && !(count && Number(count[2]) > 0)) {
      failures.push(`the browser runner exited with status ${browser.status}`);
      uncounted++;
    }
  }
  if (skipped > 0) failures.push(`${skipped} tests skipped`);

  if (failures.length) lines.push(`failed: ${failures.join('; ')}`);
  lines.push(`${passed} passed, ${failed + uncounted} failed${skipped ? `, ${skipped} skipped` : ''}`);
  return { lines, exitCode: failures.length ? 1 : 0 };
}

const firstLine = (text) => String(text).split('\n')[0].slice(0, 200);
