import { describe, expect, it } from 'vitest';
import {
  COALESCE_WINDOW_MS,
  HISTORY_LIMIT,
  createHistory,
  record,
  redo,
  redoLabel,
  undo,
  undoLabel,
} from '../../src/store/history';

describe('history', () => {
  it('an edit can be undone and redone, and says what it was', () => {
    let h = createHistory('a');
    h = record(h, 'b', 'Set b', { nowMs: 0 });
    expect(h.present).toBe('b');
    expect(undoLabel(h)).toBe('Set b');
    h = undo(h);
    expect(h.present).toBe('a');
    expect(redoLabel(h)).toBe('Set b');
    h = redo(h);
    expect(h.present).toBe('b');
    expect(redoLabel(h)).toBeNull();
  });

  it('an edit that changes nothing records nothing', () => {
    const h = createHistory('a');
    expect(record(h, 'a', 'same', { nowMs: 0 })).toBe(h);
  });

  it('a new edit after undo drops the redo branch', () => {
    let h = record(createHistory('a'), 'b', 'b', { nowMs: 0 });
    h = record(undo(h), 'c', 'c', { nowMs: 1 });
    expect(h.future).toHaveLength(0);
    expect(undo(h).present).toBe('a');
  });

  it('quick edits with the same key merge into one undo step, slow ones do not', () => {
    let h = createHistory('');
    h = record(h, '1', 'type', { nowMs: 0, coalesceKey: 'f' });
    h = record(h, '12', 'type', { nowMs: 300, coalesceKey: 'f' });
    h = record(h, '12.', 'type', { nowMs: 600, coalesceKey: 'f' });
    expect(h.past).toHaveLength(1);
    expect(undo(h).present).toBe('');
    h = record(h, '12.5', 'type', { nowMs: 600 + COALESCE_WINDOW_MS + 1, coalesceKey: 'f' });
    expect(h.past).toHaveLength(2);
    expect(undo(h).present).toBe('12.');
  });

  it('edits with different keys never merge', () => {
    let h = createHistory(0);
    h = record(h, 1, 'x', { nowMs: 0, coalesceKey: 'x' });
    h = record(h, 2, 'y', { nowMs: 1, coalesceKey: 'y' });
    expect(h.past).toHaveLength(2);
  });

  it('keeps at most the history limit of steps', () => {
    let h = createHistory(0);
    for (let i = 1; i <= HISTORY_LIMIT + 25; i++) h = record(h, i, `set ${i}`, { nowMs: i });
    expect(h.past).toHaveLength(HISTORY_LIMIT);
    expect(h.past[0]?.doc).toBe(25);
  });
});
