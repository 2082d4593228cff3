/** Marks drawn over the time plot: the cross-hair at one sample, and the off-scale first sample's label. */
import { toPixel, type AxisMap } from '../chart/pixels.ts';
import type { Range } from '../chart/range.ts';
import { formatNumber } from '../shared/format.ts';

interface Band {
  top: number;
  bottom: number;
}

const clampY = (y: number, b: Band) => Math.min(b.bottom, Math.max(b.top, y));

/** A dashed vertical line at pixel x with dots at the input and output values there. */
export function SampleCrosshair(p: { x: number; yMap: AxisMap; input: number; output: number; rect: Band }) {
  return (
    <g aria-hidden="true">
      <path className="pw-crosshair" d={`M${Math.round(p.x) + 0.5} ${p.rect.top}V${p.rect.bottom}`} />
      <circle
        className="pw-crosshair-dot"
        cx={p.x}
        cy={clampY(toPixel(p.yMap, p.input), p.rect)}
        r={3}
        fill="var(--pw-input)"
      />
      <circle
        className="pw-crosshair-dot"
        cx={p.x}
        cy={clampY(toPixel(p.yMap, p.output), p.rect)}
        r={3.5}
        fill="var(--pw-output)"
      />
    </g>
  );
}

/** A label at the plot's edge for the first output sample when the axis was fitted without it. */
export function OffScaleNote(p: { x: number; value: number | undefined; range: Range; rect: Band }) {
  const v = p.value;
  if (v === undefined || (v >= p.range[0] && v <= p.range[1])) return null;
  const up = v > p.range[1];
  return (
    <text
      className="pw-offscale"
      x={p.x + 5}
      y={up ? p.rect.top + 11 : p.rect.bottom - 4}
      data-testid="time-offscale"
    >
      {`${up ? '↑' : '↓'} y[0] = ${formatNumber(v, 4)}`}
    </text>
  );
}
