import { describe, it, expect } from 'vitest';
import { stabilityOfZpk, UNIT_CIRCLE_TOLERANCE } from '../../../src/core/stability/index.ts';
import type { Verdict } from '../../../src/core/stability/index.ts';
import { juryTest } from '../../../src/core/jury.ts';
import { tfToZpk } from '../../../src/core/system/fromCoefficients.ts';
import { polyFromRoots } from '../../../src/core/poly.ts';
import type { Root, Zpk } from '../../../src/core/types.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { loadFixture } from '../../helpers/fixtures.ts';

interface RandomCase {
  a: number[];
  max_radius: number;
  stable: boolean;
}
interface TrapFixture {
  name: string;
  zeros: Root[];
  poles: Root[];
  gain: number;
  max_pole_radius: number;
  exact_max_radius: number;
  tf_a: number[];
}

const polar = (r: number, t: number, multiplicity = 1): Root => ({
  re: r * Math.cos(t),
  im: t === 0 || t === Math.PI ? 0 : r * Math.sin(t),
  multiplicity,
});
const real = (x: number, multiplicity = 1): Root => ({ re: x, im: 0, multiplicity });
const allPole = (poles: Root[]): Zpk => ({ zeros: [], poles, gain: 1 });

/** Both verdicts for one denominator: from the roots of a (via tfToZpk) and from the coefficient test. */
function verdicts(a: ArrayLike<number>): { roots: Verdict; jury: 'stable' | 'not-stable' } {
  return { roots: stabilityOfZpk(tfToZpk({ b: [1], a: Array.from(a) })).verdict, jury: juryTest(a).verdict };
}

describe('stabilityOfZpk: hand-made cases', () => {
  // common practice: stable iff every pole is strictly inside the unit circle
  const cases: Array<[string, Root[], Verdict]> = [
    ['no poles (FIR)', [], 'stable'],
    ['real pole just inside', [real(1 - 1e-6)], 'stable'],
    ['pole pair just inside', [polar(1 - 1e-6, 0.7)], 'stable'],
    ['real pole on the circle at 1', [real(1)], 'marginal'],
    ['real pole on the circle at -1', [real(-1)], 'marginal'],
    ['pole pair on the circle', [polar(1, 0.7)], 'marginal'],
    ['pole pair on the circle and one inside', [polar(1, 2.1), real(0.3)], 'marginal'],
    ['pole pair just outside', [polar(1 + 1e-6, 0.7)], 'unstable'],
    ['real pole just outside', [real(-1 - 1e-6)], 'unstable'],
    ['double pole on the circle', [real(1, 2)], 'unstable'],
    ['double pole pair on the circle', [polar(1, 1.3, 2)], 'unstable'],
    ['double pole just inside', [real(0.999, 2)], 'stable'],
  ];
  for (const [name, poles, expected] of cases) {
    it(`${name}: ${expected}, and the coefficient test agrees`, () => {
      expect(stabilityOfZpk(allPole(poles)).verdict).toBe(expected);
      const a = polyFromRoots(poles);
      const v = verdicts(a);
      expect(v.roots).toBe(expected);
      expect(v.jury).toBe(expected === 'stable' ? 'stable' : 'not-stable');
    });
  }
  it('names the responsible pole and its radius', () => {
    const s = stabilityOfZpk(allPole([polar(0.5, 1), { re: 0.9, im: 0.5, multiplicity: 1 }]));
    expect(s.verdict).toBe('unstable');
    expect(s.reason).toBe('pole pair at 0.9 ± 0.5j has radius 1.03 > 1');
    expect(s.responsible).toEqual([{ re: 0.9, im: 0.5, multiplicity: 1 }]);
    expectClose(s.maxPoleRadius, Math.hypot(0.9, 0.5), { rel: 1e-15 });
  });
  it('reports repeated poles on the circle as the reason', () => {
    expect(stabilityOfZpk(allPole([real(-1, 2)])).reason).toMatch(
      /double pole at -1 is repeated on the unit circle/,
    );
  });
  it('the on-circle band is the documented tolerance', () => {
    expect(stabilityOfZpk(allPole([real(1 - UNIT_CIRCLE_TOLERANCE / 2)])).verdict).toBe('marginal');
    expect(stabilityOfZpk(allPole([real(1 - 2 * UNIT_CIRCLE_TOLERANCE)])).verdict).toBe('stable');
  });
});

describe('second-order stability triangle |a2| < 1, |a1| < 1 + a2', () => {
  it('roots and coefficient test both agree with the triangle on a 41 x 25 grid (boundaries included)', () => {
    // common practice: the stability triangle of 1 + a1 z^-1 + a2 z^-2; step 1/8 keeps boundaries exact
    for (let i = -20; i <= 20; i++) {
      for (let j = -12; j <= 12; j++) {
        const a1 = i / 8;
        const a2 = j / 8;
        const inside = Math.abs(a2) < 1 && Math.abs(a1) < 1 + a2;
        const v = verdicts([1, a1, a2]);
        expect(v.roots === 'stable', `roots at a1=${a1}, a2=${a2}`).toBe(inside);
        expect(v.jury === 'stable', `jury at a1=${a1}, a2=${a2}`).toBe(inside);
      }
    }
  });
});

describe('random polynomials classified by numpy.roots', () => {
  const cases = loadFixture<RandomCase[]>('stability_random');
  it('root verdict, largest radius and coefficient test agree with numpy on every case', () => {
    let stable = 0;
    cases.forEach((c, i) => {
      const s = stabilityOfZpk(tfToZpk({ b: [1], a: c.a }));
      expect(s.verdict === 'stable', `case ${i} roots`).toBe(c.stable); // numpy.roots 2.4
      expect(juryTest(c.a).verdict === 'stable', `case ${i} jury`).toBe(c.stable); // numpy.roots 2.4
      expectClose(s.maxPoleRadius, c.max_radius, { rel: 1e-8 }, `case ${i} radius`); // numpy.roots 2.4
      if (c.stable) stable++;
    });
    expect(stable).toBeGreaterThan(40);
    expect(cases.length - stable).toBeGreaterThan(40);
  });
});

describe('the expanded-polynomial trap (8th-order Butterworth, 10 Hz at 8 kHz)', () => {
  const trap = loadFixture<TrapFixture>('response_trap');
  it('from the product form: stable, largest radius 0.99847', () => {
    const s = stabilityOfZpk({ zeros: trap.zeros, poles: trap.poles, gain: trap.gain });
    expect(s.verdict).toBe('stable');
    expectClose(s.maxPoleRadius, trap.max_pole_radius, { rel: 1e-14 }); // scipy.signal.butter 1.17
    // mpmath 1.3 polyroots at 80 digits of the expanded a as stored in doubles: rounding alone moves a root out
    expect(trap.exact_max_radius).toBeGreaterThan(1.005);
  });
});
