// DEVELOPERS.md's layout and README.md's pointers into the source describe
// the tree as it is: every folder of src/ (and of src/core/ and src/ui/) is
// named in the layout, every folder the layout names exists, the UI's
// folders are exactly the entries of eslint.config.js's UI_ORDER (so each
// stands under the layer rule), test/ mirrors src/, and every `src/…` path
// either document quotes exists. A folder added or moved without its line in
// the guide fails here.
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = join(import.meta.dirname, '../..');
// Loaded by a path typed as a string, so the type check does not take in the lint config's JavaScript.
const CONFIG: string = '../../eslint.config.js';
const { UI_ORDER } = (await import(CONFIG)) as { readonly UI_ORDER: readonly string[] };
const read = (file: string): string => readFileSync(join(ROOT, file), 'utf8');
const folders = (dir: string): string[] =>
  readdirSync(join(ROOT, dir)).filter((name) => statSync(join(ROOT, dir, name)).isDirectory());

/** The fenced block under DEVELOPERS.md's "## Layout". */
function layoutBlock(): string {
  const text = read('DEVELOPERS.md');
  const start = text.indexOf('## Layout');
  expect(start, 'DEVELOPERS.md has a "## Layout" section').toBeGreaterThanOrEqual(0);
  const open = text.indexOf('```', start);
  const close = text.indexOf('```', open + 3);
  return text.slice(open + 3, close);
}

/** The lines of the layout block from the one starting with `head` to the next top-level entry. */
function section(block: string, head: string): string {
  const lines = block.split('\n');
  const first = lines.findIndex((line) => line.startsWith(head));
  expect(first, `the layout has an entry "${head}"`).toBeGreaterThanOrEqual(0);
  const rest = lines.slice(first + 1).findIndex((line) => /^\S/.test(line));
  return lines.slice(first, rest < 0 ? undefined : first + 1 + rest).join('\n');
}

/** `name/` words of a layout section: the folders it names. */
const namedFolders = (text: string): Set<string> =>
  new Set([...text.matchAll(/(?<![\w/.-])([a-z][\w-]*)\/(?![\w])/g)].map((m) => m[1] as string));

describe('DEVELOPERS.md layout against the tree', () => {
  const block = layoutBlock();

  it('names every folder of src/ and no folder that is not there', () => {
    const named = [...block.matchAll(/^src\/([\w-]+)\//gm)].map((m) => m[1]);
    expect(new Set(named)).toEqual(new Set(folders('src')));
  });

  it('names every folder of src/core/, and each folder it names there exists', () => {
    const named = namedFolders(section(block, 'src/core/'));
    named.delete('core');
    named.delete('src');
    expect([...named].sort()).toEqual(folders('src/core').sort());
  });

  it('names every folder of src/ui/, which are exactly the folders of UI_ORDER', () => {
    const ui = folders('src/ui').sort();
    const named = namedFolders(section(block, 'src/ui/'));
    for (const folder of ui) expect(named.has(folder), `src/ui/${folder}/ named in the layout`).toBe(true);
    const files = readdirSync(join(ROOT, 'src/ui')).filter(
      (name) => !statSync(join(ROOT, 'src/ui', name)).isDirectory(),
    );
    // Every entry of src/ui stands in the lint rule's order, and every entry of the order exists.
    expect([...UI_ORDER].sort()).toEqual([...ui, ...files.filter((f) => !f.endsWith('.css'))].sort());
  });

  it('test/ mirrors src/: each test folder is a src folder or one the layout names as test-only', () => {
    const testOnly = new Set(['browser', 'bench', 'helpers', 'fixtures', 'scripts', 'source']);
    for (const name of testOnly)
      expect(block.includes(`test/${name}`), `test/${name} is named in the layout`).toBe(true);
    for (const folder of folders('test')) {
      expect(testOnly.has(folder) || existsSync(join(ROOT, 'src', folder)), `test/${folder} has src/${folder}`).toBe(
        true,
      );
    }
    for (const layer of ['core', 'ui']) {
      for (const folder of folders(`test/${layer}`)) {
        expect(existsSync(join(ROOT, 'src', layer, folder)), `test/${layer}/${folder} has src/${layer}/${folder}`).toBe(
          true,
        );
      }
    }
  });
});

describe('paths the guides quote', () => {
  for (const file of ['README.md', 'DEVELOPERS.md']) {
    it(`every src/…, test/… and scripts/… path in ${file} exists`, () => {
      const text = read(file);
      const quoted = new Set(
        [...text.matchAll(/`((?:src|test|scripts|build)\/[\w./-]+?)`/g)].map((m) =>
          (m[1] as string).replace(/\/$/, ''),
        ),
      );
      expect(quoted.size).toBeGreaterThan(5);
      const missing = [...quoted].filter((path) => !existsSync(join(ROOT, path)));
      expect(missing).toEqual([]);
    });
  }
});
