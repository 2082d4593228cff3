/**
 * Zoom and pan of a plot's horizontal axis, one piece for every plot that has one (the frequency plots, the
 * time plot, the recording). The gestures themselves (axisZoomGestures.ts) and the zoom buttons load after
 * the first paint (loadZoomKit, also fetched by prefetch.ts): a plot drawn zoomed (from a link) needs only
 * its span, and the gestures are there well before a person reaches for them.
 */
import {
  useEffect,
  useMemo,
  useRef,
  useState,
  type KeyboardEvent,
  type PointerEvent,
  type RefObject,
} from 'react';
import type { Span } from './zoom.ts';

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

/** What the gestures read of their plot at each event. */
export interface AxisZoomHost {
  target(): AxisZoomTarget;
  options(): AxisZoomOptions;
  /** The SVG's left edge in client pixels. */
  left(): number;
  /** Shows (or with null hides) the selection band being dragged, in SVG pixels. */
  setBand(band: readonly [number, number] | null): void;
}

export interface AxisZoomGestures {
  wheel: (e: WheelEvent) => void;
  onPointerDown: (e: PointerEvent<SVGElement>) => void;
  onPointerMove: (e: PointerEvent<SVGElement>) => void;
  onPointerUp: (e: PointerEvent<SVGElement>) => void;
  onPointerCancel: (e: PointerEvent<SVGElement>) => void;
  onDoubleClick: () => void;
  /** Runs the zoom key the press asks for; returns whether it was one. */
  onKey: (e: KeyboardEvent<SVGElement>) => boolean;
}

type ZoomKit = typeof import('./zoomKit.ts');
let kit: ZoomKit | null = null;
let pending: Promise<ZoomKit> | null = null;

/** The zoom gestures and buttons, loaded once (a failed load is tried again on the next call). */
export function loadZoomKit(): Promise<ZoomKit> {
  return (pending ??= import('./zoomKit.ts').then(
    (m) => (kit = m),
    (e: unknown) => {
      pending = null;
      throw e;
    },
  ));
}

/** The zoom kit once loaded (null before), re-rendering the caller when it arrives. */
export function useZoomKit(): ZoomKit | null {
  const [loaded, setLoaded] = useState(() => kit);
  useEffect(() => {
    if (loaded) return;
    let live = true;
    loadZoomKit().then(
      (m) => live && setLoaded(() => m),
      () => undefined, // the plot still shows its span; the next plot mounted tries again
    );
    return () => {
      live = false;
    };
  }, [loaded]);
  return loaded;
}

const ignore = () => {};

export function useAxisZoom(
  svg: RefObject<SVGSVGElement | null>,
  target: AxisZoomTarget,
  opts: AxisZoomOptions,
) {
  const latest = useRef({ target, opts });
  latest.current = { target, opts };
  /** The selection band being dragged, in SVG pixels. */
  const [band, setBand] = useState<readonly [number, number] | null>(null);
  const loaded = useZoomKit();
  const gestures = useMemo(
    () =>
      loaded?.axisZoomGestures({
        target: () => latest.current.target,
        options: () => latest.current.opts,
        left: () => svg.current?.getBoundingClientRect().left ?? 0,
        setBand,
      }) ?? null,
    [loaded, svg],
  );

  useEffect(() => {
    const el = svg.current;
    if (!el || !gestures) return;
    el.addEventListener('wheel', gestures.wheel, { passive: false });
    return () => el.removeEventListener('wheel', gestures.wheel);
  }, [svg, gestures]);

  return {
    handlers: {
      onPointerDown: gestures?.onPointerDown ?? ignore,
      onPointerMove: gestures?.onPointerMove ?? ignore,
      onPointerUp: gestures?.onPointerUp ?? ignore,
      onPointerCancel: gestures?.onPointerCancel ?? ignore,
      onDoubleClick: gestures?.onDoubleClick ?? ignore,
    },
    onKey: gestures?.onKey ?? (() => false),
    band,
  };
}
