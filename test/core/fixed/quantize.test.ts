import { describe, it, expect } from 'vitest';
import {
  autoFractionBits,
  buildImplementation,
  DEFAULT_IMPLEMENTATION,
  qName,
  quantizeCascade,
  quantizeValue,
  smallestWordLength,
  validateSettings,
  type ImplementationSettings,
} from '../../../src/core/fixed/index.ts';
import type { Section, Zpk } from '../../../src/core/types.ts';
import { tfToZpk } from '../../../src/core/system/fromCoefficients.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const Q1_14 = { wordLength: 16, fractionBits: 14 };
const settings = (over: Partial<ImplementationSettings> = {}): ImplementationSettings => ({
  ...DEFAULT_IMPLEMENTATION,
  ...over,
});
const biquad = (b: number[], a: number[]): Zpk => tfToZpk({ b, a });

describe('quantizeValue', () => {
  it('hand-worked codes in Q1.14', () => {
    expect(qName(Q1_14)).toBe('Q1.14');
    // 0.5·2^14 = 8192 exactly
    expect(quantizeValue(0.5, Q1_14, 'nearest')).toEqual({ code: 8192, saturated: false });
    // −1.6·2^14 = −26214.4: nearest −26214, truncate (toward −∞) −26215
    expect(quantizeValue(-1.6, Q1_14, 'nearest').code).toBe(-26214);
    expect(quantizeValue(-1.6, Q1_14, 'truncate').code).toBe(-26215);
    // 0.64·2^14 = 10485.76 → 10486 / 10485
    expect(quantizeValue(0.64, Q1_14, 'nearest').code).toBe(10486);
    expect(quantizeValue(0.64, Q1_14, 'truncate').code).toBe(10485);
  });

  it('rounds ties up (toward +∞) and truncates toward −∞', () => {
    const lsb = 2 ** -14;
    expect(quantizeValue(2.5 * lsb, Q1_14, 'nearest').code).toBe(3);
    expect(quantizeValue(-2.5 * lsb, Q1_14, 'nearest').code).toBe(-2);
    expect(quantizeValue(-2.5 * lsb, Q1_14, 'truncate').code).toBe(-3);
    expect(quantizeValue(2.4999999 * lsb, Q1_14, 'nearest').code).toBe(2);
    // the largest double below one half LSB must not round up through floor(x + 0.5)
    expect(quantizeValue(0.49999999999999994 * lsb, Q1_14, 'nearest').code).toBe(0);
  });

  it('saturates at the largest code and keeps the most negative one', () => {
    expect(quantizeValue(2, Q1_14, 'nearest')).toEqual({ code: 32767, saturated: true });
    expect(quantizeValue(-2, Q1_14, 'nearest')).toEqual({ code: -32768, saturated: false });
    expect(quantizeValue(-2.0001, Q1_14, 'nearest')).toEqual({ code: -32768, saturated: true });
    // 2 − 2^−15 rounds up to 2^15 in Q1.14 and must clamp
    expect(quantizeValue(2 - 2 ** -15, Q1_14, 'nearest')).toEqual({ code: 32767, saturated: true });
  });
});

describe('autoFractionBits', () => {
  it('gives an integer bit exactly when a coefficient reaches 1 (but −1 fits Q0.15)', () => {
    expect(autoFractionBits([0.3, -1.6, 0.64], 16, 'nearest').fractionBits).toBe(14);
    expect(autoFractionBits([0.99], 16, 'nearest').fractionBits).toBe(15);
    expect(autoFractionBits([1.0], 16, 'nearest').fractionBits).toBe(14);
    expect(autoFractionBits([-1.0], 16, 'nearest').fractionBits).toBe(15);
    expect(autoFractionBits([3.9], 16, 'nearest').fractionBits).toBe(13);
    expect(autoFractionBits([300], 8, 'nearest')).toEqual({ fractionBits: 0, fits: false });
  });
});

describe('quantizeCascade', () => {
  it('stores the feedback pair in the denominator sign or negated, each quantized as stored', () => {
    const s: Section[] = [[0.25, 0.5, 0.25, 1, -1.6, 0.64]];
    const den = quantizeCascade(s, settings());
    expect(den.format.fractionBits).toBe(14);
    expect(den.codes[0]).toEqual({ b: [4096, 8192, 4096], a: [-26214, 10486] });
    const neg = quantizeCascade(s, settings({ feedbackSign: 'negated' }));
    // +1.6·2^14 = 26214.4 → 26214; −0.64·2^14 = −10485.76 → −10486
    expect(neg.codes[0]).toEqual({ b: [4096, 8192, 4096], a: [26214, -10486] });
    expect(neg.sections[0]).toEqual(den.sections[0]);
    expect(den.sections[0]![4]).toBe(-26214 / 16384);
  });
});

describe('buildImplementation', () => {
  it('quantized poles of a double pole at 0.8 in 8 bits (Q1.6), by the quadratic formula by hand', () => {
    const impl = buildImplementation(
      biquad([1], [1, -1.6, 0.64]),
      1000,
      settings({ wordLength: 8, scaling: 'none' }),
    );
    if (!impl.ok) throw new Error(impl.error.message);
    const q = impl.value;
    expect(q.quantized.format).toEqual({ wordLength: 8, fractionBits: 6 });
    // −1.6·64 = −102.4 → −102; 0.64·64 = 40.96 → 41
    expect(q.quantized.codes[0]!.a).toEqual([-102, 41]);
    // z² − (102/64) z + 41/64: discriminant (102/64)² − 4·41/64 < 0, so a pair at 51/64 ± j·sqrt(41/64 − (51/64)²)
    const poles = q.sectionRoots[0]!.poles;
    expect(poles).toHaveLength(1);
    expectClose(
      [poles[0]!.re, poles[0]!.im],
      [51 / 64, Math.sqrt(41 / 64 - (51 / 64) ** 2)],
      { abs: 1e-15 },
      'pole',
    );
    expect(q.stability.verdict).toBe('stable');
  });

  it('says when quantization puts a pole on the unit circle', () => {
    // a2 = 0.9995 rounds to 64/64 = 1 in Q1.6
    const impl = buildImplementation(
      biquad([1], [1, -1.9, 0.9995]),
      1,
      settings({ wordLength: 8, scaling: 'none' }),
    );
    if (!impl.ok) throw new Error(impl.error.message);
    expect(impl.value.quantized.codes[0]!.a[1]).toBe(64);
    expect(impl.value.idealStability.verdict).toBe('stable');
    expect(impl.value.stability.verdict).not.toBe('stable');
    expect(impl.value.notes.join(' ')).toMatch(/quantization made the filter/);
  });

  it('restores the output gain, so the quantized zpk tracks the ideal gain', () => {
    const zpk = biquad([0.2, 0.4, 0.2], [1, -0.5, 0.3]);
    const impl = buildImplementation(zpk, 1, settings({ wordLength: 24, scaling: 'l1' }));
    if (!impl.ok) throw new Error(impl.error.message);
    expectClose(impl.value.quantizedZpk.gain, zpk.gain, { rel: 1e-5 }, 'gain');
  });

  it('rejects settings with a useful message', () => {
    const bad = validateSettings(settings({ wordLength: 40 }));
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.error.expected).toMatch(/8 to 32/);
    const acc = validateSettings(settings({ wordLength: 24, accumulatorBits: 32 }));
    if (!acc.ok) expect(acc.error.message).toMatch(/39 bits/);
    else throw new Error('a 16×24-bit product needs 39 bits');
    expect(validateSettings(settings({ fractionBits: 16 })).ok).toBe(false);
  });
});

describe('smallestWordLength', () => {
  const zpk = biquad([1], [1, -1.9, 0.9995]);

  it('finds the word length the stability triangle predicts', () => {
    // Hand search (common practice: a biquad is stable iff |a2| < 1 and |a1| < 1 + a2): with one integer bit
    // F = W − 2, a2 = round(0.9995·2^F)/2^F stays below 1 once 2^F·0.0005 ≥ 0.5, i.e. F ≥ 10, W ≥ 12.
    let expected = 0;
    for (let w = 8; w <= 32 && expected === 0; w++) {
      const f = 2 ** (w - 2);
      const a1 = Math.round(-1.9 * f) / f;
      const a2 = Math.round(0.9995 * f) / f;
      if (Math.abs(a2) < 1 && Math.abs(a1) < 1 + a2) expected = w;
    }
    expect(expected).toBe(12);
    const r = smallestWordLength(zpk, 1, settings({ scaling: 'none' }));
    expect(r.wordLength).toBe(12);
    expect(r.longerAllPass).toBe(true);
    expect(r.trials).toHaveLength(25);
    expect(r.trials[0]!.stable).toBe(false);
  });

  it('applies a requirement on the quantized filter', () => {
    const ideal = Math.sqrt(0.9995);
    // requirement: pole radius within 1e-6 of the ideal one
    const r = smallestWordLength(zpk, 1, settings({ scaling: 'none' }), ({ zpk: q }) =>
      q.poles.every((p) => Math.abs(Math.hypot(p.re, p.im) - ideal) < 1e-6),
    );
    expect(r.wordLength).not.toBeNull();
    expect(r.wordLength!).toBeGreaterThan(12);
    const t = r.trials.find((x) => x.wordLength === r.wordLength)!;
    expect(Math.abs(t.maxPoleRadius - ideal)).toBeLessThan(1e-6);
    const before = r.trials.find((x) => x.wordLength === r.wordLength! - 1)!;
    expect(before.accepted).toBe(false);
  });
});
