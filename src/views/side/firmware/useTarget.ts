/**
 * Small hooks the Target page's parts share. Building the implementation costs tens of milliseconds (the
 * cascade's norms sum long impulse responses when poles sit near the circle), too much for every frame of a
 * root drag: while a drag is on, the page keeps what it computed before it and catches up on release.
 */
import { useRef } from 'react';
import type { Implementation, ImplementationSettings } from '../../../core/fixed/index.ts';
import type { InputError } from '../../../core/types.ts';
import { selectImplementation, selectImplementationSettings } from '../../../store/implementationDerived.ts';
import type { WorkbenchState } from '../../../store/store.ts';
import { useWorkbench, workbenchStore } from '../../../store/useWorkbench.ts';

/** Marks "not computed" (a selector may itself return null). */
const NONE = Symbol('none');

/** The selector's value, computed only while no drag is on; during a drag, the last value from before it. */
export function useSettled<T>(selector: (s: WorkbenchState) => T): T {
  const fresh = useWorkbench((s) => (s.dragging ? NONE : selector(s)));
  const last = useRef<T | typeof NONE>(NONE);
  if (fresh !== NONE) last.current = fresh;
  // Before any settled value exists (the page opened mid-drag), compute once.
  return last.current === NONE ? selector(workbenchStore.getState()) : last.current;
}

/** The settings in force (the design's or the defaults). */
export function useSettings(): ImplementationSettings {
  return useWorkbench(selectImplementationSettings);
}

/** The implementation, or null when the settings do not apply (the page then shows why). */
export function useImplementation(): Implementation | null {
  const r = useSettled(selectImplementation);
  return r.ok ? r.value : null;
}

/** Applies a settings patch (one undo step); returns why nothing changed, or null. */
export function patchSettings(patch: Partial<ImplementationSettings>): InputError | null {
  return workbenchStore.getState().setImplementation(patch);
}
