/** One drawn root: a circle (zero) or a cross (pole), with its selection, danger and multiplicity marks. */
import { memo } from 'react';
import type { RootKind } from '../../core/model/design.ts';
import { HIT_RADIUS_PX } from './rootHit.ts';

/** Half-size of a marker, pixels. */
export const MARK_SIZE = 6;

interface Props {
  kind: RootKind;
  index: number;
  x: number;
  y: number;
  multiplicity: number;
  /** The conjugate mirror of a stored pair (drawn lighter, never focused). */
  mirror: boolean;
  selected: boolean;
  /** The roots' one tab stop (tabindex 0); the others are reached by N and P (tabindex −1). */
  tabStop: boolean;
  /** A pole on or outside the unit circle. */
  danger: boolean;
  label: string;
}

function RootMarkImpl({ kind, index, x, y, multiplicity, mirror, selected, tabStop, danger, label }: Props) {
  const s = MARK_SIZE;
  const cls = `pw-root pw-root-${kind}${mirror ? ' pw-root-mirror' : ''}${selected ? ' pw-root-selected' : ''}`;
  const focusable = mirror
    ? {}
    : { tabIndex: tabStop ? 0 : -1, role: 'button', 'aria-label': label, 'aria-pressed': selected };
  return (
    <g
      className={cls}
      transform={`translate(${x},${y})`}
      data-kind={kind}
      data-index={index}
      data-mirror={mirror ? '1' : undefined}
      aria-hidden={mirror ? true : undefined}
      {...focusable}
    >
      <circle className="pw-root-hit" r={HIT_RADIUS_PX} />
      {danger && <circle className="pw-root-danger" r={s + 5} />}
      <circle className="pw-root-ring" r={s + 5} />
      {kind === 'zero' ? (
        <circle className="pw-root-glyph" r={s} />
      ) : (
        <path className="pw-root-glyph" d={`M${-s},${-s}L${s},${s}M${-s},${s}L${s},${-s}`} />
      )}
      {multiplicity > 1 && (
        <text className="pw-root-mult" x={s + 3} y={-s - 1}>
          {multiplicity}
        </text>
      )}
    </g>
  );
}

export const RootMark = memo(RootMarkImpl);
