/**
 * The zoom and pan gestures of a plot's horizontal axis (see useAxisZoom.ts, which attaches them): the wheel
 * zooms about the pointer, a drag selects a span to zoom to (or pans, where panning is the plot's drag),
 * Shift+drag or the middle button pans, a double click shows everything, and the shortcut table's zoom keys
 * zoom, pan and show everything. Loaded after the first paint with the zoom buttons (zoomKit.ts).
 */
import type { KeyboardEvent, PointerEvent } from 'react';
import { shortcutAction } from '../shortcuts.ts';
import { PAN_STEP, panBy, panSpan, spanMiddle, ZOOM_STEP, zoomSpan, type Span } from './zoom.ts';
import type { AxisZoomGestures, AxisZoomHost } from './useAxisZoom.ts';

/** A drag shorter than this (px) is a click, not a selection. */
export const SELECT_MIN_PX = 5;

type Gesture = { mode: 'pan'; x: number; span: Span } | { mode: 'select'; x: number; to: number };

/** The gestures of one plot, reading its current target and options from `host` at each event. */
export function axisZoomGestures(host: AxisZoomHost): AxisZoomGestures {
  let gesture: Gesture | null = null;
  const xOf = (e: { clientX: number }) => e.clientX - host.left();
  return {
    // A wheel listener must be non-passive to keep the page from scrolling while the plot zooms.
    wheel: (e: WheelEvent) => {
      e.preventDefault();
      const t = host.target();
      t.set(zoomSpan(t.span, t.valueAt(xOf(e)), e.deltaY < 0 ? ZOOM_STEP : 1 / ZOOM_STEP, t.kind));
    },
    onPointerDown: (e: PointerEvent<SVGElement>) => {
      if (e.button !== 0 && e.button !== 1) return;
      const pan = host.options().drag === 'pan' || e.shiftKey || e.button === 1;
      e.currentTarget.setPointerCapture(e.pointerId);
      const x = xOf(e);
      gesture = pan ? { mode: 'pan', x, span: host.target().span } : { mode: 'select', x, to: x };
    },
    onPointerMove: (e: PointerEvent<SVGElement>) => {
      const g = gesture;
      if (!g) return;
      const x = xOf(e);
      const t = host.target();
      if (g.mode === 'pan') {
        t.set(panSpan(g.span, t.valueAt(g.x), t.valueAt(x), t.kind));
        return;
      }
      g.to = x;
      host.setBand(Math.abs(x - g.x) >= SELECT_MIN_PX ? [Math.min(g.x, x), Math.max(g.x, x)] : null);
    },
    onPointerUp: () => {
      const g = gesture;
      gesture = null;
      host.setBand(null);
      if (g?.mode !== 'select' || Math.abs(g.to - g.x) < SELECT_MIN_PX) return;
      const t = host.target();
      t.set([t.valueAt(Math.min(g.x, g.to)), t.valueAt(Math.max(g.x, g.to))]);
    },
    onPointerCancel: () => {
      gesture = null;
      host.setBand(null);
    },
    onDoubleClick: () => host.target().set(null),
    onKey: (e: KeyboardEvent<SVGElement>): boolean => {
      const target = host.target();
      const { span, kind, focus } = target;
      const about = focus != null && focus >= span[0] && focus <= span[1] ? focus : spanMiddle(span, kind);
      const pan = e.shiftKey ? 1 : PAN_STEP;
      const action = shortcutAction(host.options().scope, e);
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
    },
  };
}
