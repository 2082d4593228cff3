import { describe, it, expect } from 'vitest';
import {
  filterSections,
  filterTf,
  impulseResponse,
  sineResponse,
  stepResponse,
} from '../../../src/core/time/filter.ts';
import { makeSine } from '../../../src/core/time/inputs.ts';
import type { Section, TransferFunction } from '../../../src/core/types.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { loadFixture } from '../../helpers/fixtures.ts';

interface LfilterCase {
  name: string;
  b: number[];
  a: number[];
  x: number[];
  y: number[];
}

describe('filterTf', () => {
  const { cases } = loadFixture<{ cases: LfilterCase[] }>('time_lfilter');
  for (const c of cases) {
    it(`matches lfilter for ${c.name}`, () => {
      // scipy.signal.lfilter 1.17: the same recursion, so agreement is at rounding level.
      expectClose(filterTf({ b: c.b, a: c.a }, c.x), c.y, { rel: 1e-12, abs: 1e-12 }, c.name);
    });
  }

  it('starts from a given state and writes the final state back, as lfilter zi/zf', () => {
    const f = loadFixture<{
      b: number[];
      a: number[];
      x: number[];
      zi: number[];
      y1: number[];
      zf1: number[];
      y2: number[];
      zf2: number[];
    }>('time_lfilter_state');
    const state = Float64Array.from(f.zi);
    const tf = { b: f.b, a: f.a };
    // scipy.signal.lfilter 1.17 with zi
    expectClose(filterTf(tf, f.x.slice(0, 50), state), f.y1, { rel: 1e-13, abs: 1e-14 }, 'y1');
    expectClose(state, f.zf1, { rel: 1e-13, abs: 1e-14 }, 'zf1');
    expectClose(filterTf(tf, f.x.slice(50), state), f.y2, { rel: 1e-13, abs: 1e-14 }, 'y2');
    expectClose(state, f.zf2, { rel: 1e-13, abs: 1e-14 }, 'zf2');
  });

  it('rejects a zero leading denominator coefficient and a state of the wrong length', () => {
    expect(() => filterTf({ b: [1], a: [0, 1] }, [1, 2])).toThrow(/a\[0\]/);
    expect(() => filterTf({ b: [1, 1], a: [1, 0.5] }, [1], new Float64Array(3))).toThrow(/needs 1/);
  });

  it('scales by a pure gain when both polynomials are constants', () => {
    expectClose(filterTf({ b: [3], a: [2] }, [1, -2, 4]), [1.5, -3, 6], { abs: 0 });
  });
});

describe('filterSections', () => {
  const f = loadFixture<{
    sos: Section[];
    b: number[];
    a: number[];
    x: number[];
    y_sos: number[];
    y_tf: number[];
  }>('time_sosfilt');

  it('matches sosfilt on a tenth-order cascade', () => {
    // scipy.signal.sosfilt 1.17
    expectClose(filterSections(f.sos, f.x), f.y_sos, { rel: 1e-12, abs: 1e-12 }, 'sosfilt');
  });

  it('matches lfilter on the expanded tenth-order polynomial', () => {
    // scipy.signal.lfilter 1.17 on sos2tf of the same sections: high order, so the tolerance is looser.
    expectClose(filterTf({ b: f.b, a: f.a }, f.x), f.y_tf, { rel: 1e-9, abs: 1e-9 }, 'lfilter');
  });

  it('agrees with filterTf of the product for sections whose a0 is not 1', () => {
    const sections: Section[] = [
      [2, 1, 0, 2, -1, 0.4],
      [1, -0.5, 0.25, 4, -2, 1.6],
    ];
    const tf: TransferFunction = {
      b: [2 * 1, 2 * -0.5 + 1 * 1, 2 * 0.25 + 1 * -0.5, 1 * 0.25],
      a: [2 * 4, 2 * -2 + -1 * 4, 2 * 1.6 + -1 * -2 + 0.4 * 4, -1 * 1.6 + 0.4 * -2, 0.4 * 1.6],
    };
    const x = makeSine(0.3, 100, 0.2);
    // common practice: a cascade filters like the product of its sections.
    expectClose(filterSections(sections, x), filterTf(tf, x), { rel: 1e-12, abs: 1e-13 });
  });

  it('passes the input through an empty cascade', () => {
    expectClose(filterSections([], [1, 2, 3]), [1, 2, 3], { abs: 0 });
  });
});

describe('responses', () => {
  const tf: TransferFunction = { b: [0.2, 0.1], a: [1, -0.7] };

  it('impulse response of a first-order section is geometric', () => {
    // h[k] = 0.2·0.7^k + 0.1·0.7^(k-1) for k >= 1 (inverse z-transform, common practice)
    const h = impulseResponse(tf, 20);
    const expected = Array.from(
      { length: 20 },
      (_, k) => 0.2 * 0.7 ** k + (k > 0 ? 0.1 * 0.7 ** (k - 1) : 0),
    );
    expectClose(h, expected, { rel: 1e-13, abs: 1e-15 });
  });

  it('step response settles to the DC gain', () => {
    const s = stepResponse(tf, 200);
    // H(1) = 0.3 / 0.3 = 1
    expectClose(s[199]!, 1, { abs: 1e-12 });
  });

  it('sine response settles to |H|·cos(ωk + φ + ∠H)', () => {
    const omega = 0.9;
    const phase = 0.4;
    const y = sineResponse(tf, omega, 300, phase);
    const zr = Math.cos(-omega);
    const zi = Math.sin(-omega);
    const nr = 0.2 + 0.1 * zr;
    const ni = 0.1 * zi;
    const dr = 1 - 0.7 * zr;
    const di = -0.7 * zi;
    const mag = Math.hypot(nr, ni) / Math.hypot(dr, di);
    const ang = Math.atan2(ni, nr) - Math.atan2(di, dr);
    // steady-state sinusoidal response, common practice
    for (let k = 250; k < 300; k++)
      expectClose(y[k]!, mag * Math.cos(omega * k + phase + ang), { abs: 1e-12 });
  });
});
