import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const folder = join(import.meta.dirname, '../../../src/core/baseflow');

describe('the baseflow core', () => {
  const files = readdirSync(folder).filter((name) => name.endsWith('.ts'));

  it('imports only its own folder and the core beside it: no React, no DOM, no UI', () => {
    expect(files.length).toBeGreaterThan(5);
    for (const name of files) {
      const source = readFileSync(join(folder, name), 'utf8');
      const specifiers = [...source.matchAll(/from\s+'([^']+)'/g)].map((m) => m[1] as string);
      for (const spec of specifiers) {
        expect(spec, `${name} imports ${spec}`).toMatch(/^\.\/[\w-]+$|^\.\.\/(errors|units|time-limits)$/);
      }
      const code = source.replace(/\/\*[\s\S]*?\*\//g, '').replace(/\/\/.*$/gm, '');
      expect(code, name).not.toMatch(/\b(document|window|navigator|HTMLElement|requestAnimationFrame)\b/);
    }
  });
});
