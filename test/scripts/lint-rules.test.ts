// The layer rules are lint rules (eslint.config.js), run by `npm test`. These
// tests lint small pieces of code through ESLint's Node API as if they stood at
// a real path in src/, and check that each forbidden import or global is an
// error of the rule that guards it, and that the real file it stands in for is
// clean: a rule that flags everything or nothing fails here.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { ESLint, type Linter } from 'eslint';
import { beforeAll, describe, expect, it } from 'vitest';

const ROOT = join(import.meta.dirname, '../..');

/** The rules this test is about; the type-aware ones are left out so no type program is built. */
const LAYER_RULES = new Set([
  'import-x/no-restricted-paths',
  'import-x/no-cycle',
  'no-restricted-imports',
  'no-restricted-globals',
  'no-restricted-syntax',
]);

let eslint: ESLint;
beforeAll(() => {
  eslint = new ESLint({
    cwd: ROOT,
    ruleFilter: ({ ruleId }) => LAYER_RULES.has(ruleId),
    overrideConfig: { languageOptions: { parserOptions: { projectService: false } } },
  });
});

/** The real text of a source file. */
const source = (path: string): string => readFileSync(join(ROOT, path), 'utf8');

/** Lints `text` as though it were the file at `path`; returns the errors as "rule: message". */
async function errors(path: string, text: string): Promise<string[]> {
  const [result] = await eslint.lintText(text, { filePath: join(ROOT, path) });
  return (result?.messages ?? [])
    .filter((m: Linter.LintMessage) => m.severity === 2)
    .map((m) => `${m.ruleId}: ${m.message}`);
}

// ESLint follows each file's imports through the tree (no-cycle): on a loaded
// machine that outlasts the default test timeout. No time is asserted here.
const LINT_TIMEOUT_MS = 180_000;

describe('the layer rules, as ESLint applies them', { timeout: LINT_TIMEOUT_MS }, () => {
  it('leave the real files clean (so each error below comes from the line added)', async () => {
    for (const path of [
      'src/core/errors.ts',
      'src/core/baseflow/index.ts',
      'src/io/index.ts',
      'src/scenario/index.ts',
      'src/store/index.ts',
      'src/ui/services/download.ts',
    ]) {
      expect(await errors(path, source(path)), path).toEqual([]);
    }
  });

  it('refuse an import of the UI from the core', async () => {
    const found = await errors('src/core/errors.ts', `import { App } from '../ui/App';\nexport const a = App;\n`);
    expect(found).toContainEqual(
      expect.stringMatching(/^import-x\/no-restricted-paths: .*The core imports nothing outside src\/core/),
    );
  });

  it('refuse a package, a browser global and JSX in the core', async () => {
    const text = `${source('src/core/errors.ts')}\nimport { useState } from 'react';\nexport const w = () => [window.innerWidth, useState];\nexport const j = <b />;\n`;
    const found = await errors('src/core/errors.tsx', text);
    expect(found).toContainEqual(expect.stringMatching(/^no-restricted-imports: .*The core imports no package/));
    expect(found).toContainEqual(expect.stringMatching(/^no-restricted-globals: .*This layer runs in Node too/));
    expect(found).toContainEqual(expect.stringMatching(/^no-restricted-syntax: .*No JSX outside src\/ui/));
  });

  it('keep the baseflow core to its own folder, errors, units and time limits', async () => {
    const text = `${source('src/core/baseflow/index.ts')}\nimport { computeHorton } from '../loss/horton';\nexport const c = computeHorton;\n`;
    expect(await errors('src/core/baseflow/index.ts', text)).toContainEqual(
      expect.stringMatching(/^import-x\/no-restricted-paths: .*Baseflow separation uses only/),
    );
  });

  it('refuse the store or the UI from io and scenario, and the UI from the store', async () => {
    const cases: [string, string, RegExp][] = [
      ['src/io/index.ts', `import { useScenario } from '../store';`, /io imports only itself and the core/],
      ['src/scenario/index.ts', `import { App } from '../ui/App';`, /scenario imports only itself and the core/],
      ['src/store/index.ts', `import { App } from '../ui/App';`, /The store never imports the UI/],
    ];
    for (const [path, line, message] of cases) {
      const found = await errors(path, `${source(path)}\n${line}\n`);
      expect(found, path).toContainEqual(expect.stringMatching(message));
    }
  });

  it('refuse an import from a shared UI piece up to a panel that uses it', async () => {
    const path = 'src/ui/services/download.ts';
    const text = `${source(path)}\nimport { ScenarioBar } from '../share/ScenarioBar';\nexport const s = ScenarioBar;\n`;
    expect(await errors(path, text)).toContainEqual(
      expect.stringMatching(/^import-x\/no-restricted-paths: .*src\/ui\/services stands below it in UI_ORDER/),
    );
  });

  it('refuse a call of the core’s computations from the UI, which reads derived values', async () => {
    const path = 'src/ui/services/download.ts';
    const text = `${source(path)}\nimport { computeLosses } from '../../core';\nexport const c = computeLosses;\n`;
    expect(await errors(path, text)).toContainEqual(
      expect.stringMatching(/^no-restricted-imports: .*The UI reads derived values from the store/),
    );
    // A type or a helper of the core stays open to the UI.
    const allowed = `${source(path)}\nimport { totalDepthMm } from '../../core';\nexport const t = totalDepthMm;\n`;
    expect(await errors(path, allowed)).toEqual([]);
  });

  it('refuse an import cycle, even inside one layer', async () => {
    // src/core/loss/horton.ts imports src/core/errors.ts, so errors.ts importing horton.ts closes a loop.
    const path = 'src/core/errors.ts';
    const text = `${source(path)}\nimport { computeHorton } from './loss/horton';\nexport const c = computeHorton;\n`;
    expect(await errors(path, text)).toContainEqual(expect.stringMatching(/^import-x\/no-cycle: /));
  });
});
