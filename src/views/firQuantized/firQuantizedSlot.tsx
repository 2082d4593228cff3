/**
 * Places on the plane and the magnitude plot for an FIR's quantized taps (FirQuantizedViews.tsx), whose code
 * loads after the first paint (shared/lazyPart.tsx): it needs the root finder and the FIR arithmetic, and
 * draws only once a target is set. Until the code is there, and while a root is dragged (finding the zeros
 * of the taps again on every move would cost a frame), the keys say so instead of drawing anything stale.
 */
import { selectRunsAsTaps, selectShowQuantized } from '../../store/implementationDerived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import type { MagnitudeOverlayProps } from '../frequency/overlays.ts';
import { QuantizedTraceKey, QuantizedTracePaused } from '../frequency/QuantizedTrace.tsx';
import type { PlaneOverlayProps } from '../plane/overlays.ts';
import { QuantizedPlaneKey, QuantizedPlanePaused } from '../plane/QuantizedRoots.tsx';
import { lazyPart } from '../shared/lazyPart.tsx';

const views = () => import('./FirQuantizedViews.tsx');

const waitingText = (failed: boolean) =>
  failed ? 'could not be loaded (reload the page to try again)' : 'loading…';

const zerosPart = lazyPart(
  () => views().then((m) => m.QuantizedTapZeros),
  ({ failed }: PlaneOverlayProps & { failed: boolean }) => (
    <g aria-hidden="true">
      <QuantizedPlaneKey testId="quantized-tap-zeros-waiting">{`◇ quantized taps: ${waitingText(failed)}`}</QuantizedPlaneKey>
    </g>
  ),
);
const tracePart = lazyPart(
  () => views().then((m) => m.QuantizedTapTrace),
  ({ rect, failed }: MagnitudeOverlayProps & { failed: boolean }) => (
    <g aria-hidden="true">
      <QuantizedTraceKey rect={rect} testId="quantized-tap-trace-waiting">
        {`dashed quantized line: ${waitingText(failed)}`}
      </QuantizedTraceKey>
    </g>
  ),
);

/** Fetches the layers' code (views/prefetch.ts calls it after the first paint). */
export const prefetchFirQuantized = () => Promise.all([zerosPart.prefetch(), tracePart.prefetch()]);

const useShown = () => useWorkbench((s) => selectShowQuantized(s) && selectRunsAsTaps(s));

/** The plane's layer: the quantized taps' zeros of an FIR with a target set. */
export function FirQuantizedZeros(props: PlaneOverlayProps) {
  const on = useShown();
  const dragging = useWorkbench((s) => s.dragging);
  if (!on) return null;
  if (dragging) return <QuantizedPlanePaused marks="◇" />;
  return <zerosPart.Part {...props} />;
}

/** The magnitude plot's layer: the quantized taps' response of an FIR with a target set. */
export function FirQuantizedTrace(props: MagnitudeOverlayProps) {
  const on = useShown();
  const dragging = useWorkbench((s) => s.dragging);
  if (!on) return null;
  if (dragging) return <QuantizedTracePaused rect={props.rect} />;
  return <tracePart.Part {...props} />;
}
