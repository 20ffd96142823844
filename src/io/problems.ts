/**
 * A problem found while reading pasted text. Importers never throw on bad
 * text: they return a list of these, each saying what is wrong and where, so
 * the paste dialog can point at the line and column.
 */
export interface ImportProblem {
  /** Line number in the pasted text, 1-based; 0 when no single line is at fault (a setting, an empty paste). */
  readonly row: number;
  /** Column number, 1-based; 0 when the whole line (or no column) is at fault. */
  readonly column: number;
  /**
   * What the cell or setting was meant to hold: a quantity ('time', 'date',
   * 'depth', 'intensity', 'cumulative depth', 'discharge'), 'line' for the
   * shape of a line, 'text' for the paste as a whole, or the settings key.
   */
  readonly field: string;
  /** The offending text as pasted (trimmed), or the setting's value; '' when missing. */
  readonly value: string;
  /** A plain sentence: what is wrong, and where it helps, what to do. */
  readonly reason: string;
}

/** At most this many problems are listed; one more line then says how many were left out. */
export const MAX_LISTED_PROBLEMS = 200;

export function problem(row: number, column: number, field: string, value: string, reason: string): ImportProblem {
  return { row, column, field, value, reason };
}

/**
 * Collects problems and lists them in text order (by line, then column), at
 * most MAX_LISTED_PROBLEMS of them, so a whole column read with the wrong
 * decimal mark does not list 100,000 lines.
 */
export interface ProblemList {
  add(p: ImportProblem): void;
  readonly count: number;
  list(): ImportProblem[];
}

export function problemList(): ProblemList {
  const items: ImportProblem[] = [];
  return {
    add(p) {
      items.push(p);
    },
    get count() {
      return items.length;
    },
    list() {
      // Array.prototype.sort is stable, so problems on one cell keep the order they were found in.
      const sorted = items.slice().sort((a, b) => a.row - b.row || a.column - b.column);
      if (sorted.length <= MAX_LISTED_PROBLEMS) return sorted;
      const more = sorted.length - MAX_LISTED_PROBLEMS;
      return [
        ...sorted.slice(0, MAX_LISTED_PROBLEMS),
        problem(
          0,
          0,
          'text',
          '',
          `${more} more problem${more === 1 ? '' : 's'} not listed; fix the ones above or check the settings.`,
        ),
      ];
    },
  };
}

/** One line for people: `Line 4, column 2 (depth) "abc": not a number.` */
export function describeProblem(p: ImportProblem): string {
  const where: string[] = [];
  if (p.row > 0) where.push(`Line ${p.row}`);
  if (p.column > 0) where.push(p.row > 0 ? `column ${p.column}` : `Column ${p.column}`);
  const place = where.length > 0 ? `${where.join(', ')} (${p.field})` : p.field === 'text' ? '' : `Setting ${p.field}`;
  const value = p.value === '' ? '' : ` "${p.value}"`;
  const head = `${place}${value}`;
  return head === '' ? p.reason : `${head}: ${p.reason}`;
}
