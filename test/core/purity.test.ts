// The hydrology core stays pure: nothing under src/core imports React, the
// DOM, the store or the UI, and no core file touches browser globals.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

const CORE = join(import.meta.dirname, '../../src/core');

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? files(path) : /\.tsx?$/.test(name) ? [path] : [];
  });
}

describe('src/core', () => {
  const sources = files(CORE).map((path) => ({ path: relative(CORE, path), text: readFileSync(path, 'utf8') }));

  it('has source files to check', () => {
    expect(sources.length).toBeGreaterThan(5);
  });

  it.each(sources.map((s) => [s.path, s.text] as const))('%s imports only core modules', (_path, text) => {
    const imports = [...text.matchAll(/\bfrom\s+['"]([^'"]+)['"]/g)].map((m) => m[1] as string);
    for (const spec of imports) {
      expect(spec, `import "${spec}"`).toMatch(/^\.\.?\//);
      expect(spec, `import "${spec}"`).not.toMatch(/(^|\/)(ui|store|scenario|io)(\/|$)/);
    }
    expect(text).not.toMatch(/\b(document|window|localStorage)\s*\./);
    expect(text).not.toMatch(/\.tsx['"]/);
  });
});
