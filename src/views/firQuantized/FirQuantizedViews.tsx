/**
 * An FIR's quantized taps on the plane and the magnitude plot (loaded after the first view, see
 * firQuantizedSlot.tsx): their zeros in the marks of the quantized roots, and their magnitude response in
 * the dashed quantized line, from store/firQuantizedDerived.ts. A long tap set's zeros are found in a worker
 * (tapZerosFinder.ts): until they come the plane's key says they are being found and no marks are drawn,
 * and the line is drawn on the plot's grid alone, its key saying the notches' depths follow with the zeros.
 */
import { qName } from '../../core/fixed/index.ts';
import type { FirImplementation } from '../../core/fixed/fir.ts';
import type { TapZeros } from '../../core/fixed/firQuantized.ts';
import { selectResponse } from '../../store/derived.ts';
import { selectFirQuantizedTaps, tapsMagnitudeOn } from '../../store/firQuantizedDerived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import type { MagnitudeOverlayProps } from '../frequency/overlays.ts';
import { QuantizedLine, QuantizedTraceKey, useQuantizedPath } from '../frequency/QuantizedTrace.tsx';
import type { PlaneOverlayProps } from '../plane/overlays.ts';
import { QuantizedPlaneKey, quantizedMarks } from '../plane/QuantizedRoots.tsx';
import { useTapZeros } from './tapZerosFinder.ts';

/** "16-bit Q1.15 taps". */
const tapsFormat = (impl: FirImplementation) => `${impl.settings.wordLength}-bit ${qName(impl.format)} taps`;

/** What a second line of the key says when the drawn zeros are not simply the L − 1 of the taps. */
function zerosCaveat(zeros: TapZeros): string | null {
  const { leadingZeroTaps: m, trailingZeroTaps: t, allZero, converged } = zeros;
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
  const q = useWorkbench(selectFirQuantizedTaps);
  const answer = useTapZeros(q?.taps ?? null);
  if (!q || !answer) return null;
  if (answer.status === 'finding')
    return (
      <g data-testid="quantized-tap-zeros-finding" aria-hidden="true">
        <QuantizedPlaneKey testId="quantized-tap-zeros-finding-key">
          {`◇ quantized: finding the zeros of the ${tapsFormat(q.impl)}…`}
        </QuantizedPlaneKey>
      </g>
    );
  const caveat = zerosCaveat(answer.zeros);
  return (
    <g data-testid="quantized-tap-zeros" aria-hidden="true">
      {quantizedMarks('zero', null, answer.zeros.zeros, scale)}
      <QuantizedPlaneKey testId="quantized-tap-zeros-key">
        {`◇ quantized: zeros of the ${tapsFormat(q.impl)}`}
      </QuantizedPlaneKey>
      {caveat ? (
        <QuantizedPlaneKey line={2} testId="quantized-tap-zeros-caveat">
          {caveat}
        </QuantizedPlaneKey>
      ) : null}
      {answer.failure ? (
        <QuantizedPlaneKey line={caveat ? 3 : 2} testId="quantized-tap-zeros-failure">
          {`${answer.failure}: zeros found on the page instead, which may pause at each change`}
        </QuantizedPlaneKey>
      ) : null}
    </g>
  );
}

/**
 * The quantized taps' magnitude response: the dashed quantized line, with a key. While a long tap set's zeros
 * are being found it is drawn on the plot's grid alone (right at every grid point, but a notch between two
 * may read shallower), and points at the zeros' angles are added once they come.
 */
export function QuantizedTapTrace(props: MagnitudeOverlayProps) {
  const q = useWorkbench(selectFirQuantizedTaps);
  const grid = useWorkbench((s) => selectResponse(s).omega);
  const answer = useTapZeros(q?.taps ?? null);
  const curve =
    q && answer ? tapsMagnitudeOn(q.taps, answer.status === 'found' ? answer.zeros : null, grid) : null;
  const d = useQuantizedPath(curve, props);
  if (!q || !answer || !curve) return null;
  const finding = answer.status === 'finding';
  return (
    <g data-testid="quantized-tap-trace" data-finding={finding ? 'true' : undefined} aria-hidden="true">
      <QuantizedLine d={d} />
      <QuantizedTraceKey rect={props.rect}>
        {`dashed: quantized, ${tapsFormat(q.impl)}${finding ? '; notch depths follow once their zeros are found' : ''}`}
      </QuantizedTraceKey>
    </g>
  );
}
