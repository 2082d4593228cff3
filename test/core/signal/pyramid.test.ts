import { describe, expect, it } from 'vitest';
import {
  PYRAMID_BASE,
  PyramidBuilder,
  columnExtremes,
  pyramidOf,
  rangeExtremes,
} from '../../../src/core/signal/index.ts';
import { mulberry32 } from '../../../src/core/random.ts';

/** Smallest and largest of x over [a, b) by looking at every sample. */
function bruteForce(x: Float64Array, a: number, b: number): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = Math.max(0, a); i < Math.min(x.length, b); i++) {
    lo = Math.min(lo, x[i]!);
    hi = Math.max(hi, x[i]!);
  }
  return [lo, hi];
}

const next = mulberry32(21);
// A random walk with spikes, of a length that leaves partial blocks at every level.
const x = new Float64Array(PYRAMID_BASE * 4 ** 5 + 77);
for (let i = 1; i < x.length; i++)
  x[i] = x[i - 1]! + (next() - 0.5) + (next() < 1e-3 ? 40 * (next() - 0.5) : 0);
const f32 = (v: number) => Math.fround(v);

describe('min/max pyramid', () => {
  const p = pyramidOf(x);

  it('ends in one block holding the extremes of the whole signal', () => {
    const top = p.levels.at(-1)!;
    expect(top.min.length).toBe(1);
    const [lo, hi] = bruteForce(x, 0, x.length);
    expect(top.min[0]).toBe(f32(lo));
    expect(top.max[0]).toBe(f32(hi));
  });

  it('built in pieces of odd sizes equals built at once', () => {
    const b = new PyramidBuilder(x.length);
    for (let i = 0, k = 0; i < x.length; k++) {
      const step = [1, 31, 33, 1000, 7][k % 5]!;
      b.push(x.subarray(i, i + step));
      i += step;
    }
    const q = b.finish();
    q.levels.forEach((l, i) => {
      expect(Array.from(l.min)).toEqual(Array.from(p.levels[i]!.min));
      expect(Array.from(l.max)).toEqual(Array.from(p.levels[i]!.max));
    });
  });

  it('with the raw samples, any range reads exactly what its samples hold (to float32)', () => {
    for (let t = 0; t < 400; t++) {
      const a = Math.floor(next() * x.length);
      const b = a + Math.floor(next() * (t % 2 ? 50 : x.length - a));
      const [lo, hi] = rangeExtremes(p, a, b, x);
      const [elo, ehi] = bruteForce(x, a, b);
      if (b <= a) continue;
      expect([f32(lo), f32(hi)], `[${a}, ${b})`).toEqual([f32(elo), f32(ehi)]);
    }
  });

  it('without them, a range reads the whole finest blocks it touches', () => {
    for (let t = 0; t < 400; t++) {
      const a = Math.floor(next() * x.length);
      const b = Math.min(x.length, a + 1 + Math.floor(next() * 5000));
      const [lo, hi] = rangeExtremes(p, a, b);
      const covered = bruteForce(
        x,
        Math.floor(a / PYRAMID_BASE) * PYRAMID_BASE,
        Math.ceil(b / PYRAMID_BASE) * PYRAMID_BASE,
      );
      expect([lo, hi], `[${a}, ${b})`).toEqual(covered.map(f32));
    }
  });

  it('columns split the range as the plot does and each reads its own stretch', () => {
    const i0 = 12345;
    const i1 = 98765;
    const columns = 333;
    const c = columnExtremes(p, i0, i1, columns, x);
    const per = (i1 - i0) / columns;
    for (let k = 0; k < columns; k++) {
      const a = i0 + Math.floor(k * per);
      const b = Math.max(a + 1, Math.min(i1, i0 + Math.floor((k + 1) * per)));
      const [lo, hi] = bruteForce(x, a, b);
      expect([c.min[k], c.max[k]]).toEqual([f32(lo), f32(hi)]);
    }
  });

  it('ignores NaN and handles an empty signal', () => {
    const q = pyramidOf(Float64Array.of(NaN, 1, -2, NaN));
    expect(rangeExtremes(q, 0, 4)).toEqual([-2, 1]);
    expect(pyramidOf(new Float64Array(0)).levels[0]!.min.length).toBe(0);
    expect(rangeExtremes(q, 2, 2)).toEqual([Infinity, -Infinity]);
  });
});
