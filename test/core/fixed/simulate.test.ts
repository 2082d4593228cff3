import { describe, it, expect } from 'vitest';
import {
  buildImplementation,
  DEFAULT_IMPLEMENTATION,
  detectLimitCycle,
  FixedCascade,
  makeBigArith,
  runFixedCodes,
  simulateFixed,
  type Implementation,
  type ImplementationSettings,
} from '../../../src/core/fixed/index.ts';
import type { Zpk } from '../../../src/core/types.ts';
import { tfToZpk } from '../../../src/core/system/fromCoefficients.ts';
import { makeWhiteNoise } from '../../../src/core/time/inputs.ts';
import { mulberry32 } from '../../../src/core/random.ts';

const settings = (over: Partial<ImplementationSettings> = {}): ImplementationSettings => ({
  ...DEFAULT_IMPLEMENTATION,
  ...over,
});

function implement(zpk: Zpk, over: Partial<ImplementationSettings> = {}): Implementation {
  const r = buildImplementation(zpk, 1000, settings(over));
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

// 1/(1 + 0.875 z⁻¹): a zero at the origin keeps the numerator undelayed.
const firstOrder: Zpk = {
  zeros: [{ re: 0, im: 0, multiplicity: 1 }],
  poles: [{ re: -0.875, im: 0, multiplicity: 1 }],
  gain: 1,
};

describe('fixed-point simulation, hand-worked', () => {
  for (const structure of ['df1', 'df2t'] as const) {
    it(`${structure}: y[n] = round(−0.875·y[n−1]) from y[0] = 8 LSB`, () => {
      const impl = implement(firstOrder, { structure, scaling: 'none' });
      const x = new Int32Array(12);
      x[0] = 8;
      // By hand, rounding half up: 8, −7, 6.125→6, −5.25→−5, 4.375→4, −3.5→−3, 2.625→3, −2.625→−3, 3, −3, ...
      expect(Array.from(runFixedCodes(impl, x).output)).toEqual([8, -7, 6, -5, 4, -3, 3, -3, 3, -3, 3, -3]);
      const t = implement(firstOrder, { structure, scaling: 'none', rounding: 'truncate' });
      // Flooring: 8, −7, 6, −5.25→−6, 5.25→5, −4.375→−5, 4.375→4, −3.5→−4, 3.5→3, −2.625→−3, 2.625→2, −1.75→−2
      expect(Array.from(runFixedCodes(t, x).output)).toEqual([8, -7, 6, -6, 5, -5, 4, -4, 3, -3, 2, -2]);
    });
  }

  it('reports output overflows with sample and section, saturating or wrapping', () => {
    const gain2: Zpk = { zeros: [], poles: [], gain: 2 };
    const x = [0.25, 0.5, -0.75, 0.1];
    const sat = simulateFixed(implement(gain2, { scaling: 'none' }), x);
    // 0.1·32768 = 3276.8 → 3277; doubled: 16384, 32768 → 32767, −49152 → −32768, 6554
    expect(Array.from(sat.input)).toEqual([8192, 16384, -24576, 3277]);
    expect(Array.from(sat.output)).toEqual([16384, 32767, -32768, 6554]);
    expect(sat.overflows).toEqual([
      { sample: 1, section: 0, place: 'output' },
      { sample: 2, section: 0, place: 'output' },
    ]);
    const wrap = simulateFixed(implement(gain2, { scaling: 'none', overflow: 'wrap' }), x);
    // 32768 − 65536 = −32768; −49152 + 65536 = 16384
    expect(Array.from(wrap.output)).toEqual([16384, -32768, 16384, 6554]);
    expect(wrap.overflowCount).toBe(2);
  });

  it('overflows a 31-bit accumulator with (−2^15)·(−2^15)', () => {
    const minus2: Zpk = { zeros: [], poles: [], gain: -2 };
    const base = { scaling: 'none' as const, accumulatorBits: 31 };
    const x = Int32Array.of(-32768);
    const sat = implement(minus2, base);
    expect(sat.quantized.codes[0]!.b[0]).toBe(-32768); // −2 in Q1.14
    // 2^30 saturates to 2^30 − 1; >> 14 with rounding: 65535 + bit 13 (1) = 65536 → saturates to 32767
    const s = runFixedCodes(sat, x);
    expect(Array.from(s.output)).toEqual([32767]);
    expect(s.overflows.map((e) => e.place)).toEqual(['accumulator', 'output']);
    // wrapping: 2^30 → −2^30; >> 14 = −65536 → wraps to 0
    const w = runFixedCodes(implement(minus2, { ...base, overflow: 'wrap' }), x);
    expect(Array.from(w.output)).toEqual([0]);
    expect(w.overflowCount).toBe(2);
  });
});

describe('fixed-point simulation, invariants', () => {
  /** A random stable biquad cascade of order 2..6. */
  function randomZpk(rand: () => number): Zpk {
    const n = 1 + Math.floor(rand() * 3);
    const poles = [];
    const zeros = [];
    for (let i = 0; i < n; i++) {
      const r = 0.3 + 0.69 * rand();
      const t = Math.PI * rand();
      poles.push({ re: r * Math.cos(t), im: r * Math.sin(t), multiplicity: 1 });
      const u = Math.PI * rand();
      zeros.push({ re: Math.cos(u), im: Math.sin(u), multiplicity: 1 });
    }
    return { zeros, poles, gain: 0.5 + 3 * rand() };
  }

  it('the double path equals BigInt arithmetic bit for bit (seeded designs, inputs that overflow)', () => {
    const rand = mulberry32(17);
    let overflowed = 0;
    for (let trial = 0; trial < 40; trial++) {
      const over: Partial<ImplementationSettings> = {
        structure: rand() < 0.5 ? 'df1' : 'df2t',
        rounding: rand() < 0.5 ? 'nearest' : 'truncate',
        overflow: rand() < 0.5 ? 'saturate' : 'wrap',
        feedbackSign: rand() < 0.5 ? 'denominator' : 'negated',
        scaling: (['none', 'linf', 'l2'] as const)[Math.floor(rand() * 3)]!,
        wordLength: 10 + Math.floor(rand() * 14),
        dataWordLength: 12 + Math.floor(rand() * 5),
      };
      const w = over.wordLength!;
      const d = over.dataWordLength!;
      over.accumulatorBits = d + w - 1 + Math.floor(rand() * 4);
      const impl = implement(randomZpk(rand), over);
      const x = makeWhiteNoise(300, trial, 0.7);
      const fast = simulateFixed(impl, x);
      const events: string[] = [];
      const big = new FixedCascade(
        makeBigArith({
          dataBits: d,
          accumulatorBits: over.accumulatorBits,
          postShift: impl.postShift,
          rounding: over.rounding!,
          overflow: over.overflow!,
        }),
        impl.quantized.codes,
        over.structure!,
        over.feedbackSign!,
        (e) => events.push(`${e.sample}/${e.section}/${e.place}`),
      );
      const slow = Array.from(fast.input, (v, n) => big.step(v, n));
      if (fast.overflowCount > 0) overflowed++;
      expect(Array.from(fast.output), `trial ${trial}`).toEqual(slow);
      expect(fast.overflows.map((e) => `${e.sample}/${e.section}/${e.place}`)).toEqual(events.slice(0, 1000));
    }
    expect(overflowed).toBeGreaterThan(5);
  });

  it('a 24-bit path follows the float cascade to within a few LSB when nothing overflows', () => {
    const zpk = tfToZpk({ b: [0.02, 0, -0.02], a: [1, -1.8, 0.9] });
    const impl = implement(zpk, { wordLength: 24, dataWordLength: 24, accumulatorBits: 56, scaling: 'l1' });
    const sim = simulateFixed(impl, makeWhiteNoise(2000, 3, 0.3));
    expect(sim.overflowCount).toBe(0);
    let worst = 0;
    for (let i = 0; i < sim.output.length; i++)
      worst = Math.max(worst, Math.abs(sim.outputValues[i]! - sim.reference[i]!));
    expect(worst).toBeLessThan(64 * 2 ** -23);
  });
});

describe('detectLimitCycle', () => {
  it('first order, rounding: the ±3 LSB dead-band oscillation of y = round(−0.875·y[n−1])', () => {
    // common practice: rounding a first-order recursion sustains |y| ≤ 0.5/(1 − |a|) = 4 LSB; by hand ±3, period 2
    const impl = implement(firstOrder, { scaling: 'none', structure: 'df1' });
    const r = detectLimitCycle(impl, Int32Array.of(8));
    expect(r.verdict).toBe('cycle');
    expect(r.period).toBe(2);
    expect(r.amplitudeCodes).toBe(3);
    expect(Array.from(r.cycle).sort()).toEqual([-3, 3]);
  });

  it('first order, truncation (floor): decays to rest', () => {
    const impl = implement(firstOrder, { scaling: 'none', rounding: 'truncate' });
    expect(detectLimitCycle(impl, Int32Array.of(8)).verdict).toBe('rest');
  });

  for (const structure of ['df1', 'df2t'] as const) {
    it(`${structure}: a lightly damped pole pair with rounding oscillates inside the dead band`, () => {
      // poles 0.975·e^{±jπ/3}: a1 = −0.975, a2 = 0.950625. Rounding makes a2·y round back to y for
      // |y| ≤ 0.5/(1 − a2) ≈ 10 LSB, so the pair acts as if on the unit circle (common practice, from memory).
      const zpk = tfToZpk({ b: [1, 0, 0], a: [1, -0.975, 0.950625] });
      const impl = implement(zpk, { scaling: 'none', structure });
      const r = detectLimitCycle(impl, Int32Array.of(200));
      expect(r.verdict).toBe('cycle');
      expect(r.amplitudeCodes).toBeGreaterThan(0);
      expect(r.amplitudeCodes).toBeLessThanOrEqual(Math.ceil(0.5 / (1 - 0.950625)));
      // An independent integer recursion with the same codes and rounding repeats with the same period.
      const [a1, a2] = impl.quantized.codes[0]!.a;
      const F = impl.postShift;
      const y: number[] = [200];
      let y1 = 200;
      let y2 = 0;
      for (let n = 1; n < 5000; n++) {
        const v = Math.floor((-a1 * y1 - a2 * y2) / 2 ** F + 0.5);
        [y2, y1] = [y1, v];
        y.push(v);
      }
      const tail = y.slice(4000);
      for (let n = r.period; n < tail.length; n++) expect(tail[n]).toBe(tail[n - r.period]);
      for (let p = 1; p < r.period; p++) expect(tail.slice(p).some((v, n) => v !== tail[n])).toBe(true);
    });
  }

  it('the float cascade of the same pole pair decays below an LSB', () => {
    const zpk = tfToZpk({ b: [1, 0, 0], a: [1, -0.975, 0.950625] });
    const impl = implement(zpk, { scaling: 'none' });
    const x = new Float64Array(2000);
    x[0] = 200 / 32768;
    const sim = simulateFixed(impl, x);
    expect(Math.abs(sim.reference[1999]!)).toBeLessThan(2 ** -15);
    expect(Math.abs(sim.output[1999]!)).toBeGreaterThan(0);
  });
});
