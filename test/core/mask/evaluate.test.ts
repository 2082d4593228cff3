import { describe, it, expect } from 'vitest';
import type { Root, Zpk } from '../../../src/core/types.ts';
import {
  evaluateMask,
  evaluateMaskOn,
  functionSource,
  magnitudeDbZpk,
  maskFromNotchRequirement,
  sampledSource,
  sectionsSource,
  validateMask,
  type RequirementMask,
} from '../../../src/core/mask/index.ts';
import { responseZpk, frequencyGrid, evalZpkAt } from '../../../src/core/response/index.ts';
import { zpkToSections } from '../../../src/core/system/index.ts';
import { mulberry32 } from '../../../src/core/random.ts';
import { runDesigner } from '../../../src/core/design/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

const FS = 1000;
const toOmega = (f: number) => (2 * Math.PI * f) / FS;

/** First-order low-pass (1 − a)/(1 − a z⁻¹): |H|² = (1 − a)² / (1 − 2a cos ω + a²) (closed form). */
const A = 0.8;
const firstOrder: Zpk = { zeros: [], poles: [{ re: A, im: 0, multiplicity: 1 }], gain: 1 - A };
const firstOrderDb = (f: number) => {
  const w = toOmega(f);
  return 10 * Math.log10((1 - A) ** 2 / (1 - 2 * A * Math.cos(w) + A * A));
};

describe('magnitude kernel', () => {
  it('matches the closed form of a first-order low-pass', () => {
    const f = [0, 1, 10, 100, 250, 499.9, 500];
    const got = magnitudeDbZpk(firstOrder, f.map(toOmega));
    expectClose(got, f.map(firstOrderDb), { abs: 1e-11 }, 'dB');
  });

  it('agrees with the full response on random designs up to order 64, multiplicities included', () => {
    const rand = mulberry32(41);
    const omega = frequencyGrid(301);
    for (let trial = 0; trial < 20; trial++) {
      const roots = (n: number): Root[] =>
        Array.from({ length: n }, () => {
          const r = 0.2 + 0.79 * rand();
          const th = Math.PI * rand();
          const real = rand() < 0.3;
          return {
            re: r * Math.cos(real ? 0 : th),
            im: real ? 0 : r * Math.sin(th),
            multiplicity: 1 + Math.floor(rand() * 2),
          };
        });
      const zpk: Zpk = {
        zeros: roots(1 + Math.floor(rand() * 16)),
        poles: roots(1 + Math.floor(rand() * 16)),
        gain: 0.01 + rand(),
      };
      const ours = magnitudeDbZpk(zpk, omega);
      expectClose(ours, responseZpk(zpk, omega).magnitudeDb, { abs: 1e-9 }, `trial ${trial}`);
    }
  });

  it('does not overflow for 200 poles near the circle (the log is summed in pieces)', () => {
    const zpk: Zpk = { zeros: [], poles: [{ re: 0, im: 0.999, multiplicity: 100 }], gain: 1 };
    // At ω = π/2 each pole (and its conjugate) is 0.001 and 1.999 away: 100·(−20·log10(0.001·1.999)) dB.
    const expected = -100 * 20 * Math.log10(0.001 * 1.999);
    expectClose(magnitudeDbZpk(zpk, [Math.PI / 2])[0]!, expected, { rel: 1e-12 }, 'dB'); // closed form
  });
});

describe('evaluateMask on a first-order low-pass (closed form)', () => {
  const mask: RequirementMask = {
    regions: [
      { id: 'pass', kind: 'pass', fromHz: 0, toHz: 20, lowerDb: -1, upperDb: 0.5 },
      { id: 'stop', kind: 'stop', fromHz: 200, toHz: 500, upperDb: -15 },
    ],
  };

  it('finds the worst points at the region edges exactly, with margins from the formula', () => {
    const r = evaluateMask(mask, firstOrder, FS);
    const [pass, stop] = r.regions;
    // |H| falls monotonically, so the worst pass point is the pass edge and the worst stop point the stop edge.
    expect(pass!.worstAtHz).toBe(20);
    expectClose(pass!.worstMarginDb, firstOrderDb(20) + 1, { abs: 1e-10 }, 'pass margin');
    expect(pass!.limit).toBe('lower');
    expect(stop!.worstAtHz).toBe(200);
    expectClose(stop!.worstMarginDb, -15 - firstOrderDb(200), { abs: 1e-10 }, 'stop margin');
    expect(stop!.limit).toBe('upper');
    expect(r.pass).toBe(firstOrderDb(20) >= -1 && firstOrderDb(200) <= -15);
    expect(r.worstMarginDb).toBe(Math.min(pass!.worstMarginDb, stop!.worstMarginDb));
  });

  it('passes and fails as the limits cross the response (margin sign = inside/outside)', () => {
    const at20 = firstOrderDb(20); // about −0.72 dB
    const tight = {
      regions: [{ id: 'p', kind: 'pass' as const, fromHz: 0, toHz: 20, lowerDb: at20 + 0.01 }],
    };
    const loose = {
      regions: [{ id: 'p', kind: 'pass' as const, fromHz: 0, toHz: 20, lowerDb: at20 - 0.01 }],
    };
    const t = evaluateMask(tight, firstOrder, FS);
    const l = evaluateMask(loose, firstOrder, FS);
    expect(t.pass).toBe(false);
    expectClose(t.worstMarginDb, -0.01, { abs: 1e-10 }, 'tight');
    expect(l.pass).toBe(true);
    expectClose(l.worstMarginDb, 0.01, { abs: 1e-10 }, 'loose');
  });

  it('an upper limit in the pass band is measured against the DC gain, 0 dB', () => {
    const m = { regions: [{ id: 'p', kind: 'band' as const, fromHz: 0, toHz: 100, upperDb: -0.25 }] };
    const r = evaluateMask(m, firstOrder, FS);
    expect(r.regions[0]!.worstAtHz).toBe(0);
    expectClose(r.worstMarginDb, -0.25, { abs: 1e-12 }, 'margin'); // |H(1)| = 1 (closed form)
    expect(r.pass).toBe(false);
  });
});

describe('worst points between grid points', () => {
  it('refines a peak narrower than the grid step', () => {
    // A 0.01 Hz wide, 20 dB peak placed half-way between grid points of a 0–100 Hz region (step 100/511 Hz).
    const step = 100 / 511;
    const fp = 37 * step + step / 2;
    const db = (f: number) => 10 * Math.log10(1 + 99 / (1 + ((f - fp) / 0.01) ** 2));
    const m = { regions: [{ id: 'b', kind: 'band' as const, fromHz: 0, toHz: 100, upperDb: 10 }] };
    const r = evaluateMaskOn(m, functionSource(db), FS);
    const gridOnly = Math.min(...Array.from({ length: 512 }, (_, i) => 10 - db(i * step)));
    expect(gridOnly).toBeGreaterThan(5); // the grid alone sees under 5 of the 20 dB
    expectClose(r.worstAtHz, fp, { abs: 1e-6 }, 'peak frequency');
    expectClose(r.worstMarginDb, 10 - 20, { abs: 1e-6 }, 'margin'); // the peak is 10·log10(100) = 20 dB
    expect(r.pass).toBe(false);
  });

  it('finds the exact top of a sharp resonance of a zpk system (brute-force check)', () => {
    const th = toOmega(123.4567);
    const zpk: Zpk = {
      zeros: [],
      poles: [{ re: 0.9995 * Math.cos(th), im: 0.9995 * Math.sin(th), multiplicity: 1 }],
      gain: 1e-3,
    };
    const m = { regions: [{ id: 'b', kind: 'band' as const, fromHz: 100, toHz: 150, upperDb: 0 }] };
    const r = evaluateMask(m, zpk, FS, { pointsPerRegion: 16 });
    // Independent search: 200 001 points over ±0.5 Hz around the pole angle with the point evaluator.
    let best = -Infinity;
    let bestF = 0;
    for (let i = 0; i <= 200_000; i++) {
      const f = 123.4567 - 0.5 + i * 5e-6;
      const h = evalZpkAt(zpk, Math.cos(toOmega(f)), Math.sin(toOmega(f)));
      const d = 20 * Math.log10(Math.hypot(h.re, h.im));
      if (d > best) [best, bestF] = [d, f];
    }
    expectClose(r.regions[0]!.worstDb, best, { abs: 1e-7 }, 'peak dB');
    expectClose(r.worstAtHz, bestF, { abs: 1e-4 }, 'peak Hz');
  });
});

describe('ripple added by a pole, and removed again', () => {
  it('a passing mask fails when a pole pair moves towards the circle, and passes when it moves back', () => {
    const designed = runDesigner({
      kind: 'iir',
      fs: FS,
      family: 'butterworth',
      response: 'lowpass',
      order: 4,
      edgesHz: [120],
    });
    if (!designed.ok) throw new Error(designed.error.message);
    const zpk = designed.value.zpk;
    const mask: RequirementMask = {
      regions: [
        { id: 'pass', kind: 'pass', fromHz: 0, toHz: 100, lowerDb: -1, upperDb: 1 },
        { id: 'stop', kind: 'stop', fromHz: 400, toHz: 500, upperDb: -40 },
      ],
    };
    const atRadius = (radius: number): Zpk => {
      // The pole pair nearer the circle, moved radially: a resonant bump grows in the pass band.
      const i = zpk.poles.reduce(
        (best, p, j) =>
          Math.hypot(p.re, p.im) > Math.hypot(zpk.poles[best]!.re, zpk.poles[best]!.im) ? j : best,
        0,
      );
      const p = zpk.poles[i]!;
      const s = radius / Math.hypot(p.re, p.im);
      const poles = zpk.poles.slice();
      poles[i] = { ...p, re: p.re * s, im: p.im * s };
      return { ...zpk, poles };
    };
    const before = evaluateMask(mask, zpk, FS);
    expect(before.pass).toBe(true);
    // Butterworth loss at 100 Hz: 10·log10(1 + (tan(0.1π)/tan(0.12π))^8) dB (bilinear transform, closed form).
    const loss = 10 * Math.log10(1 + (Math.tan(0.1 * Math.PI) / Math.tan(0.12 * Math.PI)) ** 8);
    expect(before.regions[0]!.worstAtHz).toBe(100);
    expectClose(before.regions[0]!.worstMarginDb, 1 - loss, { abs: 1e-9 }, 'pass margin');

    // A little ripple: still inside, the worst point is now a bump inside the band, found exactly.
    const bumpy = atRadius(0.8);
    const mid = evaluateMask(mask, bumpy, FS).regions[0]!;
    expect(mid.pass).toBe(true);
    expect(mid.limit).toBe('upper');
    expect(mid.worstAtHz).toBeGreaterThan(0);
    expect(mid.worstAtHz).toBeLessThan(100);
    let top = -Infinity;
    for (let f = 0; f <= 100; f += 1e-3) {
      const h = evalZpkAt(bumpy, Math.cos(toOmega(f)), Math.sin(toOmega(f)));
      top = Math.max(top, 20 * Math.log10(Math.hypot(h.re, h.im)));
    }
    expectClose(mid.worstDb, top, { abs: 1e-6 }, 'bump top (brute force, 0.001 Hz steps)');

    const during = evaluateMask(mask, atRadius(0.85), FS);
    expect(during.pass).toBe(false);
    expect(during.worstRegionId).toBe('pass');
    expect(during.regions[0]!.limit).toBe('upper');
    expect(during.regions[1]!.pass).toBe(true);

    const after = evaluateMask(mask, atRadius(Math.hypot(zpk.poles[0]!.re, zpk.poles[0]!.im)), FS);
    expect(after.pass).toBe(true);
    expectClose(after.worstMarginDb, before.worstMarginDb, { abs: 1e-12 }, 'margin restored');
  });
});

describe('other sources', () => {
  const designed = runDesigner({
    kind: 'iir',
    fs: FS,
    family: 'elliptic',
    response: 'bandpass',
    order: 4,
    edgesHz: [100, 200],
    rippleDb: 0.5,
    attenuationDb: 50,
  });
  if (!designed.ok) throw new Error(designed.error.message);
  const zpk = designed.value.zpk;
  const mask: RequirementMask = {
    regions: [
      { id: 'low', kind: 'stop', fromHz: 0, toHz: 60, upperDb: -45 },
      { id: 'pass', kind: 'pass', fromHz: 100, toHz: 200, lowerDb: -0.6, upperDb: 0.1 },
      { id: 'high', kind: 'stop', fromHz: 300, toHz: 500, upperDb: -45 },
    ],
  };

  it('second-order sections give the same verdict and margins as the roots', () => {
    const a = evaluateMask(mask, zpk, FS);
    const b = evaluateMaskOn(mask, sectionsSource(zpkToSections(zpk), FS), FS);
    expect(b.pass).toBe(a.pass);
    expectClose(
      b.regions.map((r) => r.worstMarginDb),
      a.regions.map((r) => r.worstMarginDb),
      { abs: 1e-7 },
      'margins',
    );
  });

  it('a sampled response is judged at its samples and interpolated edges, never better than the truth', () => {
    const omega = frequencyGrid(4096);
    const sampled = responseZpk(zpk, omega);
    const a = evaluateMask(mask, zpk, FS);
    const b = evaluateMaskOn(mask, sampledSource(sampled.omega, sampled.magnitudeDb, FS), FS);
    for (let k = 0; k < mask.regions.length; k++) {
      // The refined margin is the true minimum; the sampled one may miss a little between samples.
      expect(b.regions[k]!.worstMarginDb).toBeGreaterThanOrEqual(a.regions[k]!.worstMarginDb - 1e-9);
      expectClose(b.regions[k]!.worstMarginDb, a.regions[k]!.worstMarginDb, { abs: 0.05 }, `region ${k}`);
    }
  });
});

describe('notch requirement (hopper-scale hum scenario)', () => {
  const FS2 = 2000;
  const designed = runDesigner({
    kind: 'harmonicNotch',
    fs: FS2,
    f0: 50,
    harmonics: [1, 3, 5],
    bandwidthHz: 2,
  });
  if (!designed.ok) throw new Error(designed.error.message);
  const zpk = designed.value.zpk;
  const req = (halfWidthHz: number) =>
    maskFromNotchRequirement({
      fs: FS2,
      notchesHz: [50, 150, 250],
      halfWidthHz,
      attenuationDb: 40,
      passHz: [[0, 20]],
      passToleranceDb: 0.1,
    });

  it('builds one pass region and one stop region per harmonic', () => {
    const m = req(0.5);
    if (!m.ok) throw new Error(m.error.message);
    expect(m.value.regions.map((r) => [r.id, r.kind, r.fromHz, r.toHz])).toEqual([
      ['pass', 'pass', 0, 20],
      ['notch-50', 'stop', 49.5, 50.5],
      ['notch-150', 'stop', 149.5, 150.5],
      ['notch-250', 'stop', 249.5, 250.5],
    ]);
  });

  it('2 Hz wide notches meet 40 dB only very near each centre', () => {
    const narrow = req(0.005);
    const wide = req(0.5);
    if (!narrow.ok || !wide.ok) throw new Error('mask');
    expect(evaluateMask(narrow.value, zpk, FS2).pass).toBe(true);
    const r = evaluateMask(wide.value, zpk, FS2);
    expect(r.pass).toBe(false);
    const n50 = r.regions.find((x) => x.id === 'notch-50')!;
    expect([49.5, 50.5]).toContain(n50.worstAtHz);
    // Common practice: near its centre a notch of −3 dB width B has |H|² ≈ δ²/(δ² + (B/2)²); δ = 0.5, B = 2.
    expectClose(n50.worstDb, 10 * Math.log10(0.25 / 1.25), { abs: 0.2 }, 'dB at the region edge');
    expect(r.regions.find((x) => x.id === 'pass')!.pass).toBe(true);
  });
});

describe('validation', () => {
  const check = (region: object) => validateMask({ regions: [region as never] }, FS);
  it.each([
    [
      { id: 'a', kind: 'pass', fromHz: 50, toHz: 20, lowerDb: -1 },
      /fromHz = 50 Hz is not below toHz = 20 Hz/,
    ],
    [
      { id: 'a', kind: 'pass', fromHz: 0, toHz: 600, lowerDb: -1 },
      /toHz = 600 Hz lies outside \[0, 500\] Hz/,
    ],
    [{ id: 'a', kind: 'pass', fromHz: -1, toHz: 6, lowerDb: -1 }, /fromHz = -1 Hz lies outside/],
    [{ id: 'a', kind: 'stop', fromHz: 0, toHz: 6, upperDb: NaN }, /upperDb = NaN is not accepted/],
    [
      { id: 'a', kind: 'band', fromHz: 0, toHz: 6, upperDb: -1, lowerDb: 1 },
      /upperDb = -1 dB is not above lowerDb = 1 dB/,
    ],
    [{ id: 'a', kind: 'pass', fromHz: 0, toHz: 6, upperDb: 1 }, /a pass region needs a lower limit/],
    [{ id: 'a', kind: 'stop', fromHz: 0, toHz: 6, lowerDb: -1 }, /a stop region needs an upper limit/],
    [{ id: 'a', kind: 'band', fromHz: 0, toHz: 6 }, /no limit given/],
    [{ id: 'a', kind: 'wide', fromHz: 0, toHz: 6, upperDb: 1 }, /kind 'wide' is not known/],
  ])('%o is refused', (region, message) => {
    const r = check(region);
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.message).toMatch(message);
      expect(r.error.message).toMatch(/^region "a": /);
      expect(r.error.expected).toBeTruthy();
    }
  });

  it('refuses duplicate ids and accepts a good mask', () => {
    const region = { id: 'a', kind: 'stop' as const, fromHz: 0, toHz: 6, upperDb: -3 };
    expect(validateMask({ regions: [region, region] }, FS).ok).toBe(false);
    expect(validateMask({ regions: [region] }, FS).ok).toBe(true);
  });

  it('a region left above Nyquist by a lower sample rate cannot be judged and fails', () => {
    const m = { regions: [{ id: 'hi', kind: 'stop' as const, fromHz: 300, toHz: 400, upperDb: -3 }] };
    const r = evaluateMask(m, firstOrder, 500);
    expect(r.pass).toBe(false);
    expect(r.regions[0]!.problem).toMatch(/lies above fs\/2 = 250 Hz/);
  });

  it('a mask without regions passes with an infinite margin', () => {
    const r = evaluateMask({ regions: [] }, firstOrder, FS);
    expect(r).toMatchObject({ pass: true, worstMarginDb: Infinity, worstRegionId: null });
  });
});
