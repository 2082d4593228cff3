/**
 * The plane's mapping between z and screen pixels: one scale for both axes (circles stay round), centred on
 * view.planeCentre, showing at least view.planeSpan z units either side of it along the shorter side.
 */
import type { Complex } from '../../core/types.ts';
import { linearScale, type LinearScale } from '../chart/linearScale.ts';

export interface PlaneView {
  span: number;
  centre: Complex;
}

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

/** Smallest and largest half-width the view may take, in z units. */
export const MIN_SPAN = 1e-4;
export const MAX_SPAN = 1e4;

/** The view after zooming by `factor` (< 1 zooms in) about the point z, which stays under the pointer. */
export function zoomAbout(view: PlaneView, factor: number, z: Complex): PlaneView {
  const span = Math.min(MAX_SPAN, Math.max(MIN_SPAN, view.span * factor));
  const f = span / view.span;
  return {
    span,
    centre: { re: z.re - (z.re - view.centre.re) * f, im: z.im - (z.im - view.centre.im) * f },
  };
}

/** Margin around the roots when fitting the view to them, as a fraction of their extent. */
export const FIT_MARGIN = 0.25;
/** Smallest half-width a fit gives, so a single root or a tight cluster is not magnified absurdly. */
export const FIT_MIN_SPAN = 0.02;
/** The view that shows the unit circle with a margin. */
export const HOME_VIEW: PlaneView = { span: 1.3, centre: { re: 0, im: 0 } };

/** A view that frames every point given (roots and their mirrors), or the home view when there are none. */
export function fitView(points: Complex[]): PlaneView {
  const finite = points.filter((p) => Number.isFinite(p.re) && Number.isFinite(p.im));
  if (finite.length === 0) return HOME_VIEW;
  let x0 = Infinity;
  let x1 = -Infinity;
  let y0 = Infinity;
  let y1 = -Infinity;
  for (const p of finite) {
    x0 = Math.min(x0, p.re);
    x1 = Math.max(x1, p.re);
    y0 = Math.min(y0, p.im);
    y1 = Math.max(y1, p.im);
  }
  const half = Math.max(x1 - x0, y1 - y0) / 2;
  const span = Math.min(MAX_SPAN, Math.max(FIT_MIN_SPAN, half * (1 + FIT_MARGIN)));
  return { span, centre: { re: (x0 + x1) / 2, im: (y0 + y1) / 2 } };
}
