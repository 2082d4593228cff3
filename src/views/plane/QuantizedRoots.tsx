/**
 * The quantized filter's roots on the z-plane, over the ideal ones: small raspberry diamonds (zeros) and
 * small filled triangles (poles), so a root that moved with quantization shows beside its ideal mark and
 * one that did not move still shows inside it. Drawn only while the design has target settings and the
 * overlay is on, and not during a root drag (the key says so meanwhile). An FIR runs as taps on the target:
 * its quantized zeros are drawn by views/firQuantized/ instead, in the same marks.
 */
import type { ReactNode } from 'react';
import type { Root } from '../../core/types.ts';
import {
  selectImplementation,
  selectRunsAsTaps,
  selectShowQuantized,
} from '../../store/implementationDerived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { QuantizedKeyText } from '../shared/QuantizedKeyText.tsx';
import type { PlaneOverlayProps } from './overlays.ts';

/** Half-size of a quantized mark, pixels (the design's own marks are 6). */
const Q_MARK = 3.5;
const COLOUR = 'var(--pw-quantized)';

/**
 * One mark per quantized root and per conjugate: a diamond (zero) or a triangle (pole), with the root's
 * place in data attributes; `section` is the cascade section it belongs to (none for FIR taps).
 */
export function quantizedMarks(
  kind: 'zero' | 'pole',
  section: number | null,
  roots: readonly Root[],
  scale: PlaneOverlayProps['scale'],
) {
  const s = Q_MARK;
  return roots.flatMap((r, i) =>
    (r.im === 0 ? [0] : [r.im, -r.im]).map((im, m) => (
      <g
        key={`${kind}${section ?? ''}-${i}-${m}`}
        transform={`translate(${scale.x(r.re)},${scale.y(im)})`}
        data-quantized={kind}
        data-section={section ?? undefined}
        data-re={r.re}
        data-im={im}
        data-multiplicity={r.multiplicity > 1 ? r.multiplicity : undefined}
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

/** A line of the quantized marks' key, in the plane's top left corner (line 2 below the first). */
export function QuantizedPlaneKey({
  children,
  testId,
  line = 1,
}: {
  children: ReactNode;
  testId?: string;
  line?: number;
}) {
  return (
    <QuantizedKeyText x={8} y={32 + 14 * (line - 1)} testId={testId}>
      {children}
    </QuantizedKeyText>
  );
}

/** The key alone while a drag holds the quantized marks back (`marks`: the shapes it names). */
export function QuantizedPlanePaused({ marks }: { marks: string }) {
  return (
    <g aria-hidden="true">
      <QuantizedPlaneKey testId="quantized-paused">{`${marks} quantized: drawn again when you let go`}</QuantizedPlaneKey>
    </g>
  );
}

export function QuantizedRoots({ scale }: PlaneOverlayProps) {
  const on = useWorkbench((s) => selectShowQuantized(s) && !selectRunsAsTaps(s));
  // Hidden during a root drag: rebuilding the implementation every frame costs too much (see useTarget.ts).
  const dragging = useWorkbench((s) => s.dragging);
  const result = useWorkbench((s) => (on && !s.dragging ? selectImplementation(s) : null));
  if (on && dragging) return <QuantizedPlanePaused marks="◇ ▲" />;
  if (!on || !result?.ok) return null;
  const impl = result.value;
  const q = impl.quantized.format;
  return (
    <g data-testid="quantized-roots" aria-hidden="true">
      {impl.sectionRoots.map((sec, i) => (
        <g key={i}>
          {quantizedMarks('zero', i, sec.zeros, scale)}
          {quantizedMarks('pole', i, sec.poles, scale)}
        </g>
      ))}
      <QuantizedPlaneKey>{`◇ ▲ quantized: ${q.wordLength}-bit coefficients`}</QuantizedPlaneKey>
    </g>
  );
}
