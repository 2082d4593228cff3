import { describe, expect, it } from 'vitest';
import { designIir } from '../../../src/core/design/index.ts';
import type { BandShape, IirFamily } from '../../../src/core/design/index.ts';
import { loadFixture } from '../../helpers/fixtures.ts';
import { expectClose } from '../../helpers/expectClose.ts';
import type { C } from './helpers.ts';
import { allRoots, angleGap, dbAt, fixtureRoots, responseHz, rootSetDistance } from './helpers.ts';

interface IirCase {
  response: BandShape;
  order: number;
  edgesHz: number[];
  fs: number;
  rippleDb?: number;
  attenuationDb?: number;
  zeros: (C | number)[];
  poles: (C | number)[];
  gain: number;
  curve: { f: number[]; magDb: (number | null)[]; phase: (number | null)[] }; // null: not a reliable reference
}

/** Roots agree with scipy to this relative distance; the worst seen is 2e-12 (elliptic, order 20). */
const ROOT_TOL = 1e-10;
/** Magnitude agreement in dB wherever scipy's magnitude is above DEEP_DB; worst seen 2e-9 dB. */
const DB_TOL = 1e-7;
const DEEP_DB = -150;
/** Phase agreement in radians where the magnitude is above −100 dB. */
const PHASE_TOL = 1e-7;

const FIXTURES: [IirFamily, string][] = [
  ['butterworth', 'design_butter'],
  ['chebyshev1', 'design_cheby1'],
  ['chebyshev2', 'design_cheby2'],
  ['elliptic', 'design_ellip'],
];

describe.each(FIXTURES)('designIir %s against scipy.signal', (family, name) => {
  const cases = loadFixture<IirCase[]>(name);
  it.each(
    cases.map((c) => [`${c.response} order ${c.order} at ${c.edgesHz.join(',')} Hz, fs ${c.fs}`, c] as const),
  )('%s', (_label, c) => {
    const zpk = designIir({ family, ...c });
    // scipy.signal.butter/cheby1/cheby2/ellip(output='zpk', fs=...) 1.17
    expect(rootSetDistance(allRoots(zpk.zeros), fixtureRoots(c.zeros))).toBeLessThan(ROOT_TOL);
    expect(rootSetDistance(allRoots(zpk.poles), fixtureRoots(c.poles))).toBeLessThan(ROOT_TOL);
    expectClose(zpk.gain, c.gain, { rel: 1e-9 }, 'gain');
    // scipy.signal.freqz_zpk 1.17
    const r = responseHz(zpk, c.curve.f, c.fs);
    c.curve.magDb.forEach((e, i) => {
      if (e === null) return; // on top of a zero on the circle: scipy's value is rounding noise
      if (e > DEEP_DB) expectClose(r.magnitudeDb[i]!, e, { abs: DB_TOL }, `dB at ${c.curve.f[i]} Hz`);
      if (e > -100) expect(angleGap(r.phase[i]!, c.curve.phase[i]!)).toBeLessThan(PHASE_TOL);
    });
  });
});

describe('designIir published facts', () => {
  const fs = 1000;
  it('Butterworth is −3.01 dB at its edge for every order and band shape', () => {
    // common practice: |H|² = 1/2 at the Butterworth cutoff, 10·log10(1/2) = −3.0103 dB
    for (const order of [1, 2, 5, 13]) {
      expectClose(
        dbAt(designIir({ family: 'butterworth', response: 'lowpass', order, edgesHz: [123], fs }), 123, fs),
        -3.0103,
        { abs: 1e-4 },
      );
      expectClose(
        dbAt(designIir({ family: 'butterworth', response: 'highpass', order, edgesHz: [77], fs }), 77, fs),
        -3.0103,
        { abs: 1e-4 },
      );
      const bp = designIir({ family: 'butterworth', response: 'bandpass', order, edgesHz: [100, 300], fs });
      expectClose([dbAt(bp, 100, fs), dbAt(bp, 300, fs)], [-3.0103, -3.0103], { abs: 1e-4 });
    }
  });

  it('Chebyshev I ripple equals the request: 0 dB peaks and −rp dB troughs and edge', () => {
    // common practice: equiripple pass band between 0 and −rp dB, ending at −rp dB at the edge
    for (const [order, rp] of [
      [5, 0.5],
      [6, 1],
      [9, 2],
    ] as const) {
      const zpk = designIir({
        family: 'chebyshev1',
        response: 'lowpass',
        order,
        edgesHz: [200],
        fs,
        rippleDb: rp,
      });
      const f = Array.from({ length: 4001 }, (_, i) => (200 * i) / 4000);
      const db = responseHz(zpk, f, fs).magnitudeDb;
      expectClose(Math.max(...db), 0, { abs: 1e-4 }, 'peak');
      expectClose(Math.min(...db), -rp, { abs: 1e-4 }, 'trough');
      expectClose(db[4000]!, -rp, { abs: 1e-9 }, 'edge');
      expectClose(db[0]!, order % 2 === 0 ? -rp : 0, { abs: 1e-9 }, 'DC');
    }
  });

  it('Chebyshev II reaches −rs dB at its edge and never rises above it beyond', () => {
    // common practice: the type II edge is the start of the equiripple stop band
    const zpk = designIir({
      family: 'chebyshev2',
      response: 'lowpass',
      order: 7,
      edgesHz: [150],
      fs,
      attenuationDb: 55,
    });
    expectClose(dbAt(zpk, 150, fs), -55, { abs: 1e-8 });
    const stop = responseHz(
      zpk,
      Array.from({ length: 2000 }, (_, i) => 150 + (350 * i) / 1999),
      fs,
    ).magnitudeDb;
    expect(Math.max(...stop)).toBeLessThan(-55 + 1e-8);
  });

  it('elliptic designs are equiripple in both bands', () => {
    // Cauer/elliptic definition, common practice: pass band between 0 and −rp, stop band peaks all at −rs
    const zpk = designIir({
      family: 'elliptic',
      response: 'lowpass',
      order: 6,
      edgesHz: [100],
      fs,
      rippleDb: 0.5,
      attenuationDb: 60,
    });
    const pass = responseHz(
      zpk,
      Array.from({ length: 4001 }, (_, i) => (100 * i) / 4000),
      fs,
    ).magnitudeDb;
    expectClose([Math.max(...pass), Math.min(...pass)], [0, -0.5], { abs: 1e-4 });
    const f = Array.from({ length: 20001 }, (_, i) => 100 + (400 * i) / 20000);
    const db = responseHz(zpk, f, fs).magnitudeDb;
    const peaks: number[] = [];
    for (let i = 1; i < db.length - 1; i++)
      if (db[i]! > db[i - 1]! && db[i]! >= db[i + 1]! && db[i]! < -30) peaks.push(db[i]!);
    // even order: two interior maxima between the three zero pairs, the third maximum sits at Nyquist
    peaks.push(db[db.length - 1]!);
    expect(peaks.length).toBe(3);
    expectClose(peaks, [-60, -60, -60], { abs: 1e-3 }, 'stop-band peaks');
  });

  it('keeps every pole inside the unit circle up to order 64 near DC and near Nyquist', () => {
    for (const family of ['butterworth', 'chebyshev1', 'chebyshev2', 'elliptic'] as const)
      for (const edgesHz of [[0.5], [499.5]]) {
        const zpk = designIir({
          family,
          response: 'lowpass',
          order: 64,
          edgesHz,
          fs,
          rippleDb: 0.1,
          attenuationDb: 100,
        });
        for (const p of zpk.poles) expect(Math.hypot(p.re, p.im)).toBeLessThan(1);
        expect(Number.isFinite(zpk.gain) && zpk.gain !== 0).toBe(true);
      }
  });
});
