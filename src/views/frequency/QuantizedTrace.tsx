/**
 * The quantized filter's magnitude response in the magnitude plot: a dashed raspberry line in the plot's
 * unit, refined at the quantized roots so a notch that moved shows where it went, with a one-line key.
 * Drawn only while the design has target settings and the overlay is on, and not during a root drag (the
 * key says so meanwhile). An FIR runs as taps on the target: its quantized taps' response is drawn by
 * views/firQuantized/ instead, in the same line.
 */
import { useMemo, type ReactNode } from 'react';
import { qName } from '../../core/fixed/index.ts';
import {
  selectImplementation,
  selectQuantizedDisplayResponse,
  selectRunsAsTaps,
  selectShowQuantized,
} from '../../store/implementationDerived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { linePath } from '../chart/paths.ts';
import { toPixels } from '../chart/pixels.ts';
import type { MagnitudeOverlayProps } from './overlays.ts';
import { omegaGridToHz } from '../../core/units.ts';
import { QuantizedKeyText } from '../shared/QuantizedKeyText.tsx';

const COLOUR = 'var(--pw-quantized)';

/** The dashed quantized line through (ω, |H| or dB) points in the magnitude plot's pixels. */
export function useQuantizedPath(
  curve: { omega: Float64Array; magnitude: Float64Array; magnitudeDb: Float64Array } | null,
  { rect, xMap, yMap, db }: MagnitudeOverlayProps,
): string {
  const fs = useWorkbench((s) => s.design.sampleRate);
  return useMemo(() => {
    if (!curve) return '';
    const px = toPixels(xMap, omegaGridToHz(curve.omega, fs));
    const py = toPixels(yMap, db ? curve.magnitudeDb : curve.magnitude);
    return linePath(px, py, { top: rect.top, bottom: rect.bottom, thin: true });
  }, [curve, fs, xMap, yMap, db, rect.top, rect.bottom]);
}

/** The quantized line itself: dashed raspberry. */
export function QuantizedLine({ d }: { d: string }) {
  return <path d={d} fill="none" stroke={COLOUR} strokeWidth={1.4} strokeDasharray="5 3" />;
}

/** The one-line key of the quantized line, in the magnitude plot's bottom left corner. */
export function QuantizedTraceKey({
  rect,
  children,
  testId,
}: {
  rect: MagnitudeOverlayProps['rect'];
  children: ReactNode;
  testId?: string;
}) {
  return (
    <QuantizedKeyText x={rect.left + 6} y={rect.bottom - 6} testId={testId}>
      {children}
    </QuantizedKeyText>
  );
}

/** The key alone while a drag holds the quantized line back. */
export function QuantizedTracePaused({ rect }: { rect: MagnitudeOverlayProps['rect'] }) {
  return (
    <g aria-hidden="true">
      <QuantizedTraceKey rect={rect} testId="quantized-trace-paused">
        dashed quantized line: drawn again when you let go
      </QuantizedTraceKey>
    </g>
  );
}

export function QuantizedTrace(props: MagnitudeOverlayProps) {
  const on = useWorkbench((s) => selectShowQuantized(s) && !selectRunsAsTaps(s));
  // Hidden during a root drag: rebuilding the implementation every frame costs too much (see useTarget.ts).
  const dragging = useWorkbench((s) => s.dragging);
  const shown = on && !dragging;
  const result = useWorkbench((s) => (shown ? selectImplementation(s) : null));
  const response = useWorkbench((s) => (shown ? selectQuantizedDisplayResponse(s) : null));
  const impl = result?.ok ? result.value : null;
  const d = useQuantizedPath(impl ? response : null, props);
  if (on && dragging) return <QuantizedTracePaused rect={props.rect} />;
  if (!impl) return null;
  return (
    <g data-testid="quantized-trace" aria-hidden="true">
      <QuantizedLine d={d} />
      <QuantizedTraceKey rect={props.rect}>
        {`dashed: quantized, ${impl.settings.wordLength}-bit ${qName(impl.quantized.format)}`}
      </QuantizedTraceKey>
    </g>
  );
}
