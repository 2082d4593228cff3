/**
 * Which part of the z-plane the plane view shows, and the view that frames a design: every root and its
 * conjugate mirror, with the unit circle kept in the picture. The store uses it when a design arrives whole
 * (typed and applied, opened from a file or a link), so a root far outside the circle is never off screen.
 */
import type { Complex } from '../core/types.ts';
import type { Design } from '../core/model/design.ts';

export interface PlaneView {
  /** Half-width shown along the shorter side of the plane box, z units. */
  span: number;
  centre: Complex;
}

/** Smallest and largest half-width the view may take, in z units. */
export const MIN_SPAN = 1e-4;
export const MAX_SPAN = 1e4;
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

/** Every root of the design with its conjugate mirror (a complex root stands for a pair). */
export function rootPoints(design: Pick<Design, 'zeros' | 'poles'>): Complex[] {
  return [...design.zeros, ...design.poles].flatMap((r) => [
    { re: r.re, im: r.im },
    { re: r.re, im: -r.im },
  ]);
}

/**
 * Whether the view surely shows every point: each lies inside the square of half-width `span` about the
 * centre, which the plane box shows whatever its shape (the shorter side shows exactly that much).
 */
export function viewShows(view: PlaneView, points: Complex[]): boolean {
  return points.every(
    (p) =>
      !Number.isFinite(p.re) ||
      !Number.isFinite(p.im) ||
      (Math.abs(p.re - view.centre.re) <= view.span && Math.abs(p.im - view.centre.im) <= view.span),
  );
}

/** The unit circle's extreme points: a view framing them shows the whole circle. */
const CIRCLE_EXTENT: Complex[] = [
  { re: 1, im: 0 },
  { re: -1, im: 0 },
  { re: 0, im: 1 },
  { re: 0, im: -1 },
];

/**
 * The view after a design arrives whole: the current one when it already shows every root and the unit
 * circle (nothing jumps), otherwise one framing the roots and the circle together, never tighter than the
 * home view.
 */
export function viewForDesign(view: PlaneView, design: Pick<Design, 'zeros' | 'poles'>): PlaneView {
  const points = rootPoints(design);
  if (viewShows(view, points) && viewShows(view, CIRCLE_EXTENT)) return view;
  if (viewShows(HOME_VIEW, points)) return HOME_VIEW;
  return fitView([...points, ...CIRCLE_EXTENT]);
}

/** View settings with the plane framing every root of `design` and the unit circle (the same object if they did). */
export function framed<V extends { planeSpan: number; planeCentre: Complex }>(
  view: V,
  design: Pick<Design, 'zeros' | 'poles'>,
): V {
  const current = { span: view.planeSpan, centre: view.planeCentre };
  const next = viewForDesign(current, design);
  return next === current ? view : { ...view, planeSpan: next.span, planeCentre: next.centre };
}
