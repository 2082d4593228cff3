/**
 * Zoom and pan of the recording's time axis: wheel zooms about the pointer, a drag pans, a double click
 * shows everything; keys on the focused plot do the same (+/− zoom, arrows pan, 0 or Home shows all).
 */
import { useEffect, useRef, type KeyboardEvent, type PointerEvent, type RefObject } from 'react';
import { shortcutAction } from '../shortcuts.ts';

/** Zoom factor of one wheel notch or key press. */
export const ZOOM_STEP = 1.5;
/** Fraction of the visible span one arrow key pans (Shift: a whole span). */
export const PAN_STEP = 0.1;

export interface ZoomTarget {
  /** Visible span, s. */
  t0: number;
  t1: number;
  /** Time at a pixel x measured from the SVG's left edge. */
  timeAt: (px: number) => number;
  /** Pixels per second. */
  pxPerSecond: number;
  set: (span: readonly [number, number] | null) => void;
}

/** Span zoomed by `factor` (> 1 zooms in) about time `at`. */
export function zoomAbout(t0: number, t1: number, at: number, factor: number): [number, number] {
  return [at - (at - t0) / factor, at + (t1 - at) / factor];
}

export function useZoomGestures(svg: RefObject<SVGSVGElement | null>, target: ZoomTarget) {
  const latest = useRef(target);
  latest.current = target;
  const drag = useRef<{ x: number; t0: number; t1: number } | null>(null);

  useEffect(() => {
    const el = svg.current;
    if (!el) return;
    // A wheel listener must be non-passive to keep the page from scrolling while the plot zooms.
    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      const t = latest.current;
      const box = el.getBoundingClientRect();
      const factor = e.deltaY < 0 ? ZOOM_STEP : 1 / ZOOM_STEP;
      t.set(zoomAbout(t.t0, t.t1, t.timeAt(e.clientX - box.left), factor));
    };
    el.addEventListener('wheel', onWheel, { passive: false });
    return () => el.removeEventListener('wheel', onWheel);
  }, [svg]);

  const onPointerDown = (e: PointerEvent<SVGElement>) => {
    if (e.button !== 0) return;
    e.currentTarget.setPointerCapture(e.pointerId);
    drag.current = { x: e.clientX, t0: target.t0, t1: target.t1 };
  };
  const onPointerMove = (e: PointerEvent<SVGElement>) => {
    const d = drag.current;
    if (!d) return;
    const dt = (e.clientX - d.x) / target.pxPerSecond;
    target.set([d.t0 - dt, d.t1 - dt]);
  };
  const onPointerUp = () => {
    drag.current = null;
  };
  const onKeyDown = (e: KeyboardEvent<SVGElement>) => {
    const { t0, t1 } = target;
    const mid = (t0 + t1) / 2;
    const pan = (e.shiftKey ? 1 : PAN_STEP) * (t1 - t0);
    const next = {
      'zoom-in': () => target.set(zoomAbout(t0, t1, mid, ZOOM_STEP)),
      'zoom-out': () => target.set(zoomAbout(t0, t1, mid, 1 / ZOOM_STEP)),
      'pan-back': () => target.set([t0 - pan, t1 - pan]),
      'pan-forward': () => target.set([t0 + pan, t1 + pan]),
      'zoom-all': () => target.set(null),
    };
    const action = shortcutAction('recording', e);
    if (!action) return;
    const act = next[action];
    e.preventDefault();
    act();
  };
  return {
    onPointerDown,
    onPointerMove,
    onPointerUp,
    onPointerCancel: onPointerUp,
    onDoubleClick: () => target.set(null),
    onKeyDown,
  };
}
