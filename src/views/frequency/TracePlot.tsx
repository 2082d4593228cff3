/** One frequency plot: grid, y axis and the curve clipped to the plot's rectangle (its title row is HTML). */
import { memo, useId, useMemo } from 'react';
import { Axis } from '../chart/Axis.tsx';
import { PlotFrame } from '../chart/PlotFrame.tsx';
import { linePath } from '../chart/paths.ts';
import { toPixels, type AxisMap } from '../chart/pixels.ts';
import { DEGREE_STEPS, spacedTicks, stepTicks, type Tick } from '../chart/ticks.ts';
import type { Range } from '../chart/range.ts';
import type { Series } from './series.ts';
import type { PlotRect } from './layout.ts';

export interface TracePlotProps {
  rect: PlotRect;
  xMap: AxisMap;
  xTicks: readonly Tick[];
  /** Pixel x of every grid point (shared by the three plots). */
  xPx: Float64Array;
  series: Series;
  range: Range;
  /** CSS colour of the curve, e.g. var(--pw-magnitude). */
  colour: string;
  /** Name used for the plot's test id. */
  name: string;
}

/** Pixels per y tick: fewer labels on short plots. */
const PX_PER_Y_TICK = 28;
/** Closest two y labels may sit, px (11px text plus air). */
const MIN_Y_LABEL_GAP_PX = 22;

/** Maps the plot's y range onto its rectangle (top of range at the top). */
export function yMapOf(rect: PlotRect, range: Range): AxisMap {
  return { kind: 'linear', d0: range[0], d1: range[1], p0: rect.bottom, p1: rect.top };
}

export const TracePlot = memo(function TracePlot(p: TracePlotProps) {
  const { rect, xMap, xTicks, xPx, series, range, colour, name } = p;
  const yMap = useMemo(() => yMapOf(rect, range), [rect, range]);
  const yTicks = useMemo(() => {
    const count = Math.max(2, (rect.bottom - rect.top) / PX_PER_Y_TICK);
    return series.degrees
      ? stepTicks(range[0], range[1], count, DEGREE_STEPS)
      : spacedTicks(range[0], range[1], rect.bottom - rect.top, MIN_Y_LABEL_GAP_PX);
  }, [range, rect.bottom, rect.top, series.degrees]);
  const d = useMemo(() => {
    const py = toPixels(yMap, series.values, series.scale);
    const jump = series.breakFraction ? series.breakFraction * (rect.bottom - rect.top) : Infinity;
    return linePath(xPx, py, { top: rect.top, bottom: rect.bottom, maxJumpPx: jump, thin: true });
  }, [xPx, yMap, series, rect.top, rect.bottom]);
  const clipId = `pw-clip-${useId().replace(/:/g, '')}`;
  return (
    <g data-testid={`plot-${name}`}>
      <PlotFrame
        rect={rect}
        clipId={clipId}
        x={{ map: xMap, ticks: xTicks }}
        y={{ map: yMap, ticks: yTicks }}
      />
      <path
        d={d}
        clipPath={`url(#${clipId})`}
        fill="none"
        stroke={colour}
        strokeWidth={1.6}
        strokeLinejoin="round"
      />
      <Axis side="left" map={yMap} ticks={yTicks} at={rect.left} />
    </g>
  );
});
