import { describe, expect, it } from 'vitest';
import {
  buildFirImplementation,
  DEFAULT_FIR_SETTINGS,
  quantizeFirInput,
  runFirCodes,
  tapSymmetry,
  firQuantizationError,
  firWorstInput,
  type FirImplementation,
  type FirSettings,
} from '../../../src/core/fixed/fir.ts';
import { differentiator21, lopsided16, lowpass129, lowpass41, lowpass42 } from '../../helpers/firDesigns.ts';
import { overflowInputs } from '../../helpers/fixedDesigns.ts';

function implement(taps: number[], s: Partial<FirSettings> = {}): FirImplementation {
  const r = buildFirImplementation(taps, 1000, { ...DEFAULT_FIR_SETTINGS, ...s });
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

/** The input scaled into the data range (no clipping), so outputs compare with exact sums. */
const calm = (n: number) => overflowInputs(n).map((v) => 0.2 * v);

describe('fixed-point FIR', () => {
  it('an order-128 equiripple multiplied out from its zeros keeps symmetric taps, so the symmetric form is offered', () => {
    // A linear-phase FIR's taps are symmetric (common practice). Multiplied out one zero at a time in doubles
    // these taps were 2.7e-6 of the largest tap from symmetric, above TAP_SYMMETRY_TOLERANCE.
    const L = lowpass129.length;
    const big = Math.max(...lowpass129.map(Math.abs));
    let worst = 0;
    for (let k = 0; k < L; k++) worst = Math.max(worst, Math.abs(lowpass129[k]! - lowpass129[L - 1 - k]!));
    expect(L).toBe(129);
    expect(worst).toBeLessThan(1e-13 * big);
    expect(tapSymmetry(lowpass129)).toBe('even');
  });

  it('reads the symmetry of designed taps', () => {
    expect(tapSymmetry(lowpass41)).toBe('even');
    expect(tapSymmetry(lowpass42)).toBe('even');
    expect(tapSymmetry(differentiator21)).toBe('odd');
    expect(tapSymmetry(lopsided16)).toBe('none');
  });

  it('the symmetric form halves the multiplies and states the pre-add headroom', () => {
    const s = implement(lowpass41, { form: 'symmetric' });
    expect(s.multiplies).toBe(21);
    expect(s.preAddBits).toBe(17);
    const d = implement(lowpass41, { form: 'direct' });
    expect(d.multiplies).toBe(41);
    expect(d.preAddBits).toBe(0);
    expect(implement(lowpass42).multiplies).toBe(21);
    // the codes are exactly symmetric (antisymmetric), so both forms are one filter
    for (const impl of [s, implement(differentiator21)]) {
      const L = impl.codes.length;
      const sign = impl.symmetry === 'odd' ? -1 : 1;
      for (let k = 0; k < L; k++) expect(impl.codes[k]! - sign * impl.codes[L - 1 - k]!).toBe(0);
    }
  });

  it('refuses the symmetric form for taps without symmetry, naming the setting', () => {
    const r = buildFirImplementation(lopsided16, 1000, { ...DEFAULT_FIR_SETTINGS, form: 'symmetric' });
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.parameter).toBe('form');
    expect(implement(lopsided16, { form: 'direct' }).multiplies).toBe(16);
  });

  for (const [name, taps] of [
    ['low-pass, 41 taps', lowpass41],
    ['low-pass, 42 taps', lowpass42],
    ['differentiator, 21 taps', differentiator21],
  ] as const) {
    it(`${name}: with a wide accumulator both forms give the same codes, within half an LSB of the exact sum`, () => {
      const x = calm(1200);
      const sym = implement([...taps], { form: 'symmetric', accumulatorBits: 48 });
      const dir = implement([...taps], { form: 'direct', accumulatorBits: 48 });
      expect(sym.accumulatorSafe).toBe(true);
      const { codes } = quantizeFirInput(sym, x);
      const a = runFirCodes(sym, codes);
      const b = runFirCodes(dir, codes);
      expect(a.overflowCount).toBe(0);
      expect(Array.from(a.output)).toEqual(Array.from(b.output));
      // common practice: with an exact accumulator the only error is the final rounding, at most half an
      // LSB; the exact sum here in integers (every product and sum below 2^53)
      const F = sym.format.fractionBits;
      const L = sym.codes.length;
      for (let n = 0; n < codes.length; n++) {
        let acc = 0;
        for (let k = 0; k < L && k <= n; k++) acc += sym.codes[k]! * codes[n - k]!;
        const exact = acc / 2 ** F;
        expect(Math.abs(a.output[n]! - exact)).toBeLessThanOrEqual(0.5);
      }
      // truncation: floor, so the output is at most one LSB below the exact sum and never above
      const t = implement([...taps], { form: 'symmetric', accumulatorBits: 48, rounding: 'truncate' });
      const tc = quantizeFirInput(t, x).codes;
      const out = runFirCodes(t, tc).output;
      for (let n = 0; n < tc.length; n++) {
        let acc = 0;
        for (let k = 0; k < L && k <= n; k++) acc += t.codes[k]! * tc[n - k]!;
        const exact = acc / 2 ** F;
        expect(out[n]!).toBeLessThanOrEqual(exact);
        expect(out[n]!).toBeGreaterThan(exact - 1);
      }
    });
  }

  it('the stated accumulator width is tight: the worst input fits it and overflows one bit less', () => {
    for (const form of ['direct', 'symmetric'] as const) {
      const probe = implement(lowpass41, { form, accumulatorBits: 48 });
      const need = probe.accumulatorNeeded;
      // every sample at full scale with the sign of the tap it meets: |acc| = Σ|c|·2^(D−1), the largest
      const L = probe.codes.length;
      const worst = Array.from({ length: 3 * L }, (_, n) => {
        const k = L - 1 - (n % L);
        return probe.codes[k]! >= 0 ? -32768 : 32767;
      }).reverse();
      const fits = runFirCodes(implement(lowpass41, { form, accumulatorBits: need }), worst);
      expect(
        fits.overflows.filter((e) => e.place === 'accumulator'),
        form,
      ).toEqual([]);
      const tight = implement(lowpass41, { form, accumulatorBits: need - 1, overflow: 'wrap' });
      expect(tight.accumulatorSafe).toBe(false);
      expect(
        runFirCodes(tight, worst).overflows.some((e) => e.place === 'accumulator'),
        form,
      ).toBe(true);
    }
  });

  it('a full-scale step through a low-pass with pass-band gain above 1 overflows the output word and says so', () => {
    const impl = implement(lowpass41);
    expect(impl.worstGain).toBeGreaterThan(1);
    const step = new Int32Array(200).fill(32767);
    const r = runFirCodes(impl, step);
    expect(r.overflows.some((e) => e.place === 'output')).toBe(true);
    expect(Math.max(...r.output)).toBe(32767); // saturated, not wrapped
  });

  it('wide words take the exact BigInt path and still agree between the forms', () => {
    const x = calm(400);
    const s = { wordLength: 31, dataWordLength: 32, accumulatorBits: 64 } as const;
    const sym = implement(lowpass42, { ...s, form: 'symmetric' });
    const dir = implement(lowpass42, { ...s, form: 'direct' });
    const { codes } = quantizeFirInput(sym, x);
    expect(Array.from(runFirCodes(sym, codes).output)).toEqual(Array.from(runFirCodes(dir, codes).output));
    expect(
      buildFirImplementation(lowpass42, 1000, {
        ...DEFAULT_FIR_SETTINGS,
        ...s,
        wordLength: 32,
        form: 'symmetric',
      }).ok,
    ).toBe(false);
  });

  it('the worst input the page runs reaches the stated accumulator width, and the response error its bound', () => {
    for (const form of ['direct', 'symmetric'] as const) {
      const need = implement(lowpass42, { form, accumulatorBits: 48 }).accumulatorNeeded;
      const fits = implement(lowpass42, { form, accumulatorBits: need });
      const x = firWorstInput(fits);
      expect(runFirCodes(fits, x).overflows.filter((e) => e.place === 'accumulator')).toEqual([]);
      const tight = implement(lowpass42, { form, accumulatorBits: need - 1 });
      expect(runFirCodes(tight, firWorstInput(tight)).overflows.some((e) => e.place === 'accumulator')).toBe(
        true,
      );
    }
    // common practice: rounding each tap to nearest moves it by at most half a step, so |H_q − H| ≤ L·2^−(F+1)
    const impl = implement(lowpass41, { wordLength: 10 });
    const q = firQuantizationError(impl);
    expect(q.largest).toBeGreaterThan(0);
    expect(q.largest).toBeLessThanOrEqual(41 * 2 ** -(impl.format.fractionBits + 1));
  });
});
