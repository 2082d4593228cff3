/**
 * The pinned reference design's magnitude response in the magnitude plot: a faint dashed slate line in
 * the plot's unit, at the reference's own sample rate (frequencies in Hz, so designs at different rates
 * line up), with a one-line key in the plot's corner.
 */
import { useMemo } from 'react';
import { selectReferenceResponse, selectReferenceZpk, useCompare } from '../../store/compare.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { linePath } from '../chart/paths.ts';
import { toPixels } from '../chart/pixels.ts';
import '../compare/compare.css';
import type { MagnitudeOverlayProps } from './overlays.ts';
import { refineAtRoots } from './refine.ts';
import { fitText } from '../pictures/pictureDocument.ts';

export function ReferenceTrace({ rect, xMap, yMap, db }: MagnitudeOverlayProps) {
  const reference = useCompare((s) => s.reference);
  const view = useWorkbench((s) => s.view);
  const grid = reference ? selectReferenceResponse(reference, view) : null;
  const d = useMemo(() => {
    if (!reference || !grid) return '';
    // Refined at the roots like the design's own curve, so a notch shows its true depth in both.
    const r = refineAtRoots(selectReferenceZpk(reference), grid.response);
    const k = reference.design.sampleRate / (2 * Math.PI);
    const px = toPixels(
      xMap,
      r.omega.map((w) => w * k),
    );
    const py = toPixels(yMap, db ? r.magnitudeDb : r.magnitude);
    return linePath(px, py, { top: rect.top, bottom: rect.bottom, thin: true });
  }, [reference, grid, xMap, yMap, db, rect.top, rect.bottom]);
  if (!reference) return null;
  return (
    <g data-testid="reference-trace" aria-hidden="true">
      <path className="pw-ref-trace" d={d} />
      <text className="pw-ref-legend" x={rect.right - 6} y={rect.bottom - 6} textAnchor="end">
        {`dashed: reference “${fitText(reference.design.name || 'untitled', 260, 6.2)}”`}
      </text>
    </g>
  );
}
