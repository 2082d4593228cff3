/** A labelled vertical line at the frequency of the root selected in the z-plane. */
import { memo } from 'react';
import { formatHz } from '../shared/format.ts';
import type { FrequencyLayout } from './layout.ts';

export interface RootMarkerProps {
  x: number;
  hz: number;
  kind: 'zero' | 'pole';
  layout: FrequencyLayout;
}

/** Width kept free for the magnitude plot's own title at its top left. */
const TITLE_ROOM_PX = 110;

export const RootMarker = memo(function RootMarker({ x, hz, kind, layout }: RootMarkerProps) {
  const colour = kind === 'zero' ? 'var(--pw-zero)' : 'var(--pw-pole)';
  const px = Math.round(x) + 0.5;
  const nearRight = x > (layout.magnitude.left + layout.magnitude.right) / 2;
  // The label sits in the title row above the magnitude plot, clear of the curve; keep it off the title.
  const textX = nearRight ? px - 4 : Math.max(px + 4, layout.magnitude.left + TITLE_ROOM_PX);
  const label = `${kind === 'zero' ? 'Zero' : 'Pole'} ${formatHz(hz)}`;
  return (
    <g className="pw-root-marker" data-testid="root-marker" aria-label={`Selected ${label}`} role="img">
      <path
        d={`M${px} ${layout.magnitude.top - 3}V${layout.magnitude.bottom}M${px} ${layout.phase.top}V${layout.phase.bottom}M${px} ${layout.delay.top}V${layout.delay.bottom}`}
        stroke={colour}
        strokeWidth={1.5}
        strokeOpacity={0.75}
      />
      <text
        x={textX}
        y={layout.magnitude.top - 5}
        textAnchor={nearRight ? 'end' : 'start'}
        fill={colour}
        className="pw-marker-label"
      >
        {label}
      </text>
    </g>
  );
});
