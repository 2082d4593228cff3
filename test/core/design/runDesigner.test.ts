import { describe, expect, it } from 'vitest';
import { designNotch, runDesigner } from '../../../src/core/design/index.ts';
import type { DesignerSpec } from '../../../src/core/design/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import { dbAt } from './helpers.ts';

function fails(spec: DesignerSpec, pattern: RegExp): string {
  const r = runDesigner(spec);
  if (r.ok) throw new Error(`expected an error for ${JSON.stringify(spec)}`);
  expect(r.error.message).toMatch(pattern);
  expect(r.error.expected).toBeTruthy();
  return r.error.expected!;
}

describe('runDesigner', () => {
  it('designs a notch from a bandwidth or the equivalent Q identically, and describes it', () => {
    const a = runDesigner({ kind: 'notch', fs: 1000, f0: 50, bandwidthHz: 2 });
    const b = runDesigner({ kind: 'notch', fs: 1000, f0: 50, q: 25 });
    if (!a.ok || !b.ok) throw new Error('design failed');
    expect(a.value.zpk).toEqual(designNotch(50, 2, 1000));
    expect(b.value.zpk.poles[0]!.re).toBeCloseTo(a.value.zpk.poles[0]!.re, 14);
    expect(a.value.note).toMatch(/notch at 50 Hz.*2 Hz.*Q 25/);
  });

  it('meets a requirement with the least order and reports the margins (scenario: low-pass ahead of decimation)', () => {
    const spec: DesignerSpec = {
      kind: 'iir',
      fs: 1000,
      family: 'butterworth',
      response: 'lowpass',
      order: 'auto',
      passbandHz: [120],
      stopbandHz: [400],
      rippleDb: 1,
      attenuationDb: 60,
    };
    const r = runDesigner(spec);
    if (!r.ok) throw new Error(r.error.message);
    // scipy.signal.buttord(120, 400, 1, 60, fs=1000) 1.17 gives order 4
    expect(r.value.estimate!.order).toBe(4);
    expect(r.value.margin!.stopMarginDb).toBeGreaterThan(0);
    expectClose(r.value.margin!.passMarginDb, 0, { abs: 1e-6 });
    expectClose(dbAt(r.value.zpk, 120, 1000), -1, { abs: 1e-9 }, 'loss at the pass-band edge');
    expect(r.value.note).toMatch(/order 4 Butterworth low-pass/);
  });

  it('re-running a spec with a changed parameter gives the changed design', () => {
    const spec: DesignerSpec = {
      kind: 'iir',
      fs: 1000,
      family: 'elliptic',
      response: 'bandpass',
      order: 4,
      edgesHz: [100, 200],
      rippleDb: 0.5,
      attenuationDb: 50,
    };
    const a = runDesigner(spec);
    const b = runDesigner({ ...spec, order: 5 });
    if (!a.ok || !b.ok) throw new Error('design failed');
    // band-pass order N: 2N poles, all in conjugate pairs here, stored once each
    expect(a.value.zpk.poles.length).toBe(4);
    expect(b.value.zpk.poles.length).toBe(5);
    expect(a.value.margin).toBeUndefined();
  });

  it('designs every other kind', () => {
    const specs: DesignerSpec[] = [
      { kind: 'peak', fs: 8000, f0: 1000, q: 10 },
      { kind: 'dcBlocker', fs: 48000, cutoffHz: 10 },
      { kind: 'harmonicNotch', fs: 2000, f0: 50, harmonics: [1, 2, 3, 4, 5], bandwidthHz: 2 },
      { kind: 'harmonicNotch', fs: 2000, f0: 50, harmonics: [3, 1], q: 30 },
      { kind: 'comb', fs: 1000, f0: 50, type: 'notch', bandwidthHz: 1 },
      { kind: 'peakingEq', fs: 48000, f0: 1000, gainDb: -6, bandwidthOctaves: 1 },
      { kind: 'lowShelf', fs: 48000, f0: 100, gainDb: 6, slope: 1 },
      { kind: 'highShelf', fs: 48000, f0: 8000, gainDb: -3, q: 0.7 },
    ];
    for (const s of specs) {
      const r = runDesigner(s);
      expect(r.ok, s.kind).toBe(true);
    }
  });

  it('says what was wrong and what is accepted', () => {
    expect(
      fails({ kind: 'notch', fs: 1000, f0: 500, bandwidthHz: 2 }, /f0 = 500 Hz lies outside \(0, 500\)/),
    ).toMatch(/500 Hz/);
    fails({ kind: 'notch', fs: 1000, f0: 50 }, /exactly one of bandwidthHz and q/);
    fails({ kind: 'notch', fs: 1000, f0: 50, bandwidthHz: 2, q: 3 }, /exactly one/);
    fails({ kind: 'notch', fs: 0, f0: 50, q: 3 }, /sample rate/);
    fails({ kind: 'comb', fs: 1000, f0: 300, type: 'notch', q: 10 }, /not a whole number/);
    fails({ kind: 'comb', fs: 1000, f0: 100, type: 'peak', bandwidthHz: 150 }, /too wide/);
    fails({ kind: 'harmonicNotch', fs: 1000, f0: 100, harmonics: [1, 5], q: 10 }, /harmonic 5/);
    fails({ kind: 'harmonicNotch', fs: 1000, f0: 100, harmonics: [1.5], q: 10 }, /harmonic 1.5/);
    fails({ kind: 'lowShelf', fs: 48000, f0: 100, gainDb: 12, slope: 8 }, /too steep/);
    const iir: DesignerSpec = {
      kind: 'iir',
      fs: 1000,
      family: 'chebyshev1',
      response: 'bandstop',
      order: 4,
      edgesHz: [200, 100],
      rippleDb: 1,
    };
    fails(iir, /not in increasing order/);
    fails({ ...iir, edgesHz: [100, 200], order: 0 }, /order 0/);
    fails({ ...iir, edgesHz: [100, 200], order: 65 }, /order 65/);
    fails({ ...iir, edgesHz: [100, 200], rippleDb: 0 }, /ripple = 0 dB/);
    const { rippleDb: _ripple, ...noRipple } = iir;
    fails({ ...noRipple, edgesHz: [100, 200] }, /ripple is missing/);
    fails({ ...iir, edgesHz: [100] }, /two edges, got 1/);
    fails({ ...iir, family: 'elliptic', edgesHz: [100, 200], attenuationDb: 0.5 }, /attenuation = 0.5 dB/);
    const auto: DesignerSpec = {
      kind: 'iir',
      fs: 1000,
      family: 'elliptic',
      response: 'lowpass',
      order: 'auto',
      passbandHz: [120],
      stopbandHz: [100],
      rippleDb: 1,
      attenuationDb: 40,
    };
    expect(fails(auto, /do not fit a low-pass/)).toMatch(/pass-band edge < stop-band edge/);
    const { stopbandHz: _stop, ...noStop } = auto;
    fails(noStop, /stop-band edges needs one edge/);
    fails(
      { ...auto, family: 'butterworth', stopbandHz: [120.001], attenuationDb: 100 },
      /needs order \d+, above the limit of 64/,
    );
  });
});
