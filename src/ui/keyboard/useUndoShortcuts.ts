import { useEffect } from 'react';
import type { WorkbenchActions } from '../../store';

/** True for a key event the text field itself should handle (its own undo of typing). */
function inTextField(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  if (target.isContentEditable || target instanceof HTMLTextAreaElement) return true;
  return (
    target instanceof HTMLInputElement && ['text', 'search', 'number', 'email', 'url', 'tel', ''].includes(target.type)
  );
}

/**
 * Undo / redo from the keyboard anywhere on the page: Ctrl+Z (⌘Z), and
 * Ctrl+Shift+Z or Ctrl+Y (⌘⇧Z) to redo. Inside a text field the browser
 * keeps its own undo of the typing (whose changes reach the store anyway).
 */
export function useUndoShortcuts(actions: WorkbenchActions, target: Window = window): void {
  useEffect(() => {
    const onKeyDown = (e: KeyboardEvent): void => {
      if (!(e.ctrlKey || e.metaKey) || e.altKey || inTextField(e.target)) return;
      const key = e.key.toLowerCase();
      if (key === 'z' && !e.shiftKey) {
        e.preventDefault();
        actions.undo();
      } else if ((key === 'z' && e.shiftKey) || (key === 'y' && !e.shiftKey)) {
        e.preventDefault();
        actions.redo();
      }
    };
    target.addEventListener('keydown', onKeyDown);
    return () => target.removeEventListener('keydown', onKeyDown);
  }, [actions, target]);
}
