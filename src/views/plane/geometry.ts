/**
 * The plane's mapping between z and screen pixels: one scale for both axes (circles stay round), centred on
 * view.planeCentre, showing at least view.planeSpan z units either side of it along the shorter side.
 */
import type { Complex } from '../../core/types.ts';
import { linearScale, type LinearScale } from '../chart/linearScale.ts';
import { MAX_SPAN, MIN_SPAN, type PlaneView } from '../../store/planeFit.ts';

export type { PlaneView } from '../../store/planeFit.ts';

export interface PlaneScale {
  /** Real part → x pixel. */
  x: LinearScale;
  /** Imaginary part → y pixel (up is positive). */
  y: LinearScale;
  /** Pixels per z unit. */
  k: number;
  width: number;
  height: number;
}

/** Scales for a box of width × height pixels showing the given view. */
export function planeScale(view: PlaneView, width: number, height: number): PlaneScale {
  const w = Math.max(1, width);
  const h = Math.max(1, height);
  const k = Math.min(w, h) / (2 * view.span);
  const halfRe = w / 2 / k;
  const halfIm = h / 2 / k;
  const { re, im } = view.centre;
  return {
    x: linearScale([re - halfRe, re + halfRe], [0, w]),
    y: linearScale([im - halfIm, im + halfIm], [h, 0]),
    k,
    width: w,
    height: h,
  };
}

/** The z of a pixel position inside the plane box. */
export function pixelToZ(s: PlaneScale, px: number, py: number): Complex {
  return { re: s.x.invert(px), im: s.y.invert(py) };
}

export { MIN_SPAN, MAX_SPAN, FIT_MARGIN, FIT_MIN_SPAN, HOME_VIEW, fitView } from '../../store/planeFit.ts';

/** The view after zooming by `factor` (< 1 zooms in) about the point z, which stays under the pointer. */
export function zoomAbout(view: PlaneView, factor: number, z: Complex): PlaneView {
  const span = Math.min(MAX_SPAN, Math.max(MIN_SPAN, view.span * factor));
  const f = span / view.span;
  return {
    span,
    centre: { re: z.re - (z.re - view.centre.re) * f, im: z.im - (z.im - view.centre.im) * f },
  };
}
