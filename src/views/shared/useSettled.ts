/**
 * A store read that pauses during a root drag: for views whose work or layout costs too much to redo on
 * every pointer move (the Target page's implementation, the written-out forms), they keep what they showed
 * before the drag and catch up on release.
 */
import { useRef } from 'react';
import type { WorkbenchState } from '../../store/store.ts';
import { useWorkbench, workbenchStore } from '../../store/useWorkbench.ts';

/** Marks "not computed" (a selector may itself return null). */
const NONE = Symbol('none');

/** The selector's value, computed only while no drag is on; during a drag, the last value from before it. */
export function useSettled<T>(selector: (s: WorkbenchState) => T): T {
  const fresh = useWorkbench((s) => (s.dragging ? NONE : selector(s)));
  const last = useRef<T | typeof NONE>(NONE);
  if (fresh !== NONE) last.current = fresh;
  // Before any settled value exists (the view opened mid-drag), compute once.
  return last.current === NONE ? selector(workbenchStore.getState()) : last.current;
}
