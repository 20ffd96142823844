// Runs the browser specs (see harness.mjs). Usage: node test/browser/run.mjs [filter]
// Each test gets a fresh context; any page error or console.error on a page
// of a context it used fails it (collected here, not by each spec). Closes
// with the count that scripts/test-all.mjs reads (see tally.mjs).
import { readdir } from 'node:fs/promises';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { watchCsp } from './csp.mjs';
import { launchBrowser, serveDist, unexpectedErrors, watchErrors } from './harness.mjs';
import { tallyBrowser } from './tally.mjs';

const filter = process.argv[2] ?? '';
const dir = import.meta.dirname;
const specs = (await readdir(dir)).filter((f) => f.endsWith('.spec.mjs') && f.includes(filter)).sort();
const server = await serveDist();
const launched = await launchBrowser();
const counts = [];
try {
  for (const spec of specs) {
    const count = { file: spec, declared: 0, ran: 0, passed: 0, failed: 0 };
    counts.push(count);
    let tests;
    try {
      tests = (await import(pathToFileURL(join(dir, spec)).href)).tests;
    } catch (error) {
      count.loadError = String(error?.message ?? error).split('\n')[0];
      continue;
    }
    if (!Array.isArray(tests)) continue;
    count.declared = tests.length;
    for (const t of tests) {
      const watch = watchErrors();
      const browser = watch.watchBrowser(launched.browser);
      const context = await browser.newContext({ viewport: { width: 1400, height: 900 } });
      const csp = await watchCsp(context);
      const newPage = () => context.newPage();
      const launch = async () => {
        const more = await launchBrowser();
        return { ...more, browser: watch.watchBrowser(more.browser) };
      };
      const started = performance.now();
      count.ran++;
      try {
        let thrown = null;
        try {
          await t.run({ browser, context, baseUrl: server.baseUrl, newPage, launchBrowser: launch, csp });
          csp.check();
        } catch (error) {
          thrown = error;
        }
        const errors = unexpectedErrors(watch.errors, t.expectErrors);
        if (thrown || errors.length) {
          const because = errors.length ? `\n${errors.map((e) => `page: ${e}`).join('\n')}` : '';
          throw new Error(
            `${thrown ? String(thrown?.stack ?? thrown) : 'the test passed its own checks, but'}${because}`,
          );
        }
        count.passed++;
        console.log(`  ok   ${spec} › ${t.name} (${Math.round(performance.now() - started)} ms)`);
      } catch (error) {
        count.failed++;
        console.log(`  FAIL ${spec} › ${t.name}\n       ${String(error.message).split('\n').join('\n       ')}`);
      } finally {
        await context.close();
      }
    }
  }
} finally {
  await launched.close();
  await server.close();
}
const { lines, exitCode } = tallyBrowser(counts);
for (const line of lines) console.log(line);
process.exit(exitCode);
