import { describe, it, expect } from 'vitest';
import { formatNumber, formatHz, formatSeconds, formatComplex } from '../../../src/views/shared/format.ts';

describe('page number formatting', () => {
  it('keeps significant digits and drops trailing zeros', () => {
    expect(formatNumber(0.5, 4)).toBe('0.5');
    expect(formatNumber(-1.23456, 3)).toBe('−1.23');
    expect(formatNumber(1.5e-7, 3)).toBe('1.5e-7');
    expect(formatNumber(Infinity)).toBe('∞');
  });
  it('chooses Hz or kHz and s, ms or µs', () => {
    expect(formatHz(3150)).toBe('3.15 kHz');
    expect(formatHz(50)).toBe('50 Hz');
    expect(formatSeconds(0.0125)).toBe('12.5 ms');
  });
  it('prints a conjugate with a minus sign', () => {
    expect(formatComplex(0.5, -0.25)).toBe('0.5 − 0.25j');
  });
});
