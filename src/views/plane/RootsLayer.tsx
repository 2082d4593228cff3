/** Every root of the design and its conjugate mirror, zeros under poles, mirrors under stored roots. */
import type { Root } from '../../core/types.ts';
import { UNIT_CIRCLE_TOLERANCE } from '../../core/stability/index.ts';
import type { RootKind, RootRef } from '../../core/model/design.ts';
import type { PlaneScale } from './geometry.ts';
import { RootMark } from './RootMark.tsx';
import { rootAriaLabel } from './rootLabel.ts';

interface Props {
  zeros: Root[];
  poles: Root[];
  sampleRate: number;
  selection: RootRef | null;
  scale: PlaneScale;
}

/** True for a pole on or outside the unit circle (within the engine's tolerance band). */
export function poleAtRisk(root: Root): boolean {
  return Math.hypot(root.re, root.im) >= 1 - UNIT_CIRCLE_TOLERANCE;
}

export function RootsLayer({ zeros, poles, sampleRate, selection, scale }: Props) {
  const isSelected = (kind: RootKind, i: number) => selection?.kind === kind && selection.index === i;
  // One tab stop for all the roots (a roving tabindex): the selected root, else the first of the table's
  // order; N and P walk the others.
  const stop: RootRef | null =
    selection ??
    (poles.length ? { kind: 'pole', index: 0 } : zeros.length ? { kind: 'zero', index: 0 } : null);
  const marks = (kind: RootKind, roots: Root[], mirror: boolean) =>
    roots.map((r, i) =>
      mirror && r.im === 0 ? null : (
        <RootMark
          key={`${kind}${i}${mirror ? 'm' : ''}`}
          kind={kind}
          index={i}
          x={scale.x(r.re)}
          y={scale.y(mirror ? -r.im : r.im)}
          multiplicity={r.multiplicity}
          mirror={mirror}
          selected={isSelected(kind, i)}
          tabStop={!mirror && stop?.kind === kind && stop.index === i}
          danger={kind === 'pole' && poleAtRisk(r)}
          label={mirror ? '' : rootAriaLabel(kind, r, sampleRate)}
        />
      ),
    );
  return (
    <g className="pw-roots">
      <g>{marks('zero', zeros, true)}</g>
      <g>{marks('pole', poles, true)}</g>
      <g>{marks('zero', zeros, false)}</g>
      <g>{marks('pole', poles, false)}</g>
    </g>
  );
}
