/** Moving roots to a new sample rate with their frequencies in Hz kept (matched-z mapping z' = z^(fsOld/fsNew)). */
import { describe, expect, it } from 'vitest';
import { gainKeepingLevel, maskAtRate, rootsKeepingHz } from '../../../src/core/model/rate.ts';
import { rootFrequencyHz } from '../../../src/core/readouts.ts';
import { magnitudeDbAt } from '../../../src/core/response/magnitude.ts';
import { hzToOmega } from '../../../src/core/units.ts';
import { expectClose } from '../../helpers/expectClose.ts';

describe('rootsKeepingHz', () => {
  it('keeps each root frequency in Hz and its decay per second', () => {
    // A pole pair at 50 Hz, radius 0.99 at fs 2 kHz: time constant −1/(fs ln r) seconds (common practice).
    const theta = (2 * Math.PI * 50) / 2000;
    const pole = { re: 0.99 * Math.cos(theta), im: 0.99 * Math.sin(theta), multiplicity: 1 };
    const r = rootsKeepingHz(
      [pole, { re: 0.5, im: 0, multiplicity: 2 }, { re: -0.3, im: 0, multiplicity: 1 }],
      2000,
      4000,
      'pole',
    );
    if (!r.ok) throw new Error(r.error.message);
    const [p, real, nyq] = r.value;
    expectClose(rootFrequencyHz(p!, 4000), 50, { rel: 1e-12 }, 'pair stays at 50 Hz');
    const tau = (radius: number, fs: number) => -1 / (fs * Math.log(radius));
    expectClose(
      tau(Math.hypot(p!.re, p!.im), 4000),
      tau(0.99, 2000),
      { rel: 1e-12 },
      'same decay in seconds',
    );
    expectClose(real!.re, Math.sqrt(0.5), { rel: 1e-15 }, 'real root r^(1/2)');
    expect(real!.multiplicity).toBe(2);
    expect(nyq!.re).toBeLessThan(0);
    expect(nyq!.im).toBe(0);
  });

  it('refuses a root that would lie above the new fs/2, saying which and what to do', () => {
    const theta = (2 * Math.PI * 300) / 1000;
    const r = rootsKeepingHz(
      [{ re: Math.cos(theta), im: Math.sin(theta), multiplicity: 1 }],
      1000,
      500,
      'zero',
    );
    expect(r.ok).toBe(false);
    if (!r.ok) {
      expect(r.error.message).toMatch(/the zero at 300 Hz lies above fs\/2 = 250 Hz/);
      expect(r.error.expected).toMatch(/above 600 Hz/);
    }
  });
});

describe('gainKeepingLevel', () => {
  it('keeps the level at the loudest frequency', () => {
    const old = { zeros: [], poles: [{ re: 0.9, im: 0, multiplicity: 1 }], gain: 0.1 };
    const moved = { ...old, poles: [{ re: 0.9 ** 0.5, im: 0, multiplicity: 1 }] };
    const g = gainKeepingLevel(old, 1000, moved, 2000);
    expectClose(
      magnitudeDbAt({ ...moved, gain: g }, hzToOmega(0, 2000)),
      magnitudeDbAt(old, hzToOmega(0, 1000)),
      { abs: 1e-12 },
      'DC level',
    );
  });
});

describe('maskAtRate', () => {
  it('clips regions to the new fs/2 and drops those wholly above it', () => {
    const mask = {
      regions: [
        { id: 'a', kind: 'pass' as const, fromHz: 0, toHz: 300, lowerDb: -1 },
        { id: 'b', kind: 'stop' as const, fromHz: 400, toHz: 500, upperDb: -40 },
      ],
    };
    const r = maskAtRate(mask, 500);
    expect(r.mask.regions.map((x) => [x.id, x.toHz])).toEqual([['a', 250]]);
    expect(r.dropped).toEqual(['b']);
    expect(r.clipped).toEqual(['a']);
    expect(maskAtRate(mask, 2000).mask).toBe(mask);
  });
});
