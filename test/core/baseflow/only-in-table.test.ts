// DEVELOPERS.md: adding a baseflow method touches its own file and its table
// entries only. That holds while nothing outside src/core/baseflow names a
// baseflow kind: no `x.baseflow.kind === 'straight-line'`, no `case
// 'eckhardt':`, no object keyed by kind. This test reads every source file
// with TypeScript's parser and fails on such a place; the kinds come from the
// table itself, so a method added to it is covered with no change here.
import { readFileSync, readdirSync } from 'node:fs';
import { join, relative } from 'node:path';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';
import { BASEFLOW_KINDS, METHOD_KINDS, TRANSFORM_KINDS } from '../../../src/core';

const ROOT = join(import.meta.dirname, '../../..');
const SRC = join(ROOT, 'src');
const TABLE_HOME = join(SRC, 'core/baseflow');

/** Kinds of another table too (the loss method 'constant'): named freely, unless compared with a baseflow kind. */
const SHARED = new Set<string>([...METHOD_KINDS, ...TRANSFORM_KINDS]);

/**
 * Places in `text` (a source file) that name a baseflow kind, as
 * "line: code". A kind no other table has is flagged wherever it stands (a
 * string or a property name); a kind another table shares only where it is
 * compared with, or is a case of a switch on, an expression that mentions
 * baseflow.
 */
export function kindNamings(fileName: string, text: string, kinds: readonly string[]): string[] {
  const file = ts.createSourceFile(fileName, text, ts.ScriptTarget.Latest, true);
  const found: string[] = [];
  const report = (node: ts.Node): void => {
    const { line } = file.getLineAndCharacterOfPosition(node.getStart(file));
    found.push(`${line + 1}: ${node.parent.getText(file).split('\n')[0]}`);
  };
  const mentionsBaseflow = (node: ts.Node | undefined): boolean =>
    node !== undefined && /baseflow/i.test(node.getText(file));
  const comparedWithBaseflow = (literal: ts.Node): boolean => {
    const parent = literal.parent;
    if (ts.isBinaryExpression(parent)) {
      const op = parent.operatorToken.kind;
      const equality =
        op === ts.SyntaxKind.EqualsEqualsEqualsToken ||
        op === ts.SyntaxKind.ExclamationEqualsEqualsToken ||
        op === ts.SyntaxKind.EqualsEqualsToken ||
        op === ts.SyntaxKind.ExclamationEqualsToken;
      return equality && mentionsBaseflow(parent.left === literal ? parent.right : parent.left);
    }
    if (ts.isCaseClause(parent)) return mentionsBaseflow(parent.parent.parent.expression);
    return false;
  };
  const visit = (node: ts.Node): void => {
    const name =
      ts.isStringLiteralLike(node) || (ts.isIdentifier(node) && node.parent && ts.isPropertyAssignment(node.parent))
        ? node.text
        : null;
    if (name !== null && kinds.includes(name)) {
      if (!SHARED.has(name) || comparedWithBaseflow(node)) report(node);
    }
    ts.forEachChild(node, visit);
  };
  visit(file);
  return found;
}

function sourceFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return path === TABLE_HOME ? [] : sourceFiles(path);
    return /\.tsx?$/.test(entry.name) ? [path] : [];
  });
}

describe('a baseflow kind is named only in its table (src/core/baseflow)', () => {
  it('finds the kinds of a switch written outside the table (so the check below can fail)', () => {
    const switched = [
      "const a = flow.baseflow.kind === 'straight-line' ? 1 : 0;",
      "if ('eckhardt' !== s.streamflow.baseflow.kind) go();",
      'switch (flow.baseflow.kind) {',
      "  case 'constant':",
      '    break;',
      '}',
      "const labels = { 'lyne-hollick': 'LH', eckhardt: 'E' };",
      "const loss = method.kind === 'constant';",
      "const first: Scenario = { method: { kind: 'constant', rateMmH: 8 } };",
    ].join('\n');
    expect(kindNamings('switched.ts', switched, BASEFLOW_KINDS)).toEqual([
      "1: flow.baseflow.kind === 'straight-line'",
      "2: 'eckhardt' !== s.streamflow.baseflow.kind",
      "4: case 'constant':",
      "7: 'lyne-hollick': 'LH'",
      "7: eckhardt: 'E'",
    ]);
  });

  it('finds none in src/ outside src/core/baseflow', () => {
    const files = sourceFiles(SRC);
    expect(files.length).toBeGreaterThan(100);
    const found = files.flatMap((path) =>
      kindNamings(path, readFileSync(path, 'utf8'), BASEFLOW_KINDS).map((at) => `${relative(ROOT, path)}:${at}`),
    );
    expect(found).toEqual([]);
  });
});
