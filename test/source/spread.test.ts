// No spread of an unbounded list into a call: `list.push(...cells)`,
// `Math.max(...values)` and `fn(...args)` put every element on the call stack
// and throw "Maximum call stack size exceeded" past about 10⁵ elements (a
// one-line paste of 200,000 cells did exactly that). This reads every source
// file with the TypeScript parser and fails on any spread argument of a call
// or `new`, or any `.apply(…)`, unless the line above says why it is bounded
// with a comment starting `spread-ok:`. Spreads into array literals
// (`[...a, b]`) copy by iteration and are not limited this way.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';

const ROOT = join(import.meta.dirname, '../..');
const SRC = join(ROOT, 'src');

function sourceFiles(dir: string): string[] {
  const found: string[] = [];
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory())
      found.push(...sourceFiles(path)); // spread-ok: one folder's files
    else if (/\.tsx?$/.test(name)) found.push(path);
  }
  return found;
}

/** Every spread into a call's arguments and every `.apply(`, as "file:line  code", unless marked `spread-ok:`. */
export function unboundedSpreads(fileName: string, text: string): string[] {
  const source = ts.createSourceFile(
    fileName,
    text,
    ts.ScriptTarget.Latest,
    true,
    fileName.endsWith('.tsx') ? ts.ScriptKind.TSX : ts.ScriptKind.TS,
  );
  const lines = text.split('\n');
  const found: string[] = [];
  const report = (node: ts.Node): void => {
    const line = source.getLineAndCharacterOfPosition(node.getStart(source)).line;
    const marked = [lines[line] ?? '', lines[line - 1] ?? ''].some((l) => /\/\/\s*spread-ok:/.test(l));
    if (!marked) found.push(`${fileName}:${line + 1}  ${node.getText(source).replace(/\s+/g, ' ').slice(0, 100)}`);
  };
  const visit = (node: ts.Node): void => {
    if ((ts.isCallExpression(node) || ts.isNewExpression(node)) && node.arguments?.some(ts.isSpreadElement)) {
      report(node);
    }
    if (
      ts.isCallExpression(node) &&
      ts.isPropertyAccessExpression(node.expression) &&
      node.expression.name.text === 'apply' &&
      node.arguments.length === 2
    ) {
      report(node);
    }
    ts.forEachChild(node, visit);
  };
  visit(source);
  return found;
}

describe('spreads into calls', () => {
  it('finds the ones it is meant to find, and lets a marked one pass', () => {
    const code = [
      'a.push(...cells);',
      'Math.max(0, ...xs);',
      'new Set(...x);',
      'f.apply(null, list);',
      '// spread-ok: two fixed arguments',
      'g(...pair);',
      'const copy = [...cells, 1];',
      'const o = { ...p };',
    ].join('\n');
    expect(unboundedSpreads('x.ts', code)).toEqual([
      'x.ts:1  a.push(...cells)',
      'x.ts:2  Math.max(0, ...xs)',
      'x.ts:3  new Set(...x)',
      'x.ts:4  f.apply(null, list)',
    ]);
  });

  it('are nowhere in src unless marked as bounded', () => {
    const files = sourceFiles(SRC);
    expect(files.length).toBeGreaterThan(100);
    const found = files.flatMap((file) => unboundedSpreads(relative(ROOT, file), readFileSync(file, 'utf8')));
    expect(found).toEqual([]);
  });
});
