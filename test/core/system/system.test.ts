import { describe, it, expect } from 'vitest';
import {
  compressRoots,
  expandRoots,
  rootCount,
  sectionsToTf,
  sectionsToZpk,
  systemOrder,
  zpkToSections,
  zpkToTf,
} from '../../../src/core/system/index.ts';
import { tfToZpk } from '../../../src/core/system/fromCoefficients.ts';
import { responseSections, responseZpk } from '../../../src/core/response/index.ts';
import { polyEvalComplex } from '../../../src/core/poly.ts';
import type { Root, Section, TransferFunction, Zpk } from '../../../src/core/types.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { loadFixture } from '../../helpers/fixtures.ts';
import { expectSameRoots } from './rootMatch.ts';

interface ZpkCase {
  name: string;
  zeros: Root[];
  poles: Root[];
  gain: number;
  zpk2tf: TransferFunction;
  zpk2sos_nearest: Section[];
  zpk2sos_keep_odd: Section[] | null;
  sos2tf: TransferFunction;
  omega: number[];
  freqz_zpk: { re: number[]; im: number[] };
  scipy_tf_matches_zpk: boolean;
}
interface TfCase extends TransferFunction {
  name: string;
  zeros: Root[];
  poles: Root[];
  gain: number;
}

const zpkCases = loadFixture<ZpkCase[]>('system_zpk');
const tfCases = loadFixture<TfCase[]>('system_tf');
const zpkOf = (c: ZpkCase): Zpk => ({ zeros: c.zeros, poles: c.poles, gain: c.gain });

/** B(z^-1)/A(z^-1) at z = e^{iω}, straight from the arrays (low orders only). */
function tfAt(tf: TransferFunction, omega: number): [number, number] {
  const zr = Math.cos(-omega);
  const zi = Math.sin(-omega);
  const rev = (p: number[]) => [...p].reverse();
  const [br, bi] = polyEvalComplex(rev(tf.b), zr, zi);
  const [ar, ai] = polyEvalComplex(rev(tf.a), zr, zi);
  const d = ar * ar + ai * ai;
  return [(br * ar + bi * ai) / d, (bi * ar - br * ai) / d];
}

function expectResponseMatches(
  re: ArrayLike<number>,
  im: ArrayLike<number>,
  c: ZpkCase,
  label: string,
  rel = 1e-10,
) {
  const scale = Math.max(...c.freqz_zpk.re.map((v, i) => Math.hypot(v, c.freqz_zpk.im[i]!)));
  expectClose(re, c.freqz_zpk.re, { abs: rel * scale }, `${label} re`); // scipy.signal.freqz_zpk 1.17
  expectClose(im, c.freqz_zpk.im, { abs: rel * scale }, `${label} im`); // scipy.signal.freqz_zpk 1.17
}

/** Section numerators equal scipy's, or scipy's shifted right by delays (scipy pads with origin zeros). */
function expectSectionsLikeScipy(ours: Section[], scipy: Section[], label: string) {
  expect(ours.length, `${label} section count`).toBe(scipy.length);
  ours.forEach((s, i) => {
    const ref = scipy[i]!;
    expectClose(s.slice(3), ref.slice(3), { rel: 1e-12, abs: 1e-14 }, `${label} a[${i}]`); // scipy.signal.zpk2sos 1.17
    const shifts = [ref.slice(0, 3), [0, ref[0]!, ref[1]!], [0, 0, ref[0]!]];
    const ok = shifts.some((b) => b.every((v, j) => Math.abs(v - s[j]!) <= 1e-12 * Math.max(1, Math.abs(v))));
    expect(ok, `${label} b[${i}] = ${s.slice(0, 3).join(',')} vs scipy ${ref.slice(0, 3).join(',')}`).toBe(
      true,
    );
  });
}

describe('zpkToTf', () => {
  for (const c of zpkCases) {
    it(`${c.name}: equals scipy zpk2tf up to the delay that keeps H exact in z`, () => {
      const tf = zpkToTf(zpkOf(c));
      const delay = tf.b.length - c.zpk2tf.b.length;
      expect(delay).toBeGreaterThanOrEqual(0);
      expectClose(tf.a, c.zpk2tf.a, { rel: 1e-12, abs: 1e-15 }, 'a'); // scipy.signal.zpk2tf 1.17
      expectClose(tf.b.slice(delay), c.zpk2tf.b, { rel: 1e-12, abs: 1e-15 }, 'b'); // scipy.signal.zpk2tf 1.17
      expect(tf.b.slice(0, delay).every((v) => v === 0)).toBe(true);
      // The arrays must describe the same H as scipy's freqz_zpk whenever the system is causal.
      if (systemOrder(zpkOf(c)) === c.poles.reduce((n, p) => n + (p.im ? 2 : 1) * p.multiplicity, 0)) {
        const re = c.omega.map((w) => tfAt(tf, w)[0]);
        const im = c.omega.map((w) => tfAt(tf, w)[1]);
        // Evaluating expanded b/a (order 14 here) loses digits; this checks the alignment, not precision.
        expectResponseMatches(re, im, c, c.name, 1e-8);
      }
    });
  }
  it('scipy zpk2tf itself describes a shifted system when zero and pole counts differ', () => {
    // scipy.signal.zpk2tf vs freqz_zpk 1.17: the reason for the leading zeros above.
    expect(zpkCases.find((c) => c.name === 'all_pole_3')!.scipy_tf_matches_zpk).toBe(false);
    expect(zpkCases.find((c) => c.name === 'butter4')!.scipy_tf_matches_zpk).toBe(true);
  });
  it('one pole at 0.5 and gain 2 gives b = [0, 2], a = [1, -0.5]', () => {
    // common practice: 2/(z - 0.5) = 2z^-1/(1 - 0.5z^-1)
    expect(zpkToTf({ zeros: [], poles: [{ re: 0.5, im: 0, multiplicity: 1 }], gain: 2 })).toEqual({
      b: [0, 2],
      a: [1, -0.5],
    });
  });
});

describe('tfToZpk', () => {
  for (const c of tfCases) {
    it(`${c.name}: matches scipy tf2zpk on b/a padded to equal length`, () => {
      const zpk = tfToZpk(c);
      // A 4-fold zero (cheby1_4 at -1) is only determined to about eps^(1/4) by any root finder.
      const tol = c.name === 'cheby1_4' ? 2e-3 : 1e-7;
      expectSameRoots(zpk.zeros, c.zeros, tol, 'zeros'); // scipy.signal.tf2zpk 1.17
      expectSameRoots(zpk.poles, c.poles, 1e-7, 'poles'); // scipy.signal.tf2zpk 1.17
      expectClose(zpk.gain, c.gain, { rel: 1e-12 }, 'gain'); // scipy.signal.tf2zpk 1.17
    });
  }
  it('leading zeros of b are poles at the origin', () => {
    // common practice: z^-2 = 1/z^2
    expect(tfToZpk({ b: [0, 0, 3], a: [1] })).toEqual({
      zeros: [],
      poles: [{ re: 0, im: 0, multiplicity: 2 }],
      gain: 3,
    });
  });
  it('rejects an all-zero denominator and non-finite coefficients with the place named', () => {
    expect(() => tfToZpk({ b: [1], a: [0, 0] })).toThrow(/denominator/);
    expect(() => tfToZpk({ b: [1, NaN], a: [1] })).toThrow(/b\[1\]/);
  });
  it('all-zero b gives gain 0 and keeps the poles', () => {
    const zpk = tfToZpk({ b: [0, 0], a: [1, -0.5] });
    expect(zpk.gain).toBe(0);
    expect(zpk.zeros).toEqual([]);
    expect(zpk.poles).toEqual([{ re: 0.5, im: 0, multiplicity: 1 }]);
  });
});

describe('zpkToSections', () => {
  for (const c of zpkCases) {
    it(`${c.name}: nearest pairing matches scipy zpk2sos and keeps H exact`, () => {
      const s = zpkToSections(zpkOf(c));
      expectSectionsLikeScipy(s, c.zpk2sos_nearest, 'nearest');
      const h = responseSections(s, Float64Array.from(c.omega));
      if (c.name !== 'more_zeros_than_poles' && c.name !== 'fir_only')
        expectResponseMatches(h.re, h.im, c, c.name);
      else
        expectClose(h.magnitude, responseZpk(zpkOf(c), Float64Array.from(c.omega)).magnitude, { rel: 1e-12 });
    });
    it(`${c.name}: keep-odd pairing matches scipy zpk2sos(pairing='keep_odd')`, () => {
      const s = zpkToSections(zpkOf(c), { pairing: 'keep-odd' });
      if (c.zpk2sos_keep_odd) expectSectionsLikeScipy(s, c.zpk2sos_keep_odd, 'keep-odd');
      // Where scipy raises (more zeros than poles), the fallback pairing must still be the same system.
      expectClose(
        responseSections(s, Float64Array.from(c.omega)).magnitude,
        responseZpk(zpkOf(c), Float64Array.from(c.omega)).magnitude,
        { rel: 1e-11 },
      );
    });
  }
  it('gain alone is one section', () => {
    expect(zpkToSections({ zeros: [], poles: [], gain: 4 })).toEqual([[4, 0, 0, 1, 0, 0]]);
  });
});

describe('sectionsToTf', () => {
  for (const c of zpkCases) {
    it(`${c.name}: matches scipy sos2tf`, () => {
      const tf = sectionsToTf(c.zpk2sos_nearest);
      expectClose(tf.b, c.sos2tf.b, { rel: 1e-12, abs: 1e-15 }, 'b'); // scipy.signal.sos2tf 1.17
      expectClose(tf.a, c.sos2tf.a, { rel: 1e-12, abs: 1e-15 }, 'a'); // scipy.signal.sos2tf 1.17
    });
  }
});

/** Seeded linear congruential generator (deterministic invariant tests). */
function rng(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (Math.imul(s, 1664525) + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

function randomZpk(rand: () => number, nZeros: number, nPoles: number): Zpk {
  const roots = (n: number, rmax: number): Root[] => {
    const out: Root[] = [];
    let left = n;
    while (left > 0) {
      const r = rmax * Math.sqrt(rand());
      const t = Math.PI * rand();
      if (left >= 2 && rand() < 0.7) {
        out.push({ re: r * Math.cos(t), im: r * Math.sin(t) + 1e-3, multiplicity: 1 });
        left -= 2;
      } else {
        out.push({ re: r * (rand() < 0.5 ? -1 : 1), im: 0, multiplicity: 1 });
        left -= 1;
      }
    }
    return out;
  };
  return { zeros: roots(nZeros, 1.3), poles: roots(nPoles, 0.95), gain: 0.5 + rand() };
}

describe('invariants (seeded random systems)', () => {
  const rand = rng(20240611);
  const grid = Float64Array.from({ length: 64 }, (_, i) => (Math.PI * (i + 0.5)) / 64);
  it('|H| from zpk equals |H| from its sections, both pairings', () => {
    for (let t = 0; t < 40; t++) {
      const zpk = randomZpk(rand, Math.floor(rand() * 9), 1 + Math.floor(rand() * 9));
      const ref = responseZpk(zpk, grid);
      for (const pairing of ['nearest', 'keep-odd'] as const) {
        const h = responseSections(zpkToSections(zpk, { pairing }), grid);
        expectClose(h.magnitude, ref.magnitude, { rel: 1e-10 }, `case ${t} ${pairing} |H|`);
        // With more zeros than poles the cascade is the causal version, delayed by the difference.
        const lag = Math.max(0, systemOrder(zpk) - rootCount(zpk.poles));
        const shifted = ref.groupDelay.map((v) => v + lag);
        expectClose(h.groupDelay, shifted, { abs: 1e-8, rel: 1e-9 }, `case ${t} ${pairing} delay`);
      }
    }
  });
  it('zpk -> sections -> zpk gives back the roots and gain', () => {
    for (let t = 0; t < 40; t++) {
      const zpk = randomZpk(rand, Math.floor(rand() * 9), Math.floor(rand() * 9));
      const back = sectionsToZpk(zpkToSections(zpk));
      const lag = Math.max(0, systemOrder(zpk) - rootCount(zpk.poles));
      const poles = lag ? [...zpk.poles, { re: 0, im: 0, multiplicity: lag }] : zpk.poles;
      expectSameRoots(back.zeros, zpk.zeros, 1e-12, `case ${t} zeros`);
      expectSameRoots(back.poles, poles, 1e-12, `case ${t} poles (origin poles make it causal)`);
      expectClose(back.gain, zpk.gain, { rel: 1e-12 }, `case ${t} gain`);
    }
  });
  it('zpkToTf(tfToZpk(tf)) gives back the normalised tf', () => {
    for (let t = 0; t < 40; t++) {
      const nb = 1 + Math.floor(rand() * 6);
      const zpk = randomZpk(rand, nb - 1, nb - 1 + Math.floor(rand() * 3));
      const tf = zpkToTf(zpk);
      const a0 = 1 + rand();
      const scaled = { b: tf.b.map((v) => v * a0), a: tf.a.map((v) => v * a0) };
      const back = zpkToTf(tfToZpk(scaled));
      expectClose(back.b, tf.b, { abs: 1e-10 }, `case ${t} b`);
      expectClose(back.a, tf.a, { abs: 1e-10 }, `case ${t} a`);
    }
  });
  it('compressRoots undoes expandRoots and merges only identical roots', () => {
    const roots: Root[] = [
      { re: 0.3, im: 0.4, multiplicity: 2 },
      { re: -1, im: 0, multiplicity: 1 },
    ];
    expect(compressRoots(expandRoots(roots))).toEqual(roots);
    // no fixed distance merges roots (issue 10): a pair 1e-9 off the axis stays a pair, and two real roots
    // 1e-7 apart stay two; identical entries still add up
    expect(compressRoots(expandRoots([{ re: -1, im: 1e-9, multiplicity: 1 }]))).toEqual([
      { re: -1, im: 1e-9, multiplicity: 1 },
    ]);
    const pair = [
      { re: 0.9999999, im: 0, multiplicity: 1 },
      { re: 1.0000001, im: 0, multiplicity: 1 },
    ];
    expect(compressRoots(pair)).toEqual(pair);
    expect(compressRoots([pair[0]!, pair[0]!])).toEqual([{ ...pair[0]!, multiplicity: 2 }]);
    expect(systemOrder({ zeros: roots, poles: [], gain: 1 })).toBe(5);
  });
});
