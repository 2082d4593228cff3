/** Buttons that zoom a plot's horizontal axis (in, out, everything), with the span shown while zoomed. */
import { spanMiddle, ZOOM_STEP, zoomSpan, type Span } from './zoom.ts';

export interface ZoomControlsProps {
  /** What is zoomed, for the group's name: "frequency", "samples". */
  what: string;
  /** The visible span, and whether it is less than everything. */
  span: Span;
  zoomed: boolean;
  kind?: 'linear' | 'log';
  /** The shown span in words, e.g. "49.99–50.01 Hz". */
  spanText: string;
  set: (span: Span | null) => void;
}

export function ZoomControls({ what, span, zoomed, kind = 'linear', spanText, set }: ZoomControlsProps) {
  const mid = spanMiddle(span, kind);
  return (
    <span className="pw-zoom-controls" role="group" aria-label={`Zoom in ${what}`}>
      <button
        type="button"
        className="pw-toggle"
        aria-label={`Zoom in (${what})`}
        title="Zoom in (+, wheel, or drag across the plot)"
        onClick={() => set(zoomSpan(span, mid, ZOOM_STEP, kind))}
      >
        +
      </button>
      <button
        type="button"
        className="pw-toggle"
        aria-label={`Zoom out (${what})`}
        title="Zoom out (−, wheel)"
        disabled={!zoomed}
        onClick={() => set(zoomSpan(span, mid, 1 / ZOOM_STEP, kind))}
      >
        −
      </button>
      <button
        type="button"
        className="pw-toggle"
        aria-label={`Show all (${what})`}
        title="Whole axis (0, double-click)"
        disabled={!zoomed}
        onClick={() => set(null)}
      >
        all
      </button>
      {zoomed ? (
        <span className="pw-zoom-span" data-testid={`zoom-span-${what}`}>
          {spanText}
        </span>
      ) : null}
    </span>
  );
}
