/**
 * Keyboard use of the plane, by the plane's actions of the shortcut table (views/shortcuts.ts): arrows
 * nudge the focused or selected root (one undo step each) or pan the view when no root is selected;
 * Delete/Backspace removes the root; + and − zoom; Escape stops placing, then clears the selection.
 */
import type { KeyboardEvent as ReactKeyboardEvent, RefObject } from 'react';
import { workbenchStore } from '../../store/useWorkbench.ts';
import { zoomAbout } from './geometry.ts';
import { nudgeDelta } from './nudge.ts';
import { rootTargetOf } from './rootTarget.ts';
import { ownsKeys, shortcutAction } from '../shortcuts.ts';

/** Zoom factor of one + or − press (and of the zoom buttons). */
export const ZOOM_STEP = 1.25;
/** Fraction of the visible half-width one arrow press pans when no root is selected. */
const PAN_FRACTION = 0.1;

interface Options {
  svgRef: RefObject<SVGSVGElement | null>;
  cancelPlacing: () => boolean;
}

export function usePlaneKeys({ svgRef, cancelPlacing }: Options) {
  return (e: ReactKeyboardEvent) => {
    if (ownsKeys(e.target)) return;
    const action = shortcutAction('plane', e);
    if (!action) return;
    const st = workbenchStore.getState();
    const hit = rootTargetOf(e.target);
    const ref = hit && !hit.mirror ? hit.ref : st.selection;
    switch (action) {
      case 'nudge':
      case 'nudge-fine': {
        e.preventDefault();
        const delta = nudgeDelta(e.key, action === 'nudge-fine')!;
        const root = ref && (ref.kind === 'zero' ? st.design.zeros : st.design.poles)[ref.index];
        if (ref && root) {
          st.moveRoot(ref, root.re + delta.dre, root.im + delta.dim);
        } else {
          const { planeSpan: span, planeCentre: c } = st.view;
          const step = (PAN_FRACTION * span) / Math.abs(delta.dre || delta.dim);
          st.setView({ planeCentre: { re: c.re + delta.dre * step, im: c.im + delta.dim * step } });
        }
        return;
      }
      case 'delete-root':
        if (!ref) return;
        e.preventDefault();
        st.deleteRoot(ref);
        svgRef.current?.focus({ preventScroll: true });
        return;
      case 'zoom-in':
      case 'zoom-out': {
        e.preventDefault();
        const { planeSpan: span, planeCentre: c } = st.view;
        const v = zoomAbout({ span, centre: c }, action === 'zoom-out' ? ZOOM_STEP : 1 / ZOOM_STEP, c);
        st.setView({ planeSpan: v.span, planeCentre: v.centre });
        return;
      }
      case 'cancel':
        if (!cancelPlacing()) st.select(null);
        return;
      case 'select-root':
        if (!hit || hit.mirror) return;
        e.preventDefault();
        st.select(hit.ref);
    }
  };
}
