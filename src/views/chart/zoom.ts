/**
 * Zooming and panning one axis of a plot, linear or logarithmic: pure arithmetic on the visible span. On a
 * log axis every step is taken on log(value), so a zoom or a pan looks the same anywhere on the axis.
 */
export type Span = readonly [number, number];

/** Zoom factor of one wheel notch, key press or button press (> 1 zooms in). */
export const ZOOM_STEP = 1.5;
/** Fraction of the visible span one pan key moves (Shift: a whole span). */
export const PAN_STEP = 0.1;

const into = (kind: 'linear' | 'log', v: number) => (kind === 'log' ? Math.log(v) : v);
const outOf = (kind: 'linear' | 'log', t: number) => (kind === 'log' ? Math.exp(t) : t);

/** The span zoomed by `factor` (> 1 zooms in) about the value `at`, which keeps its place on screen. */
export function zoomSpan(span: Span, at: number, factor: number, kind: 'linear' | 'log' = 'linear'): Span {
  const [t0, t1, ta] = [into(kind, span[0]), into(kind, span[1]), into(kind, at)];
  return [outOf(kind, ta - (ta - t0) / factor), outOf(kind, ta + (t1 - ta) / factor)];
}

/** The span moved so that the value `from` lands where `to` was (a drag), or by a fraction of itself. */
export function panSpan(span: Span, from: number, to: number, kind: 'linear' | 'log' = 'linear'): Span {
  const d = into(kind, from) - into(kind, to);
  return [outOf(kind, into(kind, span[0]) + d), outOf(kind, into(kind, span[1]) + d)];
}

/** The span moved by `fraction` of its own width (negative: towards lower values). */
export function panBy(span: Span, fraction: number, kind: 'linear' | 'log' = 'linear'): Span {
  const [t0, t1] = [into(kind, span[0]), into(kind, span[1])];
  const d = fraction * (t1 - t0);
  return [outOf(kind, t0 + d), outOf(kind, t1 + d)];
}

/** The middle of a span as the axis shows it (geometric on a log axis). */
export function spanMiddle(span: Span, kind: 'linear' | 'log' = 'linear'): number {
  return outOf(kind, (into(kind, span[0]) + into(kind, span[1])) / 2);
}
