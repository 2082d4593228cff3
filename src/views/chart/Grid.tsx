/** Background grid lines of a plot, major (labelled ticks) a little darker than minor ones. */
import { memo } from 'react';
import type { Tick } from './ticks.ts';
import { toPixel, type AxisMap } from './pixels.ts';

export interface GridProps {
  x?: { map: AxisMap; ticks: readonly Tick[] };
  y?: { map: AxisMap; ticks: readonly Tick[] };
  /** The plot rectangle in pixels. */
  left: number;
  right: number;
  top: number;
  bottom: number;
}

/** Grid lines across the plot rectangle at the given ticks. */
export const Grid = memo(function Grid({ x, y, left, right, top, bottom }: GridProps) {
  const lines: { key: string; d: string; major: boolean }[] = [];
  for (const t of x?.ticks ?? []) {
    const p = Math.round(toPixel(x!.map, t.value)) + 0.5;
    if (p >= left && p <= right + 1)
      lines.push({ key: `x${t.value}`, d: `M${p} ${top}V${bottom}`, major: t.label !== '' });
  }
  for (const t of y?.ticks ?? []) {
    const p = Math.round(toPixel(y!.map, t.value)) + 0.5;
    if (p >= top && p <= bottom + 1)
      lines.push({ key: `y${t.value}`, d: `M${left} ${p}H${right}`, major: t.label !== '' });
  }
  const major = lines
    .filter((l) => l.major)
    .map((l) => l.d)
    .join('');
  const minor = lines
    .filter((l) => !l.major)
    .map((l) => l.d)
    .join('');
  return (
    <g className="pw-chart-grid" aria-hidden="true">
      {minor ? <path className="pw-grid-minor" d={minor} /> : null}
      {major ? <path className="pw-grid-major" d={major} /> : null}
    </g>
  );
});
