/** An SVG axis drawn from precomputed ticks: tick marks, labels and an axis title with its unit. */
import { memo } from 'react';
import type { Tick } from './ticks.ts';
import { toPixel, type AxisMap } from './pixels.ts';

export interface AxisProps {
  /** Which side of the plot the axis sits on. */
  side: 'bottom' | 'left' | 'top' | 'right';
  map: AxisMap;
  ticks: readonly Tick[];
  /** Pixel position of the axis line across the axis (y for bottom/top, x for left/right). */
  at: number;
  /** Axis title including the unit, e.g. "Magnitude (dB)". */
  title?: string;
  /** Where the title goes for a vertical axis: rotated beside the labels, or level above the axis. */
  titlePlacement?: 'beside' | 'above';
}

const TICK = 4;

/** Ticks and labels along one side of a plot. */
export const Axis = memo(function Axis({
  side,
  map,
  ticks,
  at,
  title,
  titlePlacement = 'beside',
}: AxisProps) {
  const horizontal = side === 'bottom' || side === 'top';
  const dir = side === 'bottom' || side === 'right' ? 1 : -1;
  const p0 = Math.min(map.p0, map.p1);
  const p1 = Math.max(map.p0, map.p1);
  const marks = ticks.filter((t) => t.label !== '');
  return (
    <g className={`pw-chart-axis pw-chart-axis-${side}`} aria-hidden="true">
      {horizontal ? <line x1={p0} x2={p1} y1={at} y2={at} /> : <line x1={at} x2={at} y1={p0} y2={p1} />}
      {marks.map((t) => {
        const p = toPixel(map, t.value);
        if (!(p >= p0 - 0.5 && p <= p1 + 0.5)) return null;
        return horizontal ? (
          <g key={t.value} transform={`translate(${p},${at})`}>
            <line y2={dir * TICK} />
            <text y={dir * (TICK + 2)} dy={dir > 0 ? '0.71em' : '0'} textAnchor="middle">
              {t.label}
            </text>
          </g>
        ) : (
          <g key={t.value} transform={`translate(${at},${p})`}>
            <line x2={dir * TICK} />
            <text x={dir * (TICK + 2)} dy="0.32em" textAnchor={dir > 0 ? 'start' : 'end'}>
              {t.label}
            </text>
          </g>
        );
      })}
      {title ? (
        <AxisTitle side={side} at={at} p0={p0} p1={p1} title={title} placement={titlePlacement} />
      ) : null}
    </g>
  );
});

function AxisTitle(props: {
  side: AxisProps['side'];
  at: number;
  p0: number;
  p1: number;
  title: string;
  placement: 'beside' | 'above';
}) {
  const { side, at, p0, p1, title, placement } = props;
  const mid = (p0 + p1) / 2;
  if (side === 'bottom') {
    return (
      <text className="pw-chart-axis-title" x={p1} y={at + 30} textAnchor="end">
        {title}
      </text>
    );
  }
  if (side === 'top') {
    return (
      <text className="pw-chart-axis-title" x={p1} y={at - 20} textAnchor="end">
        {title}
      </text>
    );
  }
  if (placement === 'above') {
    const left = side === 'left';
    return (
      <text
        className="pw-chart-axis-title"
        x={at + (left ? -6 : 6)}
        y={p0 - 6}
        textAnchor={left ? 'start' : 'end'}
      >
        {title}
      </text>
    );
  }
  const x = side === 'left' ? at - 40 : at + 40;
  return (
    <text
      className="pw-chart-axis-title"
      transform={`translate(${x},${mid}) rotate(-90)`}
      textAnchor="middle"
    >
      {title}
    </text>
  );
}
