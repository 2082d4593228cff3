/**
 * Extra layers drawn in the magnitude plot, under the cross-hair: features add theirs here (one line), e.g.
 * the requirement mask, the quantized filter's response, a pinned reference design. Each draws from the
 * store itself and uses the maps it is given, so the plot stays one piece of code.
 */
import type { ComponentType } from 'react';
import type { AxisMap } from '../chart/pixels.ts';
import type { PlotRect } from './layout.ts';
import { MaskLayer } from './mask/MaskLayer.tsx';
import { QuantizedTrace } from './QuantizedTrace.tsx';
import { ReferenceTrace } from './ReferenceTrace.tsx';

export interface MagnitudeOverlayProps {
  /** The magnitude plot's box in SVG pixels. */
  rect: PlotRect;
  /** Hz → x pixel (linear or log). */
  xMap: AxisMap;
  /** Magnitude (in the plot's unit: dB or linear) → y pixel. */
  yMap: AxisMap;
  /** Whether the plot shows dB (true) or linear magnitude (false). */
  db: boolean;
}

export interface MagnitudeOverlay {
  id: string;
  Layer: ComponentType<MagnitudeOverlayProps>;
}

export const MAGNITUDE_OVERLAYS: MagnitudeOverlay[] = [
  { id: 'reference', Layer: ReferenceTrace },
  { id: 'mask', Layer: MaskLayer },
  { id: 'quantized', Layer: QuantizedTrace },
];
