/** Installs the page-wide shortcuts of the shortcut table (views/shortcuts.ts): undo and redo. */
import { useEffect } from 'react';
import { workbenchStore } from '../store/useWorkbench.ts';
import { isTextEntry, shortcutAction } from './shortcuts.ts';

/** Runs the page's shortcuts on the window while the component is mounted. */
export function useKeyboardShortcuts(): void {
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const action = shortcutAction('page', e);
      if (!action || e.defaultPrevented || isTextEntry(e.target)) return;
      e.preventDefault();
      workbenchStore.getState()[action]();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);
}
