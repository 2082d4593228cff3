/**
 * Pointer gestures on the plane (mouse, touch and pen alike): drag a root or its mirror, place a new root,
 * or pan on empty space. A root drag is one undo step (beginGesture … endGesture); moves reach the store at
 * most once per animation frame and the last one is always delivered.
 */
import { useRef, type PointerEvent as ReactPointerEvent, type RefObject } from 'react';
import type { RootKind, RootRef } from '../../core/model/design.ts';
import type { Complex } from '../../core/types.ts';
import { workbenchStore } from '../../store/useWorkbench.ts';
import { frameCoalescer, type FrameCoalescer } from './frameCoalescer.ts';
import { pixelToZ, type PlaneScale } from './geometry.ts';
import { nearestRoot } from './rootHit.ts';
import { rootElement } from './rootTarget.ts';
import { snapPoint } from './snap.ts';

/** What a click on empty space adds while placing. */
export interface Placement {
  kind: RootKind;
  pair: boolean;
}

/** Pointer travel below which a press on empty space counts as a click (clears the selection), pixels. */
const CLICK_SLOP_PX = 3;

type Gesture =
  | { type: 'root'; ref: RootRef; mirror: boolean; real: boolean; offset: Complex; id: number }
  | { type: 'pan'; start: { x: number; y: number }; centre: Complex; k: number; moved: boolean; id: number };

interface Options {
  svgRef: RefObject<SVGSVGElement | null>;
  scaleRef: RefObject<PlaneScale | null>;
  placingRef: RefObject<Placement | null>;
  onPlaced: () => void;
}

function snapSettings() {
  const { view, design } = workbenchStore.getState();
  return {
    mode: view.snap,
    radius: view.snapRadius,
    frequencyHz: view.snapFrequencyHz,
    sampleRate: design.sampleRate,
  };
}

export function usePlanePointer({ svgRef, scaleRef, placingRef, onPlaced }: Options) {
  const gesture = useRef<Gesture | null>(null);
  const rootMoves = useRef<FrameCoalescer<{ ref: RootRef; z: Complex }> | null>(null);
  const panMoves = useRef<FrameCoalescer<Complex> | null>(null);
  rootMoves.current ??= frameCoalescer(({ ref, z }) => workbenchStore.getState().moveRoot(ref, z.re, z.im));
  panMoves.current ??= frameCoalescer((centre) => workbenchStore.getState().setView({ planeCentre: centre }));

  /** The pointer's z, from the SVG's current box (re-read: the panel may change size during a drag). */
  const zAt = (e: { clientX: number; clientY: number }): Complex | null => {
    const s = scaleRef.current;
    const rect = svgRef.current?.getBoundingClientRect();
    return s && rect ? pixelToZ(s, e.clientX - rect.left, e.clientY - rect.top) : null;
  };

  /** Starts dragging a root; `at` is the pointer's z, or null to let the root jump to the pointer. */
  const startRootDrag = (e: ReactPointerEvent, ref: RootRef, mirror: boolean, at: Complex | null) => {
    const st = workbenchStore.getState();
    const root = (ref.kind === 'zero' ? st.design.zeros : st.design.poles)[ref.index];
    if (!root) return;
    // Grabbing a marker off-centre keeps that offset, so the root does not jump under the pointer.
    const offset = at ? { re: root.re - at.re, im: (mirror ? -root.im : root.im) - at.im } : { re: 0, im: 0 };
    gesture.current = { type: 'root', ref, mirror, real: root.im === 0, offset, id: e.pointerId };
    st.select(ref);
    st.setDragging(true);
  };

  const onPointerDown = (e: ReactPointerEvent<SVGSVGElement>) => {
    const svg = svgRef.current;
    const s = scaleRef.current;
    if (!svg || !s || gesture.current || (e.pointerType === 'mouse' && e.button > 1)) return;
    const rect = svg.getBoundingClientRect();
    const at = pixelToZ(s, e.clientX - rect.left, e.clientY - rect.top);
    const st = workbenchStore.getState();
    const hit = nearestRoot(st.design.zeros, st.design.poles, s, e.clientX - rect.left, e.clientY - rect.top);
    const placing = placingRef.current;
    if (hit && e.button === 0) {
      st.beginGesture();
      startRootDrag(e, hit.ref, hit.mirror, at);
      rootElement(svg, hit.ref)?.focus({ preventScroll: true });
    } else if (placing && e.button === 0) {
      const real = !placing.pair;
      const z = snapPoint(at, snapSettings(), real);
      const mirror = z.im < 0;
      st.beginGesture();
      st.addRoot(placing.kind, { re: z.re, im: real ? 0 : Math.abs(z.im), multiplicity: 1 });
      const ref = workbenchStore.getState().selection;
      onPlaced();
      if (ref) {
        startRootDrag(e, ref, mirror, null);
        requestAnimationFrame(() => rootElement(svg, ref)?.focus({ preventScroll: true }));
      }
    } else {
      svg.focus({ preventScroll: true });
      const view = st.view;
      gesture.current = {
        type: 'pan',
        start: { x: e.clientX, y: e.clientY },
        centre: view.planeCentre,
        k: s.k,
        moved: false,
        id: e.pointerId,
      };
    }
    e.preventDefault();
    try {
      svg.setPointerCapture(e.pointerId);
    } catch {
      // Synthetic pointers (scripts, benchmarks) cannot be captured; the drag works without capture.
    }
  };

  const onPointerMove = (e: ReactPointerEvent<SVGSVGElement>) => {
    const g = gesture.current;
    if (!g || e.pointerId !== g.id) return;
    if (g.type === 'root') {
      const at = zAt(e);
      if (!at) return;
      const p = { re: at.re + g.offset.re, im: at.im + g.offset.im };
      const up = g.mirror ? { re: p.re, im: -p.im } : p;
      rootMoves.current!.push({ ref: g.ref, z: snapPoint(up, snapSettings(), g.real) });
    } else {
      const dx = e.clientX - g.start.x;
      const dy = e.clientY - g.start.y;
      if (Math.hypot(dx, dy) > CLICK_SLOP_PX) g.moved = true;
      if (g.moved) panMoves.current!.push({ re: g.centre.re - dx / g.k, im: g.centre.im + dy / g.k });
    }
  };

  const finish = (e: ReactPointerEvent<SVGSVGElement>) => {
    const g = gesture.current;
    if (!g || e.pointerId !== g.id) return;
    gesture.current = null;
    const st = workbenchStore.getState();
    if (g.type === 'root') {
      try {
        rootMoves.current!.flush();
        rootMoves.current!.cancel();
      } finally {
        // The drag's undo step closes whatever happened to its last move.
        st.endGesture();
        st.setDragging(false);
      }
    } else {
      panMoves.current!.flush();
      panMoves.current!.cancel();
      if (!g.moved && e.type === 'pointerup') st.select(null);
    }
  };

  return {
    onPointerDown,
    onPointerMove,
    onPointerUp: finish,
    onPointerCancel: finish,
    onLostPointerCapture: finish,
  };
}
