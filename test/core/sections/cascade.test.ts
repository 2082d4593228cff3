import { describe, it, expect } from 'vitest';
import type { Section, Zpk } from '../../../src/core/types.ts';
import { buildCascade, partialCascadeNorms, peakMagnitude } from '../../../src/core/sections/index.ts';
import { passWithSums } from '../../../src/core/sections/norms.ts';
import { createSectionFilter, runSectionFilter } from '../../../src/core/signal/sectionFilter.ts';
import { responseSections, responseZpk, frequencyGrid } from '../../../src/core/response/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { loadFixture } from '../../helpers/fixtures.ts';
import { tfToZpk } from '../../../src/core/system/fromCoefficients.ts';

interface NormCase {
  name: string;
  sos: number[][];
  norms: { l1: number; l2: number; linf: number }[];
  scaled_l1: number[][];
  scaled_l2: number[][];
  scaled_linf: number[][];
}
const cases = loadFixture<NormCase[]>('fixed_norms');
const asSections = (rows: number[][]) => rows.map((r) => r as Section);

/** The zpk of scipy's cascade, read back through the engine (delays and gain exact). */
const zpkOfRows = (rows: number[][]): Zpk => {
  let b = [1];
  let a = [1];
  const mul = (p: number[], q: number[]) => {
    const out = new Array<number>(p.length + q.length - 1).fill(0);
    p.forEach((x, i) => q.forEach((y, j) => (out[i + j]! += x * y)));
    return out;
  };
  for (const r of rows) {
    b = mul(b, r.slice(0, 3));
    a = mul(a, r.slice(3, 6));
  }
  return tfToZpk({ b, a });
};

describe('partialCascadeNorms', () => {
  for (const c of cases) {
    it(`${c.name}: L1, L2 and L∞ of every partial cascade match numpy`, () => {
      const { norms, converged } = partialCascadeNorms(asSections(c.sos));
      expect(converged).toBe(true);
      c.norms.forEach((n, i) => {
        // scipy.signal.sosfilt 1.17 impulse response summed with numpy 2.x
        expectClose(norms[i]!.l1, n.l1, { rel: 1e-9 }, `${c.name} l1[${i}]`);
        expectClose(norms[i]!.l2, n.l2, { rel: 1e-9 }, `${c.name} l2[${i}]`);
        // scipy.signal.sosfreqz 1.17 on 2^18+1 points plus pole angles; ours refines the peak, so it may be higher
        expectClose(norms[i]!.linf, n.linf, { rel: 1e-6 }, `${c.name} linf[${i}]`);
        expect(norms[i]!.linf).toBeGreaterThanOrEqual(n.linf * (1 - 1e-12));
      });
    });
  }

  it('marks a pole on the unit circle as not converged, and a pole outside as infinite', () => {
    const onCircle = partialCascadeNorms([[1, 0, 0, 1, 0, -1]]);
    expect(onCircle.converged).toBe(false);
    const outside = partialCascadeNorms([[1, 0, 0, 1, -1.1, 0]]);
    expect(outside.converged).toBe(false);
    expect(outside.norms[0]!.l1).toBe(Infinity);
  });

  it('first-order closed forms: 1/(1 − 0.5z⁻¹) has L1 = 2, L2 = 1/√0.75, L∞ = 2', () => {
    // common practice: geometric series sums Σ0.5^n = 2, Σ0.25^n = 4/3; |H| peaks at DC, 1/(1 − 0.5)
    const { norms } = partialCascadeNorms([[1, 0, 0, 1, -0.5, 0]]);
    expectClose(norms[0]!.l1, 2, { rel: 1e-12 }, 'l1');
    expectClose(norms[0]!.l2, Math.sqrt(4 / 3), { rel: 1e-12 }, 'l2');
    expectClose(norms[0]!.linf, 2, { rel: 1e-12 }, 'linf');
  });
});

describe('peakMagnitude', () => {
  it('finds the peak of a sharp resonance between grid points', () => {
    // 1/(1 − 2r cosθ z⁻¹ + r² z⁻²) with r = 0.9995: the peak lies off the pole angle; dense check by brute force
    const r = 0.9995;
    const th = 0.7;
    const s: Section = [1, 0, 0, 1, -2 * r * Math.cos(th), r * r];
    const dense = responseSections([s], frequencyGrid(2_000_001)).magnitude;
    const brute = dense.reduce((m, x) => Math.max(m, x), 0);
    const { peak } = peakMagnitude([s]);
    expect(peak).toBeGreaterThanOrEqual(brute * (1 - 1e-12));
    expectClose(peak, brute, { rel: 1e-6 }, 'peak');
  });
});

describe('buildCascade', () => {
  for (const c of cases) {
    const zpk = zpkOfRows(c.sos);
    for (const norm of ['l1', 'l2', 'linf'] as const) {
      it(`${c.name}: ${norm} scaling matches numpy-scaled scipy sections`, () => {
        const cascade = buildCascade(zpk, { ordering: 'ascending', gain: 'first', scaling: norm });
        const expected = c[`scaled_${norm}`];
        expect(cascade.sections).toHaveLength(expected.length);
        // scipy.signal.zpk2sos 1.17 pairing and order (nearest circle last), scaled with numpy
        cascade.sections.forEach((s, i) =>
          expectClose(
            s.coefficients,
            expected[i]!,
            { rel: 1e-6, abs: 1e-9 },
            `${c.name} ${norm} section ${i}`,
          ),
        );
      });
    }

    it(`${c.name}: every scaled partial cascade has norm 1 and the output gain restores H`, () => {
      for (const norm of ['l1', 'l2', 'linf'] as const) {
        const cascade = buildCascade(zpk, { scaling: norm });
        const { norms } = partialCascadeNorms(cascade.sections.map((s) => s.coefficients));
        for (const n of norms) expectClose(n[norm], 1, { rel: 1e-9 }, `${norm} partial norm`);
        const w = frequencyGrid(64);
        const ideal = responseZpk(zpk, w).magnitude;
        const got = responseSections(
          cascade.sections.map((s) => s.coefficients),
          w,
        ).magnitude.map((m) => m * Math.abs(cascade.outputGain));
        expectClose(got, ideal, { rel: 1e-9, abs: 1e-12 }, `${norm} restored response`);
      }
    });
  }

  it('orders sections by pole radius in the direction asked, and reports radii', () => {
    const c = cases.find((x) => x.name === 'ellip6_lowpass')!;
    const zpk = zpkOfRows(c.sos);
    const up = buildCascade(zpk, { ordering: 'ascending' }).sections.map((s) => s.poleRadius);
    const down = buildCascade(zpk, { ordering: 'descending' }).sections.map((s) => s.poleRadius);
    for (let i = 1; i < up.length; i++) expect(up[i]!).toBeGreaterThan(up[i - 1]!);
    expect(down).toEqual([...up].reverse());
  });

  it("'spread' gives every unscaled section the same peak gain, and 'first' keeps k in section 0", () => {
    const c = cases.find((x) => x.name === 'butter4_lowpass')!;
    const zpk = zpkOfRows(c.sos);
    const spread = buildCascade(zpk, { gain: 'spread', scaling: 'none' });
    const peaks = spread.sections.map((s) => s.peakGainDb);
    // the whole filter peaks at 0 dB (Butterworth), so each of the two sections peaks near 0 dB too
    for (const p of peaks) expectClose(p, peaks[0]!, { abs: 1e-9 }, 'equal peaks');
    const first = buildCascade(zpk, { gain: 'first', scaling: 'none' });
    expectClose(
      first.sections[1]!.coefficients[0],
      1,
      { rel: 1e-15 },
      'later sections keep a monic numerator',
    );
    expect(first.outputGain).toBe(1);
  });

  it('does not scale a cascade with a pole on the circle under L1, and says so', () => {
    const zpk: Zpk = { zeros: [], poles: [{ re: 0, im: 1, multiplicity: 1 }], gain: 1 };
    const c = buildCascade(zpk, { scaling: 'l1' });
    expect(c.sections[0]!.scale).toBe(1);
    expect(c.notes.join(' ')).toMatch(/not scaled/);
  });
});

describe('partial norms of long cascades', () => {
  it('an FIR cascade of 10 sections (1 + z⁻¹)¹⁰ has L1 = 2¹⁰ and L2² = C(20, 10)', () => {
    // common practice: Σ C(10,k) = 2^10 and Σ C(10,k)² = C(20,10) = 184756 (Vandermonde's identity)
    const s: Section = [1, 1, 0, 1, 0, 0];
    const { norms, converged } = partialCascadeNorms(Array.from({ length: 10 }, () => s));
    expect(converged).toBe(true);
    norms.forEach((n, i) => expectClose(n.l1, 2 ** (i + 1), { rel: 1e-15 }, `l1[${i}]`));
    expectClose(norms[9]!.l2, Math.sqrt(184756), { rel: 1e-14 }, 'l2');
    expectClose(norms[9]!.linf, 1024, { rel: 1e-12 }, 'linf at DC');
  });

  it('every partial peak is at least the peak found on the partial cascade alone, and close to it', () => {
    const c = cases.find((x) => x.name === 'ellip6_lowpass')!;
    const sections = asSections(c.sos);
    const { norms } = partialCascadeNorms(sections);
    sections.forEach((_, i) => {
      const alone = peakMagnitude(sections.slice(0, i + 1)).peak;
      expect(norms[i]!.linf).toBeGreaterThanOrEqual(alone * (1 - 1e-12));
      expectClose(norms[i]!.linf, alone, { rel: 1e-9 }, `linf[${i}]`);
    });
  });
});

describe('passWithSums', () => {
  it('filters exactly as the cascade kernel does (bit for bit) and sums |y| and y² of the result', () => {
    const sections: Section[] = [
      [0.3, -0.2, 0.7, 1.1, -1.7, 0.81],
      [1, 2, 1, 1, -0.5, 0.25],
      [0.5, 0, -0.5, 2, 0.4, 0.1],
    ];
    const h = new Float64Array(300);
    h[0] = 1;
    const x = h.slice();
    for (const s of sections) {
      const { l1, energy } = passWithSums(s, h);
      runSectionFilter(createSectionFilter([s]), x, x);
      expect(Array.from(h)).toEqual(Array.from(x));
      expect(l1).toBe(x.reduce((a, v) => a + Math.abs(v), 0));
      expect(energy).toBe(x.reduce((a, v) => a + v * v, 0));
    }
  });
});
