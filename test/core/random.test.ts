import { describe, it, expect } from 'vitest';
import { mulberry32 } from '../../src/core/random.ts';
import { expectClose } from '../helpers/expectClose.ts';

describe('mulberry32', () => {
  it('is deterministic and uniform on [0, 1)', () => {
    const a = mulberry32(7);
    const b = mulberry32(7);
    const c = mulberry32(8);
    const xs = Array.from({ length: 10000 }, () => a());
    expect(xs.slice(0, 5)).toEqual(Array.from({ length: 5 }, () => b()));
    expect(xs[0]).not.toBe(c());
    expect(Math.min(...xs)).toBeGreaterThanOrEqual(0);
    expect(Math.max(...xs)).toBeLessThan(1);
    // mean 1/2 with standard error 1/sqrt(12·10000) ≈ 0.003
    expectClose(xs.reduce((s, v) => s + v, 0) / xs.length, 0.5, { abs: 0.012 });
  });
});
