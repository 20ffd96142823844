/**
 * Undo/redo history over immutable documents. Pure functions: the store owns
 * one History and replaces it on every edit.
 *
 * Each entry in `past` is the document as it was before an edit, with the
 * label of that edit (so "Undo" can say what it undoes); `future` mirrors it.
 */
export interface HistoryEntry<T> {
  readonly doc: T;
  readonly label: string;
}

export interface History<T> {
  readonly past: readonly HistoryEntry<T>[];
  readonly present: T;
  readonly future: readonly HistoryEntry<T>[];
  /**
   * The coalescing key and time of the last recorded edit. Successive edits
   * with the same key close together in time (typing digits into one field,
   * tapping an arrow key on the slider) merge into one undo step.
   */
  readonly lastKey: string | null;
  readonly lastAtMs: number;
}

/** Edits kept before the oldest are dropped. */
export const HISTORY_LIMIT = 200;
/** Edits with the same coalescing key closer together than this merge. */
export const COALESCE_WINDOW_MS = 1500;

export function createHistory<T>(present: T): History<T> {
  return { past: [], present, future: [], lastKey: null, lastAtMs: 0 };
}

export interface RecordOptions {
  /** Merge with the previous edit if it had the same key and was recent. */
  readonly coalesceKey?: string;
  /**
   * The key names one typing session (a field from focus to blur): its edits
   * merge however long apart, so the session is one undo step.
   */
  readonly session?: boolean;
  readonly nowMs: number;
}

/**
 * Makes `next` the present as one undoable edit (or merges it into the last
 * edit, see `lastKey`). An edit that changes nothing records nothing.
 */
export function record<T>(history: History<T>, next: T, label: string, options: RecordOptions): History<T> {
  if (next === history.present) return history;
  const key = options.coalesceKey ?? null;
  const merge =
    key !== null &&
    key === history.lastKey &&
    history.past.length > 0 &&
    history.future.length === 0 &&
    (options.session === true || options.nowMs - history.lastAtMs <= COALESCE_WINDOW_MS);
  if (merge) {
    return { ...history, present: next, lastAtMs: options.nowMs };
  }
  const past = [...history.past, { doc: history.present, label }];
  if (past.length > HISTORY_LIMIT) past.splice(0, past.length - HISTORY_LIMIT);
  return { past, present: next, future: [], lastKey: key, lastAtMs: options.nowMs };
}

/**
 * Takes back the last step when it was recorded under `key` and nothing was
 * undone since: the present goes back to the document before that step, as
 * if it had never been made (a typing session whose text turned out not to
 * apply). Any other history is returned unchanged.
 */
export function withdraw<T>(history: History<T>, key: string): History<T> {
  const last = history.past[history.past.length - 1];
  if (!last || history.lastKey !== key || history.future.length > 0) return history;
  return { past: history.past.slice(0, -1), present: last.doc, future: [], lastKey: null, lastAtMs: 0 };
}

/** Replaces the present without recording (a frame of a drag in progress). */
export function replacePresent<T>(history: History<T>, next: T): History<T> {
  return next === history.present ? history : { ...history, present: next };
}

export function undo<T>(history: History<T>): History<T> {
  const last = history.past[history.past.length - 1];
  if (!last) return history;
  return {
    past: history.past.slice(0, -1),
    present: last.doc,
    future: [...history.future, { doc: history.present, label: last.label }],
    lastKey: null,
    lastAtMs: 0,
  };
}

export function redo<T>(history: History<T>): History<T> {
  const next = history.future[history.future.length - 1];
  if (!next) return history;
  return {
    past: [...history.past, { doc: history.present, label: next.label }],
    present: next.doc,
    future: history.future.slice(0, -1),
    lastKey: null,
    lastAtMs: 0,
  };
}

/** Label of the edit undo would revert, or null. */
export function undoLabel<T>(history: History<T>): string | null {
  return history.past[history.past.length - 1]?.label ?? null;
}

/** Label of the edit redo would re-apply, or null. */
export function redoLabel<T>(history: History<T>): string | null {
  return history.future[history.future.length - 1]?.label ?? null;
}
