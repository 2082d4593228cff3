/**
 * The quantized filter's roots on the z-plane, over the ideal ones: small raspberry diamonds (zeros) and
 * small filled triangles (poles), so a root that moved with quantization shows beside its ideal mark and
 * one that did not move still shows inside it. Drawn only while the design has target settings and the
 * overlay is on, and not during a root drag.
 */
import type { Root } from '../../core/types.ts';
import { selectImplementation, selectShowQuantized } from '../../store/implementationDerived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import type { PlaneOverlayProps } from './overlays.ts';

/** Half-size of a quantized mark, pixels (the design's own marks are 6). */
const Q_MARK = 3.5;
const COLOUR = 'var(--pw-quantized)';

function marks(
  kind: 'zero' | 'pole',
  section: number,
  roots: readonly Root[],
  scale: PlaneOverlayProps['scale'],
) {
  const s = Q_MARK;
  return roots.flatMap((r, i) =>
    (r.im === 0 ? [0] : [r.im, -r.im]).map((im, m) => (
      <g
        key={`${kind}${section}-${i}-${m}`}
        transform={`translate(${scale.x(r.re)},${scale.y(im)})`}
        data-quantized={kind}
        data-section={section}
        data-re={r.re}
        data-im={im}
      >
        {kind === 'zero' ? (
          <path
            d={`M0,${-s - 1}L${s + 1},0L0,${s + 1}L${-s - 1},0Z`}
            fill="#fff"
            stroke={COLOUR}
            strokeWidth={1.6}
          />
        ) : (
          <path d={`M0,${-s - 0.5}L${s},${s - 0.5}L${-s},${s - 0.5}Z`} fill={COLOUR} />
        )}
      </g>
    )),
  );
}

export function QuantizedRoots({ scale }: PlaneOverlayProps) {
  // Hidden during a root drag: rebuilding the implementation every frame costs too much (see useTarget.ts).
  const shown = useWorkbench((s) => selectShowQuantized(s) && !s.dragging);
  const result = useWorkbench((s) => (shown ? selectImplementation(s) : null));
  if (!shown || !result?.ok) return null;
  const impl = result.value;
  const q = impl.quantized.format;
  return (
    <g data-testid="quantized-roots" aria-hidden="true">
      {impl.sectionRoots.map((sec, i) => (
        <g key={i}>
          {marks('zero', i, sec.zeros, scale)}
          {marks('pole', i, sec.poles, scale)}
        </g>
      ))}
      <text x={8} y={32} fill={COLOUR} fontSize={11} stroke="#fff" strokeWidth={3} paintOrder="stroke">
        {`◇ ▲ quantized: ${q.wordLength}-bit coefficients`}
      </text>
    </g>
  );
}
