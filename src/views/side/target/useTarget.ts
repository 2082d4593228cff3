/**
 * Small hooks the Target page's parts share. Building the implementation costs tens of milliseconds (the
 * cascade's norms sum long impulse responses when poles sit near the circle), too much for every frame of a
 * root drag: while a drag is on, the page keeps what it computed before it and catches up on release.
 */
import type { Implementation, ImplementationSettings } from '../../../core/fixed/index.ts';
import type { InputError } from '../../../core/types.ts';
import { selectImplementation, selectImplementationSettings } from '../../../store/implementationDerived.ts';
import { useWorkbench, workbenchStore } from '../../../store/useWorkbench.ts';
import { useSettled } from '../../shared/useSettled.ts';

export { useSettled };

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
