import { describe, expect, it } from 'vitest';
import {
  designComb,
  designDcBlocker,
  designHarmonicNotches,
  designNotch,
  designPeak,
} from '../../../src/core/design/index.ts';
import { loadFixture } from '../../helpers/fixtures.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import type { C } from './helpers.ts';
import { allRoots, angleGap, dbAt, fixtureRoots, responseHz, rootSetDistance } from './helpers.ts';
import type { Zpk } from '../../../src/core/types.ts';

interface Curve {
  f: number[];
  magDb: (number | null)[]; // null: on top of a zero on the circle, not a reliable reference
  phase: (number | null)[];
}
interface BaCase {
  fs: number;
  f0: number;
  q: number;
  zeros: (C | number)[];
  poles: (C | number)[];
  curve: Curve;
}
interface Fixture {
  notches: (BaCase & { kind: 'notch' | 'peak' })[];
  combs: (BaCase & { type: 'notch' | 'peak' })[];
  dcBlockers: {
    fs: number;
    cutoffHz: number;
    zeros: number[];
    poles: number[];
    gain: number;
    curve: Curve;
  }[];
}
const fixture = loadFixture<Fixture>('design_notch');

/** Roots from numpy.roots of scipy's b/a agree to this; numpy's companion-matrix roots of z^N − c limit it. */
const ROOT_TOL = 1e-9;
/** dB agreement where scipy's magnitude is above −150 dB. */
const DB_TOL = 1e-8;

function compare(zpk: Zpk, c: { zeros: (C | number)[]; poles: (C | number)[]; fs: number; curve: Curve }) {
  expect(rootSetDistance(allRoots(zpk.zeros), fixtureRoots(c.zeros))).toBeLessThan(ROOT_TOL);
  expect(rootSetDistance(allRoots(zpk.poles), fixtureRoots(c.poles))).toBeLessThan(ROOT_TOL);
  const r = responseHz(zpk, c.curve.f, c.fs);
  c.curve.magDb.forEach((e, i) => {
    if (e === null) return;
    if (e > -150) expectClose(r.magnitudeDb[i]!, e, { abs: DB_TOL }, `dB at ${c.curve.f[i]} Hz`);
    if (e > -100) expect(angleGap(r.phase[i]!, c.curve.phase[i]!)).toBeLessThan(1e-8);
  });
}

describe('designNotch / designPeak against scipy.signal.iirnotch / iirpeak 1.17', () => {
  it.each(fixture.notches.map((c) => [`${c.kind} ${c.f0} Hz Q ${c.q} fs ${c.fs}`, c] as const))(
    '%s',
    (_l, c) => {
      const bw = c.f0 / c.q;
      compare(c.kind === 'notch' ? designNotch(c.f0, bw, c.fs) : designPeak(c.f0, bw, c.fs), c);
    },
  );
});

describe('designComb against scipy.signal.iircomb 1.17 (notch: pass_zero False, peak: pass_zero True)', () => {
  it.each(fixture.combs.map((c) => [`${c.type} ${c.f0} Hz Q ${c.q} fs ${c.fs}`, c] as const))(
    '%s',
    (_l, c) => {
      compare(designComb(c.f0, c.f0 / c.q, c.type, c.fs), c);
    },
  );
});

describe('designDcBlocker against scipy.signal.butter(1, fc, highpass) 1.17', () => {
  it.each(fixture.dcBlockers.map((c) => [`${c.cutoffHz} Hz fs ${c.fs}`, c] as const))('%s', (_l, c) => {
    const zpk = designDcBlocker(c.cutoffHz, c.fs);
    compare(zpk, c);
    expectClose(zpk.gain, c.gain, { rel: 1e-12 });
  });
});

/** Frequencies of the two −3 dB points of a notch (or peak) around f0, by bisection on the magnitude. */
function halfPowerPoints(zpk: Zpk, f0: number, fs: number, notch: boolean): [number, number] {
  const below = (f: number) => dbAt(zpk, f, fs) < -3.0103 === notch;
  const bisect = (inside: number, outside: number) => {
    for (let i = 0; i < 200; i++) {
      const m = (inside + outside) / 2;
      if (below(m)) inside = m;
      else outside = m;
    }
    return (inside + outside) / 2;
  };
  return [bisect(f0, 1e-9), bisect(f0, fs / 2 - 1e-9)];
}

describe('notch and peak published facts', () => {
  it('the notch is infinitely deep at f0 and its −3 dB width equals the request', () => {
    // common practice: zeros on the unit circle at ±ω0 give zero gain at f0; the bilinear design of the
    // second-order notch puts the half-power points exactly B apart (Mitra, DSP: A Computer-Based Approach, from memory)
    for (const [f0, bw, fs] of [
      [50, 2, 1000],
      [60, 0.5, 48000],
      [3000, 400, 8000],
    ] as const) {
      const zpk = designNotch(f0, bw, fs);
      expect(dbAt(zpk, f0, fs)).toBeLessThan(-250);
      const [lo, hi] = halfPowerPoints(zpk, f0, fs, true);
      expectClose(hi - lo, bw, { rel: 1e-8 }, 'width');
      expectClose(dbAt(zpk, 0, fs), 0, { abs: 1e-9 }, 'DC'); // poles within 1e-4 of the zeros: rounding ~1e-11 dB
    }
  });

  it('the peak has unit gain at f0 and the requested −3 dB width', () => {
    // common practice: the resonator is 1 − notch, so it peaks at 0 dB and shares the half-power points
    const zpk = designPeak(440, 20, 16000);
    expectClose(dbAt(zpk, 440, 16000), 0, { abs: 1e-10 });
    const [lo, hi] = halfPowerPoints(zpk, 440, 16000, false);
    expectClose(hi - lo, 20, { rel: 1e-8 });
  });

  it('the DC blocker is −3.01 dB at its cutoff, 0 dB at Nyquist and has a zero at DC', () => {
    // common practice: half power at the cutoff of a first-order high-pass
    const zpk = designDcBlocker(5, 1000);
    expectClose(dbAt(zpk, 5, 1000), -3.0103, { abs: 1e-4 });
    expectClose(dbAt(zpk, 500, 1000), 0, { abs: 1e-12 });
    expect(zpk.zeros).toEqual([{ re: 1, im: 0, multiplicity: 1 }]);
  });

  it('harmonic notches remove exactly the chosen harmonics, each with the given width', () => {
    // scenario: 50 Hz mains and harmonics 2..5 at 2 kHz sampling, 2 Hz wide each
    const fs = 2000;
    const zpk = designHarmonicNotches(50, [1, 2, 3, 5], () => 2, fs);
    for (const h of [1, 2, 3, 5]) expect(dbAt(zpk, 50 * h, fs)).toBeLessThan(-250);
    expect(dbAt(zpk, 200, fs)).toBeGreaterThan(-0.1);
    // each notch is ~2 Hz wide; the neighbours add a little loss, so the width grows by well under 1 %
    const [lo, hi] = halfPowerPoints(zpk, 250, fs, true);
    expectClose(hi - lo, 2, { rel: 1e-2 });
    expect(zpk.zeros.length).toBe(4);
    expect(zpk.poles.length).toBe(4);
  });

  it('the comb notches every multiple of f0 up to Nyquist, DC included', () => {
    const zpk = designComb(100, 5, 'notch', 1000);
    for (let k = 0; k <= 5; k++) expect(dbAt(zpk, 100 * k, 1000)).toBeLessThan(-250);
    expect(dbAt(zpk, 150, 1000)).toBeGreaterThan(-0.01);
    const peak = designComb(100, 5, 'peak', 1000);
    for (let k = 0; k <= 5; k++) expectClose(dbAt(peak, 100 * k, 1000), 0, { abs: 1e-10 });
  });
});
