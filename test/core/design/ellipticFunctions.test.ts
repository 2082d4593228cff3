import { describe, expect, it } from 'vitest';
import {
  agm,
  ellipticDegree,
  ellipticF,
  ellipticK,
  jacobiElliptic,
} from '../../../src/core/design/ellipticFunctions.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('elliptic integrals and Jacobi functions', () => {
  it('K matches tabulated values', () => {
    // Abramowitz & Stegun table 17.1, from memory: K(0) = π/2, K(1/2) = 1.854074677301372
    expectClose(ellipticK(0), Math.PI / 2, { rel: 1e-15 });
    expectClose(ellipticK(0.5), 1.854074677301372, { rel: 1e-14 });
    // Gauss's constant: AGM(1, √2) = 1.198140234735592
    expectClose(agm(1, Math.SQRT2).value, 1.198140234735592, { rel: 1e-15 });
    // K(m) ~ ln(4/√mc) as m → 1 (A&S 17.3.26, from memory)
    expectClose(ellipticK(1 - 1e-20, 1e-20), Math.log(4 / 1e-10), { rel: 1e-12 });
  });

  it('F(π/2, m) = K(m) and sn(F(φ, m)) = sin φ', () => {
    for (const m of [0.1, 0.5, 0.9, 0.999999]) {
      expectClose(ellipticF(Math.PI / 2 - 1e-15, m), ellipticK(m), { rel: 1e-9 });
      for (const phi of [0.2, 0.9, 1.4])
        expectClose(jacobiElliptic(ellipticF(phi, m), m).sn, Math.sin(phi), { rel: 1e-13 });
    }
  });

  it('sn, cn, dn satisfy the Jacobi identities, d sn/du = cn·dn, and sn(K) = 1, dn(K) = √(1 − m) (seeded sample)', () => {
    // A&S 16.9 and 16.16, from memory
    let seed = 12345;
    const rand = () => (seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31;
    const h = 1e-5;
    for (let i = 0; i < 200; i++) {
      const m = rand();
      const u = 6 * rand() - 3;
      const { sn, cn, dn } = jacobiElliptic(u, m);
      expectClose(sn * sn + cn * cn, 1, { abs: 1e-13 });
      expectClose(dn * dn + m * sn * sn, 1, { abs: 1e-13 });
      const slope = (jacobiElliptic(u + h, m).sn - jacobiElliptic(u - h, m).sn) / (2 * h);
      expectClose(slope, cn * dn, { abs: 1e-9 }, 'derivative');
      const atK = jacobiElliptic(ellipticK(m), m);
      expectClose([atK.sn, atK.cn, atK.dn], [1, 0, Math.sqrt(1 - m)], { abs: 1e-10 }, `at K(${m})`);
    }
  });

  it('the degree equation is solved: N·K(m1)·K′(m) = K′(m1)·K(m)', () => {
    for (const [n, m1] of [
      [3, 1e-4],
      [8, 1e-9],
      [40, 1e-12],
    ] as const) {
      const { m, mc } = ellipticDegree(n, m1);
      expectClose(m + mc, 1, { abs: 1e-15 });
      expectClose(n * ellipticK(m1) * ellipticK(mc, m), ellipticK(1 - m1, m1) * ellipticK(m, mc), {
        rel: 1e-12,
      });
      expect(m).toBeLessThan(1);
    }
  });
});
