/**
 * The pinned reference design's output for the same test input, drawn in the time plot as a faint dashed
 * slate line under the design's, with a one-line key in the plot's corner. The engine filters the input
 * through the reference's sections (selectReferenceTimeOutput); this only draws it.
 */
import { useMemo } from 'react';
import { selectReferenceTimeOutput, useCompare } from '../../store/compare.ts';
import { selectTimeInput } from '../../store/derived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { linePath } from '../chart/paths.ts';
import { toPixels, type AxisMap } from '../chart/pixels.ts';
import '../compare/compare.css';
import type { PlotRect } from '../frequency/layout.ts';

export interface ReferenceTimeTraceProps {
  /** Pixel x of every sample index. */
  px: Float64Array;
  yMap: AxisMap;
  rect: PlotRect;
}

export function ReferenceTimeTrace({ px, yMap, rect }: ReferenceTimeTraceProps) {
  const reference = useCompare((s) => s.reference);
  const input = useWorkbench(selectTimeInput);
  const y = reference ? selectReferenceTimeOutput(reference, input) : null;
  const d = useMemo(
    () => (y ? linePath(px, toPixels(yMap, y), { top: rect.top, bottom: rect.bottom, thin: true }) : ''),
    [y, px, yMap, rect.top, rect.bottom],
  );
  if (!reference) return null;
  return (
    <g data-testid="reference-time-trace" aria-hidden="true" pointerEvents="none">
      <path className="pw-ref-trace" d={d} />
      <text className="pw-ref-legend" x={rect.right - 6} y={rect.bottom - 6} textAnchor="end">
        dashed: reference output
      </text>
    </g>
  );
}
