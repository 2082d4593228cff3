import { describe, it, expect } from 'vitest';
import {
  SECTION_BLOCK,
  createSectionFilter,
  resetSectionFilter,
  runSectionFilter,
} from '../../../src/core/signal/index.ts';
import { mulberry32 } from '../../../src/core/random.ts';
import { filterSections, filterTf } from '../../../src/core/time/filter.ts';
import type { Section } from '../../../src/core/types.ts';
import { loadFixture } from '../../helpers/fixtures.ts';
import { expectClose } from '../../helpers/expectClose.ts';

interface FilterFixture {
  x: number[];
  cases: { name: string; sos: number[][]; y_sos: number[]; b: number[]; a: number[]; y_tf: number[] }[];
}

const fx = loadFixture<FilterFixture>('signal_filter');

function inPieces(sections: Section[], x: Float64Array, sizes: number[]): Float64Array {
  const filter = createSectionFilter(sections);
  const out = new Float64Array(x.length);
  for (let p = 0, i = 0; p < x.length; i++) {
    const n = Math.min(sizes[i % sizes.length]!, x.length - p);
    out.set(runSectionFilter(filter, x.subarray(p, p + n)), p);
    p += n;
  }
  return out;
}

describe('runSectionFilter', () => {
  for (const c of fx.cases) {
    const sections = c.sos as Section[];
    const x = Float64Array.from(fx.x);
    it(`${c.name}: matches scipy.signal.sosfilt and lfilter on a hum-and-noise recording`, () => {
      const y = runSectionFilter(createSectionFilter(sections), x);
      const peak = Math.max(...c.y_sos.map(Math.abs));
      expectClose(y, c.y_sos, { abs: 1e-13 * peak, rel: 1e-12 }, 'sosfilt'); // scipy.signal.sosfilt 1.17
      expectClose(y, c.y_tf, { abs: 1e-9 * peak }, 'lfilter'); // scipy.signal.lfilter 1.17 on sos2tf
    });
    it(`${c.name}: pieces of odd sizes give the one-shot output bit for bit`, () => {
      const whole = filterSections(sections, x);
      for (const sizes of [[1], [7, 13, 1], [333], [799, 1]]) {
        const pieces = inPieces(sections, x, sizes);
        expect(Buffer.from(pieces.buffer).equals(Buffer.from(whole.buffer)), String(sizes)).toBe(true);
      }
    });
  }

  it('filters in place and starts afresh after a reset', () => {
    const sections: Section[] = [[1, 0.5, 0.25, 2, -0.4, 0.1]];
    const filter = createSectionFilter(sections);
    const x = Float64Array.of(1, 0, 0, 2, -1);
    const first = runSectionFilter(filter, x);
    resetSectionFilter(filter);
    const buf = x.slice();
    runSectionFilter(filter, buf, buf);
    expect(Array.from(buf)).toEqual(Array.from(first));
    // One section is one transfer function: filterTf normalises by a0 the same way.
    expectClose(first, filterTf({ b: [1, 0.5, 0.25], a: [2, -0.4, 0.1] }, x), { abs: 1e-15 }, 'tf');
  });

  it('refuses a section with a0 = 0', () => {
    expect(() => createSectionFilter([[1, 0, 0, 0, 1, 0]])).toThrow(/section 0 has a0 = 0/);
  });
});

describe('runSectionFilter fused kernel', () => {
  /** Section after section over the whole signal, in the kernel's form (y = b0·x + s0, state without y). */
  function sectionBySection(sections: Section[], x: Float64Array): Float64Array {
    const y = x.slice();
    for (const [b0r, b1r, b2r, a0, a1r, a2r] of sections) {
      const [b0, b1, b2, a1, a2] = [b0r / a0, b1r / a0, b2r / a0, a1r / a0, a2r / a0];
      const c1 = b1 - a1 * b0;
      const c2 = b2 - a2 * b0;
      let s0 = 0;
      let s1 = 0;
      for (let i = 0; i < y.length; i++) {
        const xi = y[i]!;
        y[i] = b0 * xi + s0;
        const t = c1 * xi - a1 * s0 + s1;
        s1 = c2 * xi - a2 * s0;
        s0 = t;
      }
    }
    return y;
  }

  /** The plain transposed direct form II, one section at a time, z0 ← b1·x + z1 − a1·y, z1 ← b2·x − a2·y. */
  function plainForm(sections: Section[], x: Float64Array): Float64Array {
    const y = x.slice();
    for (const [b0, b1, b2, a0, a1, a2] of sections) {
      let z0 = 0;
      let z1 = 0;
      for (let i = 0; i < y.length; i++) {
        const xi = y[i]!;
        const yi = (b0 / a0) * xi + z0;
        z0 = (b1 / a0) * xi + z1 - (a1 / a0) * yi;
        z1 = (b2 / a0) * xi - (a2 / a0) * yi;
        y[i] = yi;
      }
    }
    return y;
  }

  it('gives the section-by-section output bit for bit for 0 to 9 sections across block edges', () => {
    const next = mulberry32(11);
    const x = Float64Array.from({ length: 2 * SECTION_BLOCK + 37 }, () => next() - 0.5);
    for (let count = 0; count <= 9; count++) {
      const sections: Section[] = Array.from({ length: count }, (_, s) => {
        const r = 0.95 - 0.02 * s;
        const w = 0.2 + 0.3 * s;
        return [0.3 + 0.1 * s, -0.2, 0.1, 1 + 0.01 * s, -2 * r * Math.cos(w), r * r];
      });
      const fused = runSectionFilter(createSectionFilter(sections), x);
      const plain = sectionBySection(sections, x);
      expect(Buffer.from(fused.buffer).equals(Buffer.from(plain.buffer)), `${count} sections`).toBe(true);
      // The same filter as the plain form, to rounding (the state is the same; only the order of the
      // products and sums differs).
      const peak = Math.max(1e-300, ...plainForm(sections, x).map(Math.abs));
      expectClose(
        fused,
        plainForm(sections, x),
        { abs: 1e-12 * peak },
        `${count} sections vs the plain form`,
      );
    }
  });

  it('keeps the plain form’s state: one signal split between the two forms continues seamlessly', () => {
    // Notch near the circle (the hopper scenario's 50 Hz at 2 kHz): state handed over mid-signal.
    const w = (2 * Math.PI * 50) / 2000;
    const sections: Section[] = [[1, -2 * Math.cos(w), 1, 1, -2 * 0.99 * Math.cos(w), 0.99 ** 2]];
    const next = mulberry32(4);
    const x = Float64Array.from({ length: 3000 }, () => next() - 0.5);
    const whole = plainForm(sections, x);
    const f = createSectionFilter(sections);
    const first = runSectionFilter(f, x.subarray(0, 1500));
    const rest = runSectionFilter(f, x.subarray(1500));
    const peak = Math.max(...whole.map(Math.abs));
    expectClose([...first, ...rest], whole, { abs: 1e-13 * peak }, 'split');
  });
  it('reads plain arrays and Float32Array input', () => {
    const sections: Section[] = [[1, 0.5, 0.25, 1, -0.4, 0.1]];
    const x = [1, 0, 0, 2, -1];
    const a = runSectionFilter(createSectionFilter(sections), x);
    const b = runSectionFilter(createSectionFilter(sections), Float32Array.from(x));
    expect(Array.from(a)).toEqual(Array.from(b));
  });
});
