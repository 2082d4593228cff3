/** React adapter: the page's single store and a hook that reads a slice of it. */
import { useStore } from 'zustand';
import { createWorkbenchStore, type WorkbenchState, type WorkbenchStore } from './store.ts';

/** The page's store. Tests create their own with createWorkbenchStore(). */
export const workbenchStore: WorkbenchStore = createWorkbenchStore();

/** Reads a slice of the page's store; re-renders only when the selected value changes. */
export function useWorkbench<T>(selector: (s: WorkbenchState) => T): T {
  return useStore(workbenchStore, selector);
}
