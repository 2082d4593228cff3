/**
 * Round-off noise: the prediction (additive noise model) against the bit-exact simulation, and its pieces
 * against closed forms. The measured noise is the fixed-point output minus the same cascade in float64 with
 * the stored (quantized) coefficients, on long white noise that never overflows: within 1 dB of the prediction.
 */
import { describe, it, expect } from 'vitest';
import {
  buildImplementation,
  compareArrangements,
  DEFAULT_IMPLEMENTATION,
  FixedRun,
  makeArith,
  quietestSafe,
  roundingError,
  roundoffNoise,
  runFixedCodes,
  type Implementation,
  type ImplementationSettings,
} from '../../../src/core/fixed/index.ts';
import { makeSine, makeWhiteNoise } from '../../../src/core/time/inputs.ts';
import type { Zpk } from '../../../src/core/types.ts';
import { peakMagnitude } from '../../../src/core/sections/index.ts';
import { butterBand, ellip, hum } from '../../helpers/fixedDesigns.ts';

function implement(zpk: Zpk, over: Partial<ImplementationSettings>, fs = 1000): Implementation {
  const r = buildImplementation(zpk, fs, { ...DEFAULT_IMPLEMENTATION, ...over });
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

describe('one rounding: error statistics', () => {
  // Every accumulator residue of F dropped bits, shifted back by the engine's own arithmetic: the exact mean
  // and variance of the error over the 2^F equally likely residues.
  for (const rounding of ['nearest', 'truncate'] as const) {
    for (const dropped of [1, 3, 8]) {
      it(`${rounding}, ${dropped} dropped bits: mean and variance over all residues`, () => {
        const path = {
          dataBits: 16,
          accumulatorBits: 40,
          postShift: dropped,
          rounding,
          overflow: 'saturate' as const,
        };
        const ar = makeArith(path, 16) as ReturnType<typeof makeArith> & { toData(v: number): number };
        const m = 2 ** dropped;
        const base = 1000 * m; // a code well inside the word
        let sum = 0;
        let sumSq = 0;
        for (let r = 0; r < m; r++) {
          const e = ar.toData(base + r) - (base + r) / m; // in LSBs
          sum += e;
          sumSq += e * e;
        }
        const mean = sum / m;
        const variance = sumSq / m - mean * mean;
        const want = roundingError(1, dropped, rounding);
        expect(mean).toBeCloseTo(want.mean, 12);
        expect(variance).toBeCloseTo(want.variance, 12);
      });
    }
  }

  it('tends to the classic q²/12 as the dropped bits grow, and is zero with none dropped', () => {
    // q²/12: the variance of a uniform error over one step (common practice)
    expect(roundingError(1, 30, 'nearest').variance).toBeCloseTo(1 / 12, 15);
    expect(roundingError(1, 30, 'truncate').mean).toBeCloseTo(-0.5, 8);
    expect(roundingError(1, 0, 'truncate')).toEqual({ variance: 0, mean: 0 });
  });
});

describe('noise gains against closed forms', () => {
  it('a one-pole section: Σ g² = 1/(1 − a²) (geometric series)', () => {
    const a = 0.9;
    const onePole: Zpk = {
      zeros: [{ re: 0, im: 0, multiplicity: 1 }],
      poles: [{ re: a, im: 0, multiplicity: 1 }],
      gain: 0.05,
    };
    const impl = implement(onePole, { scaling: 'none' });
    const stored = -impl.quantized.sections[0]![4]; // the quantized pole
    // Σ stored^(2n) = 1/(1 − stored²), common practice
    expect(roundoffNoise(impl).sections[0]!.noiseGain).toBeCloseTo(1 / (1 - stored * stored), 9);
  });

  it('a unity-gain section rounding to D bits: SNR 6.02·D + 1.76 dB, so D effective bits', () => {
    // SNR of an ideal D-bit quantizer for a full-scale sine: 6.02·D + 1.76 dB (common practice)
    const wire = implement({ zeros: [], poles: [], gain: 1 }, { scaling: 'none', dataWordLength: 16 });
    const n = roundoffNoise(wire);
    expect(n.sections[0]!.noiseGain).toBe(1);
    expect(n.snrDb).toBeCloseTo(6.0206 * 16 + 1.7609, 2);
    expect(n.effectiveBits).toBeCloseTo(16, 1);
    expect(n.snrDb).toBeCloseTo(-n.powerDbfs, 12);
  });

  it('no rounding when the coefficients have no fraction bits', () => {
    const integer = implement({ zeros: [], poles: [], gain: 1 }, { scaling: 'none', fractionBits: 0 });
    const n = roundoffNoise(integer);
    expect(n.power).toBe(0);
    expect(n.snrDb).toBe(Infinity);
  });
});

describe('prediction against the bit-exact simulation (long white noise, no overflow)', () => {
  const designs: [string, Zpk, number][] = [
    ['hum notches', hum, 2000],
    ['elliptic low-pass', ellip, 1000],
    ['butterworth band-pass', butterBand, 8000],
  ];
  const length = 1 << 17;
  for (const [name, zpk, fs] of designs) {
    for (const structure of ['df1', 'df2t'] as const) {
      for (const rounding of ['nearest', 'truncate'] as const) {
        for (const [data, word] of [
          [16, 16],
          [12, 14],
        ] as const) {
          it(`${name}, ${structure}, ${rounding}, ${data}-bit data: measured within 1 dB of predicted`, () => {
            const impl = implement(
              zpk,
              { structure, rounding, dataWordLength: data, wordLength: word, scaling: 'l1' },
              fs,
            );
            const run = new FixedRun(impl);
            run.pushValues(makeWhiteNoise(length, 11, 0.25).map((v) => Math.max(-0.99, Math.min(0.99, v))));
            const measured = run.report();
            expect(measured.overflowCount).toBe(0);
            const predicted = roundoffNoise(impl);
            expect(Math.abs(measured.roundoff.powerDbfs - predicted.powerDbfs)).toBeLessThan(1);
          });
        }
      }
    }
  }

  it('the two structures predict the same noise (one rounding per section, the rounded output fed back)', () => {
    const a = roundoffNoise(implement(ellip, { structure: 'df1' }));
    const b = roundoffNoise(implement(ellip, { structure: 'df2t' }));
    expect(a.powerDbfs).toBeCloseTo(b.powerDbfs, 12);
  });
});

describe('arrangements', () => {
  const list = compareArrangements(hum, 2000, DEFAULT_IMPLEMENTATION);

  it('SNR counts the signal too: L1 scaling lowers the noise but lowers the signal more', () => {
    const l1 = list.find((a) => a.scaling === 'l1')!;
    const linf = list.find((a) => a.scaling === 'linf')!;
    expect(l1.noise.power).toBeLessThan(linf.noise.power);
    expect(l1.noise.peakGain).toBeLessThan(0.9);
    expect(linf.noise.peakGain).toBeCloseTo(1, 6);
    expect(l1.noise.snrDb).toBeLessThan(linf.noise.snrDb);
  });

  it('covers every ordering × scaling × structure, quietest first, with the current one marked', () => {
    expect(list).toHaveLength(16);
    for (let i = 1; i < list.length; i++)
      expect(list[i]!.noise.snrDb).toBeLessThanOrEqual(list[i - 1]!.noise.snrDb);
    expect(list.filter((a) => a.current)).toHaveLength(1);
  });

  it('L1 scaling cannot overflow for any input; L∞ for any full-scale sine', () => {
    for (const a of list) {
      if (a.scaling === 'l1') expect(a.headroom).toBe('any-input');
      if (a.scaling === 'linf') expect(['sine', 'any-input']).toContain(a.headroom);
    }
  });

  it('the verdicts hold in the bit-exact run: full-scale sines where each partial cascade peaks', () => {
    // A sine faded in over 3000 samples (the poles' transients die out as it grows), at 0.999 of full scale,
    // at the frequency where each partial cascade H₁…H_k peaks.
    const fade = 3000;
    for (const a of list.filter((x) => x.structure === 'df2t')) {
      const impl = implement(hum, a.settings, 2000);
      let overflows = 0;
      impl.cascade.sections.forEach((_, k) => {
        const { omega } = peakMagnitude(impl.cascade.sections.slice(0, k + 1).map((s) => s.coefficients));
        const x = makeSine(omega, 2 * fade).map((v, i) => 0.999 * v * Math.min(1, i / fade));
        overflows += runFixedCodes(
          impl,
          Int32Array.from(x, (v) => Math.round(v * 32768)),
        ).overflowCount;
      });
      if (a.headroom === 'any-input' || a.headroom === 'sine') expect(overflows, a.scaling).toBe(0);
      if (a.headroom === 'none') expect(overflows, a.scaling).toBeGreaterThan(0);
    }
  });

  it('picks the quietest arrangement that meets the headroom asked for', () => {
    const safe = quietestSafe(list, 'any-input');
    expect(safe?.headroom).toBe('any-input');
    const sine = quietestSafe(list, 'sine');
    expect(sine).not.toBeNull();
    expect(sine!.noise.snrDb).toBeGreaterThanOrEqual(safe!.noise.snrDb);
    // the hum design's poles share one radius, so the orderings and both structures tie: the one in force stays
    expect(sine!.current).toBe(true);
  });
});
