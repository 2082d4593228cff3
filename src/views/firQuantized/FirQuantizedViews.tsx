/**
 * An FIR's quantized taps on the plane and the magnitude plot (loaded after the first view, see
 * firQuantizedSlot.tsx): their zeros in the marks of the quantized roots, and their magnitude response in
 * the dashed quantized line, from store/firQuantizedDerived.ts.
 */
import { qName } from '../../core/fixed/index.ts';
import type { FirImplementation } from '../../core/fixed/fir.ts';
import { selectFirQuantized, selectFirQuantizedMagnitude } from '../../store/firQuantizedDerived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import type { MagnitudeOverlayProps } from '../frequency/overlays.ts';
import { QuantizedLine, QuantizedTraceKey, useQuantizedPath } from '../frequency/QuantizedTrace.tsx';
import type { PlaneOverlayProps } from '../plane/overlays.ts';
import { QuantizedPlaneKey, quantizedMarks } from '../plane/QuantizedRoots.tsx';

/** "16-bit Q1.15 taps". */
const tapsFormat = (impl: FirImplementation) => `${impl.settings.wordLength}-bit ${qName(impl.format)} taps`;

/** What the key adds when the drawn zeros are not simply the L − 1 of the taps. */
function zerosCaveat(q: NonNullable<ReturnType<typeof selectFirQuantized>>): string {
  const { leadingZeroTaps: m, allZero, converged } = q.zeros;
  if (allZero) return ': every tap rounds to 0, so the filter is 0 and has no zeros to draw';
  const parts: string[] = [];
  if (m > 0) parts.push(`the first ${m === 1 ? 'tap rounds' : `${m} taps round`} to 0, so ${m} fewer zeros`);
  if (!converged) parts.push('the root finder did not settle every zero: drawn where it stopped');
  return parts.length > 0 ? ` (${parts.join('; ')})` : '';
}

/** The quantized taps' zeros: diamonds like the quantized roots of sections, with a key. */
export function QuantizedTapZeros({ scale }: PlaneOverlayProps) {
  const q = useWorkbench(selectFirQuantized);
  if (!q) return null;
  return (
    <g data-testid="quantized-tap-zeros" aria-hidden="true">
      {quantizedMarks('zero', null, q.zeros.zeros, scale)}
      <QuantizedPlaneKey testId="quantized-tap-zeros-key">
        {`◇ quantized: zeros of the ${tapsFormat(q.impl)}${zerosCaveat(q)}`}
      </QuantizedPlaneKey>
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
