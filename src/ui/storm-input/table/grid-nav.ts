/**
 * Where the active cell of the bar table goes on a key press. Pure, so the
 * keyboard model is tested on its own: arrows one cell, Home/End the ends of
 * the row, Ctrl+Home/End the first and last bar, Page Up/Down one screenful.
 */
export interface CellPos {
  readonly row: number;
  readonly col: number;
}

export interface GridShape {
  readonly rows: number;
  readonly cols: number;
  /** Rows in one screenful, for Page Up/Down. */
  readonly page: number;
}

export function moveCell(key: string, ctrl: boolean, at: CellPos, shape: GridShape): CellPos | null {
  const { rows, cols, page } = shape;
  if (rows <= 0 || cols <= 0) return null;
  const row = (r: number): number => Math.max(0, Math.min(rows - 1, r));
  const col = (c: number): number => Math.max(0, Math.min(cols - 1, c));
  switch (key) {
    case 'ArrowUp':
      return { row: row(at.row - 1), col: at.col };
    case 'ArrowDown':
      return { row: row(at.row + 1), col: at.col };
    case 'ArrowLeft':
      return { row: at.row, col: col(at.col - 1) };
    case 'ArrowRight':
      return { row: at.row, col: col(at.col + 1) };
    case 'PageUp':
      return { row: row(at.row - Math.max(1, page)), col: at.col };
    case 'PageDown':
      return { row: row(at.row + Math.max(1, page)), col: at.col };
    case 'Home':
      return ctrl ? { row: 0, col: at.col } : { row: at.row, col: 0 };
    case 'End':
      return ctrl ? { row: rows - 1, col: at.col } : { row: at.row, col: cols - 1 };
    default:
      return null;
  }
}

/** The first row and the row after the last to draw for a scroll position (with a margin of rows either side). */
export function visibleRows(
  scrollTop: number,
  viewportPx: number,
  rowPx: number,
  rows: number,
  overscan: number,
): { readonly first: number; readonly end: number } {
  const first = Math.max(0, Math.floor(scrollTop / rowPx) - overscan);
  const end = Math.min(rows, Math.ceil((scrollTop + viewportPx) / rowPx) + overscan);
  return { first, end: Math.max(first, end) };
}

/** The scroll position that brings `row` fully into view, moving as little as possible. */
export function scrollToShow(row: number, scrollTop: number, viewportPx: number, rowPx: number): number {
  const top = row * rowPx;
  if (top < scrollTop) return top;
  if (top + rowPx > scrollTop + viewportPx) return Math.max(0, top + rowPx - viewportPx);
  return scrollTop;
}
