import { describe, it, expect } from 'vitest';
import { mergeRepeatedPoles } from '../../../src/core/time/repeatedPoles.ts';
import { taylorAt } from '../../../src/core/time/taylor.ts';
import { polyFromRoots } from '../../../src/core/poly.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const simple = (re: number, im: number) => ({ re, im, multiplicity: 1 });

describe('mergeRepeatedPoles', () => {
  it('merges a triple pole split the way a root finder splits it (spread ~1e-5) and recovers its centre', () => {
    const a = polyFromRoots([{ re: 0.5, im: 0, multiplicity: 3 }]);
    // the split an Aberth–Ehrlich search returned for (z − 0.5)^3 before grouping
    const split = [
      simple(0.4999960893358245, 7.95159181761471e-6),
      simple(0.4999960893358245, -7.95159181761471e-6),
      simple(0.5000085072206966, 0),
    ];
    const merged = mergeRepeatedPoles(a, split);
    expect(merged.length).toBe(1);
    expect(merged[0]!.multiplicity).toBe(3);
    expect(merged[0]!.im).toBe(0);
    // exact repeated root 0.5 (by construction)
    expectClose(merged[0]!.re, 0.5, { abs: 1e-14 });
  });

  it('merges split copies of a complex double pair into exact conjugates', () => {
    const a = polyFromRoots([
      { re: 0.6, im: 0.5, multiplicity: 2 },
      { re: -0.3, im: 0, multiplicity: 1 },
    ]);
    const split = [
      simple(0.599999947945609, 0.4999999701864369),
      simple(0.600000025276391, 0.5000000140577721),
      simple(-0.3, 0),
      simple(0.600000025276391, -0.5000000140577721),
      simple(0.599999947945609, -0.4999999701864369),
    ];
    const merged = mergeRepeatedPoles(a, split).sort((p, q) => p.im - q.im);
    expect(merged.map((r) => r.multiplicity)).toEqual([2, 1, 2]);
    expect(merged[0]!.re).toBe(merged[2]!.re);
    expect(merged[0]!.im).toBe(-merged[2]!.im);
    // the root placed at 0.6 + 0.5j (by construction)
    expectClose([merged[2]!.re, merged[2]!.im], [0.6, 0.5], { abs: 1e-13 });
  });

  it('keeps distinct poles 1e-3 apart separate', () => {
    const a = polyFromRoots([simple(0.9, 0), simple(0.901, 0)]);
    const merged = mergeRepeatedPoles(a, [simple(0.9, 0), simple(0.901, 0)]);
    expect(merged.map((r) => r.multiplicity)).toEqual([1, 1]);
  });
});

describe('taylorAt', () => {
  it('gives p(c + t) coefficients: x^3 − 1 about 2 is 7 + 12t + 6t^2 + t^3', () => {
    const [re, im] = taylorAt([1, 0, 0, -1], 2, 0, 5);
    // binomial expansion of (2 + t)^3 − 1, by hand
    expectClose(re, [7, 12, 6, 1, 0], { abs: 1e-15 });
    expectClose(im, [0, 0, 0, 0, 0], { abs: 0 });
  });

  it('works at a complex point: x^2 about j is −1 + 2j·t + t^2', () => {
    const [re, im] = taylorAt([1, 0, 0], 0, 1, 3);
    expectClose(re, [-1, 0, 1], { abs: 1e-15 });
    expectClose(im, [0, 2, 0], { abs: 1e-15 });
  });
});
