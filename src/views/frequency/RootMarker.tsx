/** A labelled vertical line at the frequency of the root selected in the z-plane. */
import { memo } from 'react';
import { formatHz } from '../shared/format.ts';
import type { PlotRect } from './layout.ts';

export interface RootMarkerProps {
  x: number;
  hz: number;
  kind: 'zero' | 'pole';
  /** The plots the line crosses (the first one carries the label). */
  rects: readonly PlotRect[];
  /**
   * Whether keys are written along the magnitude plot's bottom edge (the quantized line's at the left, a
   * reference's at the right): the label then sits one row higher so it never covers them.
   */
  keysBelow?: boolean;
}

/** Height of one row of labels at the plot's bottom, px. */
const ROW_PX = 17;

/** Rough width of one label character at 11px, for the label's backing box. */
const CHAR_PX = 6.6;

export const RootMarker = memo(function RootMarker({
  x,
  hz,
  kind,
  rects,
  keysBelow = false,
}: RootMarkerProps) {
  const colour = kind === 'zero' ? 'var(--pw-zero)' : 'var(--pw-pole)';
  const px = Math.round(x) + 0.5;
  const first = rects[0];
  if (!first) return null;
  const label = `${kind === 'zero' ? 'Zero' : 'Pole'} ${formatHz(hz)}`;
  const w = label.length * CHAR_PX + 6;
  // The label sits at the bottom of the magnitude plot (above the keys' row when there is one), on whichever
  // side of the line has room.
  const right = px + 4 + w <= first.right;
  const bx = right ? px + 3 : px - 3 - w;
  const by = first.bottom - ROW_PX * (keysBelow ? 2 : 1);
  return (
    <g className="pw-root-marker" data-testid="root-marker" aria-label={`Selected ${label}`} role="img">
      <path
        d={rects.map((r) => `M${px} ${r.top}V${r.bottom}`).join('')}
        stroke={colour}
        strokeWidth={1.5}
        strokeOpacity={0.75}
      />
      <rect x={bx} y={by} width={w} height={15} rx={3} className="pw-marker-box" />
      <text x={bx + 3} y={by + 11} fill={colour} className="pw-marker-label">
        {label}
      </text>
    </g>
  );
});
