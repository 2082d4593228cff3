/**
 * Extra layers drawn on the z-plane between the grid and the draggable roots: features add theirs here (one
 * line), e.g. the quantized roots (of sections, or an FIR's quantized taps), a pinned reference design's roots. Each reads the store itself and draws
 * with the plane's scale; overlays never take pointer events (the roots above them must stay draggable).
 */
import type { ComponentType } from 'react';
import type { PlaneScale } from './geometry.ts';
import { ReferenceRoots } from './ReferenceRoots.tsx';
import { QuantizedRoots } from './QuantizedRoots.tsx';
import { FirQuantizedZeros } from '../firQuantized/firQuantizedSlot.tsx';

export interface PlaneOverlayProps {
  scale: PlaneScale;
}

export interface PlaneOverlay {
  id: string;
  Layer: ComponentType<PlaneOverlayProps>;
}

export const PLANE_OVERLAYS: PlaneOverlay[] = [
  { id: 'reference', Layer: ReferenceRoots },
  { id: 'quantized', Layer: QuantizedRoots },
  { id: 'quantizedTaps', Layer: FirQuantizedZeros },
];
