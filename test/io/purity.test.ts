// The import layer stays pure, like the core: nothing under src/io imports
// React, the DOM, the store or the UI, and no file touches browser globals.
// It may use the core (units, storm checks) and papaparse, nothing else.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const IO = join(import.meta.dirname, '../../src/io');

describe('src/io', () => {
  const sources = readdirSync(IO)
    .filter((name) => /\.tsx?$/.test(name))
    .map((name) => ({ name, text: readFileSync(join(IO, name), 'utf8') }));

  it('has source files to check, and no .tsx among them', () => {
    expect(sources.length).toBeGreaterThan(5);
    expect(sources.filter((s) => s.name.endsWith('.tsx'))).toEqual([]);
  });

  it.each(sources.map((s) => [s.name, s.text] as const))(
    '%s imports only its own files, the core and papaparse',
    (_name, text) => {
      const imports = [...text.matchAll(/\bfrom\s+['"]([^'"]+)['"]/g)].map((m) => m[1] as string);
      for (const spec of imports) expect(spec, `import "${spec}"`).toMatch(/^(?:\.\/[\w-]+|\.\.\/core|papaparse)$/);
      expect(text).not.toMatch(/\b(document|window|localStorage|navigator)\s*\./);
    },
  );
});
