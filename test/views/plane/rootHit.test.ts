import { describe, it, expect } from 'vitest';
import { planeScale } from '../../../src/views/plane/geometry.ts';
import { HIT_RADIUS_PX, nearestRoot } from '../../../src/views/plane/rootHit.ts';

// 400 × 400 px showing ±1 about the origin: 200 px per z unit, z = 0 at (200, 200).
const s = planeScale({ span: 1, centre: { re: 0, im: 0 } }, 400, 400);
const zero = { re: 0.99, im: 0.1, multiplicity: 1 };
const pole = { re: 0.98, im: 0.1, multiplicity: 1 }; // 2 px left of the zero

describe('nearestRoot', () => {
  it('picks the marker whose centre is nearest, so a zero just under a pole can be grabbed', () => {
    expect(nearestRoot([zero], [pole], s, s.x(0.99), s.y(0.1))).toEqual({
      ref: { kind: 'zero', index: 0 },
      mirror: false,
    });
    expect(nearestRoot([zero], [pole], s, s.x(0.98), s.y(0.1))).toEqual({
      ref: { kind: 'pole', index: 0 },
      mirror: false,
    });
  });
  it('finds the conjugate mirror below the axis', () => {
    expect(nearestRoot([zero], [], s, s.x(0.99), s.y(-0.1))).toEqual({
      ref: { kind: 'zero', index: 0 },
      mirror: true,
    });
  });
  it('misses beyond the hit radius and never offers a mirror of a real root', () => {
    expect(nearestRoot([zero], [pole], s, s.x(0.5), s.y(0.5))).toBeNull();
    const real = { re: 0.5, im: 0, multiplicity: 2 };
    expect(nearestRoot([], [real], s, s.x(0.5), s.y(0) + HIT_RADIUS_PX - 1)).toEqual({
      ref: { kind: 'pole', index: 0 },
      mirror: false,
    });
  });
});
