import { describe, it, expect } from 'vitest';
import { juryTest } from '../../src/core/jury.ts';
import { expectClose } from '../helpers/expectClose.ts';

describe('juryTest', () => {
  it('gives the reflection coefficients of a stable second-order denominator', () => {
    // common practice: for 1 + a1 z^-1 + a2 z^-2, k2 = a2 and k1 = a1 / (1 + a2)
    const r = juryTest([1, -0.9, 0.5]);
    expect(r.verdict).toBe('stable');
    expectClose(r.reflection, [0.5, -0.6], { rel: 1e-15 });
  });
  it('fails at the first coefficient with |k| >= 1 and says whether it sits on the boundary', () => {
    const on = juryTest([1, 0, 1]); // poles at ±j
    expect(on).toMatchObject({ verdict: 'not-stable', failedAtDegree: 2, onBoundary: true });
    const out = juryTest([1, -3, 2]); // poles at 1 and 2
    expect(out.verdict).toBe('not-stable');
    expect(out.onBoundary).toBe(false);
    expect(out.detail).toMatch(/k2 = 2/);
  });
  it('ignores scale and leading zeros; a constant has no poles', () => {
    expect(juryTest([0, 4, -2]).verdict).toBe('stable'); // 4z - 2: pole at 0.5
    expect(juryTest([3]).verdict).toBe('stable');
  });
  it('rejects an all-zero or non-finite denominator', () => {
    expect(() => juryTest([0, 0])).toThrow(/all zeros/);
    expect(() => juryTest([1, Infinity])).toThrow(/a\[1\]/);
  });
});
