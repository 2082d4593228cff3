import { describe, expect, it } from 'vitest';
import { DESIGNER_VARIANTS, FAMILY_OPTIONS, runDesigner } from '../../../../src/core/design/index.ts';
import { evaluateMask } from '../../../../src/core/mask/index.ts';
import {
  KINDS,
  defaultForm,
  fieldLabel,
  kindOf,
  visibleFields,
} from '../../../../src/views/side/design/designKinds.ts';
import { formOf, readForm } from '../../../../src/views/side/design/designForm.ts';
import {
  DB_FIELD_CASES,
  HZ_FIELD_CASES,
  NO_UNIT_CASES,
  expectListPolicy,
  expectNumberPolicy,
} from '../../../helpers/numberPolicy.ts';
import { errorField } from '../../../../src/views/side/design/designErrors.ts';
import { maskFromDesigner } from '../../../../src/core/mask/index.ts';
import { describeDesigner } from '../../../../src/views/side/design/describe.ts';

const RATES = [200, 1000, 2000, 8000, 48000];
const FAMILIES = FAMILY_OPTIONS.map((o) => o.value);
const classical = (kind: string) => kindOf(kind).entry.kind === 'iir';
/** The form of a kind with a family and order mode (the family is kept only where the kind has one). */
const formWith = (kind: string, fs: number, family: string, autoOrder: boolean) => {
  const f = defaultForm(kind, fs);
  return { ...f, choices: classical(kind) ? { ...f.choices, family } : f.choices, autoOrder };
};

describe('defaultForm', () => {
  it('gives every kind values its designer accepts, at every sample rate', () => {
    for (const fs of RATES)
      for (const { id: kind } of KINDS)
        for (const family of classical(kind) ? FAMILIES : [FAMILIES[0]!])
          // "Any family" picks by least order: the form ticks the least order with it (a given order is refused, below).
          for (const autoOrder of classical(kind) ? (family === 'any' ? [true] : [false, true]) : [false]) {
            const r = readForm(formWith(kind, fs, family, autoOrder), fs);
            expect(r.ok, `${kind} ${family} at ${fs} Hz`).toBe(true);
            if (!r.ok) continue;
            const d = runDesigner(r.spec);
            expect(
              d.ok,
              `${kind} ${family} auto=${autoOrder} at ${fs} Hz: ${d.ok ? '' : d.error.message}`,
            ).toBe(true);
          }
  });

  it('refuses "any family" with a given order, marking the order', () => {
    const r = readForm(formWith('lowpass', 1000, 'any', false), 1000);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const d = runDesigner(r.spec);
    expect(d.ok).toBe(false);
    if (!d.ok) expect(d.error.parameter).toBe('order');
  });

  it('starts from designs that meet their own requirement mask (notches, Butterworth, any least order)', () => {
    for (const fs of RATES.slice(0, -1))
      for (const { id: kind } of KINDS)
        for (const autoOrder of classical(kind) ? [false, true] : [false]) {
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
    expect([notch.f0, notch.bandwidthHz]).toEqual(['50', '2']);
    const lp = defaultForm('lowpass', 1000).values;
    expect([lp.order, lp['edgesHz.0'], lp['stopbandHz.0'], lp.attenuationDb]).toEqual([
      '4',
      '120',
      '400',
      '60',
    ]);
  });

  it('offers the registry kinds, and fields with the units of their parameters', () => {
    expect(KINDS.map((k) => k.id)).toEqual(DESIGNER_VARIANTS.map((v) => v.variant.id));
    const bp = defaultForm('bandpass', 1000);
    const labels = visibleFields(bp).map((f) => [f.id, fieldLabel(f, bp).label, fieldLabel(f, bp).unit]);
    expect(labels).toContainEqual(['edgesHz.1', 'Edges', 'Hz']);
    expect(labels).toContainEqual(['passbandHz.0', 'Pass band', 'Hz']);
    expect(labels).toContainEqual(['rippleDb', 'Pass-band loss at most', 'dB']);
    expect(
      visibleFields({ ...bp, autoOrder: true }).some((f) => f.id === 'order' || f.id.startsWith('edgesHz')),
    ).toBe(false);
  });
});

describe('readForm', () => {
  it('names each field that is not a number, and designs nothing', () => {
    const f = defaultForm('notch', 2000);
    f.values.f0 = 'fifty';
    f.values.bandwidthHz = '';
    const r = readForm(f, 2000);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.f0).toMatch(/"fifty" is not a number/);
    expect(r.errors.bandwidthHz).toMatch(/required/);
  });

  it('reads every number field by the number policy, in its unit', () => {
    const field = (kind: string, id: string, key: string) => (text: string) => {
      const f = defaultForm(kind, 2000);
      f.values[id] = text;
      const r = readForm(f, 2000);
      if (!r.ok) return { ok: false as const, message: r.errors[id] ?? 'another field' };
      const v = (r.spec as unknown as Record<string, unknown>)[key];
      return { ok: true as const, value: (Array.isArray(v) ? v[Number(id.split('.')[1])] : v) as number };
    };
    const any = () => true;
    expectNumberPolicy({ read: field('notch', 'f0', 'f0'), admissible: any }, HZ_FIELD_CASES);
    expectNumberPolicy({ read: field('peakingEq', 'gainDb', 'gainDb'), admissible: any }, DB_FIELD_CASES);
    expectNumberPolicy({ read: field('lowpass', 'order', 'order'), admissible: any }, NO_UNIT_CASES);
    expectNumberPolicy(
      { read: field('bandpass', 'stopbandHz.1', 'stopbandHz'), admissible: any },
      HZ_FIELD_CASES,
    );
    expectNumberPolicy(
      { read: field('lowpass', 'attenuationDb', 'attenuationDb'), admissible: any },
      DB_FIELD_CASES,
    );
  });

  it('reads a harmonic list by the list policy', () => {
    expectListPolicy((text) => {
      const f = defaultForm('harmonicNotch', 2000);
      f.values.harmonics = text;
      const r = readForm(f, 2000);
      return r.ok
        ? { ok: true, value: (r.spec as { harmonics: number[] }).harmonics }
        : { ok: false, message: r.errors.harmonics ?? '' };
    });
  });

  it('reads band edges as low/high pairs, and a given order without a requirement', () => {
    const f = defaultForm('bandpass', 1000);
    for (const k of ['passbandHz.0', 'passbandHz.1', 'stopbandHz.0', 'stopbandHz.1']) f.values[k] = '';
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
    f.values['stopbandHz.0'] = '';
    const r = readForm(f, 1000);
    expect(!r.ok && r.errors['stopbandHz.0']).toMatch(/required/);
    const b = defaultForm('bandstop', 1000);
    b.values['passbandHz.1'] = '';
    const rb = readForm(b, 1000);
    expect(!rb.ok && rb.errors['passbandHz.1']).toMatch(/fill every edge/);
  });
});

describe('formOf', () => {
  it('writes a designer description back into a form that reads as the same description', () => {
    for (const fs of [1000, 8000])
      for (const { id: kind } of KINDS) {
        const f = defaultForm(kind, fs);
        const other = Object.fromEntries(
          (kindOf(kind).entry.alternatives ?? []).map((a) => [a.keys[0], a.keys[1]]),
        );
        const alternatives = [f, { ...f, choices: { ...f.choices, ...other }, autoOrder: true }];
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
  const fieldOf = (kind: string, fs: number, edit: (v: Record<string, string>) => void) => {
    const f = defaultForm(kind, fs);
    edit(f.values);
    const r = readForm(f, fs);
    if (!r.ok) throw new Error('form did not read');
    const d = runDesigner(r.spec);
    if (d.ok) throw new Error('designer accepted it');
    return errorField(d.error, f);
  };

  it("points the designer's errors at the field they are about (by the parameter the error names)", () => {
    expect(fieldOf('notch', 2000, (v) => (v.f0 = '1500'))).toBe('f0');
    expect(fieldOf('notch', 2000, (v) => (v.bandwidthHz = '-1'))).toBe('bandwidthHz');
    expect(fieldOf('notch', 2000, (v) => (v.bandwidthHz = '1500'))).toBe('bandwidthHz');
    expect(fieldOf('harmonicNotch', 2000, (v) => (v.harmonics = '1, 30'))).toBe('harmonics');
    expect(fieldOf('harmonicNotch', 2000, (v) => (v.harmonics = '1, 2.5'))).toBe('harmonics');
    expect(fieldOf('comb', 2000, (v) => (v.f0 = '51'))).toBe('f0');
    expect(fieldOf('lowpass', 1000, (v) => (v.order = '2.5'))).toBe('order');
    expect(fieldOf('lowpass', 1000, (v) => (v['stopbandHz.0'] = '100'))).toBe('stopbandHz.0');
    expect(fieldOf('bandpass', 1000, (v) => (v['edgesHz.1'] = '600'))).toBe('edgesHz.1');
    expect(fieldOf('lowShelf', 1000, (v) => (v.f0 = '0'))).toBe('f0');
    expect(fieldOf('lowpass', 1000, (v) => (v.attenuationDb = '0.5'))).toBe('attenuationDb');
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
