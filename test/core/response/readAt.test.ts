import { describe, it, expect } from 'vitest';
import type { Zpk } from '../../../src/core/types.ts';
import { createWorkbenchStore } from '../../../src/store/store.ts';
import { selectZpk } from '../../../src/store/derived.ts';
import { readAt } from '../../../src/core/response/readAt.ts';
import { refineAtRoots, rootAngles } from '../../../src/core/response/index.ts';
import { responseZpk, frequencyGrid } from '../../../src/core/response/index.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('readAt (exact values at the cross-hair)', () => {
  // H(z) = z / (z − a): one real pole at a.
  const a = 0.5;
  const fs = 1000;
  const onePole: Zpk = {
    zeros: [{ re: 0, im: 0, multiplicity: 1 }],
    poles: [{ re: a, im: 0, multiplicity: 1 }],
    gain: 1,
  };

  it('matches the closed forms of a one-pole system at an arbitrary frequency', () => {
    const hz = 123.4; // deliberately not a grid frequency
    const w = (2 * Math.PI * hz) / fs;
    const r = readAt(onePole, fs, hz);
    // |H| = 1/|1 − a e^{−jω}|, ∠H = −atan2(a sin ω, 1 − a cos ω), τg = (a cos ω − a²)/(1 − 2a cos ω + a²)
    // (common practice: the textbook first-order section)
    const mag = 1 / Math.hypot(1 - a * Math.cos(w), a * Math.sin(w));
    expectClose(r.magnitude, mag, { rel: 1e-13 });
    expectClose(r.magnitudeDb, 20 * Math.log10(mag), { abs: 1e-12 });
    expectClose(r.phase, -Math.atan2(a * Math.sin(w), 1 - a * Math.cos(w)), { abs: 1e-13 });
    const gd = (a * Math.cos(w) - a * a) / (1 - 2 * a * Math.cos(w) + a * a);
    expectClose(r.groupDelay, gd, { rel: 1e-12 });
    expectClose(r.groupDelayMs, (gd * 1000) / fs, { rel: 1e-12 });
  });

  it('reads the demo design: a true notch at 50 Hz and 0 dB at DC under the DC gain rule', () => {
    const store = createWorkbenchStore();
    const zpk = selectZpk(store.getState());
    const fs = store.getState().design.sampleRate;
    expect(readAt(zpk, fs, 50).magnitudeDb).toBeLessThan(-200); // zero on the circle at 50 Hz
    expectClose(readAt(zpk, fs, 0).magnitudeDb, 0, { abs: 1e-9 }); // the 'dc' gain rule: 0 dB at DC
    // 49 Hz sits inside the ~4 Hz wide notch: well down, but finite.
    const near = readAt(zpk, fs, 49).magnitudeDb;
    expect(near).toBeLessThan(-3);
    expect(near).toBeGreaterThan(-40);
  });
});

describe('refineAtRoots', () => {
  const fs = 2000;
  const w50 = (2 * Math.PI * 50) / fs;
  const notch: Zpk = {
    zeros: [{ re: Math.cos(w50), im: Math.sin(w50), multiplicity: 1 }],
    poles: [{ re: 0.99 * Math.cos(w50), im: 0.99 * Math.sin(w50), multiplicity: 1 }],
    gain: 1,
  };
  const grid = responseZpk(notch, frequencyGrid(512));

  it('finds the angles of roots near the circle only', () => {
    const far: Zpk = { ...notch, poles: [{ re: 0.3, im: 0, multiplicity: 1 }] };
    expect(rootAngles(far, 0)).toEqual([w50]);
  });
  it('adds the notch frequency, where the curve reaches −∞ dB, keeping frequencies in order', () => {
    const fine = refineAtRoots(notch, grid);
    expect(fine.omega.length).toBe(grid.omega.length + 1);
    for (let i = 1; i < fine.omega.length; i++) expect(fine.omega[i]!).toBeGreaterThan(fine.omega[i - 1]!);
    const k = fine.omega.indexOf(w50);
    expect(k).toBeGreaterThan(0);
    expect(fine.magnitudeDb[k]!).toBeLessThan(-200);
    // Every other point is the grid's own value.
    expect(fine.magnitudeDb[k - 1]).toBe(grid.magnitudeDb[k - 1]);
    expect(fine.magnitudeDb[k + 1]).toBe(grid.magnitudeDb[k]);
    // The grid alone misses the notch by tens of dB: the reason for refining.
    expect(Math.min(...grid.magnitudeDb)).toBeGreaterThan(-60);
  });
  it('returns the grid itself when there is nothing to add', () => {
    const none: Zpk = { zeros: [], poles: [], gain: 2 };
    const g = responseZpk(none, frequencyGrid(16));
    expect(refineAtRoots(none, g)).toBe(g);
  });
});
