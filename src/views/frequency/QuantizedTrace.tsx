/**
 * The quantized filter's magnitude response in the magnitude plot: a dashed raspberry line in the plot's
 * unit, refined at the quantized roots so a notch that moved shows where it went, with a one-line key.
 * Drawn only while the design has target settings and the overlay is on, and not during a root drag.
 */
import { useMemo } from 'react';
import { qName } from '../../core/fixed/index.ts';
import {
  selectImplementation,
  selectQuantizedDisplayResponse,
  selectShowQuantized,
} from '../../store/implementationDerived.ts';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { linePath } from '../chart/paths.ts';
import { toPixels } from '../chart/pixels.ts';
import type { MagnitudeOverlayProps } from './overlays.ts';
import { omegaGridToHz } from '../../core/units.ts';

const COLOUR = 'var(--pw-quantized)';

export function QuantizedTrace({ rect, xMap, yMap, db }: MagnitudeOverlayProps) {
  // Hidden during a root drag: rebuilding the implementation every frame costs too much (see useTarget.ts).
  const shown = useWorkbench((s) => selectShowQuantized(s) && !s.dragging);
  const result = useWorkbench((s) => (shown ? selectImplementation(s) : null));
  const response = useWorkbench((s) => (shown ? selectQuantizedDisplayResponse(s) : null));
  const fs = useWorkbench((s) => s.design.sampleRate);
  const impl = result?.ok ? result.value : null;
  const d = useMemo(() => {
    if (!impl || !response) return '';
    const px = toPixels(xMap, omegaGridToHz(response.omega, fs));
    const py = toPixels(yMap, db ? response.magnitudeDb : response.magnitude);
    return linePath(px, py, { top: rect.top, bottom: rect.bottom, thin: true });
  }, [impl, response, fs, xMap, yMap, db, rect.top, rect.bottom]);
  if (!impl) return null;
  return (
    <g data-testid="quantized-trace" aria-hidden="true">
      <path d={d} fill="none" stroke={COLOUR} strokeWidth={1.4} strokeDasharray="5 3" />
      <text
        x={rect.left + 6}
        y={rect.bottom - 6}
        fill={COLOUR}
        fontSize={11}
        stroke="#fff"
        strokeWidth={3}
        paintOrder="stroke"
      >
        {`dashed: quantized, ${impl.settings.wordLength}-bit ${qName(impl.quantized.format)}`}
      </text>
    </g>
  );
}
