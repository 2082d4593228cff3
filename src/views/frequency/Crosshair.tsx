/** The frequency cross-hair: a vertical line through the three plots and a dot on each curve at its exact value. */
import { memo } from 'react';
import { toPixel, type AxisMap } from '../chart/pixels.ts';
import type { PlotRect } from './layout.ts';

export interface CrosshairProps {
  x: number;
  /** The plots the line crosses (the first one carries the label). */
  rects: readonly PlotRect[];
  /** Each plot's y map and the value (in axis units) at the cross-hair. */
  points: readonly { map: AxisMap; value: number; colour: string; top: number; bottom: number }[];
}

export const Crosshair = memo(function Crosshair({ x, rects, points }: CrosshairProps) {
  const px = Math.round(x) + 0.5;
  return (
    <g aria-hidden="true" data-testid="frequency-crosshair">
      <path className="pw-crosshair" d={rects.map((r) => `M${px} ${r.top}V${r.bottom}`).join('')} />
      {points.map((p, i) => {
        const y = toPixel(p.map, p.value);
        // Off-scale values (e.g. −∞ dB at a notch) are pinned to the edge the curve was clipped to.
        const cy = Number.isNaN(y) ? NaN : Math.min(p.bottom, Math.max(p.top, y));
        if (Number.isNaN(cy)) return null;
        return <circle key={i} className="pw-crosshair-dot" cx={x} cy={cy} r={3.5} fill={p.colour} />;
      })}
    </g>
  );
});
