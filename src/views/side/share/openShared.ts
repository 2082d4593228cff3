/**
 * Opens a design that came from a file, the library or a drop: one undo step (none when it is the design
 * already open), with the view settings it carries. The previous design stays reachable by undo.
 */
import type { SharedDesign } from '../../../share/document.ts';
import { sameDesign } from '../../../core/model/design.ts';
import { pickSharedView } from '../../../core/model/view.ts';
import { workbenchStore } from '../../../store/useWorkbench.ts';
import { defaultView } from '../../../store/view.ts';

/** Replaces the design (one undo step) and applies the shared view settings; returns whether it changed. */
export function openShared(shared: SharedDesign): boolean {
  const state = workbenchStore.getState();
  const changed = !sameDesign(shared.design, state.design);
  if (changed) state.replaceDesign(shared.design);
  state.setView({ ...pickSharedView(defaultView), ...shared.view });
  return changed;
}

/** The design and every view setting worth sharing, as a file or library entry carries them. */
export function currentShared(): SharedDesign {
  const { design, view } = workbenchStore.getState();
  return { design, view: pickSharedView(view) };
}
