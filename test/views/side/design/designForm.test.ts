import { describe, expect, it } from 'vitest';
import { runDesigner } from '../../../../src/core/design/index.ts';
import { evaluateMask } from '../../../../src/core/mask/index.ts';
import { FAMILIES, KINDS, defaultForm, isClassical } from '../../../../src/views/side/design/designKinds.ts';
import { formOf, readForm, readHarmonics } from '../../../../src/views/side/design/designForm.ts';
import { expectListPolicy } from '../../../helpers/numberPolicy.ts';
import { errorField } from '../../../../src/views/side/design/designErrors.ts';
import { maskFromDesigner } from '../../../../src/core/mask/index.ts';
import { describeDesigner } from '../../../../src/views/side/design/describe.ts';

const RATES = [200, 1000, 2000, 8000, 48000];

describe('defaultForm', () => {
  it('gives every kind values its designer accepts, at every sample rate', () => {
    for (const fs of RATES)
      for (const { kind } of KINDS)
        for (const { family } of isClassical(kind) ? FAMILIES : [FAMILIES[0]!])
          for (const autoOrder of isClassical(kind) ? [false, true] : [false]) {
            const r = readForm({ ...defaultForm(kind, fs), family, autoOrder }, fs);
            expect(r.ok, `${kind} ${family} at ${fs} Hz`).toBe(true);
            if (!r.ok) continue;
            const d = runDesigner(r.spec);
            expect(
              d.ok,
              `${kind} ${family} auto=${autoOrder} at ${fs} Hz: ${d.ok ? '' : d.error.message}`,
            ).toBe(true);
          }
  });

  it('starts from designs that meet their own requirement mask (notches, Butterworth, any least order)', () => {
    for (const fs of RATES.slice(0, -1))
      for (const { kind } of KINDS)
        for (const autoOrder of isClassical(kind) ? [false, true] : [false]) {
          const r = readForm({ ...defaultForm(kind, fs), autoOrder }, fs);
          if (!r.ok) throw new Error(kind);
          const mask = maskFromDesigner(r.spec);
          const d = runDesigner(r.spec);
          if (!mask || !d.ok) continue;
          const verdict = evaluateMask(mask, d.value.zpk, fs);
          expect(verdict.pass, `${kind} auto=${autoOrder} at ${fs} Hz: ${verdict.worstMarginDb} dB`).toBe(
            true,
          );
        }
  });

  it('uses the scenarios: 50 Hz hum at 2 kHz, a 4th-order low-pass at 120 Hz with 60 dB by 400 Hz at 1 kHz', () => {
    const notch = defaultForm('notch', 2000).values;
    expect([notch.f0, notch.bandwidth]).toEqual(['50', '2']);
    const lp = defaultForm('lowpass', 1000).values;
    expect([lp.order, lp.edgeLow, lp.stopLow, lp.attenuation]).toEqual(['4', '120', '400', '60']);
  });
});

describe('readForm', () => {
  it('names each field that is not a number, and designs nothing', () => {
    const f = defaultForm('notch', 2000);
    f.values.f0 = 'fifty';
    f.values.bandwidth = '';
    const r = readForm(f, 2000);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.f0).toMatch(/"fifty" is not a number/);
    expect(r.errors.bandwidth).toMatch(/required/);
  });

  it('reads band edges as low/high pairs, and a given order without a requirement', () => {
    const f = defaultForm('bandpass', 1000);
    for (const k of ['passLow', 'passHigh', 'stopLow', 'stopHigh'] as const) f.values[k] = '';
    const r = readForm(f, 1000);
    expect(r.ok && r.spec).toMatchObject({
      kind: 'iir',
      response: 'bandpass',
      order: 4,
      edgesHz: [100, 200],
    });
    expect(r.ok && 'passbandHz' in r.spec).toBe(false);
  });

  it('asks for every requirement edge once one is given', () => {
    const f = defaultForm('lowpass', 1000);
    f.values.stopLow = '';
    const r = readForm(f, 1000);
    expect(!r.ok && r.errors.stopLow).toMatch(/fill every requirement edge/);
  });

  it('reads harmonic lists written with commas or spaces, and refuses anything else', () => {
    expect(readHarmonics('1, 3,5')).toEqual({ ok: true, value: [1, 3, 5] });
    expect(readHarmonics('1 2;  7')).toEqual({ ok: true, value: [1, 2, 7] });
    expect(readHarmonics('1, 2.5').ok).toBe(false);
    expect(readHarmonics('').ok).toBe(false);
    expectListPolicy(readHarmonics, (h) => Number.isInteger(h) && h >= 1);
  });
});

describe('formOf', () => {
  it('writes a designer description back into a form that reads as the same description', () => {
    for (const fs of [1000, 8000])
      for (const { kind } of KINDS) {
        const f = defaultForm(kind, fs);
        const alternatives = [
          f,
          {
            ...f,
            width: 'q' as const,
            eqWidth: kind === 'peakingEq' ? ('octaves' as const) : ('slope' as const),
            autoOrder: true,
          },
        ];
        for (const form of alternatives) {
          const r = readForm(form, fs);
          if (!r.ok) throw new Error(kind);
          const again = readForm(formOf(r.spec), fs);
          expect(again.ok && again.spec).toEqual(r.spec);
        }
      }
  });
});

describe('errorField', () => {
  const fieldOf = (
    kind: Parameters<typeof defaultForm>[0],
    fs: number,
    edit: (v: Record<string, string>) => void,
  ) => {
    const f = defaultForm(kind, fs);
    edit(f.values);
    const r = readForm(f, fs);
    if (!r.ok) throw new Error('form did not read');
    const d = runDesigner(r.spec);
    if (d.ok) throw new Error('designer accepted it');
    return errorField(d.error, f);
  };

  it("points the designer's errors at the field they are about", () => {
    expect(fieldOf('notch', 2000, (v) => (v.f0 = '1500'))).toBe('f0');
    expect(fieldOf('notch', 2000, (v) => (v.bandwidth = '-1'))).toBe('bandwidth');
    expect(fieldOf('harmonicNotch', 2000, (v) => (v.harmonics = '1, 30'))).toBe('harmonics');
    expect(fieldOf('comb', 2000, (v) => (v.f0 = '51'))).toBe('f0');
    expect(fieldOf('lowpass', 1000, (v) => (v.order = '2.5'))).toBe('order');
    expect(fieldOf('lowpass', 1000, (v) => (v.stopLow = '100'))).toBe('stopLow');
    expect(fieldOf('bandpass', 1000, (v) => (v.edgeHigh = '600'))).toBe('edgeHigh');
    expect(fieldOf('lowShelf', 1000, (v) => (v.f0 = '0'))).toBe('f0');
  });
});

describe('maskFromDesigner', () => {
  it('gives a notch a narrow stop region at f0 and flat pass regions clear of it', () => {
    const mask = maskFromDesigner({ kind: 'notch', fs: 2000, f0: 50, bandwidthHz: 2 })!;
    const stop = mask.regions.filter((r) => r.kind === 'stop');
    expect(stop).toHaveLength(1);
    expect(stop[0]!.fromHz).toBeLessThan(50);
    expect(stop[0]!.toHz).toBeGreaterThan(50);
    const pass = mask.regions.filter((r) => r.kind === 'pass');
    expect(pass.map((r) => [r.fromHz, r.toHz])).toEqual([
      [0, 40],
      [60, 1000],
    ]);
  });

  it('gives a comb of notches one stop region per tooth, DC and Nyquist included', () => {
    const mask = maskFromDesigner({ kind: 'comb', fs: 1000, f0: 100, bandwidthHz: 2, type: 'notch' })!;
    expect(mask.regions.filter((r) => r.kind === 'stop')).toHaveLength(6);
  });

  it('implies no mask for a resonator or a classical design without a requirement', () => {
    expect(maskFromDesigner({ kind: 'peak', fs: 8000, f0: 1200, q: 25 })).toBeNull();
    expect(
      maskFromDesigner({
        kind: 'iir',
        fs: 1000,
        family: 'butterworth',
        response: 'lowpass',
        order: 4,
        edgesHz: [120],
      }),
    ).toBeNull();
  });
});

describe('describeDesigner', () => {
  it('names the family and shape and lists parameters with units', () => {
    const w = describeDesigner({
      kind: 'iir',
      fs: 1000,
      family: 'chebyshev1',
      response: 'bandstop',
      order: 'auto',
      passbandHz: [70, 260],
      stopbandHz: [140, 160],
      rippleDb: 1,
      attenuationDb: 30,
    });
    expect(w.title).toBe('Chebyshev I band-stop');
    expect(w.params).toContainEqual(['order', 'estimated']);
    expect(w.params).toContainEqual(['stop band edge', '140–160 Hz']);
    expect(w.params).toContainEqual(['attenuation', '30 dB']);
  });
});
