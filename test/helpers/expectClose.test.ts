import { describe, it, expect } from 'vitest';
import { expectClose, closeness } from './expectClose.ts';

describe('expectClose', () => {
  it('accepts values inside the tolerance', () => {
    expect(() => expectClose([1, 2], [1 + 1e-10, 2], { rel: 1e-9 })).not.toThrow();
  });
  it('rejects values outside the tolerance and names the index', () => {
    expect(() => expectClose([1, 2.1], [1, 2], { rel: 1e-3 }, 'h')).toThrow(/h\[1\]/);
  });
  it('rejects NaN against a number', () => {
    expect(() => expectClose(NaN, 1, { abs: 1 })).toThrow();
  });
  it('rejects a length mismatch', () => {
    expect(() => expectClose([1], [1, 2], { abs: 1 })).toThrow();
  });
  it('closeness reports the worst violation ratio', () => {
    expect(closeness([1.5], [1], { abs: 1 })).toBeCloseTo(0.5, 12);
  });
});
