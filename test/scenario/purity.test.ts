// The scenario layer is pure TypeScript: it imports only the core, its own
// files and two small libraries (valibot, fflate), and reaches no browser
// global — storage comes in as an argument.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const DIR = join(import.meta.dirname, '../../src/scenario');
const sources = readdirSync(DIR)
  .filter((name) => name.endsWith('.ts'))
  .map((name) => ({ name, text: readFileSync(join(DIR, name), 'utf8') }));

describe('src/scenario', () => {
  it('has source files to check', () => {
    expect(sources.length).toBeGreaterThan(8);
  });

  it.each(sources.map((s) => [s.name, s.text] as const))(
    '%s imports only the core, its own files, valibot and fflate',
    (_name, text) => {
      const imports = [...text.matchAll(/\bfrom\s+['"]([^'"]+)['"]/g)].map((m) => m[1] as string);
      for (const spec of imports) expect(spec, `import "${spec}"`).toMatch(/^(\.\/[\w-]+|\.\.\/core|valibot|fflate)$/);
      expect(text).not.toMatch(/\b(document|window|localStorage|sessionStorage|navigator)\.[A-Za-z_]/);
      expect(text).not.toMatch(/\b(eval|Function)\s*\(/);
    },
  );
});
