import { describe, it, expect } from 'vitest';
import type { PartialFractions } from '../../../src/core/time/partialFractions.ts';
import { partialFractions } from '../../../src/core/time/fromCoefficients.ts';
import { polyFromRoots, polyEvalComplex } from '../../../src/core/poly.ts';
import type { Complex, Root, TransferFunction } from '../../../src/core/types.ts';
import { mulberry32 } from '../../../src/core/random.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { loadFixture } from '../../helpers/fixtures.ts';

interface ResiduezCase {
  name: string;
  b: number[];
  a: number[];
  r: (Complex | number)[];
  p: (Complex | number)[];
  k: number[];
}

const asComplex = (v: Complex | number): Complex => (typeof v === 'number' ? { re: v, im: 0 } : v);

/** H(z) rebuilt from its partial fractions at the complex point z. */
function evalFractions(pf: PartialFractions, zr: number, zi: number): Complex {
  // x = 1/z
  const zm = zr * zr + zi * zi;
  const xr = zr / zm;
  const xi = -zi / zm;
  let sr = 0;
  let si = 0;
  pf.residues.forEach((r, i) => {
    const p = pf.poles[i]!;
    // d = (1 − p x)^k
    const br = 1 - (p.re * xr - p.im * xi);
    const bi = -(p.re * xi + p.im * xr);
    let dr = 1;
    let di = 0;
    for (let k = 0; k < pf.powers[i]!; k++) [dr, di] = [dr * br - di * bi, dr * bi + di * br];
    const dm = dr * dr + di * di;
    sr += (r.re * dr + r.im * di) / dm;
    si += (r.im * dr - r.re * di) / dm;
  });
  let pr = 1;
  let pi = 0;
  for (const d of pf.direct) {
    sr += d * pr;
    si += d * pi;
    [pr, pi] = [pr * xr - pi * xi, pr * xi + pi * xr];
  }
  return { re: sr, im: si };
}

/** H(z) = B(z^-1)/A(z^-1) directly. */
function evalTf(tf: TransferFunction, zr: number, zi: number): Complex {
  // B(z^-1)/A(z^-1) = z^(na−nb) · Bz(z)/Az(z) with the arrays read as polynomials in z.
  const [br, bi] = polyEvalComplex(tf.b, zr, zi);
  const [ar, ai] = polyEvalComplex(tf.a, zr, zi);
  let nr = (br * ar + bi * ai) / (ar * ar + ai * ai);
  let ni = (bi * ar - br * ai) / (ar * ar + ai * ai);
  for (let k = tf.b.length; k < tf.a.length; k++) [nr, ni] = [nr * zr - ni * zi, nr * zi + ni * zr];
  const zm = zr * zr + zi * zi;
  for (let k = tf.a.length; k < tf.b.length; k++)
    [nr, ni] = [(nr * zr + ni * zi) / zm, (ni * zr - nr * zi) / zm];
  return { re: nr, im: ni };
}

describe('partialFractions against scipy.signal.residuez', () => {
  const { cases } = loadFixture<{ cases: ResiduezCase[] }>('time_residuez');
  for (const c of cases) {
    it(`matches residuez for ${c.name}`, () => {
      const pf = partialFractions({ b: c.b, a: c.a });
      const ref = c.r.map((r, i) => ({ r: asComplex(r), p: asComplex(c.p[i]!) }));
      expect(pf.residues.length, 'number of fractions').toBe(ref.length);
      // scipy.signal.residuez 1.17: compared as sets, matched by pole and then by power (residuez lists a
      // repeated pole's fractions in ascending power). Its repeated poles are averages of split roots, good to
      // about 1e-7, so residues of repeated poles are compared at 1e-5.
      const used = new Set<number>();
      pf.residues.forEach((r, i) => {
        const p = pf.poles[i]!;
        const candidates = ref
          .map((e, j) => ({ ...e, j }))
          .filter((e) => !used.has(e.j) && Math.hypot(e.p.re - p.re, e.p.im - p.im) < 1e-4);
        const match = candidates[0];
        expect(match, `${c.name}: pole ${p.re}+${p.im}i power ${pf.powers[i]} in residuez`).toBeDefined();
        used.add(match!.j);
        expectClose([p.re, p.im], [match!.p.re, match!.p.im], { abs: 1e-5 }, `${c.name} pole`);
        expectClose([r.re, r.im], [match!.r.re, match!.r.im], { rel: 1e-5, abs: 1e-6 }, `${c.name} residue`);
      });
      // scipy.signal.residuez 1.17, direct terms
      expectClose(pf.direct, c.k, { rel: 1e-10, abs: 1e-12 }, `${c.name} direct`);
    });
  }
});

describe('partialFractions', () => {
  it('finds exact residues of a triple pole: (1 + 2z^-1)/(1 − 0.5z^-1)^3', () => {
    const pf = partialFractions({ b: [1, 2], a: [1, -1.5, 0.75, -0.125] });
    expect(pf.powers).toEqual([1, 2, 3]);
    // hand expansion: 1 + 2x = r1(1 − x/2)^2 + r2(1 − x/2) + r3 at x = 2 gives r3 = 5, then r2 = −4, r1 = 0
    expectClose(
      pf.residues.flatMap((r) => [r.re, r.im]),
      [0, 0, -4, 0, 5, 0],
      { abs: 1e-12 },
    );
    expectClose(
      pf.poles.map((p) => p.re),
      [0.5, 0.5, 0.5],
      { abs: 1e-14 },
    );
  });

  it('is all direct terms for an FIR system', () => {
    const pf = partialFractions({ b: [0.5, 0.25, 0, 0], a: [2] });
    expect(pf.residues).toEqual([]);
    expect(pf.direct).toEqual([0.25, 0.125]);
  });

  it('rejects a zero leading denominator coefficient', () => {
    expect(() => partialFractions({ b: [1], a: [0, 1] })).toThrow(/a\[0\]/);
  });

  it('rebuilds H(z) at random points for random systems with repeated poles (seeded)', () => {
    const rand = mulberry32(1234);
    for (let trial = 0; trial < 40; trial++) {
      const roots: Root[] = [];
      const count = 1 + Math.floor(rand() * 4);
      for (let i = 0; i < count; i++) {
        const r = 0.2 + 0.75 * rand();
        const th = rand() < 0.4 ? (rand() < 0.5 ? 0 : Math.PI) : rand() * Math.PI;
        const im = th === 0 || th === Math.PI ? 0 : r * Math.sin(th);
        roots.push({ re: r * Math.cos(th), im, multiplicity: 1 + Math.floor(rand() * 3) });
      }
      const a = Array.from(polyFromRoots(roots));
      const nb = 1 + Math.floor(rand() * (a.length + 2));
      const b = Array.from({ length: nb }, () => rand() * 2 - 1);
      const tf = { b, a };
      const pf = partialFractions(tf);
      const order = roots.reduce((s, r) => s + r.multiplicity * (r.im === 0 ? 1 : 2), 0);
      expect(pf.residues.length, `trial ${trial} fraction count`).toBe(order);
      for (let k = 0; k < 5; k++) {
        const zr = 3 * rand() - 1.5;
        const zi = 3 * rand() - 1.5;
        const h = evalTf(tf, zr, zi);
        const g = evalFractions(pf, zr, zi);
        // Identity of the expansion (common practice). The tolerance allows for random pole clusters a few
        // hundredths apart, where rounding the coefficients alone moves a double pole by about 1e-11 and the
        // large, cancelling residues amplify that; a wrong residue gives errors of order |H|.
        expectClose(
          [g.re, g.im],
          [h.re, h.im],
          { abs: 1e-6 * (1 + Math.hypot(h.re, h.im)) },
          `trial ${trial}`,
        );
      }
    }
  });
});
