import { describe, expect, it } from 'vitest';
import { runDesigner, type BandShape, type DesignerSpec } from '../../../../src/core/design/index.ts';
import { zpkToTf } from '../../../../src/core/system/transferFunction.ts';
import { responseZpk } from '../../../../src/core/response/index.ts';
import { loadFixture } from '../../../helpers/fixtures.ts';

interface LeastOrderCase {
  response: BandShape;
  passbandHz: number[];
  stopbandHz: number[];
  rippleDb: number;
  attenuationDb: number;
  fs: number;
  method: string;
  order: number;
  marginDb: number;
  belowMarginDb: number;
}

const spec = (s: Record<string, unknown>) => ({ kind: 'iir', ...s }) as unknown as DesignerSpec;

describe('the least order meeting a requirement, against scipy.signal designs measured with freqz', () => {
  const cases = loadFixture<LeastOrderCase[]>('fir_least_order');
  it.each(
    cases.map((c) => [`${c.method} ${c.response} ${c.passbandHz.join(',')} Hz at ${c.fs}`, c] as const),
  )('%s', (_, c) => {
    const { method, order, marginDb: _m, belowMarginDb: _b, ...req } = c;
    const r = runDesigner(spec({ ...req, family: method, order: 'auto' }));
    if (!r.ok) throw new Error(r.error.message);
    // scipy.signal remez/firls/firwin 1.17 designed at every order, measured with freqz: the first that meets
    expect(r.value.estimate?.order).toBe(order);
    expect(r.value.margin!.passMarginDb).toBeGreaterThanOrEqual(0);
    expect(r.value.margin!.stopMarginDb).toBeGreaterThanOrEqual(0);
  });
});

describe('FIR families of the classical designer', () => {
  const lowpass = {
    fs: 1000,
    response: 'lowpass',
    passbandHz: [100],
    stopbandHz: [150],
    rippleDb: 1,
    attenuationDb: 60,
  };

  it('designs every method at a given order with linear phase: taps symmetric about the middle', () => {
    for (const family of ['kaiser', 'hann', 'hamming', 'blackman', 'leastsquares', 'equiripple']) {
      const r = runDesigner(spec({ ...lowpass, family, order: 40, edgesHz: [125] }));
      if (!r.ok) throw new Error(`${family}: ${r.error.message}`);
      const { b, a } = zpkToTf(r.value.zpk);
      // the poles are all at the origin: a = 1 and b the taps, delayed by nothing
      expect(a[0]).toBe(1);
      expect(a.slice(1).every((v) => v === 0)).toBe(true);
      expect(b).toHaveLength(41);
      // common practice: a linear-phase FIR's taps are symmetric; from roots, to 1e-12 of the largest
      const big = Math.max(...b.map(Math.abs));
      for (let n = 0; n < 41; n++) expect(Math.abs(b[n]! - b[40 - n]!)).toBeLessThan(1e-12 * big);
      expect(r.value.note).toMatch(/order 40 .* FIR \(41 taps, linear phase, delay 20 samples\)/);
    }
  });

  it('refuses an odd order for a high-pass, naming the order and the even ones near it', () => {
    const r = runDesigner(
      spec({
        fs: 1000,
        family: 'equiripple',
        response: 'highpass',
        order: 31,
        passbandHz: [300],
        stopbandHz: [200],
        rippleDb: 1,
        attenuationDb: 40,
      }),
    );
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.parameter).toBe('order');
    expect(r.error.message).toMatch(/order 31 is not possible/);
    expect(r.error.expected).toMatch(/30 or 32/);
  });

  it('asks for the bands when least squares or equiripple is given only a cut-off', () => {
    const r = runDesigner(
      spec({ fs: 1000, family: 'equiripple', response: 'lowpass', order: 30, edgesHz: [100] }),
    );
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error.parameter).toBe('passbandHz');
  });

  it('keeps the IIR families to their order limit while the FIR families go further', () => {
    const iir = runDesigner(
      spec({ fs: 1000, family: 'butterworth', response: 'lowpass', order: 100, edgesHz: [100] }),
    );
    expect(iir.ok).toBe(false);
    if (!iir.ok) expect(iir.error.expected).toMatch(/from 1 to 64/);
    const fir = runDesigner(
      spec({ fs: 1000, family: 'hamming', response: 'lowpass', order: 200, edgesHz: [100] }),
    );
    expect(fir.ok).toBe(true);
  });

  it('says when a fixed window cannot reach the attenuation at any order', () => {
    const r = runDesigner(spec({ ...lowpass, attenuationDb: 200, family: 'hann', order: 'auto' }));
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.message).toMatch(/no Hann-window FIR up to order 512 meets the requirement/);
      expect(r.error.expected).toMatch(/about 44 dB/);
    }
  });

  it('a Kaiser design at a given order takes β from the attenuation (Kaiser, from memory)', () => {
    const r = runDesigner(
      spec({ fs: 1000, family: 'kaiser', response: 'lowpass', order: 60, edgesHz: [125], attenuationDb: 60 }),
    );
    if (!r.ok) throw new Error(r.error.message);
    // β = 0.1102·(60 − 8.7) = 5.65326
    expect(r.value.note).toMatch(/β 5\.65326/);
  });
});

describe('the differentiator and Hilbert transformer against scipy.signal.remez', () => {
  const cases =
    loadFixture<{ kind: string; taps: number; edgesHz: number[]; fs: number; h: number[] }[]>('fir_remez');
  const taps = (s: DesignerSpec) => {
    const r = runDesigner(s);
    if (!r.ok) throw new Error(r.error.message);
    return zpkToTf(r.value.zpk).b;
  };
  const maxAbs = (h: number[]) => Math.max(...h.map(Math.abs));

  it('a differentiator is scipy’s of slope 1 times 2π (gain ω in rad/sample)', () => {
    for (const c of cases.filter((k) => k.kind === 'differentiator' && k.edgesHz.length === 2)) {
      const b = taps({
        kind: 'differentiator',
        fs: c.fs,
        order: c.taps - 1,
        upToHz: c.edgesHz[1]!,
      } as DesignerSpec);
      // scipy.signal.remez(type='differentiator') 1.17; taps from our roots, so to 1e-9 of the largest
      const want = c.h.map((v) => 2 * Math.PI * v);
      for (let n = 0; n < want.length; n++)
        expect(Math.abs(b[n]! - want[n]!)).toBeLessThan(1e-9 * maxAbs(want));
    }
  });

  it('a Hilbert transformer is scipy’s with the sign of −j on positive frequencies', () => {
    for (const c of cases.filter((k) => k.kind === 'hilbert' && k.taps === 31)) {
      const b = taps({ kind: 'hilbert', fs: c.fs, order: c.taps - 1, bandHz: c.edgesHz } as DesignerSpec);
      // scipy.signal.remez(type='hilbert') 1.17 gives +j; the ideal transformer's taps 2/(πn) at odd n (common
      // practice) are positive after the middle, as ours are
      const want = c.h.map((v) => -v);
      for (let n = 0; n < want.length; n++)
        expect(Math.abs(b[n]! - want[n]!)).toBeLessThan(1e-9 * maxAbs(want));
      expect(b[16]).toBeGreaterThan(0.5);
    }
  });
});

describe('linear-phase FIR zeros', () => {
  it('a zero of the stop band sits exactly on the circle and the group delay is order/2 everywhere', () => {
    for (const s of [
      {
        fs: 2000,
        family: 'equiripple',
        response: 'lowpass',
        order: 'auto',
        passbandHz: [100],
        stopbandHz: [150],
        rippleDb: 1,
        attenuationDb: 60,
      },
      { fs: 1000, family: 'kaiser', response: 'bandstop', order: 80, edgesHz: [45, 55], attenuationDb: 50 },
      {
        fs: 1000,
        family: 'leastsquares',
        response: 'bandpass',
        order: 60,
        passbandHz: [150, 250],
        stopbandHz: [100, 300],
        rippleDb: 1,
        attenuationDb: 40,
      },
    ]) {
      const r = runDesigner(spec(s));
      if (!r.ok) throw new Error(r.error.message);
      const order = r.value.zpk.poles[0]!.multiplicity;
      const onCircle = r.value.zpk.zeros.filter((z) => Math.abs(Math.hypot(z.re, z.im) - 1) < 1e-6);
      // an equiripple stop band has its zeros on the circle (the error alternates through 0 there)
      if (s.family === 'equiripple') expect(onCircle.length).toBeGreaterThan(20);
      for (const z of onCircle)
        expect(Math.abs(z.re * z.re + z.im * z.im - 1)).toBeLessThanOrEqual(4 * Number.EPSILON);
      const omega = Float64Array.from({ length: 4096 }, (_, i) => (Math.PI * i) / 4095);
      const gd = responseZpk(r.value.zpk, omega).groupDelay;
      // common practice: a linear-phase FIR of order N delays every frequency by N/2 samples
      for (let i = 0; i < gd.length; i++)
        expect(Math.abs(gd[i]! - order / 2), `${s.family} at ω ${omega[i]}`).toBeLessThan(1e-6);
    }
  });
});
