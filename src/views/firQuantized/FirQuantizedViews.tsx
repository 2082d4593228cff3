/**
 * An FIR's quantized taps on the plane and the magnitude plot (loaded after the first view, see
 * firQuantizedSlot.tsx): their zeros in the marks of the quantized roots, and their magnitude response in
 * the dashed quantized line, from store/firQuantizedDerived.ts.
 */
import { qName } from '../../core/fixed/index.ts';
import type { FirImplementation } from '../../core/fixed/fir.ts';
import {
  selectFirQuantized,
  selectFirQuantizedMagnitude,
  type FirQuantized,
} from '../../store/firQuantizedDerived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import type { MagnitudeOverlayProps } from '../frequency/overlays.ts';
import { QuantizedLine, QuantizedTraceKey, useQuantizedPath } from '../frequency/QuantizedTrace.tsx';
import type { PlaneOverlayProps } from '../plane/overlays.ts';
import { QuantizedPlaneKey, quantizedMarks } from '../plane/QuantizedRoots.tsx';

/** "16-bit Q1.15 taps". */
const tapsFormat = (impl: FirImplementation) => `${impl.settings.wordLength}-bit ${qName(impl.format)} taps`;

/** What a second line of the key says when the drawn zeros are not simply the L − 1 of the taps. */
function zerosCaveat(q: FirQuantized): string | null {
  const { leadingZeroTaps: m, trailingZeroTaps: t, allZero, converged } = q.zeros;
  if (allZero) return 'every tap rounds to 0: no zeros to draw';
  const parts: string[] = [];
  const taps = (n: number) => (n === 1 ? '1 tap is' : `${n} taps are`);
  if (m > 0 && m === t) parts.push(`${taps(m)} 0 at each end: ${m} zeros fewer, ${t} at the origin`);
  else {
    if (m > 0) parts.push(`the first ${taps(m)} 0: ${m} zeros fewer`);
    if (t > 0) parts.push(`the last ${taps(t)} 0: ${t} zeros at the origin`);
  }
  if (!converged) parts.push('not every zero settled: drawn where the search stopped');
  return parts.length > 0 ? parts.join('; ') : null;
}

/** The quantized taps' zeros: diamonds like the quantized roots of sections, with a key. */
export function QuantizedTapZeros({ scale }: PlaneOverlayProps) {
  const q = useWorkbench(selectFirQuantized);
  if (!q) return null;
  const caveat = zerosCaveat(q);
  return (
    <g data-testid="quantized-tap-zeros" aria-hidden="true">
      {quantizedMarks('zero', null, q.zeros.zeros, scale)}
      <QuantizedPlaneKey testId="quantized-tap-zeros-key">
        {`◇ quantized: zeros of the ${tapsFormat(q.impl)}`}
      </QuantizedPlaneKey>
      {caveat ? (
        <QuantizedPlaneKey line={2} testId="quantized-tap-zeros-caveat">
          {caveat}
        </QuantizedPlaneKey>
      ) : null}
    </g>
  );
}

/** The quantized taps' magnitude response: the dashed quantized line, with a key. */
export function QuantizedTapTrace(props: MagnitudeOverlayProps) {
  const q = useWorkbench(selectFirQuantized);
  const curve = useWorkbench(selectFirQuantizedMagnitude);
  const d = useQuantizedPath(curve, props);
  if (!q || !curve) return null;
  return (
    <g data-testid="quantized-tap-trace" aria-hidden="true">
      <QuantizedLine d={d} />
      <QuantizedTraceKey rect={props.rect}>{`dashed: quantized, ${tapsFormat(q.impl)}`}</QuantizedTraceKey>
    </g>
  );
}
