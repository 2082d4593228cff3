/**
 * The quantized taps' line refined at their zeros' angles (core/fixed/firQuantized.ts withZeroAngles): adding
 * only the zeros' points to the plain line gives exactly what evaluating the whole refined grid gives, which
 * test/store/firQuantized.test.ts checks against scipy.signal.freqz.
 */
import { describe, expect, it } from 'vitest';
import {
  gridWithZeroAngles,
  tapsMagnitude,
  tapZeros,
  withZeroAngles,
} from '../../../src/core/fixed/firQuantized.ts';
import { loadFixture } from '../../helpers/fixtures.ts';

const GRID = Float64Array.from({ length: 2048 }, (_, i) => (Math.PI * i) / 2047);

describe('the refined line of quantized taps', () => {
  const cases = loadFixture<{ name: string; codes: number[]; fractionBits: number }[]>('fir_quantized');
  for (const c of cases)
    it(`${c.name}: the zeros' points added to the plain line equal the refined grid evaluated whole`, () => {
      const taps = c.codes.map((k) => k * 2 ** -c.fractionBits);
      const zeros = tapZeros(taps).zeros;
      const refinedGrid = gridWithZeroAngles(GRID, zeros);
      expect(refinedGrid.length).toBeGreaterThan(GRID.length); // each case has zeros on the circle
      expect(withZeroAngles(tapsMagnitude(taps, GRID), taps, zeros)).toEqual(
        tapsMagnitude(taps, refinedGrid),
      );
    });

  it('no zero near the circle: the plain line itself', () => {
    const taps = [1, -0.5]; // one zero at 0.5, farther than the band
    const plain = tapsMagnitude(taps, GRID);
    expect(withZeroAngles(plain, taps, tapZeros(taps).zeros)).toBe(plain);
  });
});
