// Runs the browser specs (see harness.mjs). Usage: node test/browser/run.mjs [filter]
import { readdir } from 'node:fs/promises';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { watchCsp } from './csp.mjs';
import { launchBrowser, serveDist } from './harness.mjs';

const filter = process.argv[2] ?? '';
const dir = import.meta.dirname;
const specs = (await readdir(dir)).filter((f) => f.endsWith('.spec.mjs') && f.includes(filter)).sort();
const server = await serveDist();
const { browser, close } = await launchBrowser();
let passed = 0;
let failed = 0;
try {
  for (const spec of specs) {
    const mod = await import(pathToFileURL(join(dir, spec)).href);
    for (const t of mod.tests ?? []) {
      const context = await browser.newContext({ viewport: { width: 1400, height: 900 } });
      const csp = await watchCsp(context);
      const newPage = async () => {
        const page = await context.newPage();
        page.on('pageerror', (e) => console.error(`  page error in "${t.name}": ${e.message}`));
        return page;
      };
      const started = performance.now();
      try {
        await t.run({ browser, context, baseUrl: server.baseUrl, newPage, launchBrowser, csp });
        csp.check();
        passed++;
        console.log(`  ok   ${spec} › ${t.name} (${Math.round(performance.now() - started)} ms)`);
      } catch (error) {
        failed++;
        console.log(
          `  FAIL ${spec} › ${t.name}\n       ${String(error?.stack ?? error)
            .split('\n')
            .join('\n       ')}`,
        );
      } finally {
        await context.close();
      }
    }
  }
} finally {
  await close();
  await server.close();
}
console.log(`browser: ${passed} passed, ${failed} failed`);
process.exit(failed > 0 || passed === 0 ? 1 : 0);
