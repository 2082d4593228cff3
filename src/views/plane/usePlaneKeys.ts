/**
 * Keyboard use of the plane: arrows nudge the focused or selected root (one undo step each) or pan the view
 * when no root is selected; Delete/Backspace removes the root; + and − zoom; Escape stops placing, then
 * clears the selection.
 */
import type { KeyboardEvent as ReactKeyboardEvent, RefObject } from 'react';
import { workbenchStore } from '../../store/useWorkbench.ts';
import { zoomAbout } from './geometry.ts';
import { nudgeDelta } from './nudge.ts';
import { rootTargetOf } from './rootTarget.ts';

/** Zoom factor of one + or − press (and of the zoom buttons). */
export const ZOOM_STEP = 1.25;
/** Fraction of the visible half-width one arrow press pans when no root is selected. */
const PAN_FRACTION = 0.1;

interface Options {
  svgRef: RefObject<SVGSVGElement | null>;
  cancelPlacing: () => boolean;
}

function isTextEntry(t: EventTarget | null): boolean {
  return t instanceof HTMLElement && /^(INPUT|SELECT|TEXTAREA|BUTTON)$/.test(t.tagName);
}

export function usePlaneKeys({ svgRef, cancelPlacing }: Options) {
  return (e: ReactKeyboardEvent) => {
    if (isTextEntry(e.target) || e.ctrlKey || e.metaKey) return;
    const st = workbenchStore.getState();
    const hit = rootTargetOf(e.target);
    const ref = hit && !hit.mirror ? hit.ref : st.selection;
    const delta = nudgeDelta(e.key, e.shiftKey || e.altKey);
    if (delta) {
      e.preventDefault();
      const root = ref && (ref.kind === 'zero' ? st.design.zeros : st.design.poles)[ref.index];
      if (ref && root) {
        st.moveRoot(ref, root.re + delta.dre, root.im + delta.dim);
      } else {
        const { planeSpan: span, planeCentre: c } = st.view;
        const step = (PAN_FRACTION * span) / Math.abs(delta.dre || delta.dim);
        st.setView({ planeCentre: { re: c.re + delta.dre * step, im: c.im + delta.dim * step } });
      }
    } else if ((e.key === 'Delete' || e.key === 'Backspace') && ref) {
      e.preventDefault();
      st.deleteRoot(ref);
      svgRef.current?.focus({ preventScroll: true });
    } else if (e.key === '+' || e.key === '=' || e.key === '-' || e.key === '_') {
      e.preventDefault();
      const { planeSpan: span, planeCentre: c } = st.view;
      const v = zoomAbout({ span, centre: c }, e.key === '-' || e.key === '_' ? ZOOM_STEP : 1 / ZOOM_STEP, c);
      st.setView({ planeSpan: v.span, planeCentre: v.centre });
    } else if (e.key === 'Escape') {
      if (!cancelPlacing()) st.select(null);
    } else if ((e.key === 'Enter' || e.key === ' ') && hit && !hit.mirror) {
      e.preventDefault();
      st.select(hit.ref);
    }
  };
}
