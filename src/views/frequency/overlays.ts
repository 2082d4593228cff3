/**
 * Extra layers drawn in the frequency plots, under the cross-hair: features add theirs here (one line), e.g.
 * the requirement mask, the quantized filter's response, a pinned reference design. Each draws from the
 * store itself and uses the maps it is given, so the plots stay one piece of code. A layer of
 * PLOT_OVERLAYS is drawn once in every plot shown and says by `plot` which one it is in; a layer of
 * MAGNITUDE_OVERLAYS is drawn in the magnitude plot only.
 */
import { createElement, type ComponentType } from 'react';
import type { AxisMap } from '../chart/pixels.ts';
import type { PlotKey, PlotRect } from './layout.ts';
import { MaskLayer } from './mask/MaskLayer.tsx';
import { QuantizedTrace } from './QuantizedTrace.tsx';
import { FirQuantizedTrace } from '../firQuantized/firQuantizedSlot.tsx';
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

/** The units every plot shows: dB or linear magnitude, wrapped or unwrapped phase, delay in ms or samples. */
export interface PlotUnits {
  db: boolean;
  wrapped: boolean;
  ms: boolean;
}

export interface PlotOverlayProps {
  /** Which plot this copy of the layer is drawn in. */
  plot: PlotKey;
  /** That plot's box in SVG pixels. */
  rect: PlotRect;
  /** Hz → x pixel (linear or log). */
  xMap: AxisMap;
  /** Value in the plot's axis unit (dB or |H|; degrees; samples or ms) → y pixel. */
  yMap: AxisMap;
  units: PlotUnits;
}

export interface PlotOverlay {
  id: string;
  Layer: ComponentType<PlotOverlayProps>;
}

/** Layers drawn in the magnitude plot only. */
export const MAGNITUDE_OVERLAYS: MagnitudeOverlay[] = [
  { id: 'mask', Layer: MaskLayer },
  { id: 'quantized', Layer: QuantizedTrace },
  { id: 'quantizedTaps', Layer: FirQuantizedTrace },
];

/** A magnitude-only layer as a layer of every plot that draws nothing outside the magnitude plot. */
function magnitudeOnly({ id, Layer }: MagnitudeOverlay): PlotOverlay {
  function OnlyInMagnitude({ plot, rect, xMap, yMap, units }: PlotOverlayProps) {
    return plot === 'magnitude' ? createElement(Layer, { rect, xMap, yMap, db: units.db }) : null;
  }
  OnlyInMagnitude.displayName = `Magnitude(${id})`;
  return { id, Layer: OnlyInMagnitude };
}

/** Layers drawn in every frequency plot, in order (first is lowest). */
export const PLOT_OVERLAYS: PlotOverlay[] = [
  { id: 'reference', Layer: ReferenceTrace },
  ...MAGNITUDE_OVERLAYS.map(magnitudeOnly),
];
