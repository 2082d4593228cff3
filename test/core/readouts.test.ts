import { describe, it, expect } from 'vitest';
import { rootFrequencyHz, rootReadouts } from '../../src/core/readouts.ts';
import { rootAriaLabel } from '../../src/views/plane/rootLabel.ts';
import { snapToFrequencyGrid } from '../../src/views/plane/snap.ts';
import { formatHz } from '../../src/views/shared/format.ts';
import { responseZpk } from '../../src/core/response/index.ts';
import type { Zpk } from '../../src/core/types.ts';
import { expectClose } from '../helpers/expectClose.ts';

const fs = 48000;

describe('rootReadouts', () => {
  const t = (2 * Math.PI * 1000) / fs;
  const resonator: Zpk = {
    zeros: [],
    poles: [{ re: 0.99 * Math.cos(t), im: 0.99 * Math.sin(t), multiplicity: 1 }],
    gain: 1,
  };
  it('pole pair: frequency, radius, time constant, 40 dB decay, bandwidth and Q', () => {
    const [r] = rootReadouts(resonator, fs);
    expect(r!.kind).toBe('pole');
    expectClose(r!.frequencyHz, 1000, { rel: 1e-12 });
    expectClose(r!.radius, 0.99, { rel: 1e-15 });
    // common practice: tau = -1/ln r samples; 40 dB = amplitude / 100
    expectClose(r!.timeConstantSamples!, 99.4991624, { rel: 1e-8 });
    expectClose(r!.timeConstantSeconds!, 99.4991624 / fs, { rel: 1e-8 });
    expectClose(r!.decay40dBSeconds!, (Math.log(100) * 99.4991624) / fs, { rel: 1e-8 });
    // scipy.signal.iirnotch's pole radius r² = (1 − β)/(1 + β), β = tan(πB/fs), solved for B
    const width = (fs / Math.PI) * Math.atan((1 - 0.99 ** 2) / (1 + 0.99 ** 2));
    expectClose(r!.bandwidthHz!, width, { rel: 1e-12 });
    expectClose(r!.q!, 1000 / width, { rel: 1e-12 });
    // common practice: near the circle that is (1 − r)·fs/π
    expectClose(r!.bandwidthHz!, (0.01 * fs) / Math.PI, { rel: 0.01 });
  });
  it('the bandwidth estimate is within 2% of the measured -3 dB width of the resonance', () => {
    const grid = Float64Array.from({ length: 40001 }, (_, i) => t - 0.04 + (0.08 * i) / 40000);
    const h = responseZpk(resonator, grid);
    const peak = Math.max(...h.magnitude);
    const above = grid.filter((_, i) => h.magnitude[i]! >= peak / Math.SQRT2);
    const measuredHz = ((above[above.length - 1]! - above[0]!) * fs) / (2 * Math.PI);
    const [r] = rootReadouts(resonator, fs);
    expectClose(r!.bandwidthHz!, measuredHz, { rel: 0.02 });
  });
  it('real pole: time constant but no Q; pole at the origin decays at once; pole outside has no decay', () => {
    const out = rootReadouts(
      {
        zeros: [],
        poles: [
          { re: 0.5, im: 0, multiplicity: 1 },
          { re: 0, im: 0, multiplicity: 1 },
          { re: -1.2, im: 0, multiplicity: 1 },
        ],
        gain: 1,
      },
      fs,
    );
    expectClose(out[0]!.timeConstantSamples!, 1 / Math.LN2, { rel: 1e-15 });
    expect(out[0]!.q).toBeUndefined();
    expect(out[1]!.timeConstantSamples).toBe(0);
    expect(out[2]!.timeConstantSamples).toBeUndefined();
    expectClose(out[2]!.frequencyHz, fs / 2, { rel: 1e-15 });
  });
  it('zero near the circle: notch frequency and depth from the full response', () => {
    const th = (2 * Math.PI * 50) / fs;
    const zpk: Zpk = {
      zeros: [{ re: 0.98 * Math.cos(th), im: 0.98 * Math.sin(th), multiplicity: 1 }],
      poles: [],
      gain: 2,
    };
    const z = rootReadouts(zpk, fs)[0]!;
    expectClose(z.notchFrequencyHz!, 50, { rel: 1e-12 });
    // common practice: |H(e^{iθ})| = k·(1 − r)·|1 − r·e^{−2iθ}|
    const far = Math.hypot(1 - 0.98 * Math.cos(2 * th), 0.98 * Math.sin(2 * th));
    expectClose(z.notchDepthDb!, 20 * Math.log10(2 * 0.02 * far), { abs: 1e-9 });
    const away = rootReadouts({ zeros: [{ re: 0.5, im: 0.2, multiplicity: 1 }], poles: [], gain: 1 }, fs)[0]!;
    expect(away.notchDepthDb).toBeUndefined();
  });
});

describe('read-out frequencies at the edges', () => {
  it('a zero at z = −1 reads exactly fs/2 and one at z = 1 reads 0 Hz (common practice)', () => {
    const r = rootReadouts(
      {
        zeros: [
          { re: -1, im: 0, multiplicity: 1 },
          { re: 1, im: 0, multiplicity: 1 },
        ],
        poles: [],
        gain: 1,
      },
      1000,
    );
    expect(r.find((x) => x.root.re === -1)!.frequencyHz).toBe(500);
    expect(r.find((x) => x.root.re === 1)!.frequencyHz).toBe(0);
  });
});

describe('rootFrequencyHz (the one root-frequency read-out)', () => {
  it('is the angle as Hz for a root and its conjugate, and exact at z = −1 for odd sample rates', () => {
    // common practice: a root at angle θ stands for θ·fs/(2π) Hz
    const z = { re: 0.9 * Math.cos(0.3), im: 0.9 * Math.sin(0.3) };
    expectClose(rootFrequencyHz(z, 1000), (0.3 * 1000) / (2 * Math.PI), { rel: 1e-15 });
    expect(rootFrequencyHz({ re: z.re, im: -z.im }, 1000)).toBe(rootFrequencyHz(z, 1000));
    for (const fs of [1000, 44100, 48000, 7, 2.5e6 / 3])
      expect(rootFrequencyHz({ re: -1, im: 0 }, fs)).toBe(fs / 2);
  });

  it('the table, the plane label, the marker and the snapping read the same number', () => {
    const fs = 44100;
    const pole = { re: 0.7 * Math.cos(2.1), im: 0.7 * Math.sin(2.1), multiplicity: 1 };
    const [readout] = rootReadouts({ zeros: [], poles: [pole], gain: 1 }, fs);
    const hz = rootFrequencyHz(pole, fs);
    expect(readout!.frequencyHz).toBe(hz);
    expect(rootAriaLabel('pole', pole, fs)).toContain(formatHz(hz, 4));
    // Snapping to a grid as fine as the root's own frequency leaves its angle where it is.
    const snapped = snapToFrequencyGrid(pole, hz, fs);
    expect(rootFrequencyHz(snapped, fs)).toBeCloseTo(hz, 9);
  });
});
