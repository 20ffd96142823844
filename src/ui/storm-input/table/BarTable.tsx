import { useEffect, useLayoutEffect, useMemo, useRef, useState, type KeyboardEvent } from 'react';
import { attempt, totalDurationH, type UnitSystem } from '../../../core';
import { useActions, useDerived, useScenario } from '../../../store';
import { formatCount, formatForField, formatValue } from '../../format';
import { displayUnit, toDisplay, unitText } from '../../units';
import { barClock, barTimeText } from '../bar-times';
import { barStarts } from './bar-starts';
import { readCell, type EditableColumn } from './cell-edit';
import { moveCell, scrollToShow, visibleRows, type CellPos } from './grid-nav';

/** Row height, px (the CSS gives rows this height). */
const ROW_PX = 30;
/** Rows in view when the table cannot measure itself (no layout, as in tests). */
const FALLBACK_VIEW_ROWS = 12;
/** Rows drawn beyond each edge of the view, so a quick scroll shows no gap. */
const OVERSCAN = 6;

type ColumnKey = 'bar' | EditableColumn | 'intensity' | 'loss' | 'excess';
/** The columns keyboard focus moves through, left to right; the note column after them only explains. */
const COLUMNS: readonly ColumnKey[] = ['bar', 'start', 'duration', 'depth', 'intensity', 'loss', 'excess'];
const EDITABLE: ReadonlySet<ColumnKey> = new Set<ColumnKey>(['start', 'duration', 'depth']);
const isEditable = (c: ColumnKey): c is EditableColumn => EDITABLE.has(c);
const NOTE_COLUMN = COLUMNS.length + 1;

interface Draft {
  readonly text: string;
  readonly message: string;
}

interface Editing {
  readonly row: number;
  readonly col: number;
  readonly text: string;
  /** Select the text on opening (Enter/F2) or leave the caret after a typed first character. */
  readonly select: boolean;
}

const draftKey = (row: number, col: number): string => `${row}:${col}`;

function headings(units: UnitSystem, clockHeading: string): Record<ColumnKey, string> {
  const depth = unitText(displayUnit('depth', units));
  return {
    bar: 'Bar',
    start: `Start (${clockHeading})`,
    duration: 'Duration (min)',
    depth: `Depth (${depth})`,
    intensity: `Intensity (${unitText(displayUnit('rate', units))})`,
    loss: `Loss (${depth})`,
    excess: `Excess (${depth})`,
  };
}

/** Words for an editable column in the editor's name and in messages. */
const COLUMN_WORDS: Record<EditableColumn, string> = { start: 'start time', duration: 'duration', depth: 'depth' };

interface RowProps {
  readonly row: number;
  readonly cells: readonly string[];
  /** The active column when this row holds the active cell, else -1. */
  readonly activeCol: number;
  readonly editing: Editing | null;
  readonly drafts: ReadonlyMap<number, Draft>;
  readonly onEditText: (text: string) => void;
  readonly onEditKey: (e: KeyboardEvent<HTMLInputElement>) => void;
  readonly onEditBlur: () => void;
  readonly onCellPointer: (row: number, col: number, edit: boolean) => void;
  readonly noteId: string;
}

function BarRow({
  row,
  cells,
  activeCol,
  editing,
  drafts,
  onEditText,
  onEditKey,
  onEditBlur,
  onCellPointer,
  noteId,
}: RowProps) {
  let note: Draft | undefined;
  for (const d of drafts.values()) note ??= d;
  return (
    <div
      className={`bars__row${activeCol >= 0 ? ' bars__row--active' : ''}`}
      role="row"
      aria-rowindex={row + 2}
      style={{ top: row * ROW_PX }}
    >
      {COLUMNS.map((key, col) => {
        const draft = drafts.get(col);
        const editable = isEditable(key);
        const isEditing = editing !== null && editing.col === col;
        const className = `bars__cell bars__cell--${key}${col === activeCol ? ' bars__cell--active' : ''}${draft ? ' bars__cell--bad' : ''}${editable ? '' : ' bars__cell--fixed'}`;
        return (
          <div
            key={key}
            role={key === 'bar' ? 'rowheader' : 'gridcell'}
            aria-colindex={col + 1}
            aria-readonly={editable ? undefined : true}
            aria-invalid={draft ? true : undefined}
            aria-describedby={draft ? noteId : undefined}
            aria-selected={col === activeCol}
            tabIndex={col === activeCol && !isEditing ? 0 : -1}
            data-cell={draftKey(row, col)}
            className={className}
            onMouseDown={() => onCellPointer(row, col, false)}
            onDoubleClick={() => onCellPointer(row, col, true)}
          >
            {isEditing && editable ? (
              <EditorInput
                label={`Bar ${row + 1} ${COLUMN_WORDS[key]}`}
                editing={editing}
                invalid={draft !== undefined}
                describedBy={draft ? noteId : undefined}
                onText={onEditText}
                onKey={onEditKey}
                onBlur={onEditBlur}
              />
            ) : (
              (draft?.text ?? cells[col])
            )}
          </div>
        );
      })}
      <div
        role="gridcell"
        aria-colindex={NOTE_COLUMN}
        aria-readonly
        className="bars__cell bars__note"
        id={noteId}
        title={note?.message}
      >
        {note?.message ?? ''}
      </div>
    </div>
  );
}

function EditorInput({
  label,
  editing,
  invalid,
  describedBy,
  onText,
  onKey,
  onBlur,
}: {
  label: string;
  editing: Editing;
  invalid: boolean;
  describedBy: string | undefined;
  onText: (text: string) => void;
  onKey: (e: KeyboardEvent<HTMLInputElement>) => void;
  onBlur: () => void;
}) {
  const ref = useRef<HTMLInputElement | null>(null);
  useLayoutEffect(() => {
    const input = ref.current;
    if (!input) return;
    input.focus({ preventScroll: true });
    if (editing.select) input.select();
    else input.setSelectionRange(input.value.length, input.value.length);
    // When the editor opens for a cell (or opens again on it asking for its text selected), not as it is typed in.
  }, [editing.row, editing.col, editing.select]);
  return (
    <input
      ref={ref}
      className="bars__editor"
      type="text"
      inputMode="decimal"
      autoComplete="off"
      spellCheck={false}
      aria-label={label}
      aria-invalid={invalid || undefined}
      aria-describedby={describedBy}
      value={editing.text}
      onChange={(e) => onText(e.currentTarget.value)}
      onKeyDown={onKey}
      onBlur={onBlur}
    />
  );
}

const NO_DRAFTS: ReadonlyMap<number, Draft> = new Map();

/**
 * Every bar in a keyboard grid: start time (clock when the storm has a
 * start, else time from the start), duration and depth editable; intensity
 * and the core's loss and excess of each bar beside them. Only the rows in
 * view are drawn, so a record of 100,000 bars scrolls as lightly as 18.
 *
 * Keys: arrows move, Home/End the ends of a row, Ctrl+Home/End the first and
 * last bar, Page Up/Down a screenful; Enter or F2 edits, typing replaces;
 * in the editor Enter applies and goes down, Tab applies and goes right,
 * Esc drops the typing. A value that cannot be applied stays as typed, with
 * the reason beside it naming the bar; the bar keeps its value.
 */
export function BarTable() {
  const actions = useActions();
  const storm = useScenario((s) => s.storm);
  const units = useScenario((s) => s.units);
  const results = useDerived((d, s) => d.results(s));
  const n = storm.depthsMm.length;

  const startH = useMemo(() => barStarts(storm), [storm]);
  const clock = useMemo(() => barClock(storm.startIso, totalDurationH(storm)), [storm]);
  const heads = headings(units, clock.heading);

  const [active, setActive] = useState<CellPos>({ row: 0, col: COLUMNS.indexOf('depth') });
  const [editing, setEditing] = useState<Editing | null>(null);
  const [drafts, setDrafts] = useState<ReadonlyMap<string, Draft>>(new Map());
  const [announce, setAnnounce] = useState('');
  const [scrollTop, setScrollTop] = useState(0);
  const [viewportPx, setViewportPx] = useState(FALLBACK_VIEW_ROWS * ROW_PX);
  const scrollerRef = useRef<HTMLDivElement | null>(null);
  const gridRef = useRef<HTMLDivElement | null>(null);
  const focusPending = useRef(false);
  const editingRef = useRef<Editing | null>(null);
  editingRef.current = editing;

  const row = n === 0 ? 0 : Math.min(active.row, n - 1);
  const at: CellPos = { row, col: active.col };

  // Bars added or removed elsewhere (undo, paste, draw) shift rows, and a unit switch changes what typed
  // depths mean: typed-but-refused values no longer belong.
  useEffect(() => {
    setDrafts(new Map());
    setEditing(null);
    editingRef.current = null;
  }, [n, units]);

  useLayoutEffect(() => {
    const el = scrollerRef.current;
    if (!el) return;
    const measure = (): void => setViewportPx(el.clientHeight > 0 ? el.clientHeight : FALLBACK_VIEW_ROWS * ROW_PX);
    measure();
    if (typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(measure);
    observer.observe(el);
    return () => observer.disconnect();
  }, []);

  useLayoutEffect(() => {
    if (!focusPending.current || editing) return;
    focusPending.current = false;
    gridRef.current
      ?.querySelector<HTMLElement>(`[data-cell="${draftKey(at.row, at.col)}"]`)
      ?.focus({ preventScroll: true });
  });

  const page = Math.max(1, Math.floor(viewportPx / ROW_PX) - 1);

  const go = (next: CellPos): void => {
    setActive(next);
    focusPending.current = true;
    const top = scrollToShow(next.row, scrollTop, viewportPx, ROW_PX);
    if (top !== scrollTop) {
      setScrollTop(top);
      if (scrollerRef.current) scrollerRef.current.scrollTop = top;
    }
  };

  const cellText = (k: number, key: ColumnKey): string => {
    const d = storm.durationsH[k] as number;
    const p = storm.depthsMm[k] as number;
    switch (key) {
      case 'bar':
        return String(k + 1);
      case 'start':
        return barTimeText(clock, startH(k));
      case 'duration':
        return formatForField(d * 60);
      case 'depth':
        return formatForField(toDisplay('depth', p, units));
      case 'intensity':
        return formatValue(toDisplay('rate', p / d, units));
      case 'loss':
        return results.ok ? formatValue(toDisplay('depth', results.result.lossMm[k] as number, units)) : '—';
      case 'excess':
        return results.ok ? formatValue(toDisplay('depth', results.result.excessMm[k] as number, units)) : '—';
    }
  };

  const setDraft = (k: number, col: number, draft: Draft | null): void => {
    setDrafts((old) => {
      const key = draftKey(k, col);
      if (draft === null && !old.has(key)) return old;
      const next = new Map(old);
      if (draft === null) next.delete(key);
      else next.set(key, draft);
      return next;
    });
  };

  /** Applies typed text to bar k's cell; true when applied (or nothing to change). */
  const commit = (k: number, col: number, text: string): boolean => {
    const key = COLUMNS[col];
    if (key === undefined || !isEditable(key)) return true;
    const edit = readCell(storm, k, key, text, units, clock);
    let message: string | null = edit.ok ? null : edit.message;
    if (edit.ok) {
      const r = attempt(() => {
        if (edit.kind === 'depth') actions.setBarDepth(k, edit.depthMm);
        else if (edit.kind === 'duration') actions.setBarDuration(k, edit.durationH);
        else if (edit.kind === 'storm') actions.setStorm(edit.storm, edit.label);
        else if (edit.kind === 'start') actions.setStartIso(edit.startIso);
      });
      if (!r.ok) message = r.error.message;
    }
    if (message !== null) {
      setDraft(k, col, { text, message });
      setAnnounce(message);
      return false;
    }
    setDraft(k, col, null);
    setAnnounce('');
    return true;
  };

  const startEdit = (text: string, select: boolean): void => {
    const key = COLUMNS[at.col];
    if (n === 0 || key === undefined || !isEditable(key)) return;
    setEditing({ row: at.row, col: at.col, text, select });
  };

  const nextEditable = (col: number, dir: 1 | -1): number => {
    for (let c = col + dir; c >= 0 && c < COLUMNS.length; c += dir) if (isEditable(COLUMNS[c] as ColumnKey)) return c;
    return col;
  };

  const onGridKey = (e: KeyboardEvent<HTMLDivElement>): void => {
    if (editingRef.current || n === 0) return;
    const ctrl = e.ctrlKey || e.metaKey;
    const move = moveCell(e.key, ctrl, at, { rows: n, cols: COLUMNS.length, page });
    if (move) {
      e.preventDefault();
      go(move);
      return;
    }
    const draft = drafts.get(draftKey(at.row, at.col));
    if (e.key === 'Enter' || e.key === 'F2') {
      e.preventDefault();
      startEdit(draft?.text ?? cellText(at.row, COLUMNS[at.col] as ColumnKey), true);
    } else if (e.key === 'Escape' && draft) {
      e.preventDefault();
      setDraft(at.row, at.col, null);
      setAnnounce('');
    } else if (e.key.length === 1 && !ctrl && !e.altKey && e.key !== ' ') {
      e.preventDefault();
      startEdit(e.key, false);
    }
  };

  const closeEditor = (): void => {
    editingRef.current = null;
    setEditing(null);
    focusPending.current = true;
  };

  const onEditKey = (e: KeyboardEvent<HTMLInputElement>): void => {
    const ed = editingRef.current;
    if (!ed) return;
    if (e.key === 'Escape') {
      e.preventDefault();
      e.stopPropagation();
      setDraft(ed.row, ed.col, null);
      setAnnounce('');
      closeEditor();
      return;
    }
    const down = e.key === 'Enter' || e.key === 'ArrowDown';
    const up = e.key === 'ArrowUp';
    const tab = e.key === 'Tab';
    if (!down && !up && !tab) return;
    e.preventDefault();
    e.stopPropagation();
    if (!commit(ed.row, ed.col, ed.text)) return;
    closeEditor();
    if (tab) go({ row: ed.row, col: nextEditable(ed.col, e.shiftKey ? -1 : 1) });
    else if (down) go({ row: Math.min(n - 1, ed.row + 1), col: ed.col });
    else go({ row: Math.max(0, ed.row - 1), col: ed.col });
  };

  const onEditBlur = (): void => {
    const ed = editingRef.current;
    if (!ed) return;
    // Leaving the editor applies a good value; a bad one stays in the cell as typed, with its reason.
    commit(ed.row, ed.col, ed.text);
    editingRef.current = null;
    setEditing(null);
  };

  const onCellPointer = (k: number, col: number, edit: boolean): void => {
    if (editingRef.current && (editingRef.current.row !== k || editingRef.current.col !== col)) onEditBlur();
    setActive({ row: k, col });
    const key = COLUMNS[col];
    if (edit && key !== undefined && isEditable(key)) {
      const draft = drafts.get(draftKey(k, col));
      setEditing({ row: k, col, text: draft?.text ?? cellText(k, key), select: true });
    }
  };

  const { first, end } = visibleRows(scrollTop, viewportPx, ROW_PX, n, OVERSCAN);
  const shownRows: number[] = [];
  if (n > 0 && (at.row < first || at.row >= end)) shownRows.push(at.row); // the active row stays reachable by Tab
  for (let k = first; k < end; k++) shownRows.push(k);

  const draftsByRow = new Map<number, Map<number, Draft>>();
  for (const [key, d] of drafts) {
    const [r, c] = key.split(':').map(Number) as [number, number];
    if (!draftsByRow.has(r)) draftsByRow.set(r, new Map());
    draftsByRow.get(r)?.set(c, d);
  }

  // The active row's problem, written out in full under the grid: the Note column is one line wide.
  let activeNote: Draft | undefined;
  for (const d of draftsByRow.get(at.row)?.values() ?? []) activeNote ??= d;

  const selected =
    n === 0
      ? 'No bars yet: add one, paste rainfall or draw.'
      : `Bar ${formatCount(at.row + 1)} of ${formatCount(n)} selected.`;
  const bodyHeight = Math.max(1, Math.min(n, FALLBACK_VIEW_ROWS)) * ROW_PX;

  return (
    <section className="panel bars" aria-labelledby="bars-title">
      <div className="bars__head">
        <h2 id="bars-title">Bar table</h2>
        <p className="bars__selected" aria-live="polite">
          {selected}
        </p>
        <div className="bars__actions" role="group" aria-label="Bars">
          <button
            type="button"
            onClick={() => actions.insertBar(at.row)}
            disabled={n === 0}
            title="A dry bar before the selected one"
          >
            Insert bar
          </button>
          <button type="button" onClick={() => actions.insertBar(n)} title="A dry bar after the last one">
            Add bar at end
          </button>
          <button
            type="button"
            onClick={() => {
              actions.deleteBar(at.row);
              focusPending.current = false;
            }}
            disabled={n === 0}
            title="Delete the selected bar"
          >
            Delete bar
          </button>
        </div>
      </div>
      <p className="bars__help" id="bars-help">
        Arrow keys move; Enter or typing edits; Enter applies. Duration in minutes; depth in{' '}
        {unitText(displayUnit('depth', units))}.
      </p>
      <div
        ref={gridRef}
        className="bars__grid"
        role="grid"
        aria-labelledby="bars-title"
        aria-describedby="bars-help"
        aria-rowcount={n + 1}
        aria-colcount={NOTE_COLUMN}
        onKeyDown={onGridKey}
      >
        <div role="rowgroup" className="bars__header">
          <div role="row" aria-rowindex={1} className="bars__row bars__row--head">
            {COLUMNS.map((key, col) => (
              <div key={key} role="columnheader" aria-colindex={col + 1} className={`bars__cell bars__cell--${key}`}>
                {heads[key]}
              </div>
            ))}
            <div role="columnheader" aria-colindex={NOTE_COLUMN} className="bars__cell bars__note">
              Note
            </div>
          </div>
        </div>
        <div
          role="rowgroup"
          ref={scrollerRef}
          className="bars__body"
          style={{ height: bodyHeight }}
          onScroll={(e) => setScrollTop(e.currentTarget.scrollTop)}
        >
          <div className="bars__spacer" style={{ height: n * ROW_PX }}>
            {shownRows.map((k) => (
              <BarRow
                key={k}
                row={k}
                cells={COLUMNS.map((key) => cellText(k, key))}
                activeCol={k === at.row ? at.col : -1}
                editing={editing !== null && editing.row === k ? editing : null}
                drafts={draftsByRow.get(k) ?? NO_DRAFTS}
                onEditText={(text) => setEditing((ed) => (ed ? { ...ed, text } : ed))}
                onEditKey={onEditKey}
                onEditBlur={onEditBlur}
                onCellPointer={onCellPointer}
                noteId={`bar-note-${k}`}
              />
            ))}
          </div>
        </div>
      </div>
      {activeNote ? (
        <p className="bars__problem" data-row={at.row + 1}>
          {activeNote.message}
        </p>
      ) : null}
      <p className="visually-hidden" role="status">
        {announce}
      </p>
    </section>
  );
}
