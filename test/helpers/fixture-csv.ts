import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

/**
 * Reads a CSV from test/fixtures: `#` lines are the source header (kept and
 * returned, so a test can check the source is named), the first other line is
 * the column names. Fixtures are copies inside the project, so tests pass from
 * a plain clone.
 */
export function readFixtureCsv(name: string): { header: string; columns: string[]; rows: string[][] } {
  const path = fileURLToPath(new URL(`../fixtures/${name}`, import.meta.url));
  const lines = readFileSync(path, 'utf8')
    .split(/\r?\n/)
    .filter((l) => l.trim() !== '');
  const header = lines.filter((l) => l.startsWith('#')).join('\n');
  const [head, ...body] = lines.filter((l) => !l.startsWith('#'));
  if (head === undefined) throw new Error(`Fixture ${name} has no column header.`);
  return { header, columns: head.split(','), rows: body.map((l) => l.split(',')) };
}
