/**
 * Zoom and pan of a plot's horizontal axis, one piece for every plot that has one (the frequency plots, the
 * time plot, the recording): the wheel zooms about the pointer, a drag selects a span to zoom to (or pans,
 * where panning is the plot's drag), Shift+drag or the middle button pans, a double click shows everything,
 * and keys on the focused plot zoom (+ −), pan and show everything (0), as the shortcut table says.
 */
import { useEffect, useRef, useState, type KeyboardEvent, type PointerEvent, type RefObject } from 'react';
import { shortcutAction } from '../shortcuts.ts';
import { PAN_STEP, panBy, panSpan, spanMiddle, ZOOM_STEP, zoomSpan, type Span } from './zoom.ts';

export interface AxisZoomTarget {
  /** The visible span, in the axis unit. */
  span: Span;
  kind: 'linear' | 'log';
  /** The axis value at a pixel x measured from the SVG's left edge. */
  valueAt: (px: number) => number;
  /** Shows a span (the caller clips it to the axis) or, with null, everything. */
  set: (span: Span | null) => void;
  /** Where keys zoom about (e.g. the cross-hair); the middle of the span when null or outside it. */
  focus?: number | null;
}

export interface AxisZoomOptions {
  /** What a plain drag does: select a span to zoom to, or pan. */
  drag: 'select' | 'pan';
  /** The shortcut scope whose zoom-in, zoom-out, pan-back, pan-forward and zoom-all keys apply. */
  scope: 'cursor' | 'recording';
}

/** A drag shorter than this (px) is a click, not a selection. */
export const SELECT_MIN_PX = 5;

type Gesture = { mode: 'pan'; x: number; span: Span } | { mode: 'select'; x: number; to: number };

export function useAxisZoom(
  svg: RefObject<SVGSVGElement | null>,
  target: AxisZoomTarget,
  opts: AxisZoomOptions,
) {
  const latest = useRef(target);
  latest.current = target;
  const gesture = useRef<Gesture | null>(null);
  /** The selection band being dragged, in SVG pixels. */
  const [band, setBand] = useState<readonly [number, number] | null>(null);

  useEffect(() => {
    const el = svg.current;
    if (!el) return;
    // A wheel listener must be non-passive to keep the page from scrolling while the plot zooms.
    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      const t = latest.current;
      const at = t.valueAt(e.clientX - el.getBoundingClientRect().left);
      t.set(zoomSpan(t.span, at, e.deltaY < 0 ? ZOOM_STEP : 1 / ZOOM_STEP, t.kind));
    };
    el.addEventListener('wheel', onWheel, { passive: false });
    return () => el.removeEventListener('wheel', onWheel);
  }, [svg]);

  const xOf = (e: PointerEvent<SVGElement>) => e.clientX - (svg.current?.getBoundingClientRect().left ?? 0);
  const onPointerDown = (e: PointerEvent<SVGElement>) => {
    if (e.button !== 0 && e.button !== 1) return;
    const pan = opts.drag === 'pan' || e.shiftKey || e.button === 1;
    e.currentTarget.setPointerCapture(e.pointerId);
    const x = xOf(e);
    gesture.current = pan ? { mode: 'pan', x, span: target.span } : { mode: 'select', x, to: x };
  };
  const onPointerMove = (e: PointerEvent<SVGElement>) => {
    const g = gesture.current;
    if (!g) return;
    const x = xOf(e);
    if (g.mode === 'pan') {
      target.set(panSpan(g.span, target.valueAt(g.x), target.valueAt(x), target.kind));
      return;
    }
    g.to = x;
    setBand(Math.abs(x - g.x) >= SELECT_MIN_PX ? [Math.min(g.x, x), Math.max(g.x, x)] : null);
  };
  const onPointerUp = () => {
    const g = gesture.current;
    gesture.current = null;
    setBand(null);
    if (g?.mode !== 'select' || Math.abs(g.to - g.x) < SELECT_MIN_PX) return;
    const a = target.valueAt(Math.min(g.x, g.to));
    const b = target.valueAt(Math.max(g.x, g.to));
    target.set([a, b]);
  };
  const onPointerCancel = () => {
    gesture.current = null;
    setBand(null);
  };

  /** Runs the zoom key the press asks for; returns whether it was one. */
  const onKey = (e: KeyboardEvent<SVGElement>): boolean => {
    const { span, kind, focus } = target;
    const about = focus != null && focus >= span[0] && focus <= span[1] ? focus : spanMiddle(span, kind);
    const pan = e.shiftKey ? 1 : PAN_STEP;
    const action = shortcutAction(opts.scope, e);
    const run: Record<string, () => void> = {
      'zoom-in': () => target.set(zoomSpan(span, about, ZOOM_STEP, kind)),
      'zoom-out': () => target.set(zoomSpan(span, about, 1 / ZOOM_STEP, kind)),
      'pan-back': () => target.set(panBy(span, -pan, kind)),
      'pan-forward': () => target.set(panBy(span, pan, kind)),
      'zoom-all': () => target.set(null),
    };
    const act = action ? run[action] : undefined;
    if (!act) return false;
    e.preventDefault();
    act();
    return true;
  };

  return {
    handlers: {
      onPointerDown,
      onPointerMove,
      onPointerUp,
      onPointerCancel,
      onDoubleClick: () => target.set(null),
    },
    onKey,
    band,
  };
}
