/**
 * A read-only probe for end-to-end tests: `window.__polewright` returns copies of the design and the
 * selection, so a test can compare exact numbers without reading them off the screen. It exposes no
 * action, so nothing on the page can be changed through it; it is installed in every build.
 */
import type { Design, RootRef } from '../../core/model/design.ts';
import type { WorkbenchStore } from '../../store/store.ts';

export interface PolewrightProbe {
  /** A deep copy of the current design. */
  design(): Design;
  selection(): RootRef | null;
  canUndo(): boolean;
  canRedo(): boolean;
}

declare global {
  interface Window {
    __polewright?: PolewrightProbe;
  }
}

/** Installs the probe on window for the given store. */
export function installTestProbe(store: WorkbenchStore): void {
  const probe: PolewrightProbe = {
    design: () => structuredClone(store.getState().design),
    selection: () => structuredClone(store.getState().selection),
    canUndo: () => store.getState().history.past.length > 0,
    canRedo: () => store.getState().history.future.length > 0,
  };
  Object.defineProperty(window, '__polewright', { value: Object.freeze(probe), configurable: true });
}
