/** The still parts of the plane: outside-the-circle tint, grid, axes with ticks, unit circle, Hz ring. */
import { memo } from 'react';
import { formatHz, formatNumber } from '../shared/format.ts';
import type { PlaneScale } from './geometry.ts';
import { frequencyRingTicks } from './frequencyRing.ts';

/** Pixels of ring circumference per frequency label. */
const RING_LABEL_SPACING_PX = 72;
/** Pixels per axis tick label. */
const AXIS_LABEL_SPACING_PX = 80;
/** Room kept free of tick labels at the right end of the real axis for its title, pixels. */
const AXIS_TITLE_ROOM_PX = 34;

interface Props {
  scale: PlaneScale;
  sampleRate: number;
  /** True when the design is unstable: the outside region is tinted more strongly. */
  unstable: boolean;
}

function PlaneGridImpl({ scale, sampleRate, unstable }: Props) {
  const { x, y, k, width, height } = scale;
  const ox = x(0);
  const oy = y(0);
  const hole = `M${ox - k},${oy}a${k},${k} 0 1,0 ${2 * k},0a${k},${k} 0 1,0 ${-2 * k},0Z`;
  const outside = `M0,0H${width}V${height}H0Z${hole}`;
  const axisY = Math.min(height - 18, Math.max(4, oy));
  const axisX = Math.min(width - 4, Math.max(36, ox));
  const xTicks = x.ticks(Math.max(2, Math.round(width / AXIS_LABEL_SPACING_PX)));
  const yTicks = y.ticks(Math.max(2, Math.round(height / AXIS_LABEL_SPACING_PX)));
  const ring = frequencyRingTicks(
    sampleRate,
    Math.min(12, Math.max(2, (Math.PI * k) / RING_LABEL_SPACING_PX)),
  );
  return (
    <g className="pw-plane-grid" aria-hidden="true">
      <path
        d={outside}
        fillRule="evenodd"
        className={unstable ? 'pw-outside pw-outside-unstable' : 'pw-outside'}
      />
      {xTicks.map((t) => (
        <line key={`gx${t}`} className="pw-gridline" x1={x(t)} x2={x(t)} y1={0} y2={height} />
      ))}
      {yTicks.map((t) => (
        <line key={`gy${t}`} className="pw-gridline" x1={0} x2={width} y1={y(t)} y2={y(t)} />
      ))}
      <line className="pw-axis" x1={0} x2={width} y1={axisY} y2={axisY} />
      <line className="pw-axis" x1={axisX} x2={axisX} y1={0} y2={height} />
      {xTicks.map((t) =>
        t === 0 || x(t) > width - AXIS_TITLE_ROOM_PX ? null : (
          <g key={`tx${t}`} transform={`translate(${x(t)},${axisY})`}>
            <line className="pw-axis" y2={4} />
            <text className="pw-tick-label" y={14} textAnchor="middle">
              {formatNumber(t, 3)}
            </text>
          </g>
        ),
      )}
      {yTicks.map((t) =>
        t === 0 ? null : (
          <g key={`ty${t}`} transform={`translate(${axisX},${y(t)})`}>
            <line className="pw-axis" x2={-4} />
            <text className="pw-tick-label" x={-6} dy="0.32em" textAnchor="end">
              {`${formatNumber(t, 3)}j`}
            </text>
          </g>
        ),
      )}
      <text className="pw-axis-title" x={width - 6} y={axisY + 14} textAnchor="end">
        Re z
      </text>
      <text className="pw-axis-title" x={axisX + 6} y={12}>
        Im z
      </text>
      <circle className="pw-unit-circle" cx={ox} cy={oy} r={k} />
      {ring.map(({ hz, angle }) => {
        const c = Math.cos(angle);
        const s = Math.sin(angle);
        const anchor = c > 0.3 ? 'start' : c < -0.3 ? 'end' : 'middle';
        return (
          <g key={`r${hz}`}>
            <line
              className="pw-ring-tick"
              x1={ox + k * c}
              y1={oy - k * s}
              x2={ox + (k + 7) * c}
              y2={oy - (k + 7) * s}
            />
            <line
              className="pw-ring-tick pw-ring-tick-mirror"
              x1={ox + k * c}
              y1={oy + k * s}
              x2={ox + (k + 5) * c}
              y2={oy + (k + 5) * s}
            />
            <text
              className="pw-ring-label"
              x={ox + (k + 11) * c}
              y={oy - (k + 11) * s}
              textAnchor={anchor}
              dy={s < 0.05 ? '-0.3em' : s < 0.3 ? '0.32em' : '0'}
            >
              {formatHz(hz, 3)}
            </text>
          </g>
        );
      })}
    </g>
  );
}

export const PlaneGrid = memo(PlaneGridImpl);
