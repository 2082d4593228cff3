/**
 * Keyboard use of the plane, by the plane's actions of the shortcut table (views/shortcuts.ts): arrows
 * nudge the focused or selected root (one undo step each) or pan the view when no root is selected; Page
 * Up/Down step its radius and , / . its frequency; N and P walk the roots; Delete/Backspace removes the
 * root; + and − zoom; Escape stops placing, then clears the selection.
 */
import type { KeyboardEvent as ReactKeyboardEvent, RefObject } from 'react';
import type { RootRef } from '../../core/model/design.ts';
import { rootFrequencyHz } from '../../core/readouts.ts';
import { hzToOmega } from '../../core/units.ts';
import { workbenchStore } from '../../store/useWorkbench.ts';
import { formatHz, formatNumber } from '../shared/format.ts';
import { zoomAbout } from './geometry.ts';
import { frequencyStep, frequencyStepHz, nudgeDelta, radiusStep } from './nudge.ts';
import { rootElement, rootTargetOf } from './rootTarget.ts';
import { ownsKeys, shortcutAction } from '../shortcuts.ts';

/** Zoom factor of one + or − press (and of the zoom buttons). */
export const ZOOM_STEP = 1.25;
/** Fraction of the visible half-width one arrow press pans when no root is selected. */
const PAN_FRACTION = 0.1;

interface Options {
  svgRef: RefObject<SVGSVGElement | null>;
  cancelPlacing: () => boolean;
  /** Says what a key press did or why it did nothing (shown in the plane's hint, read by screen readers). */
  say: (text: string | null) => void;
}

/** Every stored root in the order of the root table: poles, then zeros, each in stored order. */
export function rootOrder(poles: number, zeros: number): RootRef[] {
  return [
    ...Array.from({ length: poles }, (_, index) => ({ kind: 'pole' as const, index })),
    ...Array.from({ length: zeros }, (_, index) => ({ kind: 'zero' as const, index })),
  ];
}

export function usePlaneKeys({ svgRef, cancelPlacing, say }: Options) {
  return (e: ReactKeyboardEvent) => {
    if (ownsKeys(e.target)) return;
    const action = shortcutAction('plane', e);
    if (!action) return;
    const st = workbenchStore.getState();
    const hit = rootTargetOf(e.target);
    const ref = hit && !hit.mirror ? hit.ref : st.selection;
    const root = ref ? (ref.kind === 'zero' ? st.design.zeros : st.design.poles)[ref.index] : undefined;
    const fs = st.design.sampleRate;
    const goTo = (next: RootRef) => {
      st.select(next);
      const svg = svgRef.current;
      if (svg) requestAnimationFrame(() => rootElement(svg, next)?.focus({ preventScroll: true }));
    };
    say(null);
    switch (action) {
      case 'nudge':
      case 'nudge-fine': {
        e.preventDefault();
        const delta = nudgeDelta(e.key, action === 'nudge-fine')!;
        if (ref && root) {
          st.moveRoot(ref, root.re + delta.dre, root.im + delta.dim);
        } else {
          const { planeSpan: span, planeCentre: c } = st.view;
          const step = (PAN_FRACTION * span) / Math.abs(delta.dre || delta.dim);
          st.setView({ planeCentre: { re: c.re + delta.dre * step, im: c.im + delta.dim * step } });
        }
        return;
      }
      case 'radius-out':
      case 'radius-in': {
        if (!ref || !root) return;
        e.preventDefault();
        const r = Math.hypot(root.re, root.im);
        const move = radiusStep(r, action === 'radius-out' ? 'out' : 'in', e.shiftKey);
        if (!move.ok) return say(`Radius not changed: ${move.why}.`);
        const angle = root.im === 0 && root.re === 0 ? 0 : Math.atan2(root.im, root.re);
        st.moveRoot(ref, move.radius * Math.cos(angle), root.im === 0 ? 0 : move.radius * Math.sin(angle));
        say(`radius ${formatNumber(move.radius, 7)}`);
        return;
      }
      case 'frequency-up':
      case 'frequency-down': {
        if (!ref || !root) return;
        e.preventDefault();
        if (root.im === 0) return say('A real root has no frequency to step: split it into a pair first.');
        const f = rootFrequencyHz(root, fs);
        const step = frequencyStepHz(fs, e.shiftKey);
        const to = frequencyStep(f, action === 'frequency-up' ? 'up' : 'down', step, fs);
        if (!(to > 0 && to < fs / 2))
          return say(`Frequency not changed: a pair at ${formatHz(to)} would be two real roots.`);
        const r = Math.hypot(root.re, root.im);
        const w = hzToOmega(to, fs);
        st.moveRoot(ref, r * Math.cos(w), r * Math.sin(w));
        say(`${formatHz(to, 8)} (step ${formatHz(step)})`);
        return;
      }
      case 'next-root':
      case 'previous-root': {
        const order = rootOrder(st.design.poles.length, st.design.zeros.length);
        if (order.length === 0) return;
        e.preventDefault();
        const at = ref ? order.findIndex((o) => o.kind === ref.kind && o.index === ref.index) : -1;
        const step = action === 'next-root' ? 1 : -1;
        const next = at < 0 ? (step > 0 ? 0 : order.length - 1) : (at + step + order.length) % order.length;
        goTo(order[next]!);
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
        if (cancelPlacing()) return;
        st.select(null);
        // The focused root would select itself again; the plane keeps the focus instead.
        if (hit) svgRef.current?.focus({ preventScroll: true });
        return;
      case 'select-root':
        if (!hit || hit.mirror) return;
        e.preventDefault();
        st.select(hit.ref);
    }
  };
}
