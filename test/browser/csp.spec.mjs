// The built app's Content-Security-Policy, and what the page does with it:
// inline scripts refused, nothing the app itself does refused (every test in
// the run fails on a violation, see csp.mjs), and the exports that need
// blob: URLs still work.
import { readFile } from 'node:fs/promises';
import { resolve } from 'node:path';
import { check } from './support.mjs';

const DIST = resolve(import.meta.dirname, '../../dist/index.html');

const REQUIRED = [
  "default-src 'self'",
  "script-src 'self'",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'none'",
  "img-src 'self' blob:",
  "worker-src 'self'",
];

/** The policy in the built page, read as the browser reads it (entities decoded). */
async function builtPolicy() {
  const html = await readFile(DIST, 'utf8');
  const m = /<meta http-equiv="Content-Security-Policy" content="([^"]+)"/.exec(html);
  check(m, 'dist/index.html has no Content-Security-Policy meta tag');
  return { html, policy: m[1].replace(/&#39;/g, "'") };
}

export const tests = [
  {
    name: 'the built page carries the policy before any script, and no inline script',
    async run() {
      const { html, policy } = await builtPolicy();
      for (const directive of REQUIRED) check(policy.includes(directive), `the policy lacks ${directive}: ${policy}`);
      check(!/unsafe-inline|unsafe-eval|data:/.test(policy), `the policy allows too much: ${policy}`);
      check(html.indexOf('Content-Security-Policy') < html.indexOf('<script'), 'a script comes before the policy');
      for (const m of html.matchAll(/<script\b([^>]*)>([\s\S]*?)<\/script>/g)) {
        check(/\bsrc=/.test(m[1]) && m[2].trim() === '', `dist/index.html has an inline script: ${m[0].slice(0, 80)}`);
      }
    },
  },
  {
    name: 'the page refuses an inline script, and the refusal is reported',
    // The refusal is logged as a console error twice: by the page's own report (csp.mjs; an inline
    // <script> element falls under script-src-elem, which the policy leaves to script-src) and by
    // chromium, which names the directive that refused it. Nothing else may be logged.
    expectErrors: [
      /^console\.error: CSP violation: script-src-elem refused inline$/,
      /^console\.error: Executing inline script violates the following Content Security Policy directive 'script-src 'self''\. .* The action has been blocked\.$/,
    ],
    async run({ baseUrl, newPage, csp }) {
      const page = await newPage();
      await page.goto(baseUrl);
      await page.getByLabel('Rainfall depth').first().waitFor();
      const ran = await page.evaluate(async () => {
        const script = document.createElement('script');
        script.textContent = 'window.__inlineRan = true;';
        document.head.append(script);
        await new Promise((ok) => setTimeout(ok, 50));
        return window.__inlineRan === true;
      });
      check(!ran, 'an inline script ran under the policy');
      const found = csp.take();
      check(
        found.some((v) => /script-src/.test(v)),
        `the refused inline script was not reported: ${JSON.stringify(found)}`,
      );
    },
  },
  {
    name: 'PNG, SVG and CSV exports and the printed report work under the policy, with no violation',
    async run({ baseUrl, newPage }) {
      const page = await newPage();
      await page.goto(baseUrl);
      await page.getByLabel('Rainfall depth').first().waitFor();
      for (const button of ['Export PNG', 'Export SVG', 'Export CSV']) {
        const [file] = await Promise.all([
          page.waitForEvent('download'),
          page.getByRole('button', { name: button }).click(),
        ]);
        const path = await file.path();
        const bytes = await readFile(path);
        check(bytes.length > 100, `${button} gave ${bytes.length} bytes`);
        if (button === 'Export PNG') check(bytes.subarray(1, 4).toString() === 'PNG', 'the PNG export is not a PNG');
      }
      await page.evaluate(() => {
        window.print = () => {};
      });
      await page.getByRole('button', { name: 'Print report' }).click();
      // Violations, if any, fail this test through csp.check() in run.mjs.
    },
  },
];
