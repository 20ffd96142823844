// DEVELOPERS.md: adding a loss method, a transform or a baseflow method
// touches its own file and its table entries only. That holds while nothing
// outside the table's folder names one of its kinds: no `method.kind ===
// 'green-ampt'`, no `case 'nash':`, no object keyed by kind. The guard tests
// (test/core/<table>/only-in-table.test.ts) read every source file with
// TypeScript's parser through these helpers and fail on such a place; the
// kinds come from the tables themselves, so a kind added to one is covered
// with no change to its guard.
import { readFileSync, readdirSync } from 'node:fs';
import { join, relative } from 'node:path';
import ts from 'typescript';

export const ROOT = join(import.meta.dirname, '../..');
export const SRC = join(ROOT, 'src');

/** What a guard looks for: the kinds of one table. */
export interface KindGuard {
  /** The table's kinds. */
  readonly kinds: readonly string[];
  /**
   * Kinds another table has too (the loss method and the baseflow method
   * 'constant'): named freely, unless compared with, or the case of a switch
   * on, an expression `isOurs` says is this table's.
   */
  readonly shared: ReadonlySet<string>;
  readonly isOurs: (expression: string) => boolean;
}

/**
 * Places in `text` (a source file) that name a kind of the guard's table, as
 * "line: code". A kind no other table has is flagged wherever it stands (a
 * string, a literal type or a property name); a shared kind only where it is
 * compared with, or is a case of a switch on, an expression of this table.
 */
export function kindNamings(fileName: string, text: string, guard: KindGuard): string[] {
  const file = ts.createSourceFile(fileName, text, ts.ScriptTarget.Latest, true);
  const found: string[] = [];
  const report = (node: ts.Node): void => {
    const { line } = file.getLineAndCharacterOfPosition(node.getStart(file));
    found.push(`${line + 1}: ${node.parent.getText(file).split('\n')[0]}`);
  };
  const ours = (node: ts.Node | undefined): boolean => node !== undefined && guard.isOurs(node.getText(file));
  const comparedWithOurs = (literal: ts.Node): boolean => {
    const parent = literal.parent;
    if (ts.isBinaryExpression(parent)) {
      const op = parent.operatorToken.kind;
      const equality =
        op === ts.SyntaxKind.EqualsEqualsEqualsToken ||
        op === ts.SyntaxKind.ExclamationEqualsEqualsToken ||
        op === ts.SyntaxKind.EqualsEqualsToken ||
        op === ts.SyntaxKind.ExclamationEqualsToken;
      return equality && ours(parent.left === literal ? parent.right : parent.left);
    }
    if (ts.isCaseClause(parent)) return ours(parent.parent.parent.expression);
    return false;
  };
  const visit = (node: ts.Node): void => {
    const name =
      ts.isStringLiteralLike(node) || (ts.isIdentifier(node) && node.parent && ts.isPropertyAssignment(node.parent))
        ? node.text
        : null;
    if (name !== null && guard.kinds.includes(name)) {
      if (!guard.shared.has(name) || comparedWithOurs(node)) report(node);
    }
    ts.forEachChild(node, visit);
  };
  visit(file);
  return found;
}

/** Every .ts and .tsx file under `dir`, leaving out the folder `room`. */
export function sourceFiles(dir: string, room: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return path === room ? [] : sourceFiles(path, room);
    return /\.tsx?$/.test(entry.name) ? [path] : [];
  });
}

/**
 * Every place in `files` that names a kind of the guard's table, as
 * "path:line: code", paths from the repository root. `guard` may be given
 * per file (in another table's folder a shared kind is that table's).
 */
export function namingsIn(files: readonly string[], guard: KindGuard | ((path: string) => KindGuard)): string[] {
  return files.flatMap((path) => {
    const at = relative(ROOT, path);
    const own = typeof guard === 'function' ? guard(at) : guard;
    return kindNamings(path, readFileSync(path, 'utf8'), own).map((line) => `${at}:${line}`);
  });
}
