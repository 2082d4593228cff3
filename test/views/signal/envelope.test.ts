import { describe, expect, it } from 'vitest';
import { columnEnvelope, extentOf, tracePath, visibleSamples } from '../../../src/views/signal/envelope.ts';
import { mulberry32 } from '../../../src/core/random.ts';

describe('columnEnvelope', () => {
  it('holds the min and max of every column, so a one-sample spike survives (seeded invariant)', () => {
    const next = mulberry32(7);
    for (let trial = 0; trial < 20; trial++) {
      const n = 1000 + Math.floor(next() * 50000);
      const x = Float64Array.from({ length: n }, () => next() * 2 - 1);
      const spike = Math.floor(next() * n);
      x[spike] = 5;
      const columns = 50 + Math.floor(next() * 700);
      const { min, max } = columnEnvelope(x, 0, n, columns);
      expect(Math.max(...max)).toBe(5);
      // Every sample lies within the extremes of its own column.
      for (let i = 0; i < n; i += 97) {
        const c = Math.min(columns - 1, Math.floor((i * columns) / n));
        const cc = [c - 1, c, c + 1].filter((k) => k >= 0 && k < columns);
        expect(cc.some((k) => x[i]! >= min[k]! && x[i]! <= max[k]!)).toBe(true);
      }
    }
  });

  it('extentOf ignores nothing finite and returns [0, 0] for an empty range', () => {
    expect(extentOf([3, -1, 2], 0, 3)).toEqual([-1, 3]);
    expect(extentOf([3, -1, 2], 1, 1)).toEqual([0, 0]);
  });
});

describe('tracePath', () => {
  const frame = (kx: number) => ({ left: 10, right: 110, top: 0, bottom: 100, x0: 10, kx, y0: 50, ky: 10 });

  it('draws a line through the samples when they are sparse, a closed band when dense', () => {
    const sparse = tracePath([0, 1, -1, 0], frame(25));
    expect(sparse.band).toBe(false);
    expect(sparse.d).toBe('M10 50L35 40L60 60L85 50');
    const x = Float64Array.from({ length: 10000 }, (_, i) => Math.sin(i));
    const dense = tracePath(x, frame(0.01));
    expect(dense.band).toBe(true);
    expect(dense.d.endsWith('Z')).toBe(true);
    // Two points per column (top and bottom), 100 columns.
    expect(dense.d.match(/[ML]/g)).toHaveLength(200);
  });

  it('the visible samples cover the frame with one to spare on each side', () => {
    expect(
      visibleSamples({ left: 10, right: 110, top: 0, bottom: 1, x0: -90, kx: 1, y0: 0, ky: 1 }, 1000),
    ).toEqual([100, 201]);
  });
});
