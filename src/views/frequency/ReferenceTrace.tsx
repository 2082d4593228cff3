/**
 * The pinned reference design's response in every frequency plot: a faint dashed slate line in each plot's
 * unit (magnitude, phase, group delay), at the reference's own sample rate (frequencies in Hz, so designs
 * at different rates line up), with a one-line key in the magnitude plot's corner.
 */
import { useMemo } from 'react';
import { selectReferenceCurves, useCompare } from '../../store/compare.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { linePath } from '../chart/paths.ts';
import { toPixels } from '../chart/pixels.ts';
import '../compare/compare.css';
import type { PlotOverlayProps } from './overlays.ts';
import { fitText } from '../pictures/fitText.ts';

/** Vertical jump (fraction of the plot height) at which the wrapped phase line breaks, as the design's does. */
const WRAP_BREAK_FRACTION = 0.6;

export function ReferenceTrace({ plot, rect, xMap, yMap, units }: PlotOverlayProps) {
  const reference = useCompare((s) => s.reference);
  const view = useWorkbench((s) => s.view);
  const curves = reference ? selectReferenceCurves(reference, view) : null;
  const breaks = plot === 'phase' && units.wrapped;
  const d = useMemo(() => {
    if (!curves) return '';
    const px = toPixels(xMap, curves.hz);
    const py = toPixels(yMap, curves[plot]);
    const jump = breaks ? WRAP_BREAK_FRACTION * (rect.bottom - rect.top) : Infinity;
    return linePath(px, py, { top: rect.top, bottom: rect.bottom, maxJumpPx: jump, thin: true });
  }, [curves, plot, breaks, xMap, yMap, rect.top, rect.bottom]);
  if (!reference) return null;
  return (
    <g data-testid={plot === 'magnitude' ? 'reference-trace' : `reference-trace-${plot}`} aria-hidden="true">
      <path className="pw-ref-trace" d={d} />
      {plot === 'magnitude' ? (
        <text className="pw-ref-legend" x={rect.right - 6} y={rect.bottom - 6} textAnchor="end">
          {`dashed: reference “${fitText(reference.design.name || 'untitled', 260, 6.2)}”`}
        </text>
      ) : null}
    </g>
  );
}
