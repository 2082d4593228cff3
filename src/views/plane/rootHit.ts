/**
 * Which root a press picks: the marker whose centre is nearest the pointer within the hit radius, so a zero
 * sitting just under a pole can still be grabbed by pressing on its own centre.
 */
import type { Root } from '../../core/types.ts';
import type { RootKind, RootRef } from '../../core/model/design.ts';
import type { PlaneScale } from './geometry.ts';

/** Radius round a marker's centre that a press may land in, pixels (generous for touch). */
export const HIT_RADIUS_PX = 14;

export interface RootHit {
  ref: RootRef;
  /** True when the press was on the conjugate mirror (below the axis). */
  mirror: boolean;
}

/** The root (or mirror) nearest the pixel (px, py) within `radius` pixels; poles win exact ties. */
export function nearestRoot(
  zeros: Root[],
  poles: Root[],
  s: PlaneScale,
  px: number,
  py: number,
  radius = HIT_RADIUS_PX,
): RootHit | null {
  let best: RootHit | null = null;
  let bestD = radius;
  const scan = (kind: RootKind, roots: Root[]) =>
    roots.forEach((r, index) => {
      for (const mirror of r.im === 0 ? [false] : [false, true]) {
        const d = Math.hypot(s.x(r.re) - px, s.y(mirror ? -r.im : r.im) - py);
        if (d <= bestD) {
          bestD = d;
          best = { ref: { kind, index }, mirror };
        }
      }
    });
  scan('zero', zeros);
  scan('pole', poles);
  return best;
}
