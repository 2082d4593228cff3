/** Page-wide keyboard shortcuts: undo (Ctrl/Cmd+Z) and redo (Shift+Ctrl/Cmd+Z, Ctrl+Y). */
import { useEffect } from 'react';
import { workbenchStore } from '../store/useWorkbench.ts';

/** Input types where Ctrl+Z belongs to the text field, not to the design. */
const TEXT_INPUT_TYPES = new Set(['text', 'search', 'number', 'email', 'url', 'tel', 'password', '']);

/** True when the event target is a place where the user types text (its own undo applies there). */
export function isTextEntry(target: EventTarget | null): boolean {
  if (!(target instanceof HTMLElement)) return false;
  if (target.isContentEditable || target instanceof HTMLTextAreaElement) return true;
  return target instanceof HTMLInputElement && TEXT_INPUT_TYPES.has(target.type);
}

/** The history action a key press asks for, if any. */
export function historyKey(e: Pick<KeyboardEvent, 'key' | 'ctrlKey' | 'metaKey' | 'shiftKey' | 'altKey'>) {
  if (!(e.ctrlKey || e.metaKey) || e.altKey) return null;
  const key = e.key.toLowerCase();
  if (key === 'z') return e.shiftKey ? 'redo' : 'undo';
  if (key === 'y' && !e.shiftKey) return 'redo';
  return null;
}

/** Installs the undo/redo shortcuts on the window while the component is mounted. */
export function useKeyboardShortcuts(): void {
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const action = historyKey(e);
      if (!action || e.defaultPrevented || isTextEntry(e.target)) return;
      e.preventDefault();
      workbenchStore.getState()[action]();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);
}
