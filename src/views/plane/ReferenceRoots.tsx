/**
 * The pinned reference design's roots on the z-plane: dashed slate rings (zeros) and thin slate crosses
 * (poles), a little larger than the design's own marks so they still show when a root sits exactly on them.
 */
import type { Root } from '../../core/types.ts';
import { useCompare } from '../../store/compare.ts';
import '../compare/compare.css';
import type { PlaneOverlayProps } from './overlays.ts';

/** Half-size of a reference mark, pixels (the design's own marks are 6). */
const REF_MARK = 9;

function marks(kind: 'zero' | 'pole', roots: readonly Root[], scale: PlaneOverlayProps['scale']) {
  const s = REF_MARK;
  return roots.flatMap((r, i) =>
    (r.im === 0 ? [r.im] : [r.im, -r.im]).map((im, m) => (
      <g
        key={`${kind}${i}${m}`}
        transform={`translate(${scale.x(r.re)},${scale.y(im)})`}
        className={m === 1 ? 'pw-ref-mirror' : undefined}
      >
        {kind === 'zero' ? (
          <circle className="pw-ref-root" r={s} />
        ) : (
          <path className="pw-ref-root pw-ref-pole" d={`M${-s},${-s}L${s},${s}M${-s},${s}L${s},${-s}`} />
        )}
        {r.multiplicity > 1 ? (
          <text className="pw-ref-mult" x={-s - 2} y={s + 10} textAnchor="end">
            {r.multiplicity}
          </text>
        ) : null}
      </g>
    )),
  );
}

export function ReferenceRoots({ scale }: PlaneOverlayProps) {
  const reference = useCompare((s) => s.reference);
  if (!reference) return null;
  const { zeros, poles } = reference.design;
  return (
    <g data-testid="reference-roots" aria-hidden="true">
      {marks('zero', zeros, scale)}
      {marks('pole', poles, scale)}
      <text className="pw-ref-legend" x={8} y={16}>
        dashed: reference
      </text>
    </g>
  );
}
